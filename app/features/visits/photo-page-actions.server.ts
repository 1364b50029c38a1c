// What the photo page's forms do: change the caption, or delete the photo.
import { data } from "react-router";
import type { Member } from "~/features/auth/guard.server";
import { actorOf } from "~/features/sites/scope.server";
import { redirectWithFlash } from "~/infra/flash.server";
import { DomainError, domainErrorReply } from "~/lib/domain-error";
import { deletePhoto, updateCaption } from "./photos.server";
import { captionSchema } from "./schemas";
import { parseForm } from "~/lib/form.server";

type Params = { siteId: string; visitId: string; photoId: string };

export async function photoPageAction(member: Member, params: Params, formData: FormData) {
  const intent = formData.get("intent");
  formData.delete("intent");
  const where = { visitId: params.visitId, siteId: params.siteId };
  const visitPath = `/sites/${params.siteId}/visits/${params.visitId}`;
  if (intent === "delete-photo") {
    try {
      await deletePhoto(actorOf(member), params.photoId, where);
    } catch (error) {
      if (error instanceof DomainError) return data({ deleteError: error.message }, { status: error.status });
      throw error;
    }
    return redirectWithFlash(visitPath, { kind: "success", message: "Photo deleted." });
  }
  const submission = await parseForm(formData, captionSchema);
  if (submission.status !== "success") return data(submission.reply(), { status: 400 });
  const { caption, version } = submission.value;
  if (!version) return data(submission.reply({ formErrors: ["The form is missing the version it was opened at. Reload the page."] }), { status: 400 });
  try {
    await updateCaption(actorOf(member), params.photoId, { caption, version }, where);
    return redirectWithFlash(`${visitPath}/photos/${params.photoId}`, { kind: "success", message: "Caption saved." });
  } catch (error) {
    return domainErrorReply(error, submission);
  }
}
