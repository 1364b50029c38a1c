// Photo uploads: type from the bytes, thumbnails upright, EXIF time and position, the size
// limit enforced while the upload streams in (a generated 1 GB upload), nothing written on refusal.
import { eq } from "drizzle-orm";
import sharp from "sharp";
import { beforeAll, describe, expect, it } from "vitest";
import { PHOTO_MAX_BYTES } from "~/features/visits/limits";
import { db, schema } from "~/infra/db.server";
import * as fileRoute from "~/routes/files/file";
import * as siteVisitsApi from "~/routes/api/v1/site-visits";
import * as photosApi from "~/routes/api/v1/visit-photos";
import * as tokensApi from "~/routes/api/v1/tokens";
import { callApi } from "./api-client";
import { createOrg, makeRequest, type Org } from "./fixtures";
import { createSiteWithSurfaces, generatedUpload, makeJpeg, makePng, multipart } from "./visit-fixtures";

let a: Org;
let b: Org;
let token = "";
let siteId = "";
let visitId = "";

const eng = () => ({ cookie: a.people.engineer.cookie });
const upload = (body: BodyInit, options: { contentType?: string; auth?: { cookie?: string; token?: string }; visit?: string } = {}) =>
  callApi(photosApi, "POST", `/api/v1/visits/${options.visit ?? visitId}/photos`, { auth: options.auth ?? eng(), params: { visitId: options.visit ?? visitId }, body, contentType: options.contentType });
const orgFiles = async (org: Org) => (await db.select({ id: schema.storedFile.id }).from(schema.storedFile).where(eq(schema.storedFile.organizationId, org.id))).length;
const orgPhotos = async (org: Org) => (await db.select({ id: schema.photo.id }).from(schema.photo).where(eq(schema.photo.organizationId, org.id))).length;

beforeAll(async () => {
  a = await createOrg("photos-a");
  b = await createOrg("photos-b");
  token = (await callApi(tokensApi, "POST", "/api/v1/tokens", { auth: eng(), json: { name: "camera sync" } })).body.token;
  siteId = (await createSiteWithSurfaces(a)).site.id;
  visitId = (await callApi(siteVisitsApi, "POST", `/api/v1/sites/${siteId}/visits`, { auth: eng(), json: { visitedOn: "2026-04-02" }, params: { siteId } })).body.visit.id;
});

describe("POST /api/v1/visits/:id/photos", () => {
  it("stores a JPEG with its caption, an upright thumbnail, the camera's time and GPS position, and audits it", async () => {
    const jpeg = await makeJpeg({ orientation: 6, gps: true });
    const got = await upload(multipart([{ name: "photo", file: { name: "north-sector.jpg", type: "image/jpeg", bytes: jpeg } }, { name: "caption", value: "North sector, <b>panel</b> A2" }]));
    expect(got.status).toBe(201);
    const photo = got.body.photo;
    // Stored 64 × 32 with orientation 6 (rotate 90° clockwise to view): seen as 32 wide, 64 tall.
    expect(photo).toMatchObject({ caption: "North sector, <b>panel</b> A2", fileName: "north-sector.jpg", mediaType: "image/jpeg", widthPx: 32, heightPx: 64, takenAt: "2026-03-14T10:22:05" });
    expect(photo.latitude).toBeCloseTo(51.503428, 5);
    expect(photo.longitude).toBeCloseTo(-0.125, 5);
    const [row] = await db.select().from(schema.photo).where(eq(schema.photo.id, photo.id));
    const [thumb] = await db.select().from(schema.storedFile).where(eq(schema.storedFile.id, row.thumbFileId));
    const [original] = await db.select().from(schema.storedFile).where(eq(schema.storedFile.id, row.fileId));
    expect(original.bytes.equals(jpeg)).toBe(true);
    const meta = await sharp(thumb.bytes).metadata();
    expect([meta.format, meta.width, meta.height, meta.orientation ?? 1]).toEqual(["webp", 32, 64, 1]);
    const { data } = await sharp(thumb.bytes).raw().toBuffer({ resolveWithObject: true });
    const pixel = (x: number, y: number) => [...data.subarray((y * 32 + x) * 3, (y * 32 + x) * 3 + 3)];
    expect(pixel(16, 8)[0]).toBeGreaterThan(150); // red on top once upright
    expect(pixel(16, 56)[2]).toBeGreaterThan(150); // blue below
    const [event] = await db.select().from(schema.auditEvent).where(eq(schema.auditEvent.subjectId, photo.id));
    expect(event).toMatchObject({ action: "photo.created", subjectType: "photo", siteId, actorUserId: a.people.engineer.userId });
  });

  it("serves the original and the thumbnail through /files to the organisation only", async () => {
    const got = await upload(multipart([{ name: "photo", file: { name: "a.png", type: "image/png", bytes: await makePng() } }]), { auth: { token } });
    expect(got.status).toBe(201);
    const fileId = got.body.photo.thumbnailUrl.split("/").pop();
    const mine = (await fileRoute.loader({ request: makeRequest(`/files/${fileId}`, { cookie: a.people.billing.cookie }), params: { fileId }, context: {} } as never)) as Response;
    expect(mine.status).toBe(200);
    expect(mine.headers.get("content-type")).toBe("image/webp");
    const theirs = await fileRoute.loader({ request: makeRequest(`/files/${fileId}`, { cookie: b.people.engineer.cookie }), params: { fileId }, context: {} } as never).catch((e: unknown) => e);
    expect((theirs as { init?: { status: number } }).init?.status).toBe(404);
  });

  it("accepts a PNG named .jpg (the bytes decide), and refuses a text file named .jpg with 415, writing nothing", async () => {
    const png = await upload(multipart([{ name: "photo", file: { name: "actually-png.jpg", type: "image/jpeg", bytes: await makePng() } }]));
    expect(png.status).toBe(201);
    expect(png.body.photo.mediaType).toBe("image/png");
    const [files, photos] = [await orgFiles(a), await orgPhotos(a)];
    const text = await upload(multipart([{ name: "photo", file: { name: "photo.jpg", type: "image/jpeg", bytes: Buffer.from("this is not a photo, just text in a .jpg") } }]));
    expect(text.status).toBe(415);
    expect(text.body.error.message).toMatch(/JPEG, PNG or WebP/);
    const html = await upload(multipart([{ name: "photo", file: { name: "x.webp", type: "image/webp", bytes: Buffer.from("<script>alert(1)</script>") } }]));
    expect(html.status).toBe(415);
    expect([await orgFiles(a), await orgPhotos(a)]).toEqual([files, photos]);
  });

  it("refuses a damaged image, a missing file, a caption too long, and a body that is not multipart, writing nothing", async () => {
    const [files, photos] = [await orgFiles(a), await orgPhotos(a)];
    const cut = (await makeJpeg()).subarray(0, 200);
    expect((await upload(multipart([{ name: "photo", file: { name: "cut.jpg", type: "image/jpeg", bytes: Buffer.from(cut) } }]))).status).toBe(422);
    const none = await upload(multipart([{ name: "caption", value: "no photo" }]));
    expect(none.status).toBe(400);
    expect(none.body.error.fields.photo).toMatch(/Choose a photo/);
    const long = await upload(multipart([{ name: "photo", file: { name: "a.png", type: "image/png", bytes: await makePng() } }, { name: "caption", value: "x".repeat(301) }]));
    expect(long.status).toBe(400);
    expect(long.body.error.fields.caption).toBe("Use at most 300 characters.");
    expect((await upload("{}", { contentType: "application/json" })).status).toBe(415);
    expect([await orgFiles(a), await orgPhotos(a)]).toEqual([files, photos]);
  });

  it("refuses a photo just over 10 MB with 413, and one declared larger by Content-Length before reading it", async () => {
    const [files, photos] = [await orgFiles(a), await orgPhotos(a)];
    const over = Buffer.alloc(PHOTO_MAX_BYTES + 1, 0);
    over.set([0xff, 0xd8, 0xff], 0);
    expect((await upload(multipart([{ name: "photo", file: { name: "big.jpg", type: "image/jpeg", bytes: over } }]))).status).toBe(413);
    const headers = new Headers({ cookie: a.people.engineer.cookie, "content-type": "multipart/form-data; boundary=x", "content-length": String(2 * 1024 ** 3), origin: "http://localhost" });
    const { stream, pulled } = generatedUpload(1024);
    const request = new Request(`http://localhost/api/v1/visits/${visitId}/photos`, { method: "POST", headers, body: stream, duplex: "half" } as RequestInit);
    const declared = (await photosApi.action({ request, params: { visitId }, context: {} } as never)) as Response;
    expect(declared.status).toBe(413);
    expect(pulled()).toBe(0);
    expect([await orgFiles(a), await orgPhotos(a)]).toEqual([files, photos]);
  });

  it("cuts a generated 1 GB upload off at the limit with 413: memory stays flat and nothing is written", async () => {
    const [files, photos] = [await orgFiles(a), await orgPhotos(a)];
    const GB = 1024 ** 3;
    const { stream, contentType, pulled } = generatedUpload(GB);
    global.gc?.();
    const start = process.memoryUsage();
    let peakRss = start.rss;
    let peakHeap = start.heapUsed + start.arrayBuffers;
    const sampler = setInterval(() => {
      const m = process.memoryUsage();
      peakRss = Math.max(peakRss, m.rss);
      peakHeap = Math.max(peakHeap, m.heapUsed + m.arrayBuffers);
    }, 5);
    const got = await upload(stream, { contentType });
    clearInterval(sampler);
    const mb = (n: number) => (n / 1024 / 1024).toFixed(1);
    console.log(
      `[1 GB upload] status ${got.status}; read ${mb(pulled())} MB of ${mb(GB)} MB; ` +
        `RSS ${mb(start.rss)} → peak ${mb(peakRss)} MB (+${mb(peakRss - start.rss)}); heap+buffers peak +${mb(peakHeap - start.heapUsed - start.arrayBuffers)} MB`,
    );
    expect(got.status).toBe(413);
    expect(got.body.error.message).toMatch(/larger than 10 MB/);
    expect(got.headers.get("connection")).toBe("close");
    // Cut off at the limit: the server read about 10 MB (plus a chunk or two), never the gigabyte.
    expect(pulled()).toBeLessThan(PHOTO_MAX_BYTES + 1024 * 1024);
    expect([await orgFiles(a), await orgPhotos(a)]).toEqual([files, photos]);
  });
});

describe("roles and isolation", () => {
  it("refuses billing with 403, a visitor with 401, and another organisation with 404, writing nothing", async () => {
    const body = async () => multipart([{ name: "photo", file: { name: "a.png", type: "image/png", bytes: await makePng() } }]);
    const files = await orgFiles(b);
    expect((await upload(await body(), { auth: { cookie: a.people.billing.cookie } })).status).toBe(403);
    expect((await upload(await body(), { auth: {} })).status).toBe(401);
    expect((await upload(await body(), { auth: { cookie: b.people.engineer.cookie } })).status).toBe(404);
    expect(await orgFiles(b)).toBe(files);
  });
});
