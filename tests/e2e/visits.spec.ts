// An engineer records a site visit: instruments (one out of calibration), a photo taken sideways
// with GPS (seen upright), readings typed into the table and imported from a CSV (a bad file
// first), all converted to power density, and finds it all in the site's History.
import AxeBuilder from "@axe-core/playwright";
import { expect, test, type Page } from "@playwright/test";
import postgres from "postgres";
import sharp from "sharp";
import { shot, signIn, visit } from "./helpers";

/** 64 × 32 pixels, left half red, stored with EXIF orientation 6: seen upright it is tall, red on top. */
async function sidewaysJpeg() {
  const red = await sharp({ create: { width: 32, height: 32, channels: 3, background: "#d00000" } }).png().toBuffer();
  return sharp({ create: { width: 64, height: 32, channels: 3, background: "#0000d0" } })
    .composite([{ input: red, left: 0, top: 0 }])
    .jpeg()
    .withExif({ IFD2: { DateTimeOriginal: "2026:03:14 10:22:05" }, IFD3: { GPSLatitudeRef: "N", GPSLatitude: "51/1 30/1 1234/100", GPSLongitudeRef: "W", GPSLongitude: "0/1 7/1 3000/100" } })
    .withMetadata({ orientation: 6 })
    .toBuffer();
}

/** The roof surfaces go straight into the database: drawing them is the Layout section's own test. */
async function addSurfaces(siteId: string) {
  const sql = postgres(process.env.DATABASE_URL!, { max: 1, onnotice: () => {} });
  try {
    const [site] = await sql`select organization_id from site where id = ${siteId}`;
    for (const [i, name, elevation] of [[0, "Main roof", 0], [1, "Penthouse top", 4.2]] as const) {
      await sql`insert into surface (id, organization_id, site_id, position, name, kind, polygon, elevation_m, access)
        values (${crypto.randomUUID()}, ${site.organization_id}, ${siteId}, ${i}, ${name}, 'area', ${sql.json([[0, 0], [20, 0], [20, 12], [0, 12]])}, ${elevation}, 'public')`;
    }
  } finally {
    await sql.end();
  }
}

/** Pixel colour at a fraction of the image's height, read through a canvas. */
async function pixelAt(page: Page, img: string, fy: number) {
  return page.locator(img).evaluate((el: HTMLImageElement, y) => {
    const canvas = document.createElement("canvas");
    canvas.width = el.naturalWidth;
    canvas.height = el.naturalHeight;
    const ctx = canvas.getContext("2d")!;
    ctx.drawImage(el, 0, 0);
    return [...ctx.getImageData(Math.floor(el.naturalWidth / 2), Math.floor(el.naturalHeight * y), 1, 1).data.slice(0, 3)];
  }, fy);
}

test("an engineer records a visit with a photo and readings, and finds it in History", async ({ page }, info) => {
  test.setTimeout(120_000);
  await page.setViewportSize({ width: 1280, height: 900 });
  await signIn(page, "engineer@demo.isotrope.test");

  await visit(page, "/sites/new");
  const siteName = `Quayside Exchange ${Date.now().toString(36)}`;
  await page.getByLabel("Name").fill(siteName);
  await page.getByRole("button", { name: "Record the site" }).click();
  await expect(page.getByRole("heading", { name: siteName })).toBeVisible();
  const siteId = new URL(page.url()).pathname.split("/")[2];
  await addSurfaces(siteId);

  // The Visits section, empty, then a new visit with one probe calibrated too long ago.
  await page.getByRole("navigation", { name: "Site sections" }).getByRole("link", { name: "Visits" }).click();
  await expect(page.getByText("No visits yet")).toBeVisible();
  await page.getByRole("link", { name: "New visit" }).click();
  await page.getByLabel("Date of the visit").fill("2026-05-12");
  await page.getByLabel("People").fill("R. Okafor, T. Lindqvist");
  await page.getByLabel("Conditions").fill("Dry, 14 °C, all sectors on air");
  await page.getByRole("button", { name: "Add an instrument" }).click();
  await page.getByLabel("Probe or meter").fill("Broadband isotropic probe");
  await page.getByLabel("Serial").fill("BB-2231");
  await page.getByLabel("Calibrated on").fill("2025-02-01");
  await shot(page, info, "01-new-visit");
  await page.getByRole("button", { name: "Record the visit" }).click();
  await expect(page.getByRole("heading", { name: "Visit on 12 May 2026" })).toBeVisible();
  await expect(page.getByText("more than a year before the visit")).toBeVisible();

  // A photo taken sideways: the thumbnail is upright (tall, red on top), GPS and time on its page.
  await page.getByLabel("Photos", { exact: true }).setInputFiles({ name: "north-sector.jpg", mimeType: "image/jpeg", buffer: await sidewaysJpeg() });
  await page.getByLabel("Caption").fill("North sector panels");
  await page.getByRole("button", { name: "Upload" }).click();
  await expect(page.getByText("north-sector.jpg: added.")).toBeVisible();
  const thumb = 'img[alt="North sector panels"]';
  await expect(page.locator(thumb)).toBeVisible();
  await page.locator(thumb).evaluate((el: HTMLImageElement) => el.decode());
  const size = await page.locator(thumb).evaluate((el: HTMLImageElement) => [el.naturalWidth, el.naturalHeight]);
  expect(size).toEqual([32, 64]);
  const top = await pixelAt(page, thumb, 0.25);
  const bottom = await pixelAt(page, thumb, 0.75);
  expect(top[0]).toBeGreaterThan(150);
  expect(bottom[2]).toBeGreaterThan(150);
  await page.locator(thumb).click();
  await expect(page.getByText("51.50343° N, 0.12500° W")).toBeVisible();
  await expect(page.getByText("14 Mar 2026, 10:22 by the camera's clock")).toBeVisible();
  await shot(page, info, "02-photo-page");
  await page.getByRole("link", { name: "Visit on 12 May 2026" }).click();

  // A reading typed into the table: 6.14 V/m is 0.100 W/m² (6.14² / 376.73).
  const add = page.getByRole("region", { name: "Add a reading" });
  await add.getByLabel("Label").fill("R1");
  await add.getByLabel("Surface").selectOption({ label: "Main roof" });
  await add.getByLabel("x (m)").fill("3");
  await add.getByLabel("y (m)").fill("4");
  await add.getByLabel("Height (m)").fill("1.7");
  await add.getByLabel("Value").fill("6.14");
  await expect(add.getByText("= 0.100 W/m²")).toBeVisible();
  await add.getByRole("button", { name: "Add reading" }).click();
  const table = page.getByRole("table", { name: "Readings" });
  await expect(table.getByRole("row", { name: /R1/ })).toContainText("0.100 W/m²");
  await expect(add.getByLabel("Label")).toHaveValue("");
  await expect(add.getByLabel("Surface")).toHaveValue(/.+/); // carried over to the next reading

  // 50 % of the FCC general-population limit at 1900 MHz: 5 W/m² (47 CFR §1.1310 Table 1(B)).
  await add.getByLabel("Label").fill("R2");
  await add.getByLabel("x (m)").fill("5");
  await add.getByLabel("y (m)").fill("6");
  await add.getByLabel("Height (m)").fill("1.5");
  await add.getByLabel("Value").fill("50");
  await add.getByLabel("Unit").selectOption("percent");
  await add.getByRole("button", { name: "Add reading" }).click();
  await expect(add.getByText("Name the standard the % refers to.")).toBeVisible();
  await add.getByLabel("Standard").selectOption("fcc");
  await add.getByLabel("Tier").selectOption("general");
  await add.getByLabel("Frequency (MHz)").fill("1900");
  await add.getByRole("button", { name: "Add reading" }).click();
  await expect(table.getByRole("row", { name: /R2/ })).toContainText("5.00 W/m²");

  // Edit R1 in place: 10 V/m is 0.265 W/m².
  await table.getByRole("button", { name: "Edit reading R1" }).click();
  const edit = table.locator("form");
  await edit.getByLabel("Value").fill("10");
  await edit.getByRole("button", { name: "Save reading" }).click();
  await expect(edit).toHaveCount(0);
  await expect(table.getByRole("row", { name: /R1/ })).toContainText("0.265 W/m²");

  // A CSV with a bad row: the report names row and column, nothing is stored; the fixed file goes in.
  const header = "label,surface,x_m,y_m,height_m,value,unit,standard,tier,frequency_mhz,notes";
  const bad = `${header}\nC1,Main roof,1,1,1.5,580,µW/cm²,,,,\nC2,Main roof,2,2,1.5,three,V/m,,,,\nC3,Penthouse top,3,3,1.5,0.05,A/m,,,900,by the plant room\n`;
  const importer = page.getByRole("region", { name: "Import readings from a CSV file" });
  await importer.getByLabel("CSV file").setInputFiles({ name: "survey.csv", mimeType: "text/csv", buffer: Buffer.from(bad) });
  await importer.getByRole("button", { name: "Import" }).click();
  const report = importer.getByRole("alert");
  await expect(report).toContainText("nothing was stored");
  await expect(report.getByRole("row", { name: /3 value “three” is not a number/ })).toBeVisible();
  await expect(table.getByRole("row", { name: /C1/ })).toHaveCount(0);
  await shot(page, info, "03-csv-report");
  await importer.getByLabel("CSV file").setInputFiles({ name: "survey.csv", mimeType: "text/csv", buffer: Buffer.from(bad.replace("three", "3")) });
  await importer.getByRole("button", { name: "Import" }).click();
  await expect(importer.getByText("Stored 3 readings.")).toBeVisible();
  await expect(table.getByRole("row", { name: /C1/ })).toContainText("5.80 W/m²");
  await expect(table.getByRole("row", { name: /C3/ })).toContainText("0.942 W/m²"); // 376.73 × 0.05²
  await expect(page.getByRole("complementary", { name: "RF safety cautions" })).toBeVisible(); // readings are results (DESIGN.md §5)
  await shot(page, info, "04-visit-1280");
  const axe = await new AxeBuilder({ page }).analyze();
  expect(axe.violations.filter((v) => v.impact === "serious" || v.impact === "critical").map((v) => `${v.id}: ${v.help}`)).toEqual([]);

  await page.setViewportSize({ width: 390, height: 844 });
  await page.reload();
  await expect(page.getByRole("heading", { name: "Visit on 12 May 2026" })).toBeVisible();
  await shot(page, info, "05-visit-390");
  await page.setViewportSize({ width: 1280, height: 900 });

  // The list shows the visit with its counts; History has every change.
  await page.getByRole("navigation", { name: "Site sections" }).getByRole("link", { name: "Visits" }).click();
  const listed = page.getByRole("row", { name: /12 May 2026/ }).getByRole("cell");
  await expect(listed.nth(3)).toHaveText("1"); // photos
  await expect(listed.nth(4)).toHaveText("5"); // readings
  await shot(page, info, "06-visits-list");
  await page.getByRole("navigation", { name: "Site sections" }).getByRole("link", { name: "History" }).click();
  await expect(page.getByText("added visit 2026-05-12")).toBeVisible();
  await expect(page.getByText("added photo north-sector.jpg")).toBeVisible();
  await expect(page.getByText("changed reading R1")).toBeVisible();
  await expect(page.getByText("added reading C3")).toBeVisible();
  await shot(page, info, "07-history");
});
