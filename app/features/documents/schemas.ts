// The documents' forms and the API's query: drafting (which assessment, which kind) and the
// lifecycle's steps (withdrawing needs a reason).
import { z } from "zod";
import { documentKinds, documentStates } from "~/infra/db/schema/documents";
import { identifier, oneOf, text } from "~/lib/fields";

export const REASON_MAX = 500;

export const draftSchema = z.strictObject({
  assessmentId: identifier("Choose the assessment to draw from."),
  kind: oneOf("the kind of document", documentKinds),
});

export const STEP_INTENTS = ["submit", "return", "issue", "reissue", "withdraw"] as const;
export const stepSchema = z
  .strictObject({
    intent: z.enum(STEP_INTENTS, { error: "The form is incomplete. Reload the page and try again." }),
    reason: text(REASON_MAX).default(""),
  })
  .superRefine((v, ctx) => {
    if (v.intent === "withdraw" && v.reason.length < 3) ctx.addIssue({ code: "custom", path: ["reason"], message: "Say why it is withdrawn (at least 3 characters)." });
  });

export const listQuerySchema = z.strictObject({
  siteId: identifier().optional(),
  kind: oneOf("the kind", documentKinds).optional(),
  state: oneOf("the state", documentStates).optional(),
});
