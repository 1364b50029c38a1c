// What a photo upload becomes: its type proven from the bytes, decoded once by sharp, a
// thumbnail turned upright by its EXIF orientation, and the camera's time and GPS position.
import exifReader from "exif-reader";
import sharp, { type Metadata } from "sharp";
import { imageTypeLabels, isHeifFamily, sniffImageType, type ImageType } from "~/lib/image-type";
import { DomainError } from "~/lib/domain-error";
import { PHOTO_MAX_PIXELS, THUMB_MAX_PX } from "./limits";
import { photoMetadataFromExif } from "./photo-exif";

export type ProcessedPhoto = {
  mediaType: ImageType;
  /** Width and height as the photo is seen, its EXIF orientation applied. */
  widthPx: number;
  heightPx: number;
  thumb: Buffer;
  thumbMediaType: "image/webp";
  takenAt: Date | null;
  latitude: number | null;
  longitude: number | null;
};

export const notAnImage = () => new DomainError("Upload a JPEG, PNG or WebP photo. This file is not one of those, whatever its name says.", 415, "photo");

export async function processPhoto(bytes: Buffer): Promise<ProcessedPhoto> {
  const mediaType = sniffImageType(bytes);
  if (!mediaType && isHeifFamily(bytes)) throw new DomainError("This is a HEIC or AVIF photo, which not every browser shows. Export it as JPEG (or set the camera to save JPEG) and upload that.", 415, "photo");
  if (!mediaType) throw notAnImage();
  const options = { limitInputPixels: PHOTO_MAX_PIXELS, failOn: "error" as const };
  let metadata: Metadata;
  let thumb: Buffer;
  try {
    metadata = await sharp(bytes, options).metadata();
    thumb = await sharp(bytes, options).rotate().resize(THUMB_MAX_PX, THUMB_MAX_PX, { fit: "inside", withoutEnlargement: true }).webp({ quality: 78 }).toBuffer();
  } catch (error) {
    const tooLarge = error instanceof Error && /pixel limit/i.test(error.message);
    throw new DomainError(
      tooLarge
        ? `This photo has more than ${PHOTO_MAX_PIXELS / 1_000_000} megapixels. Resize it and upload it again.`
        : `This ${imageTypeLabels[mediaType]} file could not be read: it may be damaged or cut short.`,
      422,
      "photo",
    );
  }
  const upright = metadata.autoOrient ?? { width: metadata.width, height: metadata.height };
  let exif = {};
  if (metadata.exif) {
    try {
      exif = exifReader(metadata.exif);
    } catch {
      // Unreadable EXIF is not a reason to refuse the photo: it just has no time or position.
    }
  }
  return { mediaType, widthPx: upright.width, heightPx: upright.height, thumb, thumbMediaType: "image/webp", ...photoMetadataFromExif(exif) };
}
