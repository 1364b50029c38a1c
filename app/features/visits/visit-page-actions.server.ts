// What the visit page's forms do, by intent: edit or delete the visit, add, edit or delete a
// reading. Each answers as its form expects: a redirect with a flash, or Conform's reply.
import { data } from "react-router";
import type { Member } from "~/features/auth/guard.server";
import { actorOf } from "~/features/sites/scope.server";
import { redirectWithFlash } from "~/infra/flash.server";
import { DomainError, domainErrorReply } from "~/lib/domain-error";
import { resolveSurface, toNewReading } from "./readings-check";
import { addReadings, deleteReading, ReadingsRefused, updateReading } from "./readings.server";
import { readingFormSchema, visitFormSchema } from "./schemas";
import { deleteVisit, updateVisit } from "./visits.server";
import { parseForm } from "~/lib/form.server";

type Params = { siteId: string; visitId: string };

export async function visitPageAction(member: Member, params: Params, formData: FormData) {
  const intent = String(formData.get("intent") ?? "");
  formData.delete("intent");
  const who = actorOf(member);
  const visitPath = `/sites/${params.siteId}/visits/${params.visitId}`;

  if (intent === "delete-visit") {
    try {
      await deleteVisit(who, params.visitId, params.siteId);
    } catch (error) {
      if (error instanceof DomainError) return data({ intent, message: error.message }, { status: error.status });
      throw error;
    }
    return redirectWithFlash(`/sites/${params.siteId}/visits`, { kind: "success", message: "Visit deleted, with its photos and readings." });
  }

  if (intent === "delete-reading") {
    try {
      await deleteReading(who, String(formData.get("id") ?? ""), params);
      return data({ intent, ok: true as const });
    } catch (error) {
      if (error instanceof DomainError) return data({ intent, message: error.message }, { status: error.status });
      throw error;
    }
  }

  if (intent === "save-visit") {
    const submission = await parseForm(formData, visitFormSchema);
    if (submission.status !== "success") return data(submission.reply(), { status: 400 });
    const { version, ...fields } = submission.value;
    if (!version) return data(submission.reply({ formErrors: ["The form is missing the version it was opened at. Reload the page."] }), { status: 400 });
    try {
      await updateVisit(who, params.visitId, params.siteId, { ...fields, version });
      return redirectWithFlash(visitPath, { kind: "success", message: "Visit details saved." });
    } catch (error) {
      return domainErrorReply(error, submission);
    }
  }

  if (intent === "add-reading" || intent === "edit-reading") {
    const submission = await parseForm(formData, readingFormSchema);
    if (submission.status !== "success") return data(submission.reply(), { status: 400 });
    const { id, version, ...reading } = submission.value;
    try {
      if (intent === "edit-reading") {
        if (!id || !version) return data(submission.reply({ formErrors: ["The form is missing the reading it edits. Reload the page."] }), { status: 400 });
        await updateReading(who, id, { ...reading, version }, params);
        return data(submission.reply());
      }
      await addReadings(
        who,
        params.visitId,
        (surfaces) => {
          const choice = resolveSurface(reading, surfaces);
          return choice.ok ? { valid: [toNewReading(reading, choice.id)], problems: [] } : { valid: [], problems: [choice.message] };
        },
        { siteId: params.siteId },
      );
      return data(submission.reply());
    } catch (error) {
      if (error instanceof ReadingsRefused) return data(submission.reply({ fieldErrors: { surfaceId: error.problems.map(String) } }), { status: 400 });
      return domainErrorReply(error, submission);
    }
  }

  return data({ intent, message: "That form is not known here. Reload the page." }, { status: 400 });
}
