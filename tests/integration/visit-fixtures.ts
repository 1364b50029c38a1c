// Sites with surfaces, generated photos and multipart bodies for the visits tests.
import sharp from "sharp";
import { db, schema } from "~/infra/db.server";
import type { Org } from "./fixtures";

export async function createSiteWithSurfaces(org: Org, name = "Visit test site") {
  const [site] = await db.insert(schema.site).values({ organizationId: org.id, name, kind: "rooftop" }).returning();
  const surfaces = await db
    .insert(schema.surface)
    .values([
      { organizationId: org.id, siteId: site.id, name: "Main roof", kind: "area", polygon: [[0, 0], [20, 0], [20, 12], [0, 12]], elevationM: 0, position: 0 },
      { organizationId: org.id, siteId: site.id, name: "Penthouse top", kind: "area", polygon: [[2, 2], [6, 2], [6, 5], [2, 5]], elevationM: 4.2, position: 1 },
    ])
    .returning();
  return { site, surfaces };
}

/** A small JPEG, wider than tall, its left half red: with orientation 6 it is seen upright as tall, red on top. */
export async function makeJpeg(options: { orientation?: number; gps?: boolean; width?: number; height?: number } = {}) {
  const width = options.width ?? 64;
  const height = options.height ?? 32;
  const red = await sharp({ create: { width: width / 2, height, channels: 3, background: "#d00000" } }).png().toBuffer();
  let image = sharp({ create: { width, height, channels: 3, background: "#0000d0" } }).composite([{ input: red, left: 0, top: 0 }]).jpeg();
  image = image.withExif({
    IFD0: { Make: "Fixture camera" },
    IFD2: { DateTimeOriginal: "2026:03:14 10:22:05" },
    ...(options.gps ? { IFD3: { GPSLatitudeRef: "N", GPSLatitude: "51/1 30/1 1234/100", GPSLongitudeRef: "W", GPSLongitude: "0/1 7/1 3000/100" } } : {}),
  });
  if (options.orientation) image = image.withMetadata({ orientation: options.orientation });
  return image.toBuffer();
}

export const makePng = () => sharp({ create: { width: 40, height: 30, channels: 4, background: "#208020ff" } }).png().toBuffer();

/** A multipart/form-data body and its content type. */
export function multipart(parts: { name: string; value?: string; file?: { name: string; type: string; bytes: Buffer } }[]) {
  const form = new FormData();
  for (const p of parts) {
    if (p.file) form.append(p.name, new File([new Uint8Array(p.file.bytes)], p.file.name, { type: p.file.type }));
    else form.append(p.name, p.value ?? "");
  }
  return form;
}

/**
 * A multipart upload of `totalBytes` generated on demand (nothing on disk, nothing held): a header
 * part, then filler pulled chunk by chunk. `pulled()` says how much of it the server ever read.
 */
export function generatedUpload(totalBytes: number, boundary = "isotrope-test-boundary") {
  const head = Buffer.from(`--${boundary}\r\nContent-Disposition: form-data; name="photo"; filename="huge.jpg"\r\nContent-Type: image/jpeg\r\n\r\n`);
  const tail = Buffer.from(`\r\n--${boundary}--\r\n`);
  const chunk = Buffer.alloc(64 * 1024, 0x41);
  chunk[0] = 0xff;
  let sent = 0;
  let first = true;
  const stream = new ReadableStream<Uint8Array>({
    pull(controller) {
      if (first) {
        first = false;
        controller.enqueue(new Uint8Array(head));
        return;
      }
      if (sent >= totalBytes) {
        controller.enqueue(new Uint8Array(tail));
        controller.close();
        return;
      }
      const n = Math.min(chunk.length, totalBytes - sent);
      sent += n;
      controller.enqueue(new Uint8Array(chunk.subarray(0, n)));
    },
  });
  return { stream, contentType: `multipart/form-data; boundary=${boundary}`, pulled: () => sent };
}
