// The site as the JSON API shows it.
type SiteRow = {
  id: string;
  name: string;
  kind: string;
  address: string;
  city: string;
  clientId: string | null;
  latitude: number | null;
  longitude: number | null;
  datumNote: string;
  accessNotes: string;
  version: number;
  createdAt: Date;
  updatedAt: Date;
};

export function siteJson(row: SiteRow) {
  return {
    id: row.id,
    name: row.name,
    kind: row.kind,
    address: row.address,
    city: row.city,
    clientId: row.clientId,
    latitude: row.latitude,
    longitude: row.longitude,
    datumNote: row.datumNote,
    accessNotes: row.accessNotes,
    version: row.version,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}
