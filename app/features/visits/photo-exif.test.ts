import { describe, expect, it } from "vitest";
import { formatPosition, photoMetadataFromExif } from "./photo-exif";

describe("photoMetadataFromExif", () => {
  it("turns degrees, minutes, seconds and N/S, E/W into signed decimal degrees (EXIF 2.32 GPS tags)", () => {
    const got = photoMetadataFromExif({ GPSInfo: { GPSLatitude: [51, 30, 12.34], GPSLatitudeRef: "N", GPSLongitude: [0, 7, 30], GPSLongitudeRef: "W" } });
    expect(got.latitude).toBeCloseTo(51 + 30 / 60 + 12.34 / 3600, 10);
    expect(got.longitude).toBeCloseTo(-(7 / 60 + 30 / 3600), 10);
    const south = photoMetadataFromExif({ GPSInfo: { GPSLatitude: [33, 52, 0], GPSLatitudeRef: "S", GPSLongitude: [151, 12, 0], GPSLongitudeRef: "E" } });
    expect(south.latitude).toBeCloseTo(-33.86667, 5);
    expect(south.longitude).toBeCloseTo(151.2, 5);
  });

  it("gives no position for missing, partial or impossible coordinates", () => {
    expect(photoMetadataFromExif({})).toEqual({ takenAt: null, latitude: null, longitude: null });
    expect(photoMetadataFromExif({ GPSInfo: { GPSLatitude: [51, 30, 0], GPSLatitudeRef: "N" } }).latitude).toBeNull();
    expect(photoMetadataFromExif({ GPSInfo: { GPSLatitude: [95, 0, 0], GPSLongitude: [1, 0, 0] } }).latitude).toBeNull();
    expect(photoMetadataFromExif({ GPSInfo: { GPSLatitude: "51", GPSLongitude: [1, 0, 0] } }).latitude).toBeNull();
  });

  it("takes the original time, else the digitised time, else the file's time, as the camera clock shows it", () => {
    const at = new Date("2026-03-14T10:22:05Z");
    expect(photoMetadataFromExif({ Photo: { DateTimeOriginal: at, DateTimeDigitized: new Date(0) } }).takenAt).toEqual(at);
    expect(photoMetadataFromExif({ Image: { DateTime: at } }).takenAt).toEqual(at);
    expect(photoMetadataFromExif({ Photo: { DateTimeOriginal: "not a date" } }).takenAt).toBeNull();
  });
});

describe("formatPosition", () => {
  it("writes hemispheres instead of signs", () => {
    expect(formatPosition(51.503427, -0.125)).toBe("51.50343° N, 0.12500° W");
    expect(formatPosition(-33.8667, 151.2)).toBe("33.86670° S, 151.20000° E");
  });
});
