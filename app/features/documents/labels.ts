// Words the pages use for kinds and render states.
import type { DocumentKind, RenderState } from "~/infra/db/schema/documents";
export { stateLabels } from "./lifecycle";

export const kindLabels: Record<DocumentKind, string> = { report: "Report", letter: "Landlord letter", certificate: "Certificate" };
export const renderLabels: Record<RenderState, string> = { queued: "PDF queued", rendering: "PDF being made", ready: "PDF ready", failed: "PDF failed" };
