// Assessments as the JSON API returns them (issue 8 §8, a contract):
// { id, siteId, name, standard, tier, createdAt, author, inventory, runs: [{ surfaceId, request, response }],
//   summary: { worstPercent, worstAt, emitters, areas }, mitigation }, plus the options they were made with.
import type { AssessmentListRow, AssessmentRow } from "./assessments.server";

const author = (row: { authorUserId: string | null; authorName: string }) => ({ id: row.authorUserId, name: row.authorName });

/** In lists: no inventory, runs or mitigation (fetch the assessment for those). */
export function assessmentListJson(row: AssessmentListRow) {
  return {
    id: row.id,
    siteId: row.siteId,
    name: row.name,
    standard: row.standard,
    tier: row.tier,
    createdAt: row.createdAt.toISOString(),
    author: author(row),
    options: row.options,
    summary: row.summary,
  };
}

export function assessmentJson(row: AssessmentRow) {
  const { summary, ...listed } = assessmentListJson(row);
  return {
    ...listed,
    inventory: { ...row.site, ...row.inventory },
    runs: row.runs,
    summary,
    mitigation: { ...row.mitigation, version: row.mitigationVersion },
  };
}
