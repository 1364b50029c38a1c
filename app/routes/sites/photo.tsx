import { useState } from "react";
import { readFormData } from "~/lib/form.server";
import { Form, Link } from "react-router";
import { Button } from "~/components/button";
import { Dialog } from "~/components/dialog";
import { FormErrors } from "~/components/field";
import { Card } from "~/components/panels";
import { requireMember } from "~/features/auth/guard.server";
import { scopeOf } from "~/features/sites/scope.server";
import { CaptionForm } from "~/features/visits/caption-form";
import { formatBytes, formatCameraTime } from "~/features/visits/format";
import { formatPosition } from "~/features/visits/photo-exif";
import { photoPageAction } from "~/features/visits/photo-page-actions.server";
import { findPhoto } from "~/features/visits/photos.server";
import { findVisit } from "~/features/visits/visits.server";
import { formatDate } from "~/lib/dates";
import { found } from "~/lib/responses.server";
import { canEditInventory, inventoryEditors, staffRoles } from "~/lib/roles";
import type { Route } from "./+types/photo";

export const meta: Route.MetaFunction = ({ data }) => [{ title: data ? `${data.photo.caption || data.photo.fileName} · Isotrope` : "Photo · Isotrope" }];

export async function loader({ request, params }: Route.LoaderArgs) {
  const member = await requireMember(request, { roles: staffRoles });
  const scope = scopeOf(member);
  const visit = found(await findVisit(scope, params.visitId, params.siteId), "No such visit on this site.");
  const photo = found(await findPhoto(scope, params.photoId, { visitId: visit.id, siteId: visit.siteId }), "No such photo in this visit.");
  return { photo, visit: { id: visit.id, siteId: visit.siteId, visitedOn: visit.visitedOn }, canEdit: canEditInventory(member.role) };
}

export async function action({ request, params }: Route.ActionArgs) {
  const member = await requireMember(request, { roles: inventoryEditors });
  return photoPageAction(member, params, await readFormData(request));
}

export default function PhotoPage({ loaderData, actionData }: Route.ComponentProps) {
  const { photo, visit, canEdit } = loaderData;
  const [confirm, setConfirm] = useState(false);
  const visitPath = `/sites/${visit.siteId}/visits/${visit.id}`;
  const deleteError = actionData && "deleteError" in actionData ? actionData.deleteError : null;
  const captionReply = actionData && "status" in actionData ? actionData : undefined;
  return (
    <div className="space-y-5">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div className="min-w-0">
          <p className="text-sm text-graphite-600">
            <Link to={visitPath} className="underline">
              Visit on {formatDate(visit.visitedOn)}
            </Link>{" "}
            / Photo
          </p>
          <h2 className="text-lg font-semibold break-words">{photo.caption || photo.fileName}</h2>
        </div>
        {canEdit ? (
          <Button type="button" tone="danger" onClick={() => setConfirm(true)}>
            Delete photo
          </Button>
        ) : null}
      </div>
      <FormErrors errors={deleteError ? [deleteError] : null} />
      <figure className="overflow-hidden rounded-sheet border border-rule bg-ink-900">
        <img src={`/files/${photo.fileId}`} alt={photo.caption || `Photo ${photo.fileName}`} width={photo.widthPx} height={photo.heightPx} className="mx-auto max-h-[75vh] w-auto max-w-full object-contain" />
      </figure>
      <Card title="About this photo">
        <dl className="grid gap-x-6 gap-y-3 text-sm sm:grid-cols-2">
          <div>
            <dt className="font-medium text-graphite-600">Taken</dt>
            <dd className="mt-0.5 text-ink-900">{photo.takenAt ? `${formatCameraTime(photo.takenAt)} by the camera's clock` : "Not recorded in the file"}</dd>
          </div>
          <div>
            <dt className="font-medium text-graphite-600">Position (GPS)</dt>
            <dd className="mt-0.5 text-ink-900">{photo.latitude !== null && photo.longitude !== null ? formatPosition(photo.latitude, photo.longitude) : "Not recorded in the file"}</dd>
          </div>
          <div>
            <dt className="font-medium text-graphite-600">File</dt>
            <dd className="mt-0.5 break-all text-ink-900">
              {photo.fileName} · {photo.mediaType.replace("image/", "").toUpperCase()} · {photo.widthPx} × {photo.heightPx} px · {formatBytes(photo.byteSize)}
            </dd>
          </div>
          <div>
            <dt className="font-medium text-graphite-600">Original</dt>
            <dd className="mt-0.5">
              <a href={`/files/${photo.fileId}`} className="text-flag-600 underline" target="_blank" rel="noreferrer">
                Open the full-size file
              </a>
            </dd>
          </div>
        </dl>
        {canEdit ? (
          <div className="mt-5 border-t border-rule pt-4">
            <CaptionForm key={photo.version} caption={photo.caption} version={photo.version} lastResult={captionReply} />
          </div>
        ) : null}
      </Card>
      <Dialog open={confirm} onClose={() => setConfirm(false)} title="Delete this photo?">
        <p className="text-sm text-graphite-600">The photo and its thumbnail are removed from the visit. History keeps a record of it.</p>
        <Form method="post" className="mt-4 flex justify-end gap-2" onSubmit={() => setConfirm(false)}>
          <input type="hidden" name="intent" value="delete-photo" />
          <Button type="button" tone="secondary" onClick={() => setConfirm(false)}>
            Keep
          </Button>
          <Button tone="danger">Delete</Button>
        </Form>
      </Dialog>
    </div>
  );
}

export { RouteError as ErrorBoundary } from "~/components/route-error";
