// Sign-in, sessions and organisation roles: better-auth over the Drizzle adapter.
import { betterAuth } from "better-auth";
import { drizzleAdapter } from "better-auth/adapters/drizzle";
import { organization } from "better-auth/plugins";
import { createAccessControl } from "better-auth/plugins/access";
import { defaultStatements, ownerAc } from "better-auth/plugins/organization/access";
import { CLIENT_ADDRESS_HEADER } from "~/infra/client-address.server";
import { db, schema } from "~/infra/db.server";
import { env } from "~/infra/env.server";
import { linkMail, sendLater } from "~/infra/mail.server";
import { preferredOrganizationId } from "~/features/members/organizations.server";
import { afterHook, beforeHook } from "./auth-hooks.server";

// The organisation plugin keeps the session's active organisation and the role
// names; members and invitations are written by members.server.ts under our own
// guard (permissions.server.ts), and the plugin's HTTP endpoints stay closed.
const ac = createAccessControl(defaultStatements);
const noManagement = ac.newRole({});
export const accessRoles = {
  owner: ac.newRole(ownerAc.statements),
  engineer: noManagement,
  reviewer: noManagement,
  billing: noManagement,
  client: noManagement,
  regulator: noManagement,
};

const trustedOrigins = [env.APP_URL, env.APP_URL.replace("127.0.0.1", "localhost")];

export const auth = betterAuth({
  appName: "Isotrope",
  baseURL: env.APP_URL,
  basePath: "/api/auth",
  secret: env.BETTER_AUTH_SECRET,
  trustedOrigins,
  database: drizzleAdapter(db, { provider: "pg", schema: schema.authSchema }),
  emailAndPassword: {
    enabled: true,
    requireEmailVerification: true,
    minPasswordLength: 10,
    maxPasswordLength: 128,
    resetPasswordTokenExpiresIn: 60 * 60,
    revokeSessionsOnPasswordReset: true,
    // Mails go out after the answer (sendLater), so the answer takes the same time whether
    // or not the address has an account.
    sendResetPassword: async ({ user, url }) => {
      sendLater(
        linkMail(user.email, "Reset your Isotrope password", [
          `Someone asked to reset the password of ${user.email}.`,
          "The link works once, for one hour. If it wasn't you, ignore this message.",
        ], { label: "Choose a new password", url }),
      );
    },
    // Sign-up with a taken address answers exactly as for a new one; the owner hears of it.
    onExistingUserSignUp: async ({ user }) => {
      sendLater(
        linkMail(user.email, "Someone tried to sign up with your address", [
          `Someone tried to create an Isotrope account with ${user.email}, which already has one.`,
          "If it was you, sign in, or choose a new password if you have forgotten it. If it wasn't, ignore this message: nothing has changed.",
        ], [
          { label: "Sign in", url: `${env.APP_URL}/sign-in` },
          { label: "Reset the password", url: `${env.APP_URL}/forgot-password` },
        ]),
      );
    },
  },
  emailVerification: {
    sendOnSignUp: true,
    sendOnSignIn: true,
    autoSignInAfterVerification: true,
    expiresIn: 60 * 60,
    sendVerificationEmail: async ({ user, url }) => {
      sendLater(
        linkMail(user.email, "Confirm your e-mail for Isotrope", [
          `Welcome to Isotrope, ${user.name}.`,
          "Confirm this address to finish signing up. The link works for one hour.",
        ], { label: "Confirm my e-mail", url }),
      );
    },
  },
  rateLimit: {
    enabled: true,
    storage: "database",
    window: 60,
    max: 300,
    customRules: {
      "/sign-in/email": { window: env.SIGN_IN_WINDOW_SECONDS, max: env.SIGN_IN_LIMIT },
      "/sign-up/email": { window: 60, max: env.SIGN_IN_LIMIT },
      "/request-password-reset": { window: 60, max: env.SIGN_IN_LIMIT },
      "/send-verification-email": { window: 60, max: env.SIGN_IN_LIMIT },
      "/reset-password": { window: 60, max: env.SIGN_IN_LIMIT },
      "/change-password": { window: 60, max: env.SIGN_IN_LIMIT },
    },
  },
  // The forms' Zod limits and the per-account throttles (auth-hooks.server.ts) on every call.
  hooks: { before: beforeHook, after: afterHook },
  // A new session opens the organisation the person last joined or switched to.
  databaseHooks: {
    session: {
      create: {
        before: async (session) => ({ data: { ...session, activeOrganizationId: await preferredOrganizationId(session.userId) } }),
      },
    },
  },
  advanced: { ipAddress: { ipAddressHeaders: [CLIENT_ADDRESS_HEADER] } },
  plugins: [
    organization({
      ac,
      roles: accessRoles,
      creatorRole: "owner",
      allowUserToCreateOrganization: false,
      disableOrganizationDeletion: true,
    }),
  ],
});
