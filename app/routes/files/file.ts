// GET /files/:fileId: an uploaded file (photo, thumbnail, roof drawing) of the member's organisation.
import { requireMember } from "~/features/auth/guard.server";
import { getFile } from "~/infra/storage.server";
import { notFound } from "~/lib/responses.server";
import { staffRoles } from "~/lib/roles";
import type { Route } from "./+types/file";

export async function loader({ request, params, context }: Route.LoaderArgs) {
  const member = await requireMember({ request, context }, { roles: staffRoles });
  const file = await getFile(member.organizationId, params.fileId);
  if (!file) throw notFound("No such file.");
  const etag = `"${file.sha256}"`;
  const headers = {
    "content-type": file.mediaType,
    "cache-control": "private, max-age=86400, immutable",
    etag,
    "content-disposition": `inline; filename="${encodeURIComponent(file.fileName)}"`,
    "x-content-type-options": "nosniff",
  };
  if (request.headers.get("if-none-match") === etag) return new Response(null, { status: 304, headers });
  return new Response(new Uint8Array(file.bytes), { headers: { ...headers, "content-length": String(file.byteSize) } });
}
