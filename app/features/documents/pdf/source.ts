// What a document's PDF is drawn from: the document's own facts and its frozen assessment (plus
// the site's readings, for the comparison with predictions). Plain data; the render job loads it.
import type { EmitterSummary, Run, SurfaceResult } from "~/features/exposure/evaluate-site";
import type { MitigationPlan } from "~/features/exposure/mitigation";
import type { ExposureOptions } from "~/features/exposure/options";
import type { DocumentKind } from "~/infra/db/schema/documents";

type XY = [number, number];
export type SourceEmitter = {
  id: string; label: string; operator: string; band: string; frequencyMHz: number; powerPerCarrierW: number; carriers: number; lossDb: number; gainDbi: number;
  azimuthDeg: number; mechanicalTiltDeg: number; electricalTiltDeg: number; position: { x: number; y: number; z: number }; model: string; dutyFactor: number; actualMaxFactor: number; active: boolean;
};
export type SourceSurface = { id: string; name: string; kind: "area" | "facade"; polygon?: XY[] | null; access: string; elevationM?: number | null };

export type SourceAssessment = {
  id: string;
  name: string;
  authorName: string;
  createdAt: Date;
  standard: string;
  tier: string;
  engine: string;
  options: ExposureOptions;
  site: { site: { name: string; kind: string; address: string; city: string; accessNotes: string; datumNote: string }; client: { name: string; billingAddress?: string } | null };
  inventory: { surfaces: SourceSurface[]; emitters: SourceEmitter[]; obstructions: { name: string; polygon: XY[]; baseM: number; heightM: number }[]; accessPoints: { name: string; kind: string; x: number; y: number; z: number; locked: boolean }[] };
  runs: Run[];
  results: { surfaces: SurfaceResult[]; emitters: EmitterSummary[] };
  summary: { worstPercent: number; worstAt: { x: number; y: number; z: number; surfaceId: string } | null };
  mitigation: MitigationPlan;
};

export type SourceReading = { id: string; visitId: string; label: string; surfaceId: string | null; x: number; y: number; heightM: number; value: number; unit: string; powerDensityWm2: number | null; percentStandard: string | null; percentTier: string | null; frequencyMHz: number | null; visitedOn: string };

export type DocumentSource = {
  kind: DocumentKind;
  version: number;
  code: string;
  draft: boolean;
  organizationName: string;
  authorName: string;
  reviewerName: string | null;
  createdAt: Date;
  issuedAt: Date | null;
  expiresAt: Date | null;
  verifyUrl: string;
  assessment: SourceAssessment;
  readings: SourceReading[];
};

export const documentTitles: Record<DocumentKind, string> = { report: "RF exposure report", letter: "Letter to the property manager", certificate: "RF compliance certificate" };
