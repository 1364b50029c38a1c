// Documents as the JSON API returns them (issue 9 §8, a contract):
// { id, kind, state, siteId, assessmentId, version, code (certificates), sha256 (issued), issuedAt }.
import type { DocumentListRow } from "./documents.server";

const issuedStates = ["issued", "superseded", "withdrawn"];

export function documentJson(row: DocumentListRow) {
  return {
    id: row.id,
    kind: row.kind,
    state: row.state,
    siteId: row.siteId,
    assessmentId: row.assessmentId,
    version: row.version,
    code: row.kind === "certificate" ? row.code : null,
    sha256: issuedStates.includes(row.state) ? row.sha256 : null,
    issuedAt: row.issuedAt ? row.issuedAt.toISOString() : null,
  };
}
