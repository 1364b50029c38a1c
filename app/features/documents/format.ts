// How documents write numbers, shared by the PDFs and the tests that read them back.
export const percentText = (v: number) => `${v >= 100 ? v.toFixed(0) : v >= 10 ? v.toFixed(1) : v.toFixed(2)} %`;
export const metresText = (v: number) => `${v.toFixed(2)} m`;
export const wattsText = (v: number) => `${v >= 100 ? v.toFixed(0) : v.toFixed(1)} W`;
export const areaText = (v: number) => `${v.toFixed(1)} m²`;
export const dateText = (d: Date | string) => new Date(d).toLocaleDateString("en-GB", { day: "numeric", month: "long", year: "numeric", timeZone: "UTC" });
