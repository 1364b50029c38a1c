// The standards and tiers a reading in "% of a limit" can name: the engine's own ids, with
// the names people write (case, spaces and dashes do not matter; common tier synonyms accepted).
import { STANDARD_IDS, TIERS, type StandardId, type Tier } from "~/engine/limits";

export { STANDARD_IDS, TIERS, type StandardId, type Tier };

export const standardLabels: Record<StandardId, string> = {
  fcc: "FCC 47 CFR §1.1310",
  "icnirp-2020": "ICNIRP 2020",
  "icnirp-1998": "ICNIRP 1998",
  "ieee-c95.1-2019": "IEEE C95.1-2019",
  "sc6-2015": "Safety Code 6 (2015)",
};

/** Short names for narrow controls. */
export const standardShortLabels: Record<StandardId, string> = {
  fcc: "FCC §1.1310",
  "icnirp-2020": "ICNIRP 2020",
  "icnirp-1998": "ICNIRP 1998",
  "ieee-c95.1-2019": "IEEE C95.1-2019",
  "sc6-2015": "SC6 (2015)",
};

export const tierShortLabels: Record<Tier, string> = { general: "General public", occupational: "Occupational" };

export const tierLabels: Record<Tier, string> = {
  general: "general public / uncontrolled",
  occupational: "occupational / controlled",
};

const squash = (s: string) => s.trim().toLowerCase().replace(/[\s_-]+/g, "");
const standardByKey = new Map<string, StandardId>(STANDARD_IDS.map((id) => [squash(id), id]));
standardByKey.set(squash("IEEE C95.1 2019"), "ieee-c95.1-2019");
standardByKey.set(squash("Safety Code 6"), "sc6-2015");
standardByKey.set(squash("SC6"), "sc6-2015");

const tierByKey = new Map<string, Tier>([
  ["general", "general"],
  ["generalpublic", "general"],
  ["public", "general"],
  ["uncontrolled", "general"],
  ["occupational", "occupational"],
  ["controlled", "occupational"],
  ["workers", "occupational"],
]);

/** A standard's id from what was written ("ICNIRP 2020", "icnirp-2020"), or null. */
export function parseStandard(raw: string): StandardId | null {
  return standardByKey.get(squash(raw)) ?? null;
}

/** A tier from what was written ("general", "uncontrolled", "occupational", "controlled"), or null. */
export function parseTier(raw: string): Tier | null {
  return tierByKey.get(squash(raw)) ?? null;
}
