// A what-if answer's surfaces sent from the worker to the page: each area's values and classes
// (about 25 000 numbers each on the demo rooftop) go as typed arrays whose buffers are transferred,
// not copied, and not cloned element by element (the page's thread spent several ms per edit
// reading them back as plain arrays, most of it making numbers it never looked at). The page gets
// them back as the plain arrays AreaView promises, converted on first use: the map draws from the
// geometry built beside them, so usually they are never converted. Pure.
import type { AreaView } from "./exposure-result";

export type PackedArea = Omit<AreaView, "percent" | "classes"> & { percent: Float64Array; classes: Uint8Array };

/** The areas with their grids as typed arrays, and the buffers to transfer. */
export function packAreas(areas: AreaView[]): { areas: PackedArea[]; transfer: ArrayBuffer[] } {
  const packed = areas.map((a) => ({ ...a, percent: Float64Array.from(a.percent), classes: Uint8Array.from(a.classes) }));
  return { areas: packed, transfer: packed.flatMap((a) => [a.percent.buffer, a.classes.buffer]) };
}

/** The areas as AreaView again: `percent` and `classes` become plain arrays when first read. */
export function unpackAreas(packed: PackedArea[]): AreaView[] {
  return packed.map((p) => {
    // Key by key, so the object's keys keep their order (the same JSON as the worker's area).
    const area = {} as Record<string, unknown>;
    for (const [key, value] of Object.entries(p)) {
      if (key === "percent" || key === "classes") lazyArray(area, key, value as Float64Array | Uint8Array);
      else area[key] = value;
    }
    return area as AreaView;
  });
}

function lazyArray(target: object, key: "percent" | "classes", typed: Float64Array | Uint8Array) {
  Object.defineProperty(target, key, {
    configurable: true,
    enumerable: true,
    get() {
      const plain: number[] = [];
      for (let c = 0; c < typed.length; c++) plain.push(typed[c]);
      Object.defineProperty(target, key, { value: plain, configurable: true, enumerable: true, writable: true });
      return plain;
    },
  });
}
