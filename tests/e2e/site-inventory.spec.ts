// The whole inventory of a new site, as an engineer records it in one sitting: a client, a site for
// it, a roof drawn on the plan, emitters from a CSV (a bad row first, then the fixed file), a visit
// with a photo and a reading, and every change found in the site's History.
import { expect, test } from "@playwright/test";
import sharp from "sharp";
import { importFixedEmitterCsv, checkBadEmitterCsv } from "./emitters-helpers";
import { shot, signIn, visit } from "./helpers";
import { describeSelected, drawOutline, saveLayout } from "./layout-helpers";

test("an engineer records a client, a site, its roof, emitters, a visit with a photo and a reading, and finds it all in History", async ({ page }, info) => {
  test.setTimeout(180_000);
  await page.setViewportSize({ width: 1280, height: 900 });
  await signIn(page, "engineer@demo.isotrope.test");
  const tag = Date.now().toString(36);

  // A client of our own invention, with one contact.
  await visit(page, "/clients/new");
  const clientName = `Fenwick Row Properties ${tag}`;
  await page.getByLabel("Name").first().fill(clientName);
  await page.getByLabel("Billing address").fill("4 Fenwick Row, Eastmere");
  await page.getByRole("button", { name: "Record the client" }).click();
  await expect(page.getByRole("heading", { name: clientName, level: 1 })).toBeVisible();

  // A rooftop site for that client.
  await visit(page, "/sites/new");
  const siteName = `Fenwick Row Tower ${tag}`;
  await page.getByLabel("Name").fill(siteName);
  await page.getByLabel("Kind").selectOption("rooftop");
  await page.getByLabel("Client").selectOption({ label: clientName });
  await page.getByLabel("City").fill("Eastmere");
  await page.getByRole("button", { name: "Record the site" }).click();
  await expect(page.getByRole("heading", { name: siteName, level: 1 })).toBeVisible();
  const siteId = new URL(page.url()).pathname.split("/")[2];

  // The main roof, drawn by clicking its corners on the plan.
  await page.getByRole("link", { name: "Edit layout" }).click();
  await drawOutline(page, [[0, 0], [20, 0], [20, 12], [0, 12]]);
  await describeSelected(page, "Main roof", "0");
  await saveLayout(page);
  await shot(page, info, "01-roof-drawn");

  // Emitters from a CSV: the report names the bad row; the fixed file goes in whole.
  await visit(page, `/sites/${siteId}/emitters`);
  await checkBadEmitterCsv(page);
  await shot(page, info, "02-csv-report");
  await importFixedEmitterCsv(page);
  await shot(page, info, "03-emitters");

  // A visit with a photo and one reading typed in: 6.14 V/m is 0.100 W/m² (6.14² / 376.73).
  await page.getByRole("navigation", { name: "Site sections" }).getByRole("link", { name: "Visits" }).click();
  await page.getByRole("link", { name: "New visit" }).click();
  await page.getByLabel("Date of the visit").fill("2026-06-03");
  await page.getByLabel("People").fill("I. Marsh");
  await page.getByRole("button", { name: "Record the visit" }).click();
  await expect(page.getByRole("heading", { name: "Visit on 3 Jun 2026" })).toBeVisible();
  const photo = await sharp({ create: { width: 48, height: 32, channels: 3, background: "#3a6ea5" } }).jpeg().toBuffer();
  await page.getByLabel("Photos", { exact: true }).setInputFiles({ name: "roof-east.jpg", mimeType: "image/jpeg", buffer: photo });
  await page.getByLabel("Caption").fill("East parapet");
  await page.getByRole("button", { name: "Upload" }).click();
  await expect(page.getByText("roof-east.jpg: added.")).toBeVisible();
  const add = page.getByRole("region", { name: "Add a reading" });
  await add.getByLabel("Label").fill("P1");
  await add.getByLabel("Surface").selectOption({ label: "Main roof" });
  await add.getByLabel("x (m)").fill("6");
  await add.getByLabel("y (m)").fill("4");
  await add.getByLabel("Height (m)").fill("1.5");
  await add.getByLabel("Value").fill("6.14");
  await add.getByRole("button", { name: "Add reading" }).click();
  await expect(page.getByRole("table", { name: "Readings" }).getByRole("row", { name: /P1/ })).toContainText("0.100 W/m²");
  await shot(page, info, "04-visit");

  // History: the roof, the four emitters, the visit, the photo and the reading, newest first.
  await page.getByRole("navigation", { name: "Site sections" }).getByRole("link", { name: "History" }).click();
  for (const line of ["added reading P1", "added photo roof-east.jpg", "added visit 2026-06-03", "added emitter E4", "added emitter E1", "Main roof"]) {
    await expect(page.getByText(line).first()).toBeVisible();
  }
  await expect(page.getByText("added emitter E2")).toHaveCount(1); // the bad file stored nothing
  await shot(page, info, "05-history");

  // The client's page lists the site.
  await visit(page, "/clients");
  await page.getByRole("link", { name: clientName }).click();
  await expect(page.getByRole("link", { name: siteName })).toBeVisible();
});
