// Billing end to end against the local Stripe fake (issue 10 §7): the client buys the certificate
// of an assessment whose report is issued (checkout page → pay → success page waits for the
// webhook → download); a declined card issues nothing; the billing member issues an invoice, the
// client pays it through the e-mailed link, billing refunds half and the invoice shows partly
// refunded. Screens are kept as screenshots (checkout, success, invoice) and the invoice PDF too.
import { spawnSync } from "node:child_process";
import { writeFileSync } from "node:fs";
import AxeBuilder from "@axe-core/playwright";
import { expect, test, type Page } from "@playwright/test";
import postgres from "postgres";
import { latestMail, linkIn, shot, signIn, visit } from "./helpers";

const CLIENT = "client@demo.isotrope.test";
const ASSESSMENT = "Roof works check"; // scripts/demo/billing.ts: report issued, no certificate

async function certificateCount() {
  const sql = postgres(process.env.DATABASE_URL!, { max: 1, onnotice: () => {} });
  try {
    const [row] = await sql`select count(*)::int as n from document d join assessment a on a.id = d.assessment_id where a.name = ${ASSESSMENT} and d.kind = 'certificate'`;
    return row.n as number;
  } finally {
    await sql.end();
  }
}

/** Where a paid checkout stands (our rows and the fake's webhook deliveries): printed when the
 * success page does not offer the download in time, so a failure says which step stopped. */
async function paymentTrail(sessionId: string) {
  const sql = postgres(process.env.DATABASE_URL!, { max: 1, onnotice: () => {} });
  try {
    const checkouts = await sql`select c.state, c.failure_message, c.document_id, d.render_status, d.render_attempts, d.render_error from checkout c left join document d on d.id = c.document_id where c.stripe_session_id = ${sessionId}`;
    const jobs = await sql`select state, retry_count, created_on, started_on, completed_on, output from pgboss.job where name = 'document-render' order by created_on desc limit 5`.catch((e) => [String(e)]);
    const events = await fetch(`${process.env.STRIPE_API_BASE}/_fake/events`).then((r) => r.json()).catch((e) => ({ data: String(e) }));
    const ours = Array.isArray(events.data) ? events.data.filter((e: { event: { data: { object: { id?: string } } } }) => e.event.data.object.id === sessionId).map((e: { type: string; deliveries: unknown }) => ({ type: e.type, deliveries: e.deliveries })) : events.data;
    return JSON.stringify({ checkouts, jobs, events: ours }, null, 1);
  } finally {
    await sql.end();
  }
}

async function openCertificatePage(page: Page) {
  await visit(page, "/portal/certificates");
  const row = page.getByRole("row").filter({ hasText: ASSESSMENT });
  await row.getByRole("link", { name: "Buy certificate" }).click();
  await expect(page.getByRole("heading", { name: "Certificate", level: 1 })).toBeVisible();
}

test.describe.configure({ mode: "serial" });

test("a declined card issues nothing and says so", async ({ page }, info) => {
  await signIn(page, CLIENT);
  await openCertificatePage(page);
  await page.getByRole("button", { name: "Pay by card" }).click();
  await expect(page.getByRole("button", { name: "Card declined" })).toBeVisible();
  await shot(page, info, "checkout-page");
  await page.getByRole("button", { name: "Card declined" }).click();
  await expect(page.getByText(/The payment did not go through: Your card was declined\..*no certificate was issued/)).toBeVisible();
  await shot(page, info, "declined");
  expect(await certificateCount()).toBe(0);
});

test("the client buys a certificate and downloads it", async ({ page }, info) => {
  await signIn(page, CLIENT);
  await openCertificatePage(page);
  await page.getByRole("button", { name: "Pay by card" }).click();
  const paidFrom = Date.now() - 1000;
  await page.getByRole("button", { name: "Pay with test card" }).click();
  await expect(page).toHaveURL(/\/certificate\/paid\?session_id=cs_/);
  const download = page.getByRole("link", { name: "Download the certificate (PDF)" });
  const sessionId = new URL(page.url()).searchParams.get("session_id")!;
  try {
    await expect(download).toBeVisible({ timeout: 60_000 });
  } catch (error) {
    console.log(`[billing] the payment's trail: ${await paymentTrail(sessionId)}`);
    throw error;
  }
  await shot(page, info, "certificate-paid");
  const href = await download.getAttribute("href");
  const pdf = await page.request.get(href!);
  expect(pdf.status()).toBe(200);
  expect(pdf.headers()["content-type"]).toContain("application/pdf");
  expect((await pdf.body()).subarray(0, 5).toString()).toBe("%PDF-");
  expect(await certificateCount()).toBe(1);
  const mail = await latestMail(CLIENT, /^Issued: RF compliance certificate for Calloway House/, paidFrom);
  expect(mail.subject).toMatch(/Calloway House/);
});

test("billing issues an invoice, the client pays through the link, billing refunds half", async ({ browser }, info) => {
  const billing = await browser.newPage();
  await signIn(billing, "billing@demo.isotrope.test");
  const makeDraft = async (fee: string) => {
    await visit(billing, "/billing/invoices/new");
    await billing.getByLabel("Client").selectOption({ label: "Larchmont Estates" });
    await billing.getByRole("button", { name: "Show assessments" }).click();
    await billing.getByRole("checkbox", { name: `${fee} for ${ASSESSMENT}` }).check();
    await billing.getByRole("button", { name: "Make the draft" }).click();
    await expect(billing.getByText("The draft invoice is made.")).toBeVisible();
  };
  // A draft with the wrong line is discarded (it had no number and was never sent), then made again.
  await makeDraft("Certificate fee");
  const wrong = billing.url();
  await billing.getByRole("button", { name: "Discard the draft" }).click();
  await expect(billing.getByText("The draft is discarded.")).toBeVisible();
  expect((await billing.request.get(wrong)).status()).toBe(404);
  await makeDraft("Assessment fee");
  const started = Date.now();
  await billing.getByRole("button", { name: "Issue and send" }).click();
  const issued = billing.getByText(/Invoice INV-\d{5} is issued and sent/);
  await expect(issued).toBeVisible();
  const number = (await issued.textContent())!.match(/INV-\d{5}/)![0];

  const mail = await latestMail(CLIENT, new RegExp(number), started - 1000);
  const payLink = linkIn(mail);
  const client = await browser.newPage();
  await signIn(client, CLIENT);
  await visit(client, payLink);
  await expect(client.getByRole("heading", { name: number })).toBeVisible();
  await client.getByRole("button", { name: /^Pay .* by card$/ }).click();
  await client.getByRole("button", { name: "Pay with test card" }).click();
  await expect(client.getByText("Payment received: this invoice is paid.")).toBeVisible({ timeout: 60_000 });
  await shot(client, info, "invoice-paid-client");

  await billing.reload();
  await expect(billing.getByText("Paid", { exact: true }).first()).toBeVisible();
  const amountField = billing.getByLabel(/^Refund \(at most/);
  const full = Number((await amountField.inputValue()).replace(/,/g, ""));
  await amountField.fill((full / 2).toFixed(2));
  await billing.getByLabel("Reason (optional)").fill("Half the fee, as agreed");
  await billing.getByRole("button", { name: "Refund", exact: true }).click();
  await expect(billing.getByText(/Refunded .*partly refunded/)).toBeVisible();
  await expect(billing.getByText("Partly refunded").first()).toBeVisible();
  await shot(billing, info, "invoice-refunded");

  // The client sees it too, and the PDF says so.
  await client.reload();
  await expect(client.getByText("Partly refunded").first()).toBeVisible();
  const pdf = await billing.request.get(billing.url() + "/pdf");
  expect(pdf.status()).toBe(200);
  writeFileSync(info.outputPath("invoice.pdf"), await pdf.body());
  const text = spawnSync("pdftotext", ["-layout", info.outputPath("invoice.pdf"), "-"], { encoding: "utf8" }).stdout;
  expect(text).toContain(`Invoice ${number}`);
  expect(text).toMatch(/State: Partly refunded/i);
  expect(text).toContain("No tax has been computed on this invoice");
  expect(text).not.toContain("verification code"); // an invoice is not a verifiable document

  await visit(billing, "/billing/payments");
  await expect(billing.getByRole("row").filter({ hasText: number })).toContainText("partly refunded");
  await shot(billing, info, "payments");
  const csv = await billing.request.get("/api/v1/payments?format=csv");
  expect(await csv.text()).toContain(number);
});

test("the billing and portal pages fit a phone and pass axe", async ({ browser }, info) => {
  const pages: [string, string[]][] = [
    ["billing@demo.isotrope.test", ["/billing", "/billing/prices", "/billing/payments", "/billing/invoices/new"]],
    [CLIENT, ["/portal/invoices", "/portal/certificates"]],
  ];
  for (const [who, paths] of pages) {
    for (const width of [1280, 390]) {
      const context = await browser.newContext({ viewport: { width, height: 800 } });
      const page = await context.newPage();
      await signIn(page, who);
      for (const path of paths) {
        await visit(page, path);
        const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
        expect(overflow, `${path} at ${width} px`).toBeLessThanOrEqual(0);
        const axe = await new AxeBuilder({ page }).analyze();
        expect(axe.violations.map((v) => `${v.id}: ${v.nodes.length}`), `${path} at ${width} px`).toEqual([]);
        await shot(page, info, `${width}-${path.replace(/\//g, "_")}`);
      }
      await context.close();
    }
  }
});
