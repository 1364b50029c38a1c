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
    ...prefix("clients", [
      index("routes/clients/list.tsx"),
      route("new", "routes/clients/new.tsx"),
      route(":clientId", "routes/clients/client.tsx"),
    ]),
    ...prefix("sites", [
      index("routes/sites/list.tsx"),
      route("new", "routes/sites/new.tsx"),
      route(":siteId", "routes/sites/site.tsx", [
        index("routes/sites/layout.tsx"),
        route("edit", "routes/sites/edit.tsx"),
        route("history", "routes/sites/history.tsx"),
        route("exposure", "routes/exposure/exposure.tsx"),
        route("visits", "routes/sites/visits.tsx"),
        route("visits/new", "routes/sites/visit-new.tsx"),
        route("visits/:visitId", "routes/sites/visit.tsx"),
        route("visits/:visitId/photos/:photoId", "routes/sites/photo.tsx"),
      ]),
    ]),
    route("history", "routes/history/organization.tsx"),
    // Unknown addresses: the 404 inside the shell, with navigation when signed in.
    route("*", "routes/not-found.tsx"),
  ]),
  route("files/:fileId", "routes/files/file.ts"),
  route("sign-out", "routes/auth/sign-out.ts"),
  ...prefix("api", [
    route("auth/*", "routes/api/auth.ts"),
    route("health", "routes/api/health.ts"),
    route("v1/me", "routes/api/v1/me.ts"),
    route("v1/tokens", "routes/api/v1/tokens.ts"),
    route("v1/tokens/:tokenId", "routes/api/v1/token.ts"),
    route("v1/clients", "routes/api/v1/clients.ts"),
    route("v1/sites", "routes/api/v1/sites.ts"),
    route("v1/sites/:siteId", "routes/api/v1/site.ts"),
    route("v1/sites/:siteId/history", "routes/api/v1/site-history.ts"),
    route("v1/sites/:siteId/visits", "routes/api/v1/site-visits.ts"),
    route("v1/visits/:visitId", "routes/api/v1/visit.ts"),
    route("v1/visits/:visitId/photos", "routes/api/v1/visit-photos.ts"),
    route("v1/visits/:visitId/readings", "routes/api/v1/visit-readings.ts"),
  ]),
] satisfies RouteConfig;
