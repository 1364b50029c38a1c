// The layout editor's working copy: every number kept as the text being typed (so "-" or "4."
// can stand while typing), turned into the API's layout for the plan, the checks and the save.
// Pure, shared by the editor and its tests.
import { pointInPolygon } from "~/engine";
import { validateLayout, type XY } from "./geometry";
import type { LayoutJson } from "./json";
import type { Access, AccessPointKind, BackdropPlacement, LayoutInput } from "./schemas";

export type TextPoint = [string, string];
type Base = { key: string; id?: string; name: string };
export type AreaItem = Base & { type: "area"; polygon: TextPoint[]; elevationM: string; access: Access };
export type FacadeItem = Base & { type: "facade"; line: TextPoint[]; bottomM: string; topM: string; access: Access };
export type ObstructionItem = Base & { type: "obstruction"; polygon: TextPoint[]; baseM: string; heightM: string };
export type AccessItem = Base & { type: "access"; kind: AccessPointKind; x: string; y: string; z: string; locked: boolean };
export type LayoutItem = AreaItem | FacadeItem | ObstructionItem | AccessItem;
export type ItemType = LayoutItem["type"];

export const itemTypeLabels: Record<ItemType, string> = { area: "Area", facade: "Facade", obstruction: "Obstruction", access: "Access point" };

let counter = 0;
export const newKey = () => `k${Date.now().toString(36)}${(counter++).toString(36)}`;

const t = (v: number | null | undefined) => (v === null || v === undefined ? "" : String(v));
const tp = (p: XY): TextPoint => [t(p[0]), t(p[1])];
/** Text to metres: a comma is taken as a decimal point; empty or unreadable text is NaN (refused by the checks). */
export const num = (s: string) => (s.trim() === "" ? Number.NaN : Number(s.trim().replace(",", ".")));
const np = (p: TextPoint): XY => [num(p[0]), num(p[1])];

export function itemsFromLayout(layout: LayoutJson): LayoutItem[] {
  return [
    ...layout.surfaces.map((s): LayoutItem =>
      s.kind === "area"
        ? { key: s.id, id: s.id, type: "area", name: s.name, polygon: (s.polygon ?? []).map(tp), elevationM: t(s.elevationM), access: s.access }
        : { key: s.id, id: s.id, type: "facade", name: s.name, line: (s.line ?? []).map(tp), bottomM: t(s.bottomM), topM: t(s.topM), access: s.access },
    ),
    ...layout.obstructions.map((o): LayoutItem => ({ key: o.id, id: o.id, type: "obstruction", name: o.name, polygon: o.polygon.map(tp), baseM: t(o.baseM), heightM: t(o.heightM) })),
    ...layout.accessPoints.map((a): LayoutItem => ({ key: a.id, id: a.id, type: "access", name: a.name, kind: a.kind, x: t(a.x), y: t(a.y), z: t(a.z), locked: a.locked })),
  ];
}

/** Where each list position of the API body came from, to lead an error back to its item. */
export type PathKeys = Record<"surfaces" | "obstructions" | "accessPoints", string[]>;

export function layoutFromItems(items: LayoutItem[], extra: { version?: number; backdrop?: BackdropPlacement } = {}): { input: LayoutInput; keys: PathKeys } {
  const keys: PathKeys = { surfaces: [], obstructions: [], accessPoints: [] };
  const input: LayoutInput = { ...extra, surfaces: [], obstructions: [], accessPoints: [] };
  const id = (item: LayoutItem) => (item.id ? { id: item.id } : {});
  for (const item of items) {
    if (item.type === "area") {
      keys.surfaces.push(item.key);
      input.surfaces.push({ ...id(item), name: item.name, kind: "area", polygon: item.polygon.map(np), elevationM: num(item.elevationM), access: item.access });
    } else if (item.type === "facade") {
      keys.surfaces.push(item.key);
      input.surfaces.push({ ...id(item), name: item.name, kind: "facade", line: item.line.map(np), bottomM: num(item.bottomM), topM: num(item.topM), access: item.access });
    } else if (item.type === "obstruction") {
      keys.obstructions!.push(item.key);
      input.obstructions!.push({ ...id(item), name: item.name, polygon: item.polygon.map(np), baseM: num(item.baseM), heightM: num(item.heightM) });
    } else {
      keys.accessPoints.push(item.key);
      input.accessPoints!.push({ ...id(item), name: item.name, kind: item.kind, x: num(item.x), y: num(item.y), z: num(item.z), locked: item.locked });
    }
  }
  return { input, keys };
}

/** "surfaces[2].polygon" → the item's key and the field ("polygon"). */
export function itemOfPath(path: string, keys: PathKeys): { key: string; field: string } | null {
  const match = /^(surfaces|obstructions|accessPoints)\[(\d+)\]\.?(.*)$/.exec(path);
  if (!match) return null;
  const key = keys[match[1] as keyof PathKeys][Number(match[2])];
  return key ? { key, field: match[3].replace(/\[\d+\].*$/, "") } : null;
}

export type ItemProblems = Map<string, { field: string; message: string }[]>;

/** Every problem of the working copy, by item: names first, then the shared geometry checks. */
export function problemsOf(items: LayoutItem[]): ItemProblems {
  const problems: ItemProblems = new Map();
  const add = (key: string, field: string, message: string) => problems.set(key, [...(problems.get(key) ?? []), { field, message }]);
  for (const item of items) {
    if (!item.name.trim()) add(item.key, "name", `${itemTypeLabels[item.type]}: enter a name.`);
    else if (item.name.trim().length > 100) add(item.key, "name", `${itemTypeLabels[item.type]} “${item.name.slice(0, 20)}…”: use at most 100 characters for the name.`);
  }
  const { input, keys } = layoutFromItems(items);
  for (const issue of validateLayout(input)) {
    const found = itemOfPath(issue.path, keys);
    if (found) add(found.key, found.field, issue.message);
  }
  return problems;
}

/** Areas grouped into levels by elevation, highest first; facades, obstructions and access points after. */
export function levelsOf(items: LayoutItem[]) {
  const levels = new Map<string, { elevation: number; items: AreaItem[] }>();
  for (const item of items) {
    if (item.type !== "area") continue;
    const elevation = num(item.elevationM);
    const label = Number.isFinite(elevation) ? elevation.toFixed(2) : "?";
    const level = levels.get(label) ?? { elevation: Number.isFinite(elevation) ? elevation : Number.NEGATIVE_INFINITY, items: [] };
    level.items.push(item);
    levels.set(label, level);
  }
  return [...levels.values()].sort((a, b) => b.elevation - a.elevation);
}

/** An elevation as a level's name: "+4.2 m", "−3.5 m", "0.0 m". */
export function elevationLabel(value: number) {
  if (!Number.isFinite(value)) return "elevation not set";
  if (Math.abs(value) < 0.005) return "0.0 m";
  return `${value > 0 ? "+" : "−"}${Math.abs(value).toFixed(Math.abs(value * 10) % 1 < 1e-9 ? 1 : 2)} m`;
}

/** The plan's records, from the working copy (unreadable numbers drop out until fixed). */
export function planOf(items: LayoutItem[]) {
  const ok = (p: XY) => Number.isFinite(p[0]) && Number.isFinite(p[1]);
  const surfaces = [];
  const obstructions = [];
  const accessPoints = [];
  for (const item of items) {
    if (item.type === "area") surfaces.push({ id: item.key, name: item.name, kind: "area" as const, polygon: item.polygon.map(np).filter(ok), elevationM: num(item.elevationM) || 0, access: item.access });
    else if (item.type === "facade") {
      const line = item.line.map(np).filter(ok);
      surfaces.push({ id: item.key, name: item.name, kind: "facade" as const, line: line.length === 2 ? (line as [XY, XY]) : null, bottomM: num(item.bottomM), topM: num(item.topM), access: item.access });
    } else if (item.type === "obstruction") obstructions.push({ id: item.key, name: item.name, polygon: item.polygon.map(np).filter(ok), heightM: num(item.heightM) || 0 });
    else if (Number.isFinite(num(item.x)) && Number.isFinite(num(item.y))) accessPoints.push({ id: item.key, name: item.name, kind: item.kind, x: num(item.x), y: num(item.y) });
  }
  return { surfaces, obstructions, accessPoints };
}

/** Whether a point lies inside an outline: the engine's even–odd ray-crossing test. */
export function insideOutline(points: readonly XY[], [x, y]: XY) {
  return pointInPolygon(x, y, points);
}

function distanceToSegment([x, y]: XY, [a, b]: [XY, XY]) {
  const dx = b[0] - a[0], dy = b[1] - a[1];
  const t = Math.max(0, Math.min(1, ((x - a[0]) * dx + (y - a[1]) * dy) / (dx * dx + dy * dy || 1)));
  return Math.hypot(x - (a[0] + t * dx), y - (a[1] + t * dy));
}

/** The record under a click on the plan (within `reach` metres for points and segments): access points, facades, obstructions, then the highest area. */
export function itemAt(items: LayoutItem[], at: XY, reach: number): string | null {
  const plan = planOf(items);
  const point = plan.accessPoints.find((a) => Math.hypot(a.x - at[0], a.y - at[1]) <= reach);
  if (point) return point.id;
  const facade = plan.surfaces.find((s) => s.kind === "facade" && s.line && distanceToSegment(at, s.line) <= reach);
  if (facade) return facade.id;
  const block = plan.obstructions.find((o) => o.polygon.length >= 3 && insideOutline(o.polygon, at));
  if (block) return block.id;
  const areas = plan.surfaces.filter((s) => s.kind === "area" && s.polygon.length >= 3 && insideOutline(s.polygon, at));
  areas.sort((a, b) => (b.kind === "area" ? b.elevationM : 0) - (a.kind === "area" ? a.elevationM : 0));
  return areas[0]?.id ?? null;
}
