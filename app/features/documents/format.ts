// How documents write numbers, shared by the PDFs and the tests that read them back.
// Thousands grouped as on the web pages ("4,589 %", "1,120.0 m²"), so a document and the portal read alike.
import { areaFigure } from "~/features/assessments/format";

const fixed = [0, 1, 2].map((digits) => new Intl.NumberFormat("en-GB", { minimumFractionDigits: digits, maximumFractionDigits: digits }));
export const percentText = (v: number) => `${fixed[v >= 100 ? 0 : v >= 10 ? 1 : 2].format(v)} %`;
export const metresText = (v: number) => `${fixed[2].format(v)} m`;
export const wattsText = (v: number) => `${fixed[v >= 100 ? 0 : 1].format(v)} W`;
export const areaText = (v: number) => `${areaFigure(v)} m²`;
export const dateText = (d: Date | string) => new Date(d).toLocaleDateString("en-GB", { day: "numeric", month: "long", year: "numeric", timeZone: "UTC" });
