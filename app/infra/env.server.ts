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
  STRIPE_SECRET_KEY: z.string().default("sk_test_isotrope_local"),
  STRIPE_WEBHOOK_SECRET: z.string().default("whsec_isotrope_local"),
  /** http://127.0.0.1:<port> for the local fake (mocks/stripe); empty or unset: Stripe itself. */
  STRIPE_API_BASE: z.string().default(""),
});

export const env = schema.parse(process.env);
