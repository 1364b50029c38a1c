// The document lifecycle (issue 9 §2), pure: which step each state allows and who may take it.
// draft → in_review → issued → superseded | withdrawn. Only a reviewer issues, and never a
// document they authored (the two-person rule); the server calls `check` before every step.
import type { DocumentState } from "~/infra/db/schema/documents";
import type { Role } from "~/lib/roles";

export type Step = "submit" | "return" | "issue" | "withdraw" | "reissue" | "supersede";

/** The state each step needs and the state it leaves. */
export const transitions: Record<Step, { from: readonly DocumentState[]; to: DocumentState | null }> = {
  submit: { from: ["draft"], to: "in_review" },
  /** A reviewer sends it back for changes. */
  return: { from: ["in_review"], to: "draft" },
  issue: { from: ["in_review"], to: "issued" },
  withdraw: { from: ["issued"], to: "withdrawn" },
  /** Makes a new draft, version n + 1; the old one stays issued until the new one is issued. */
  reissue: { from: ["issued"], to: null },
  /** Done to the old version when its successor is issued. */
  supersede: { from: ["issued"], to: "superseded" },
};

export const stateLabels: Record<DocumentState, string> = {
  draft: "Draft",
  in_review: "In review",
  issued: "Issued",
  superseded: "Superseded",
  withdrawn: "Withdrawn",
};

/** Who may take each step (owners run the firm but do not sign documents off). */
const allowedRoles: Record<Step, readonly Role[]> = {
  submit: ["owner", "engineer", "reviewer"],
  return: ["reviewer"],
  issue: ["reviewer"],
  withdraw: ["reviewer"],
  reissue: ["owner", "engineer", "reviewer"],
  supersede: ["reviewer"],
};

export type Actor = { userId: string; role: Role };
export type DocState = { state: DocumentState; authorUserId: string | null };
export type Refusal = { status: 403 | 409; message: string };

/** Null when the step may go ahead; otherwise why not, as a status and a message. */
export function check(step: Step, doc: DocState, actor: Actor): Refusal | null {
  if (!allowedRoles[step].includes(actor.role)) {
    return { status: 403, message: step === "issue" ? "Only a reviewing engineer issues documents." : `Your role may not ${step} documents.` };
  }
  if (!transitions[step].from.includes(doc.state)) {
    return { status: 409, message: `A document that is ${stateLabels[doc.state].toLowerCase()} cannot be ${pastTense[step]}.` };
  }
  if ((step === "issue" || step === "return") && doc.authorUserId === actor.userId) {
    return { status: 403, message: "You wrote this document: another reviewer must review and issue it (two-person rule)." };
  }
  return null;
}

const pastTense: Record<Step, string> = { submit: "submitted for review", return: "returned", issue: "issued", withdraw: "withdrawn", reissue: "reissued", supersede: "superseded" };

/** The steps this actor may take now, for the page's buttons. */
export function availableSteps(doc: DocState, actor: Actor): Step[] {
  return (["submit", "return", "issue", "reissue", "withdraw"] as const).filter((s) => check(s, doc, actor) === null);
}

/** Certificates are valid for a year from issue (our policy; no published source). */
export const CERTIFICATE_VALID_DAYS = 365;
export function certificateExpiry(issuedAt: Date): Date {
  return new Date(issuedAt.getTime() + CERTIFICATE_VALID_DAYS * 86_400_000);
}

/** What the public verification page says of a certificate. */
export type Verdict = "valid" | "superseded" | "withdrawn" | "expired" | "unknown";
export function verdict(doc: { state: DocumentState; expiresAt: Date | null } | null, now: Date): Verdict {
  if (!doc) return "unknown";
  if (doc.state === "superseded") return "superseded";
  if (doc.state === "withdrawn") return "withdrawn";
  if (doc.state !== "issued") return "unknown";
  if (doc.expiresAt && doc.expiresAt.getTime() < now.getTime()) return "expired";
  return "valid";
}
