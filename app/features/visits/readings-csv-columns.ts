// The readings CSV's columns (our own layout; README.md, "Readings CSV"): what each holds,
// which are required, and the JSON field each fills. Pure, so the page can list them.
export type Column = { name: string; field: string; numeric?: boolean; required?: boolean; help: string };

export const READINGS_CSV_COLUMNS: readonly Column[] = [
  { name: "label", field: "label", help: "your name for the spot, e.g. R1 (optional)" },
  { name: "surface", field: "surface", help: "the surface's name or id on this site (optional)" },
  { name: "x_m", field: "x", numeric: true, required: true, help: "east, metres in the site's plan" },
  { name: "y_m", field: "y", numeric: true, required: true, help: "north, metres in the site's plan" },
  { name: "height_m", field: "heightM", numeric: true, required: true, help: "probe height above the surface, metres" },
  { name: "value", field: "value", numeric: true, required: true, help: "the reading as the instrument showed it" },
  { name: "unit", field: "unit", required: true, help: "V/m, A/m, W/m2, mW/cm2, uW/cm2 or % (µ and ² accepted)" },
  { name: "standard", field: "standard", help: "for %: fcc, icnirp-2020, icnirp-1998, ieee-c95.1-2019 or sc6-2015" },
  { name: "tier", field: "tier", help: "for %: general or occupational" },
  { name: "frequency_mhz", field: "frequencyMHz", numeric: true, help: "MHz; empty for a broadband reading" },
  { name: "notes", field: "notes", help: "anything else (optional)" },
];

