// The emitter CSV import steps, shared by the emitters spec and the combined issue-7 flow: a file
// with one bad row (read the report), then the fixed file (imported whole).
import { expect, type Page } from "@playwright/test";

export const emitterCsvHeader = "label,operator,band,frequency_mhz,power_per_carrier_w,power_per_carrier_dbm,carriers,loss_db,gain_dbi,gain_dbd,pattern_model,h_beamwidth_deg,v_beamwidth_deg,azimuth_deg,mechanical_tilt_deg,electrical_tilt_deg,x_m,y_m,z_m,model,aperture_m,actual_max_factor,tdd_factor,notes";

/** Four emitters of two invented operators; `badFrequency` puts a word where row 3's frequency goes. */
export function emitterCsv(badFrequency = false) {
  return [
    emitterCsvHeader,
    "E1,Harbour Mobile,LTE 800,806,40,,2,1.2,,15.85,3gpp-38.901,65,8,30,2,4,4,3,5.5,auto,2.1,,,north sector",
    `E2,Harbour Mobile,NR 3500,${badFrequency ? "three thousand five hundred" : "3500"},,49,1,0.5,24,,3gpp-38.901,20,8,150,0,3,12,3,5.5,cylindrical,0.9,0.25,0.74,massive MIMO`,
    "E3,Quay Radio,LTE 2600,2655,20,,2,0.8,16.5,,,,,270,0,3,1,9,4.8,spherical,,,,",
    "E4,Quay Radio,LTE 1800,1842,,43,2,0.8,17,,itu-r-f.1336-sectoral,65,7,90,1,2,18,9,4.8,spherical,,,,",
  ].join("\r\n");
}

async function choose(page: Page, csv: string) {
  await page.getByLabel("CSV file (at most 5 MB)").setInputFiles({ name: "emitters.csv", mimeType: "text/csv", buffer: Buffer.from(csv) });
  await page.getByRole("button", { name: "Check the file" }).click();
}

/** On a site's Emitters section: check a file with one bad row and read its report (row 3, frequency_mhz). */
export async function checkBadEmitterCsv(page: Page) {
  await choose(page, emitterCsv(true));
  const report = page.getByRole("status").filter({ hasText: "nothing stored yet" });
  await expect(report).toContainText("3 emitters ready, 1 problem");
  const problems = report.getByRole("table", { name: "Problems in the file" });
  await expect(problems.getByRole("row").nth(1)).toContainText(["3", "frequency_mhz", "“three thousand five hundred” is not a number"].join(""));
  await expect(report.getByRole("button", { name: "Import the 3 valid rows only" })).toBeVisible();
}

/** Then the fixed file: checked clean and imported whole; the table shows the four emitters. */
export async function importFixedEmitterCsv(page: Page, mode: "append" | "replace" = "replace") {
  if (mode === "replace") await page.getByRole("radio", { name: /^Replace/ }).check();
  await choose(page, emitterCsv(false));
  const report = page.getByRole("status").filter({ hasText: "nothing stored yet" });
  await expect(report).toContainText("4 emitters ready");
  await report.getByRole("button", { name: mode === "replace" ? "Replace with these 4" : "Add these 4" }).click();
  await expect(page.getByText("Stored 4 emitters")).toBeVisible();
  const table = page.getByRole("table", { name: "Emitters of this site, with EIRP and ERP" });
  for (const label of ["E1", "E2", "E3", "E4"]) await expect(table.getByRole("row").filter({ hasText: label }).first()).toBeVisible();
}
