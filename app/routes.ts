import { index, layout, prefix, route, type RouteConfig } from "@react-router/dev/routes";

export default [
  layout("routes/auth/layout.tsx", [
    route("sign-in", "routes/auth/sign-in.tsx"),
    route("sign-up", "routes/auth/sign-up.tsx"),
    route("check-email", "routes/auth/check-email.tsx"),
    route("verified", "routes/auth/verified.tsx"),
    route("forgot-password", "routes/auth/forgot-password.tsx"),
    route("reset-password", "routes/auth/reset-password.tsx"),
    route("invite/:invitationId", "routes/auth/invite.tsx"),
  ]),
  layout("routes/app-layout.tsx", [
    index("routes/overview.tsx"),
    route("welcome", "routes/welcome.tsx"),
    route("members", "routes/members/members.tsx"),
    route("account", "routes/account/account.tsx"),
    // Unknown addresses: the 404 inside the shell, with navigation when signed in.
    route("*", "routes/not-found.tsx"),
  ]),
  route("sign-out", "routes/auth/sign-out.ts"),
  ...prefix("api", [
    route("auth/*", "routes/api/auth.ts"),
    route("health", "routes/api/health.ts"),
    route("v1/me", "routes/api/v1/me.ts"),
  ]),
] satisfies RouteConfig;
