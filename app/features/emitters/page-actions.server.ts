// What the Emitters section's forms do, by intent: add a row, save a row (with the version it was
// opened at; a stale one answers 409 with the row as it now stands), delete a row. Each answers
// `{ intent, result }` with Conform's reply, and `conflict` on a 409.
import { data } from "react-router";
import type { Member } from "~/features/auth/guard.server";
import { actorOf } from "~/features/sites/scope.server";
import { DomainError } from "~/lib/domain-error";
import { valuesFromForm } from "./convert";
import { createEmitter, deleteEmitter, updateEmitter } from "./emitters.server";
import { emitterFormSchema } from "./schemas";
import { parseForm } from "~/lib/form.server";

export async function emittersPageAction(member: Member, siteId: string, formData: FormData) {
  const intent = String(formData.get("intent") ?? "");
  formData.delete("intent");
  const who = actorOf(member);
  if (intent === "delete-emitter") {
    try {
      await deleteEmitter(who, siteId, String(formData.get("id") ?? ""));
      return data({ intent, ok: true as const });
    } catch (error) {
      if (error instanceof DomainError) return data({ intent, message: error.message }, { status: error.status });
      throw error;
    }
  }
  if (intent !== "add-emitter" && intent !== "save-emitter") return data({ intent, message: "That form is not known here. Reload the page." }, { status: 400 });
  const submission = await parseForm(formData, emitterFormSchema);
  if (submission.status !== "success") return data({ intent, result: submission.reply() }, { status: 400 });
  const { id, version } = submission.value;
  try {
    if (intent === "save-emitter") {
      if (!id || !version) return data({ intent, result: submission.reply({ formErrors: ["The form is missing the emitter it edits. Reload the page."] }) }, { status: 400 });
      const row = await updateEmitter(who, siteId, id, valuesFromForm(submission.value), version);
      return data({ intent, result: submission.reply(), savedVersion: row.version });
    }
    await createEmitter(who, siteId, valuesFromForm(submission.value));
    return data({ intent, result: submission.reply({ resetForm: true }) });
  } catch (error) {
    if (!(error instanceof DomainError)) throw error;
    const result = error.field ? submission.reply({ fieldErrors: { [error.field]: [error.message] } }) : submission.reply({ formErrors: [error.message] });
    return data({ intent, result, conflict: error.status === 409 ? (error.details?.current ?? null) : null }, { status: error.status });
  }
}
