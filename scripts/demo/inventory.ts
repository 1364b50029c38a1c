// Writes the demo inventory (clients, sites, layouts, patterns, emitters, visits, readings)
// for the demo consultancy, inside the seed's transaction.
import { evaluate, type EvaluationRequestInput } from "../../app/engine";
import { eToS } from "../../app/engine/units";
import { schema, type Tx } from "../../app/infra/db.server";
import { demoClients, monopole, streetPole } from "./others";
import { demoPatterns } from "./patterns";
import { rooftopAccessPoints, rooftopEmitters, rooftopObstructions, rooftopSurfaces, type DemoEmitter } from "./rooftop";

type Context = { organizationId: string; engineerId: string; clientMemberId: string | null };
type Layout = {
  surfaces: { name: string; kind: "area" | "facade"; polygon?: [number, number][]; line?: [[number, number], [number, number]]; elevationM?: number; bottomM?: number; topM?: number; access: "public" | "workers" | "none" }[];
  obstructions: { name: string; polygon: [number, number][]; baseM: number; heightM: number }[];
  accessPoints: { name: string; kind: "door" | "hatch" | "ladder" | "stair" | "gate"; x: number; y: number; z: number; locked: boolean }[];
  emitters: DemoEmitter[];
};

const days = (n: number) => new Date(Date.now() - n * 86_400_000);

export async function seedInventory(tx: Tx, ctx: Context) {
  const { organizationId } = ctx;
  const clients: Record<string, string> = {};
  for (const c of demoClients) {
    const [row] = await tx.insert(schema.client).values({ organizationId, name: c.name, billingAddress: c.billingAddress, notes: c.notes, createdAt: days(120), updatedAt: days(120) }).returning();
    clients[c.key] = row.id;
    for (const contact of c.contacts) await tx.insert(schema.clientContact).values({ organizationId, clientId: row.id, ...contact });
  }
  if (ctx.clientMemberId) await tx.insert(schema.clientMember).values({ memberId: ctx.clientMemberId, clientId: clients.larchmont });

  const patterns: Record<string, string> = {};
  for (const p of demoPatterns) {
    const [row] = await tx.insert(schema.antennaPattern).values({ organizationId, ...p }).returning();
    patterns[p.name] = row.id;
  }

  const rooftop = await insertSite(tx, ctx, patterns, {
    site: { name: "Calloway House", kind: "rooftop", address: "18 Tamsin Street", city: "Port Ellery", latitude: 50.7163, longitude: -3.5301, clientId: clients.larchmont, datumNote: "main roof slab (top of membrane)", accessNotes: "Roof door on the 8th-floor stair is alarmed: call the building manager first. The penthouse top is reached by a fixed ladder and is closed to everyone without an operator's escort." },
    surfaces: rooftopSurfaces,
    obstructions: rooftopObstructions,
    accessPoints: rooftopAccessPoints,
    emitters: rooftopEmitters,
  });
  await insertSite(tx, ctx, patterns, { ...monopole, site: { ...monopole.site, clientId: clients.orchard } });
  await insertSite(tx, ctx, patterns, { ...streetPole, site: { ...streetPole.site, clientId: clients.tidewater } });

  await seedRooftopVisit(tx, ctx, rooftop);
}

async function insertSite(tx: Tx, ctx: Context, patterns: Record<string, string>, input: Layout & { site: typeof schema.site.$inferInsert extends infer T ? Omit<T, "organizationId"> : never }) {
  const { organizationId } = ctx;
  const [site] = await tx.insert(schema.site).values({ ...input.site, organizationId, createdAt: days(60), updatedAt: days(3) }).returning();
  await tx.insert(schema.auditEvent).values({ organizationId, actorUserId: ctx.engineerId, action: "site.created", subjectType: "site", subjectId: site.id, siteId: site.id, after: { name: site.name, kind: site.kind, city: site.city }, createdAt: days(60) });
  const surfaces = [];
  for (const [position, s] of input.surfaces.entries()) {
    const [row] = await tx.insert(schema.surface).values({ organizationId, siteId: site.id, position, name: s.name, kind: s.kind, polygon: s.polygon ?? null, line: s.line ?? null, elevationM: s.kind === "area" ? (s.elevationM ?? 0) : null, bottomM: s.bottomM ?? null, topM: s.topM ?? null, access: s.access }).returning();
    surfaces.push(row);
  }
  for (const [position, o] of input.obstructions.entries()) await tx.insert(schema.obstruction).values({ organizationId, siteId: site.id, position, ...o });
  for (const [position, a] of input.accessPoints.entries()) await tx.insert(schema.accessPoint).values({ organizationId, siteId: site.id, position, ...a });
  for (const [position, e] of input.emitters.entries()) {
    const { patternName, ...fields } = e;
    const patternId = patternName ? patterns[patternName] : null;
    await tx.insert(schema.emitter).values({
      organizationId,
      siteId: site.id,
      position,
      ...fields,
      patternId,
      pattern: patternId ? null : { type: "3gpp-38.901", hBeamwidthDeg: e.hBeamwidthDeg, vBeamwidthDeg: e.vBeamwidthDeg, maxAttenuationDb: 30, sideLobeDb: 30 },
      notes: e.notes ?? "",
    });
  }
  return { site, surfaces, emitters: input.emitters };
}

/** The survey of Calloway House: broadband probe readings at 1.5 m, most below the prediction, one above it. */
async function seedRooftopVisit(tx: Tx, ctx: Context, rooftop: Awaited<ReturnType<typeof insertSite>>) {
  const { organizationId } = ctx;
  const [visit] = await tx
    .insert(schema.visit)
    .values({
      organizationId,
      siteId: rooftop.site.id,
      visitedOn: days(12).toISOString().slice(0, 10),
      people: "Tobin Arkwright (engineer); Gareth Lowe-Imbert (building manager, escort)",
      conditions: "Dry, light wind, 11 °C. All operators on air at normal traffic.",
      instruments: [{ probe: "Broadband isotropic E-field probe, 100 kHz–6 GHz", serial: "KL-BB-0417", calibrationDate: days(200).toISOString().slice(0, 10) }],
      notes: "Spot readings at 1.5 m above the roof, probe on a non-conductive tripod, 6-minute averages.",
    })
    .returning();
  const mainRoof = rooftop.surfaces.find((s) => s.name === "Main roof")!;
  const spots: [string, number, number, number][] = [
    ["R1 stair door", 7, 4, 0.55],
    ["R2 centre", 20, 14, 0.6],
    ["R3 west parapet, in front of SM-3", 3.5, 13, 0.7],
    ["R4 lift room", 13, 22, 0.5],
    ["R5 south-east corner", 36, 3, 0.45],
    ["R6 below NW-A", 30, 14, 1.35],
    ["R7 north parapet", 15, 25, 0.65],
  ];
  const request: EvaluationRequestInput = {
    standard: "fcc",
    tier: "general",
    emitters: rooftop.emitters.map((e) => ({
      id: e.label,
      frequencyMHz: e.frequencyMHz,
      powerW: e.powerPerCarrierW * e.carriers * (e.actualMaxFactor ?? 1) * (e.tddFactor ?? 1),
      lossDb: e.lossDb,
      gainDbi: e.gainDbi,
      position: { x: e.x, y: e.y, z: e.z },
      azimuthDeg: e.azimuthDeg,
      tiltDeg: e.mechanicalTiltDeg + e.electricalTiltDeg,
      pattern: { type: "3gpp-38.901", hBeamwidthDeg: e.hBeamwidthDeg, vBeamwidthDeg: e.vBeamwidthDeg },
      model: e.model,
      apertureM: e.apertureM,
    })),
    points: spots.map(([label, x, y]) => ({ x, y, z: 1.5, label })),
  };
  const predicted = evaluate(request).points ?? [];
  for (const [i, [label, x, y, ratio]] of spots.entries()) {
    // A broadband reading reported as E (V/m); its density by S = E²/η₀. Invented values: a share of the
    // predicted total density (the demo's R6 deliberately above its prediction).
    const densityWm2 = predicted[i].contributions.reduce((sum, c) => sum + c.powerDensityWm2, 0) * ratio;
    const eVm = Math.round(Math.sqrt(densityWm2 * 376.730313668) * 100) / 100;
    await tx.insert(schema.reading).values({ organizationId, visitId: visit.id, surfaceId: mainRoof.id, label, x, y, heightM: 1.5, value: eVm, unit: "V/m", frequencyMHz: null, powerDensityWm2: eToS(eVm) });
  }
}
