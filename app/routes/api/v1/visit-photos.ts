// POST /api/v1/visits/:id/photos (multipart/form-data: `photo`, optional `caption`) → 201 { photo }
// The photo streams in and is cut off at PHOTO_MAX_BYTES with 413; its type comes from its bytes.
import { requireApiMember } from "~/features/auth/guard.server";
import { actorOf } from "~/features/sites/scope.server";
import { photoJson } from "~/features/visits/json";
import { readPhotoUpload } from "~/features/visits/photo-upload.server";
import { addPhoto } from "~/features/visits/photos.server";
import { requireVisit } from "~/features/visits/visits.server";
import { api, methodNotAllowed } from "~/lib/api.server";
import { inventoryEditors } from "~/lib/roles";
import type { Route } from "./+types/visit-photos";

export async function action({ request, params }: Route.ActionArgs) {
  if (request.method !== "POST") return methodNotAllowed("POST");
  const member = await requireApiMember(request, { roles: inventoryEditors });
  const who = actorOf(member);
  const answer = await api(async () => {
    const visit = await requireVisit(who, params.visitId);
    const upload = await readPhotoUpload(request);
    const photo = await addPhoto(who, visit.id, upload);
    return Response.json({ photo: photoJson(photo) }, { status: 201 });
  });
  // The rest of a refused upload is not read: ask the client to close the connection.
  if (answer.status === 413) answer.headers.set("connection", "close");
  return answer;
}
