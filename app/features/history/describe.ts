// History in words: what an audit event's action means, and which fields changed from what to what.
import { decimalOf, formatMoney } from "~/features/billing/money";
import { standardLabels, tierLabels } from "~/features/visits/standards";

const entityNames: Record<string, string> = {
  site: "site",
  client: "client",
  surface: "surface",
  obstruction: "obstruction",
  "access-point": "access point",
  backdrop: "roof drawing",
  emitter: "emitter",
  pattern: "antenna pattern",
  visit: "visit",
  photo: "photo",
  reading: "reading",
  token: "API token",
  assessment: "assessment",
  document: "document",
  filing: "filing",
};

const verbs: Record<string, string> = { created: "added", updated: "changed", deleted: "removed", imported: "imported", replaced: "replaced" };

/** "changed emitter A1" from "emitter.updated" and the record's label. */
export function describeAction(action: string, entity: string, label?: string | null) {
  const verb = verbs[action.split(".").pop() ?? ""] ?? action.split(".").pop() ?? action;
  const noun = entityNames[entity] ?? entity;
  return label ? `${verb} ${noun} ${label}` : `${verb} ${noun}`;
}

/** The label people know a record by, from its fields. */
export function recordLabel(fields: Record<string, unknown> | null | undefined) {
  if (!fields) return null;
  for (const key of ["label", "name", "visitedOn", "fileName", "probe"]) {
    const value = fields[key];
    if (typeof value === "string" && value) return value;
  }
  // Documents have no name of their own: "report v2".
  if (typeof fields.kind === "string" && typeof fields.version === "number") return `${documentKindWords[fields.kind] ?? fields.kind} v${fields.version}`;
  return null;
}

const documentKindWords: Record<string, string> = { report: "report", letter: "landlord letter", certificate: "certificate" };

const fieldLabels: Record<string, string> = {
  name: "Name",
  kind: "Kind",
  address: "Address",
  city: "City",
  clientId: "Client",
  latitude: "Latitude",
  longitude: "Longitude",
  datumNote: "Height datum",
  accessNotes: "Access notes",
  billingAddress: "Billing address",
  notes: "Notes",
  contacts: "Contacts",
  label: "Label",
  operator: "Operator",
  band: "Band / service",
  frequencyMHz: "Frequency (MHz)",
  powerPerCarrierW: "Power per carrier (W)",
  powerUnit: "Power entered in",
  carriers: "Carriers",
  lossDb: "Loss (dB)",
  gainDbi: "Gain (dBi)",
  gainUnit: "Gain entered in",
  patternId: "Pattern",
  pattern: "Parametric pattern",
  hBeamwidthDeg: "Horizontal beamwidth (°)",
  vBeamwidthDeg: "Vertical beamwidth (°)",
  azimuthDeg: "Azimuth (°)",
  mechanicalTiltDeg: "Mechanical downtilt (°)",
  electricalTiltDeg: "Electrical downtilt (°)",
  x: "x (m)",
  y: "y (m)",
  z: "z (m)",
  "position.x": "x (m)",
  "position.y": "y (m)",
  "position.z": "z (m)",
  model: "Model",
  apertureM: "Aperture height (m)",
  dishDiameterM: "Dish diameter (m)",
  dutyFactor: "Duty factor",
  actualMaxFactor: "Actual-maximum factor F_PR",
  tddFactor: "TDD factor",
  active: "Active",
  polygon: "Outline",
  line: "Segment",
  elevationM: "Elevation (m)",
  bottomM: "Bottom (m)",
  topM: "Top (m)",
  access: "Who may be there",
  baseM: "Base (m)",
  heightM: "Height (m)",
  locked: "Locked",
  p1: "Scale point 1 (px)",
  p2: "Scale point 2 (px)",
  distanceM: "Distance between the scale points (m)",
  originX: "Scale point 1 at x (m)",
  originY: "Scale point 1 at y (m)",
  rotationDeg: "Turn (° clockwise)",
  opacity: "Opacity",
  visitedOn: "Date",
  people: "People",
  conditions: "Conditions",
  instruments: "Instruments",
  value: "Value",
  unit: "Unit",
  caption: "Caption",
  surfaceId: "Surface",
  percentStandard: "Standard (for %)",
  percentTier: "Tier (for %)",
  powerDensityWm2: "Power density (W/m²)",
  takenAt: "Taken (camera clock)",
  widthPx: "Width (px)",
  heightPx: "Height (px)",
  fileName: "File",
  photoCount: "Photos",
  readingCount: "Readings",
  state: "State",
  version: "Version",
  reason: "Reason",
  standard: "Standard",
  tier: "Tier",
  mode: "Evaluation",
  heights: "Heights above each surface",
  gridStepM: "Grid step (m)",
  reflectionFactor: "Reflection factor",
  defaultModel: "Default model",
  worstPercent: "Worst point (% of limit)",
  authority: "Authority",
  note: "Note",
  amount: "Amount",
  amountRefunded: "Refunded in all",
  refund: "Refunded now",
  total: "Total",
  currency: "Currency",
  number: "Invoice number",
  lines: "Lines",
  purpose: "For",
  event: "Payment-service event",
};

/** Billing fields held in integer minor units (cents), shown as money. */
const moneyFields = new Set(["amount", "amountRefunded", "refund", "total"]);

export function fieldLabel(key: string) {
  return fieldLabels[key] ?? key.replace(/([a-z])([A-Z])/g, "$1 $2").replace(/^./, (c) => c.toUpperCase());
}

const unitNames: Record<string, string> = { "W/m2": "W/m²", "mW/cm2": "mW/cm²", "uW/cm2": "µW/cm²", percent: "% of limit" };

const stateWords: Record<string, string> = { in_review: "in review" };

/** Values whose meaning depends on the field: standards and tiers by name, a height span in words, money from cents. */
function showFieldValue(key: string, value: unknown, currency: string | null = null): string | null {
  if (moneyFields.has(key) && typeof value === "number" && Number.isInteger(value)) return currency ? formatMoney(value, currency) : decimalOf(value);
  if (key === "currency" && typeof value === "string") return value.toUpperCase();
  if ((key === "standard" || key === "percentStandard") && typeof value === "string") return standardLabels[value as keyof typeof standardLabels] ?? value;
  if ((key === "tier" || key === "percentTier") && typeof value === "string") return tierLabels[value as keyof typeof tierLabels] ?? value;
  if (key === "state" && typeof value === "string") return stateWords[value] ?? value;
  if (key === "mode" && typeof value === "string") return ({ average: "spatial average", max: "maximum" } as Record<string, string>)[value] ?? value;
  if (key === "heights" && value && typeof value === "object") {
    const h = value as { fromM?: unknown; toM?: unknown; count?: unknown };
    if (typeof h.fromM === "number" && typeof h.toM === "number" && typeof h.count === "number") {
      return h.count === 1 || h.fromM === h.toM ? `${h.fromM} m` : `${h.fromM}–${h.toM} m, ${h.count} heights`;
    }
  }
  return null;
}

/** A field's value as people read it: `showValue` with the field's own wording (standards, states, money, height spans). */
export function showField(key: string, value: unknown, currency: string | null = null): string {
  return showFieldValue(key, value, currency) ?? showValue(value);
}

/** A value as a short readable text: numbers as they are, lists and outlines summarised. */
export function showValue(value: unknown): string {
  if (value === null || value === undefined || value === "") return "—";
  if (typeof value === "boolean") return value ? "yes" : "no";
  if (typeof value === "number") return Number.isInteger(value) ? String(value) : String(Number(value.toPrecision(6)));
  if (typeof value === "string") return unitNames[value] ?? value;
  if (Array.isArray(value)) {
    if (value.every((p) => Array.isArray(p) && p.length === 2 && p.every((n) => typeof n === "number"))) {
      return value.map((p) => `(${p[0]}, ${p[1]})`).join(" ");
    }
    return value.map((v) => (v && typeof v === "object" ? recordLabel(v as Record<string, unknown>) ?? JSON.stringify(v) : String(v))).join(", ");
  }
  return JSON.stringify(value);
}

/** Internal links that mean nothing to a reader (the record's own label already says which). */
const hiddenFields = new Set(["id", "siteId", "visitId", "fileId", "organizationId", "replaces", "by"]);
/** Fields a change names its record by; missing before an update, they are context, not a change. */
const identityFields = new Set(["kind", "version"]);
const referenceFields = new Set(["clientId", "patternId", "surfaceId"]);

/**
 * Field-by-field rows of a change: every field in before or after whose value differs. Fields that
 * point at another record show its name from `names` (id → name), or "a removed record".
 */
export function changeRows(before: Record<string, unknown> | null, after: Record<string, unknown> | null, names: Record<string, string> = {}) {
  const keys = [...new Set([...Object.keys(before ?? {}), ...Object.keys(after ?? {})])]
    .filter((k) => !hiddenFields.has(k))
    // Other records' ids (assessmentId, paymentId, …) other than the ones named from `names`.
    .filter((k) => referenceFields.has(k) || !/Id$/.test(k))
    .filter((k) => !(before && after && identityFields.has(k) && !(k in before)));
  const currency = [after?.currency, before?.currency].find((c): c is string => typeof c === "string" && /^[a-z]{3}$/i.test(c)) ?? null;
  const show = (k: string, value: unknown) =>
    referenceFields.has(k) && typeof value === "string" ? (names[value] ?? "a removed record") : (showFieldValue(k, value, currency) ?? showValue(value));
  return keys
    // An empty text and a missing field both read "—": no change between them.
    .filter((k) => JSON.stringify(before?.[k] === "" ? null : (before?.[k] ?? null)) !== JSON.stringify(after?.[k] === "" ? null : (after?.[k] ?? null)))
    .map((k) => ({ field: fieldLabel(k), before: before ? show(k, before[k]) : "", after: after ? show(k, after[k]) : "" }));
}
