// Every route × every role: allowed, redirected to sign-in, or refused — checked on the server.
import { randomUUID } from "node:crypto";
import { beforeAll, describe, expect, it } from "vitest";
import routeConfig from "~/routes";
import { db, schema } from "~/infra/db.server";
import { inventoryEditors, roles, staffRoles, type Role } from "~/lib/roles";
import { createOrg, makeRequest, outcome, type Org } from "./fixtures";

// Every route module under app/routes, keyed as app/routes.ts names them ("routes/…").
const modules: Record<string, Record<string, unknown>> = Object.fromEntries(
  Object.entries(import.meta.glob("/app/routes/**/*.{ts,tsx}", { eager: true })).map(([path, mod]) => [path.replace(/^\/app\//, ""), mod as Record<string, unknown>]),
);

type Actor = "anonymous" | Role;
type Expect = "ok" | "sign-in" | "forbidden" | "home" | "portal" | "unauthorized" | "not-found" | "signed-out" | "bad-request" | "conflict" | "unsupported";
type Handler = (args: { request: Request; params: Record<string, string>; context: unknown }) => unknown;
type Case = {
  file: string;
  method: "loader" | "action";
  path: () => string;
  form?: Record<string, string>;
  /** A JSON body (API routes); `method2` the HTTP method when not POST. */
  json?: unknown;
  method2?: "PATCH" | "PUT" | "DELETE";
  params?: () => Record<string, string>;
  expect: (actor: Actor) => Expect;
};

const staff = (actor: Actor, ok: Expect, anonymous: Expect = "sign-in") => (actor === "anonymous" ? anonymous : ok);
const ownerOnly = (actor: Actor, ok: Expect) => (actor === "anonymous" ? "sign-in" : actor === "owner" ? ok : "forbidden");
const visitorOnly = (actor: Actor) => (actor === "anonymous" ? "ok" : "home");
/** API routes: allowed for the listed roles, 403 for other members, 401 for visitors. */
const apiRoles = (allowed: readonly Role[], ok: Expect) => (actor: Actor): Expect => (actor === "anonymous" ? "unauthorized" : allowed.includes(actor) ? ok : "forbidden");
/** Allowed for the listed roles, 403 for other members, sign-in for visitors. */
const rolesIn = (allowed: readonly Role[], ok: Expect) => (actor: Actor): Expect => (actor === "anonymous" ? "sign-in" : allowed.includes(actor) ? ok : "forbidden");

let org: Org;
let invitationId = "";
let clientId = "";
let siteId = "";
let visitId = "";
let photoId = "";
let assessmentId = "";
let documentId = "";
let invoiceId = "";
const billingRoles = ["owner", "billing"] as const;


const cases: Case[] = [
  // A client member's home is the portal.
  { file: "routes/overview.tsx", method: "loader", path: () => "/", expect: (a) => (a === "client" ? "portal" : staff(a, "ok")) },
  { file: "routes/account/account.tsx", method: "loader", path: () => "/account", expect: (a) => staff(a, "ok") },
  { file: "routes/account/account.tsx", method: "action", path: () => "/account", form: {}, expect: (a) => staff(a, "bad-request") },
  { file: "routes/members/members.tsx", method: "loader", path: () => "/members", expect: (a) => ownerOnly(a, "ok") },
  // An empty post passes the guard only for owners, who then get the validation error.
  { file: "routes/members/members.tsx", method: "action", path: () => "/members", form: {}, expect: (a) => ownerOnly(a, "bad-request") },
  { file: "routes/welcome.tsx", method: "loader", path: () => "/welcome", expect: (a) => staff(a, "home") },
  { file: "routes/welcome.tsx", method: "action", path: () => "/welcome", form: { name: "Another consultancy" }, expect: (a) => staff(a, "conflict") },
  { file: "routes/api/v1/me.ts", method: "loader", path: () => "/api/v1/me", expect: (a) => staff(a, "ok", "unauthorized") },
  { file: "routes/api/health.ts", method: "loader", path: () => "/api/health", expect: () => "ok" },
  { file: "routes/api/auth.ts", method: "loader", path: () => "/api/auth/get-session", expect: () => "ok" },
  { file: "routes/api/auth.ts", method: "loader", path: () => "/api/auth/organization/list-members", expect: () => "not-found" },
  { file: "routes/api/auth.ts", method: "action", path: () => "/api/auth/organization/update-member-role", form: {}, expect: () => "not-found" },
  { file: "routes/api/auth.ts", method: "action", path: () => "/api/auth/update-user", form: { name: "x" }, expect: () => "not-found" },
  { file: "routes/api/auth.ts", method: "loader", path: () => "/api/auth/list-sessions", expect: () => "not-found" },
  { file: "routes/auth/check-email.tsx", method: "loader", path: () => "/check-email", expect: () => "ok" },
  { file: "routes/auth/check-email.tsx", method: "action", path: () => "/check-email", form: {}, expect: () => "bad-request" },
  { file: "routes/auth/sign-in.tsx", method: "loader", path: () => "/sign-in", expect: visitorOnly },
  { file: "routes/auth/sign-up.tsx", method: "loader", path: () => "/sign-up", expect: visitorOnly },
  { file: "routes/auth/sign-in.tsx", method: "action", path: () => "/sign-in", form: { email: "not-an-address" }, expect: () => "bad-request" },
  { file: "routes/auth/sign-up.tsx", method: "action", path: () => "/sign-up", form: { email: "x" }, expect: () => "bad-request" },
  { file: "routes/auth/forgot-password.tsx", method: "action", path: () => "/forgot-password", form: { email: "x" }, expect: () => "bad-request" },
  // A token better-auth never issued is refused before the form shows.
  { file: "routes/auth/reset-password.tsx", method: "loader", path: () => "/reset-password?token=abc", expect: () => "bad-request" },
  { file: "routes/auth/reset-password.tsx", method: "loader", path: () => "/reset-password", expect: () => "bad-request" },
  { file: "routes/auth/reset-password.tsx", method: "action", path: () => "/reset-password", form: { token: "abc" }, expect: () => "bad-request" },
  { file: "routes/auth/verified.tsx", method: "loader", path: () => "/verified", expect: () => "ok" },
  { file: "routes/auth/verified.tsx", method: "loader", path: () => "/verified?error=INVALID_TOKEN", expect: () => "bad-request" },
  { file: "routes/auth/invite.tsx", method: "loader", path: () => `/invite/${invitationId}`, params: () => ({ invitationId }), expect: () => "ok" },
  { file: "routes/auth/invite.tsx", method: "loader", path: () => "/invite/nope", params: () => ({ invitationId: "nope" }), expect: () => "not-found" },
  // Signed-in members are not the invitee: refused; a visitor's empty form is a validation error.
  { file: "routes/auth/invite.tsx", method: "action", path: () => `/invite/${invitationId}`, form: {}, params: () => ({ invitationId }), expect: (a) => (a === "anonymous" ? "bad-request" : "forbidden") },
  { file: "routes/auth/sign-out.ts", method: "loader", path: () => "/sign-out", expect: () => "home" },
  { file: "routes/not-found.tsx", method: "loader", path: () => "/no-such-page", expect: () => "not-found" },
  { file: "routes/app-layout.tsx", method: "loader", path: () => "/", expect: () => "ok" },
  { file: "routes/auth/layout.tsx", method: "loader", path: () => "/sign-in", expect: () => "ok" },
  { file: "routes/clients/list.tsx", method: "loader", path: () => "/clients", expect: rolesIn(staffRoles, "ok") },
  { file: "routes/clients/new.tsx", method: "loader", path: () => "/clients/new", expect: rolesIn(inventoryEditors, "ok") },
  { file: "routes/clients/new.tsx", method: "action", path: () => "/clients/new", form: {}, expect: rolesIn(inventoryEditors, "bad-request") },
  { file: "routes/clients/client.tsx", method: "loader", path: () => `/clients/${clientId}`, params: () => ({ clientId }), expect: rolesIn(staffRoles, "ok") },
  { file: "routes/clients/client.tsx", method: "action", path: () => `/clients/${clientId}`, form: {}, params: () => ({ clientId }), expect: rolesIn(inventoryEditors, "bad-request") },
  { file: "routes/sites/list.tsx", method: "loader", path: () => "/sites", expect: rolesIn(staffRoles, "ok") },
  { file: "routes/sites/new.tsx", method: "loader", path: () => "/sites/new", expect: rolesIn(inventoryEditors, "ok") },
  { file: "routes/sites/new.tsx", method: "action", path: () => "/sites/new", form: {}, expect: rolesIn(inventoryEditors, "bad-request") },
  { file: "routes/sites/site.tsx", method: "loader", path: () => `/sites/${siteId}`, params: () => ({ siteId }), expect: rolesIn(staffRoles, "ok") },
  { file: "routes/sites/layout.tsx", method: "loader", path: () => `/sites/${siteId}`, params: () => ({ siteId }), expect: rolesIn(staffRoles, "ok") },
  { file: "routes/files/file.ts", method: "loader", path: () => "/files/nope", params: () => ({ fileId: "nope" }), expect: rolesIn(staffRoles, "not-found") },
  { file: "routes/sites/edit.tsx", method: "loader", path: () => `/sites/${siteId}/edit`, params: () => ({ siteId }), expect: rolesIn(inventoryEditors, "ok") },
  { file: "routes/sites/edit.tsx", method: "action", path: () => `/sites/${siteId}/edit`, form: {}, params: () => ({ siteId }), expect: rolesIn(inventoryEditors, "bad-request") },
  { file: "routes/sites/history.tsx", method: "loader", path: () => `/sites/${siteId}/history`, params: () => ({ siteId }), expect: rolesIn(staffRoles, "ok") },
  { file: "routes/exposure/exposure.tsx", method: "loader", path: () => `/sites/${siteId}/exposure`, params: () => ({ siteId }), expect: rolesIn(staffRoles, "ok") },
  { file: "routes/api/v1/sites.ts", method: "loader", path: () => "/api/v1/sites", expect: apiRoles(staffRoles, "ok") },
  { file: "routes/api/v1/sites.ts", method: "action", path: () => "/api/v1/sites", json: {}, expect: apiRoles(inventoryEditors, "bad-request") },
  { file: "routes/api/v1/site.ts", method: "loader", path: () => `/api/v1/sites/${siteId}`, params: () => ({ siteId }), expect: apiRoles(staffRoles, "ok") },
  { file: "routes/api/v1/site.ts", method: "action", path: () => `/api/v1/sites/${siteId}`, method2: "PATCH", json: {}, params: () => ({ siteId }), expect: apiRoles(inventoryEditors, "bad-request") },
  { file: "routes/sites/layout-edit.tsx", method: "loader", path: () => `/sites/${siteId}/layout`, params: () => ({ siteId }), expect: rolesIn(inventoryEditors, "ok") },
  { file: "routes/api/v1/site-surfaces.ts", method: "loader", path: () => `/api/v1/sites/${siteId}/surfaces`, params: () => ({ siteId }), expect: apiRoles(staffRoles, "ok") },
  { file: "routes/api/v1/site-surfaces.ts", method: "action", path: () => `/api/v1/sites/${siteId}/surfaces`, method2: "PUT", json: {}, params: () => ({ siteId }), expect: apiRoles(inventoryEditors, "bad-request") },
  // A JSON body is not a multipart upload: 415 once the guard lets the member through.
  { file: "routes/api/v1/site-backdrop.ts", method: "action", path: () => `/api/v1/sites/${siteId}/backdrop`, json: {}, params: () => ({ siteId }), expect: apiRoles(inventoryEditors, "unsupported") },
  { file: "routes/api/v1/site-history.ts", method: "loader", path: () => `/api/v1/sites/${siteId}/history`, params: () => ({ siteId }), expect: apiRoles(staffRoles, "ok") },
  { file: "routes/exposure/section.tsx", method: "loader", path: () => `/sites/${siteId}/exposure/section`, params: () => ({ siteId }), expect: rolesIn(staffRoles, "ok") },
  { file: "routes/exposure/solid.tsx", method: "loader", path: () => `/sites/${siteId}/exposure/solid`, params: () => ({ siteId }), expect: rolesIn(staffRoles, "ok") },
  { file: "routes/exposure/planner.tsx", method: "loader", path: () => `/sites/${siteId}/exposure/planner`, params: () => ({ siteId }), expect: rolesIn(staffRoles, "ok") },
  { file: "routes/sites/visits.tsx", method: "loader", path: () => `/sites/${siteId}/visits`, params: () => ({ siteId }), expect: rolesIn(staffRoles, "ok") },
  { file: "routes/sites/visit-new.tsx", method: "loader", path: () => `/sites/${siteId}/visits/new`, params: () => ({ siteId }), expect: rolesIn(inventoryEditors, "ok") },
  { file: "routes/sites/visit-new.tsx", method: "action", path: () => `/sites/${siteId}/visits/new`, form: {}, params: () => ({ siteId }), expect: rolesIn(inventoryEditors, "bad-request") },
  { file: "routes/sites/visit.tsx", method: "loader", path: () => `/sites/${siteId}/visits/${visitId}`, params: () => ({ siteId, visitId }), expect: rolesIn(staffRoles, "ok") },
  { file: "routes/sites/visit.tsx", method: "action", path: () => `/sites/${siteId}/visits/${visitId}`, form: {}, params: () => ({ siteId, visitId }), expect: rolesIn(inventoryEditors, "bad-request") },
  { file: "routes/sites/photo.tsx", method: "loader", path: () => `/sites/${siteId}/visits/${visitId}/photos/${photoId}`, params: () => ({ siteId, visitId, photoId }), expect: rolesIn(staffRoles, "ok") },
  { file: "routes/sites/photo.tsx", method: "action", path: () => `/sites/${siteId}/visits/${visitId}/photos/${photoId}`, form: {}, params: () => ({ siteId, visitId, photoId }), expect: rolesIn(inventoryEditors, "bad-request") },
  { file: "routes/api/v1/site-visits.ts", method: "loader", path: () => `/api/v1/sites/${siteId}/visits`, params: () => ({ siteId }), expect: apiRoles(staffRoles, "ok") },
  { file: "routes/api/v1/site-visits.ts", method: "action", path: () => `/api/v1/sites/${siteId}/visits`, json: {}, params: () => ({ siteId }), expect: apiRoles(inventoryEditors, "bad-request") },
  { file: "routes/api/v1/visit.ts", method: "loader", path: () => `/api/v1/visits/${visitId}`, params: () => ({ visitId }), expect: apiRoles(staffRoles, "ok") },
  // A JSON body is not a multipart upload: 415 once the guard lets the member through.
  { file: "routes/api/v1/visit-photos.ts", method: "action", path: () => `/api/v1/visits/${visitId}/photos`, json: {}, params: () => ({ visitId }), expect: apiRoles(inventoryEditors, "unsupported") },
  { file: "routes/api/v1/visit-readings.ts", method: "loader", path: () => `/api/v1/visits/${visitId}/readings`, params: () => ({ visitId }), expect: apiRoles(staffRoles, "ok") },
  { file: "routes/api/v1/visit-readings.ts", method: "action", path: () => `/api/v1/visits/${visitId}/readings`, json: {}, params: () => ({ visitId }), expect: apiRoles(inventoryEditors, "bad-request") },
  { file: "routes/api/v1/clients.ts", method: "loader", path: () => "/api/v1/clients", expect: apiRoles(staffRoles, "ok") },
  { file: "routes/api/v1/clients.ts", method: "action", path: () => "/api/v1/clients", json: {}, expect: apiRoles(inventoryEditors, "bad-request") },
  { file: "routes/api/v1/tokens.ts", method: "loader", path: () => "/api/v1/tokens", expect: apiRoles(roles, "ok") },
  { file: "routes/api/v1/tokens.ts", method: "action", path: () => "/api/v1/tokens", json: {}, expect: apiRoles(roles, "bad-request") },
  { file: "routes/api/v1/token.ts", method: "action", path: () => "/api/v1/tokens/nope", method2: "DELETE", params: () => ({ tokenId: "nope" }), expect: apiRoles(roles, "not-found") },
  { file: "routes/sites/assessments.tsx", method: "loader", path: () => `/sites/${siteId}/assessments`, params: () => ({ siteId }), expect: rolesIn(staffRoles, "ok") },
  { file: "routes/sites/assessments.tsx", method: "action", path: () => `/sites/${siteId}/assessments`, form: {}, params: () => ({ siteId }), expect: rolesIn(inventoryEditors, "bad-request") },
  { file: "routes/sites/assessment.tsx", method: "loader", path: () => `/sites/${siteId}/assessments/${assessmentId}`, params: () => ({ siteId, assessmentId }), expect: rolesIn(staffRoles, "ok") },
  { file: "routes/sites/assessment.tsx", method: "action", path: () => `/sites/${siteId}/assessments/${assessmentId}`, form: {}, params: () => ({ siteId, assessmentId }), expect: rolesIn(inventoryEditors, "bad-request") },
  { file: "routes/sites/assessment-compare.tsx", method: "loader", path: () => `/sites/${siteId}/assessments/${assessmentId}/compare/${assessmentId}`, params: () => ({ siteId, a: assessmentId, b: assessmentId }), expect: rolesIn(staffRoles, "ok") },
  { file: "routes/api/v1/site-assessments.ts", method: "loader", path: () => `/api/v1/sites/${siteId}/assessments`, params: () => ({ siteId }), expect: apiRoles(staffRoles, "ok") },
  { file: "routes/api/v1/site-assessments.ts", method: "action", path: () => `/api/v1/sites/${siteId}/assessments`, json: {}, params: () => ({ siteId }), expect: apiRoles(inventoryEditors, "bad-request") },
  { file: "routes/api/v1/assessment.ts", method: "action", path: () => `/api/v1/assessments/${assessmentId}`, method2: "PATCH", json: {}, params: () => ({ assessmentId }), expect: apiRoles(inventoryEditors, "bad-request") },
  { file: "routes/api/v1/assessment.ts", method: "loader", path: () => `/api/v1/assessments/${assessmentId}`, params: () => ({ assessmentId }), expect: apiRoles(staffRoles, "ok") },
  { file: "routes/api/v1/assessment-compare.ts", method: "loader", path: () => `/api/v1/assessments/${assessmentId}/compare/${assessmentId}`, params: () => ({ a: assessmentId, b: assessmentId }), expect: apiRoles(staffRoles, "ok") },
  { file: "routes/history/organization.tsx", method: "loader", path: () => "/history", expect: rolesIn(["owner"], "ok") },
  { file: "routes/sites/emitters.tsx", method: "loader", path: () => `/sites/${siteId}/emitters`, params: () => ({ siteId }), expect: rolesIn(staffRoles, "ok") },
  { file: "routes/sites/emitters.tsx", method: "action", path: () => `/sites/${siteId}/emitters`, form: {}, params: () => ({ siteId }), expect: rolesIn(inventoryEditors, "bad-request") },
  { file: "routes/patterns/patterns.tsx", method: "loader", path: () => "/patterns", expect: rolesIn(staffRoles, "ok") },
  { file: "routes/patterns/patterns.tsx", method: "action", path: () => "/patterns", form: {}, expect: rolesIn(inventoryEditors, "bad-request") },
  { file: "routes/api/v1/site-emitters.ts", method: "loader", path: () => `/api/v1/sites/${siteId}/emitters`, params: () => ({ siteId }), expect: apiRoles(staffRoles, "ok") },
  { file: "routes/api/v1/site-emitters.ts", method: "action", path: () => `/api/v1/sites/${siteId}/emitters`, method2: "PUT", json: {}, params: () => ({ siteId }), expect: apiRoles(inventoryEditors, "bad-request") },
  { file: "routes/api/v1/site-emitters-csv.ts", method: "loader", path: () => `/api/v1/sites/${siteId}/emitters/csv`, params: () => ({ siteId }), expect: apiRoles(staffRoles, "ok") },
  // A JSON body is not a CSV file: 415 once the guard lets the member through.
  { file: "routes/api/v1/site-emitters-csv.ts", method: "action", path: () => `/api/v1/sites/${siteId}/emitters/csv`, json: {}, params: () => ({ siteId }), expect: apiRoles(inventoryEditors, "unsupported") },
  { file: "routes/api/v1/patterns.ts", method: "loader", path: () => "/api/v1/patterns", expect: apiRoles(staffRoles, "ok") },
  { file: "routes/api/v1/patterns.ts", method: "action", path: () => "/api/v1/patterns", json: {}, expect: apiRoles(inventoryEditors, "bad-request") },
  { file: "routes/documents/site-documents.tsx", method: "loader", path: () => `/sites/${siteId}/documents`, params: () => ({ siteId }), expect: rolesIn(staffRoles, "ok") },
  { file: "routes/documents/site-documents.tsx", method: "action", path: () => `/sites/${siteId}/documents`, form: {}, params: () => ({ siteId }), expect: rolesIn(inventoryEditors, "bad-request") },
  { file: "routes/documents/document.tsx", method: "loader", path: () => `/sites/${siteId}/documents/${documentId}`, params: () => ({ siteId, documentId }), expect: rolesIn(staffRoles, "ok") },
  { file: "routes/documents/document.tsx", method: "action", path: () => `/sites/${siteId}/documents/${documentId}`, form: {}, params: () => ({ siteId, documentId }), expect: rolesIn(inventoryEditors, "bad-request") },
  // The fixture document is a draft with no PDF yet: staff get 409 (still being made); a client never sees drafts (404).
  { file: "routes/documents/pdf.ts", method: "loader", path: () => `/documents/${documentId}/pdf`, params: () => ({ documentId }), expect: (a) => (a === "anonymous" ? "sign-in" : a === "regulator" ? "forbidden" : a === "client" ? "not-found" : "conflict") },
  // Public: an unknown (or unissued) certificate code is 404 for everyone.
  { file: "routes/verify.tsx", method: "loader", path: () => "/verify/ABCD-EFGH-JKLM-NPQR-STUV", params: () => ({ code: "ABCD-EFGH-JKLM-NPQR-STUV" }), expect: () => "not-found" },
  // Billing (issue 10): staff pages for billing and owner; the fixture invoice is a draft, so a (fixture, unbound) client finds nothing.
  { file: "routes/billing/invoices.tsx", method: "loader", path: () => "/billing", expect: rolesIn(billingRoles, "ok") },
  { file: "routes/billing/prices.tsx", method: "loader", path: () => "/billing/prices", expect: rolesIn(billingRoles, "ok") },
  { file: "routes/billing/prices.tsx", method: "action", path: () => "/billing/prices", form: {}, expect: rolesIn(billingRoles, "bad-request") },
  { file: "routes/billing/payments.tsx", method: "loader", path: () => "/billing/payments", expect: rolesIn(billingRoles, "ok") },
  { file: "routes/billing/invoice-new.tsx", method: "loader", path: () => `/billing/invoices/new?clientId=${clientId}`, expect: rolesIn(billingRoles, "ok") },
  { file: "routes/billing/invoice-new.tsx", method: "action", path: () => "/billing/invoices/new", form: {}, expect: rolesIn(billingRoles, "bad-request") },
  { file: "routes/billing/invoice.tsx", method: "loader", path: () => `/billing/invoices/${invoiceId}`, params: () => ({ invoiceId }), expect: rolesIn(billingRoles, "ok") },
  { file: "routes/billing/invoice.tsx", method: "action", path: () => `/billing/invoices/${invoiceId}`, form: {}, params: () => ({ invoiceId }), expect: rolesIn(billingRoles, "bad-request") },
  { file: "routes/billing/invoice-pdf.ts", method: "loader", path: () => `/billing/invoices/${invoiceId}/pdf`, params: () => ({ invoiceId }), expect: (a) => (a === "client" ? "not-found" : rolesIn(billingRoles, "ok")(a)) },
  { file: "routes/portal/invoices.tsx", method: "loader", path: () => "/portal/invoices", expect: rolesIn(["client"], "ok") },
  { file: "routes/portal/invoice.tsx", method: "loader", path: () => `/portal/invoices/${invoiceId}`, params: () => ({ invoiceId }), expect: rolesIn(["client"], "not-found") },
  { file: "routes/portal/invoice.tsx", method: "action", path: () => `/portal/invoices/${invoiceId}`, form: {}, params: () => ({ invoiceId }), expect: rolesIn(["client"], "not-found") },
  { file: "routes/portal/certificates.tsx", method: "loader", path: () => "/portal/certificates", expect: rolesIn(["client"], "ok") },
  { file: "routes/portal/certificate.tsx", method: "loader", path: () => `/portal/sites/${siteId}/assessments/${assessmentId}/certificate`, params: () => ({ siteId, assessmentId }), expect: rolesIn(["client"], "not-found") },
  { file: "routes/portal/certificate.tsx", method: "action", path: () => `/portal/sites/${siteId}/assessments/${assessmentId}/certificate`, form: {}, params: () => ({ siteId, assessmentId }), expect: rolesIn(["client"], "not-found") },
  { file: "routes/portal/certificate-paid.tsx", method: "loader", path: () => `/portal/sites/${siteId}/assessments/${assessmentId}/certificate/paid?session_id=cs_none`, params: () => ({ siteId, assessmentId }), expect: rolesIn(["client"], "not-found") },
  { file: "routes/api/v1/invoices.ts", method: "loader", path: () => "/api/v1/invoices", expect: apiRoles(["owner", "billing", "client"], "ok") },
  { file: "routes/api/v1/payments.ts", method: "loader", path: () => "/api/v1/payments", expect: apiRoles(["owner", "billing"], "ok") },
  // The webhook takes no session: without a Stripe-Signature header it is 400 for everyone.
  { file: "routes/api/stripe/webhook.ts", method: "action", path: () => "/api/stripe/webhook", form: {}, expect: () => "bad-request" },
  { file: "routes/api/v1/documents.ts", method: "loader", path: () => "/api/v1/documents", expect: apiRoles([...staffRoles, "client"], "ok") },
  { file: "routes/api/v1/document-pdf.ts", method: "loader", path: () => `/api/v1/documents/${documentId}/pdf`, params: () => ({ documentId }), expect: (a) => (a === "anonymous" ? "unauthorized" : a === "regulator" ? "forbidden" : a === "client" ? "not-found" : "conflict") },
  // The client portal: client members only. The fixture client member is bound to no client, so any site is 404 to it.
  { file: "routes/portal/home.tsx", method: "loader", path: () => "/portal", expect: rolesIn(["client"], "ok") },
  { file: "routes/portal/site.tsx", method: "loader", path: () => `/portal/sites/${siteId}`, params: () => ({ siteId }), expect: rolesIn(["client"], "not-found") },
  // Filings: the regulator reads its inbox, owner/engineer/reviewer the organisation's; only engineers and reviewers file. An unknown filing id is 404.
  { file: "routes/filings/inbox.tsx", method: "loader", path: () => "/filings", expect: rolesIn(["owner", "engineer", "reviewer", "regulator"], "ok") },
  { file: "routes/filings/inbox.tsx", method: "action", path: () => "/filings", form: {}, expect: rolesIn(["engineer", "reviewer"], "bad-request") },
  { file: "routes/filings/bundle.ts", method: "loader", path: () => `/filings/${randomUUID()}/bundle`, params: () => ({ filingId: randomUUID() }), expect: rolesIn(["owner", "engineer", "reviewer", "regulator"], "not-found") },
  { file: "routes/api/v1/filings.ts", method: "loader", path: () => "/api/v1/filings", expect: apiRoles(["owner", "engineer", "reviewer", "regulator"], "ok") },
  { file: "routes/api/v1/filing-bundle.ts", method: "loader", path: () => `/api/v1/filings/${randomUUID()}/bundle`, params: () => ({ filingId: randomUUID() }), expect: apiRoles(["owner", "engineer", "reviewer", "regulator"], "not-found") },
  // Last: signing out revokes the fixture sessions.
  { file: "routes/auth/sign-out.ts", method: "action", path: () => "/sign-out", form: {}, expect: () => "signed-out" },
];

// Pages with no loader or action of their own (static text).
const staticPages: string[] = [];

function matches(expected: Expect, got: { status: number; location?: string }) {
  switch (expected) {
    case "ok": return got.status === 200;
    case "sign-in": return got.status === 302 && got.location?.startsWith("/sign-in") === true;
    case "home": return got.status === 302 && got.location === "/";
    case "portal": return got.status === 302 && got.location === "/portal";
    case "signed-out": return got.status === 302 && got.location === "/sign-in";
    case "forbidden": return got.status === 403;
    case "unauthorized": return got.status === 401;
    case "not-found": return got.status === 404;
    case "bad-request": return got.status === 400;
    case "conflict": return got.status === 409;
    case "unsupported": return got.status === 415;
  }
}

beforeAll(async () => {
  org = await createOrg("access");
  const [client] = await db.insert(schema.client).values({ organizationId: org.id, name: "Route-table client" }).returning();
  clientId = client.id;
  const [site] = await db.insert(schema.site).values({ organizationId: org.id, clientId, name: "Route-table site", kind: "rooftop" }).returning();
  siteId = site.id;
  const [visit] = await db.insert(schema.visit).values({ organizationId: org.id, siteId, visitedOn: "2026-05-01" }).returning();
  visitId = visit.id;
  const file = { organizationId: org.id, purpose: "photo", fileName: "route-table.png", mediaType: "image/png", byteSize: 1, sha256: "0", bytes: Buffer.from([0]) };
  const [original, thumb] = await db.insert(schema.storedFile).values([file, { ...file, purpose: "photo-thumbnail" }]).returning();
  const [photo] = await db.insert(schema.photo).values({ organizationId: org.id, visitId, fileId: original.id, thumbFileId: thumb.id, widthPx: 1, heightPx: 1 }).returning();
  photoId = photo.id;
  const emptyPlan = { signs: [], barriers: [], zones: [], notes: "", basis: { signSource: "47 CFR §1.1307(b)(2) and (b)(4)", powerDownThresholdPercent: 5, accessReachM: 1 } };
  const [frozen] = await db.insert(schema.assessment).values({
    organizationId: org.id, siteId, name: "Route-table assessment", authorName: "Fixture", standard: "fcc", tier: "general", options: { standard: "fcc", tier: "general", gridStepM: 0.25, heights: { fromM: 0, toM: 2, count: 11 }, mode: "average", reflectionFactor: 1, defaultModel: "spherical" },
    site: { site: { name: "Route-table site", address: "", city: "" }, client: null }, inventory: { surfaces: [], emitters: [], obstructions: [], accessPoints: [], patterns: [] },
    runs: [], summary: { worstPercent: 0, worstAt: null, emitters: [], areas: [] }, results: { surfaces: [], emitters: [] }, engine: "isotrope-engine/1", mitigation: emptyPlan,
  }).returning();
  assessmentId = frozen.id;
  const [doc] = await db.insert(schema.document).values({ organizationId: org.id, siteId, assessmentId, kind: "report", authorName: "Fixture", code: `ROUTE-TABLE-${randomUUID()}` }).returning();
  documentId = doc.id;
  const [inv] = await db.insert(schema.invoice).values({ organizationId: org.id, clientId, currency: "eur", total: 100 }).returning();
  invoiceId = inv.id;
  invitationId = randomUUID();
  await db.insert(schema.invitation).values({
    id: invitationId, organizationId: org.id, email: `invitee-${invitationId}@fixture.test`, role: "engineer",
    status: "pending", expiresAt: new Date(Date.now() + 86_400_000), inviterId: org.people.owner.userId,
  });
});

describe("route × role", () => {
  it("covers every route file listed in app/routes.ts", () => {
    const files = new Set<string>();
    const walk = (entries: { file: string; children?: unknown[] }[]) => {
      for (const entry of entries) {
        files.add(entry.file);
        if (entry.children) walk(entry.children as { file: string; children?: unknown[] }[]);
      }
    };
    walk(routeConfig as { file: string; children?: unknown[] }[]);
    const covered = new Set([...cases.map((c) => c.file), ...staticPages]);
    expect([...files].filter((f) => !covered.has(f))).toEqual([]);
    for (const file of staticPages) expect(modules[file]).not.toHaveProperty("loader");
  });

  const actors: Actor[] = ["anonymous", ...roles];
  for (const c of cases) {
    it(`${c.method2 ?? (c.form || c.json ? "POST" : "GET")} ${c.path().replace(/\/invite\/$/, "/invite/:id")} → ${c.file} ${c.method}`, async () => {
      const handler = modules[c.file][c.method] as Handler | undefined;
      expect(handler, `${c.file} has a ${c.method}`).toBeTypeOf("function");
      const results: Record<string, string> = {};
      const wanted: Record<string, string> = {};
      for (const actor of actors) {
        const cookie = actor === "anonymous" ? undefined : org.people[actor].cookie;
        const request = makeRequest(c.path(), { cookie, form: c.form, json: c.json, method: c.method2 });
        const got = await outcome(() => handler!({ request, params: c.params?.() ?? {}, context: {} }));
        const expected = c.expect(actor);
        wanted[actor] = expected;
        results[actor] = matches(expected, got) ? expected : `${got.status} ${got.location ?? ""}`.trim();
      }
      expect(results).toEqual(wanted);
    });
  }
});
