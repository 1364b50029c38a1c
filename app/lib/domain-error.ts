// The one expected-failure type of the domain, and how a form action answers it.
import type { SubmissionResult } from "@conform-to/react";
import { data } from "react-router";

/**
 * A refusal the person can act on: a message, an HTTP status, the form field it concerns,
 * and, where useful, data for the answer (a 409 carries the record as it now stands).
 */
export class DomainError extends Error {
  constructor(
    message: string,
    readonly status = 400,
    readonly field?: string,
    readonly details?: Record<string, unknown>,
  ) {
    super(message);
  }
}

/** Someone saved the record since it was read: the edit is refused and the current record returned. */
export function staleEdit(current: Record<string, unknown>) {
  return new DomainError("Someone else saved this record after you opened it. Your change was not saved: review their version, then apply yours again.", 409, undefined, { current });
}

type Replyable = { reply: (options?: { formErrors?: string[]; fieldErrors?: Record<string, string[]> }) => SubmissionResult<string[]> };

/** Turns a DomainError into the form's reply (on its field when it names one) with the error's status; rethrows anything else. */
export function domainErrorReply(error: unknown, submission: Replyable) {
  if (!(error instanceof DomainError)) throw error;
  const reply = error.field
    ? submission.reply({ fieldErrors: { [error.field]: [error.message] } })
    : submission.reply({ formErrors: [error.message] });
  return data(reply, { status: error.status });
}
