import { index, layout, route, type RouteConfig } from "@react-router/dev/routes";

export default [
  layout("routes/auth-layout.tsx", [
    route("sign-in", "routes/sign-in.tsx"),
    route("sign-up", "routes/sign-up.tsx"),
    route("check-email", "routes/check-email.tsx"),
    route("verified", "routes/verified.tsx"),
    route("forgot-password", "routes/forgot-password.tsx"),
    route("reset-password", "routes/reset-password.tsx"),
    route("invite/:invitationId", "routes/invite.tsx"),
  ]),
  layout("routes/app-layout.tsx", [
    index("routes/home.tsx"),
    route("welcome", "routes/welcome.tsx"),
    route("members", "routes/members.tsx"),
    route("account", "routes/account.tsx"),
  ]),
  route("sign-out", "routes/sign-out.ts"),
  route("api/auth/*", "routes/api.auth.ts"),
  route("api/v1/me", "routes/api.v1.me.ts"),
  route("api/health", "routes/api.health.ts"),
  route("*", "routes/not-found.tsx"),
] satisfies RouteConfig;
