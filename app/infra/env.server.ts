// Settings read once from the environment, with the local defaults that `npm start` uses.
import { z } from "zod";

const schema = z.object({
  NODE_ENV: z.string().default("development"),
  DATABASE_URL: z.string().default("postgres://isotrope@127.0.0.1:54329/isotrope"),
  SMTP_URL: z.string().default("smtp://127.0.0.1:1025"),
  MAIL_FROM: z.string().default("Isotrope <no-reply@isotrope.test>"),
  APP_URL: z.string().url().default("http://127.0.0.1:3000"),
  BETTER_AUTH_SECRET: z.string().min(32).default("isotrope-local-development-secret-change-me"),
  SIGN_IN_LIMIT: z.coerce.number().int().positive().default(10),
  SIGN_IN_WINDOW_SECONDS: z.coerce.number().int().positive().default(60),
});

export const env = schema.parse(process.env);
