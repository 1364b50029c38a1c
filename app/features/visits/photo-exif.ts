// The camera's time and position from a photo's EXIF tags (as exif-reader returns them).
// EXIF 2.32: DateTimeOriginal is the camera clock's local time. GPSLatitude/GPSLongitude are degrees, minutes, seconds
// with N/S and E/W in their Ref tags.
type Exif = { Photo?: Record<string, unknown>; GPSInfo?: Record<string, unknown>; Image?: Record<string, unknown> };

function degrees(dms: unknown, ref: unknown, negative: string, max: number): number | null {
  if (!Array.isArray(dms) || dms.length === 0 || !dms.every((n) => typeof n === "number" && Number.isFinite(n))) return null;
  const [d, m = 0, s = 0] = dms as number[];
  const value = d + m / 60 + s / 3600;
  if (value > max) return null;
  return typeof ref === "string" && ref.trim().toUpperCase() === negative ? -value : value;
}

/**
 * The camera clock's reading, kept as it shows (stored as if it were UTC and always shown as
 * "camera clock"): most cameras record no time zone, so converting some and not others would mix two meanings.
 */
function takenAt(photo: Record<string, unknown> | undefined, image: Record<string, unknown> | undefined): Date | null {
  const local = photo?.DateTimeOriginal ?? photo?.DateTimeDigitized ?? image?.DateTime;
  return local instanceof Date && !Number.isNaN(local.getTime()) ? local : null;
}

/** Taken-at time and GPS position, each null when the tags are missing or make no sense. */
export function photoMetadataFromExif(exif: Exif) {
  const gps = exif.GPSInfo;
  const latitude = degrees(gps?.GPSLatitude, gps?.GPSLatitudeRef, "S", 90);
  const longitude = degrees(gps?.GPSLongitude, gps?.GPSLongitudeRef, "W", 180);
  const hasPosition = latitude !== null && longitude !== null;
  return { takenAt: takenAt(exif.Photo, exif.Image), latitude: hasPosition ? latitude : null, longitude: hasPosition ? longitude : null };
}

/** "51.50343° N, 0.12500° W" */
export function formatPosition(latitude: number, longitude: number) {
  return `${Math.abs(latitude).toFixed(5)}° ${latitude < 0 ? "S" : "N"}, ${Math.abs(longitude).toFixed(5)}° ${longitude < 0 ? "W" : "E"}`;
}
