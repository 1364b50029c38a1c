// The API's filing: { id, siteId, assessmentId, authority, filedAt } (the contract's exact fields).
export function filingJson(f: { id: string; siteId: string; assessmentId: string; authority: string; filedAt: Date }) {
  return { id: f.id, siteId: f.siteId, assessmentId: f.assessmentId, authority: f.authority, filedAt: f.filedAt.toISOString() };
}
