// The emitter CSV's columns (our own layout; README.md, "Emitter CSV"): units are in the header
// names, so a column says what it holds. Power comes in one of two columns (W or dBm) and gain in
// one of two (dBi or dBd); each row fills exactly one of each pair. Pure, so the page lists them.
export type EmitterColumn = { name: string; numeric?: boolean; required?: boolean; help: string };

export const EMITTER_CSV_COLUMNS: readonly EmitterColumn[] = [
  { name: "label", required: true, help: "the emitter's name on the site, e.g. A1" },
  { name: "operator", help: "the operator (free text)" },
  { name: "band", help: "band or service, e.g. LTE 700" },
  { name: "frequency_mhz", numeric: true, required: true, help: "centre frequency, MHz" },
  { name: "power_per_carrier_w", numeric: true, help: "transmitter power per carrier, W (or use power_per_carrier_dbm)" },
  { name: "power_per_carrier_dbm", numeric: true, help: "transmitter power per carrier, dBm (or use power_per_carrier_w)" },
  { name: "carriers", numeric: true, help: "number of carriers (empty: 1)" },
  { name: "loss_db", numeric: true, help: "line, jumper and combiner loss, dB (empty: 0)" },
  { name: "gain_dbi", numeric: true, help: "antenna gain, dBi (or use gain_dbd)" },
  { name: "gain_dbd", numeric: true, help: "antenna gain, dBd (or use gain_dbi; stored as dBd + 2.15)" },
  { name: "pattern", help: "a pattern of the library, by name or id (optional)" },
  { name: "pattern_model", help: "3gpp-38.901 or itu-r-f.1336-sectoral, drawn from the beamwidths (optional)" },
  { name: "h_beamwidth_deg", numeric: true, help: "horizontal half-power beamwidth, degrees" },
  { name: "v_beamwidth_deg", numeric: true, help: "vertical half-power beamwidth, degrees" },
  { name: "azimuth_deg", numeric: true, help: "boresight azimuth, degrees clockwise from north (empty: 0)" },
  { name: "mechanical_tilt_deg", numeric: true, help: "mechanical downtilt, degrees (empty: 0)" },
  { name: "electrical_tilt_deg", numeric: true, help: "electrical downtilt, degrees (empty: 0)" },
  { name: "x_m", numeric: true, required: true, help: "antenna centre, metres east" },
  { name: "y_m", numeric: true, required: true, help: "antenna centre, metres north" },
  { name: "z_m", numeric: true, required: true, help: "antenna centre, metres above the site's datum" },
  { name: "model", help: "spherical, cylindrical, auto or aperture (empty: spherical)" },
  { name: "aperture_m", numeric: true, help: "aperture height, metres (cylindrical and auto)" },
  { name: "dish_diameter_m", numeric: true, help: "dish diameter, metres (aperture)" },
  { name: "duty_factor", numeric: true, help: "0 to 1 (empty: 1)" },
  { name: "actual_max_factor", numeric: true, help: "F_PR of IEC 62232, 0 to 1 (empty: 1)" },
  { name: "tdd_factor", numeric: true, help: "TDD downlink factor of IEC 62232, 0 to 1 (empty: 1)" },
  { name: "active", help: "yes or no (empty: yes)" },
  { name: "notes", help: "anything else" },
];

/** The unit words a header may end in, and what the column's quantity is called. */
export const UNIT_SUFFIXES: Record<string, string> = {
  mhz: "MHz", ghz: "GHz", khz: "kHz", hz: "Hz", w: "W", kw: "kW", mw: "mW", dbm: "dBm", dbw: "dBW", db: "dB", dbi: "dBi", dbd: "dBd",
  deg: "degrees", rad: "radians", m: "metres", cm: "centimetres", mm: "millimetres", ft: "feet", in: "inches",
};
