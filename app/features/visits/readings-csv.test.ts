import { describe, expect, it } from "vitest";
import { decodeTextFile } from "~/lib/text-file";
import { READINGS_MAX_ROWS } from "./limits";
import { parseReadingsCsv, readingsFromCsv } from "./readings-csv";

const surfaces = [
  { id: "s-main", name: "Main roof" },
  { id: "s-pent", name: "Penthouse top" },
  { id: "s-dup1", name: "Terrace" },
  { id: "s-dup2", name: "terrace" },
];
const header = "label,surface,x_m,y_m,height_m,value,unit,standard,tier,frequency_mhz,notes";
const csv = (...rows: string[]) => [header, ...rows].join("\n");

describe("readingsFromCsv: a good file", () => {
  it("reads every row, resolves surfaces by name (any case) or id, and converts to power density", () => {
    const got = readingsFromCsv(
      csv(
        "R1,Main roof,1.5,2,1.7,6.14,V/m,,,,near the door",
        "R2,main ROOF,3,4,1.7,0.05,A/m,,,900,",
        "R3,s-pent,0,0,2,50,%,fcc,general,1900,",
        "R4,,10,-5,0,580,µW/cm²,,,,street",
        "R5,Penthouse top,1,1,1.2,40,%,icnirp-2020,general,,broadband %",
      ),
      surfaces,
    );
    expect(got.problems).toEqual([]);
    expect(got.rowCount).toBe(5);
    expect(got.valid.map((v) => v.row)).toEqual([2, 3, 4, 5, 6]);
    const [r1, r2, r3, r4, r5] = got.valid.map((v) => v.reading);
    expect(r1).toMatchObject({ label: "R1", surfaceId: "s-main", x: 1.5, y: 2, heightM: 1.7, value: 6.14, unit: "V/m", frequencyMHz: null, notes: "near the door" });
    expect(r1.powerDensityWm2).toBeCloseTo((6.14 * 6.14) / 376.730313668, 12);
    expect(r2).toMatchObject({ surfaceId: "s-main", unit: "A/m", frequencyMHz: 900 });
    expect(r3).toMatchObject({ surfaceId: "s-pent", unit: "percent", percentStandard: "fcc", percentTier: "general", powerDensityWm2: 5 });
    expect(r4).toMatchObject({ surfaceId: null, unit: "uW/cm2", powerDensityWm2: 5.8 });
    expect(r5).toMatchObject({ unit: "percent", frequencyMHz: null, powerDensityWm2: null });
  });

  it("takes the columns in any order and any case, with only the required ones", () => {
    const got = readingsFromCsv("UNIT,Value,height_m,y_m,x_m\nW/m2,2.5,1,0,0\n", surfaces);
    expect(got.problems).toEqual([]);
    expect(got.valid[0].reading).toMatchObject({ unit: "W/m2", value: 2.5, powerDensityWm2: 2.5, label: "", surfaceId: null });
  });

  it("reads quoted fields with commas and line breaks, semicolon-separated files, and skips blank lines", () => {
    const quoted = csv('"R, west",Main roof,1,2,1.5,3,V/m,,,,"two\nlines"', "", "R2,,1,2,1.5,3,V/m,,,,");
    const got = readingsFromCsv(quoted, surfaces);
    expect(got.problems).toEqual([]);
    expect(got.valid.map((v) => v.reading.label)).toEqual(["R, west", "R2"]);
    expect(got.valid[0].reading.notes).toBe("two\nlines");
    const semi = readingsFromCsv("x_m;y_m;height_m;value;unit\n1;2;1.5;3;V/m\n", surfaces);
    expect(semi.problems).toEqual([]);
    expect(semi.valid).toHaveLength(1);
  });

  it("reads a file with a byte-order mark, a UTF-16 file and a Latin-1 file alike (µW/cm² survives)", () => {
    const text = csv("R1,Main roof,1,2,1.5,580,µW/cm²,,,,");
    const files = [
      Buffer.concat([Buffer.from([0xef, 0xbb, 0xbf]), Buffer.from(text, "utf8")]),
      Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from(text, "utf16le")]),
      Buffer.from(text, "latin1"),
    ];
    for (const bytes of files) {
      const got = readingsFromCsv(decodeTextFile(bytes).text, surfaces);
      expect(got.problems).toEqual([]);
      expect(got.valid[0].reading).toMatchObject({ unit: "uW/cm2", powerDensityWm2: 5.8, surfaceId: "s-main" });
    }
  });
});

describe("readingsFromCsv: bad files", () => {
  it("refuses an empty file and a header with no rows", () => {
    expect(readingsFromCsv("", surfaces).problems).toEqual([{ row: null, column: null, message: "The file is empty." }]);
    expect(readingsFromCsv("\uFEFF \n", surfaces).problems[0].message).toBe("The file is empty.");
    expect(readingsFromCsv(`${header}\n\n`, surfaces).problems).toEqual([{ row: null, column: null, message: "The file has a header but no readings." }]);
  });

  it("names missing and unknown columns, and a column given twice, reading no row", () => {
    const got = readingsFromCsv("x_m,y_m,value,unit,colour,value\n1,2,3,V/m,red,4\n", surfaces);
    expect(got.valid).toEqual([]);
    expect(got.problems).toEqual(
      expect.arrayContaining([
        expect.objectContaining({ row: 1, column: "colour", message: expect.stringContaining("Unknown column “colour”") }),
        expect.objectContaining({ row: 1, column: "value", message: "The column “value” appears twice." }),
        expect.objectContaining({ row: 1, column: "height_m", message: expect.stringContaining("required column “height_m” is missing") }),
      ]),
    );
  });

  it("reports every bad row by spreadsheet row and column: wrong unit, non-numeric, out of range, unknown and ambiguous surface", () => {
    const got = readingsFromCsv(
      csv(
        "ok,Main roof,1,2,1.5,3,V/m,,,,",
        "u,Main roof,1,2,1.5,3,dBm,,,,",
        "n,Main roof,one,2,1.5,3,V/m,,,,",
        "c,Main roof,1,2,1.5,\"3,5\",V/m,,,,",
        "h,Main roof,1,2,-1,3,V/m,,,,",
        "s,Roof of the moon,1,2,1.5,3,V/m,,,,",
        "t,Terrace,1,2,1.5,3,V/m,,,,",
        "p,Main roof,1,2,1.5,30,%,,general,900,",
        "f,Main roof,1,2,1.5,30,%,fcc,general,500000,",
        "v,Main roof,1,2,1.5,3,V/m,fcc,,,",
        "m,Main roof,1,2,1.5,,V/m,,,,",
      ),
      surfaces,
    );
    expect(got.valid.map((v) => v.row)).toEqual([2]);
    expect(got.rowCount).toBe(11);
    const at = (row: number) => got.problems.filter((p) => p.row === row).map((p) => `${p.column}: ${p.message}`);
    expect(at(3)).toEqual([expect.stringMatching(/^unit: Choose a unit: V\/m, A\/m, W\/m², mW\/cm², µW\/cm², % of a limit\.$/)]);
    expect(at(4)).toEqual(["x_m: “one” is not a number (write decimals with a point)."]);
    expect(at(5)).toEqual(["value: “3,5” is not a number (write decimals with a point)."]);
    expect(at(6)).toEqual(["height_m: Enter the height above the surface in metres from 0 to 500."]);
    expect(at(7)).toEqual(["surface: This site has no surface named “Roof of the moon”."]);
    expect(at(8)).toEqual([expect.stringContaining("2 surfaces of this site are named “Terrace”")]);
    expect(at(9)).toEqual(["standard: Name the standard the % refers to."]);
    expect(at(10)).toEqual([expect.stringMatching(/^frequency_mhz: Enter the frequency in MHz/)]);
    expect(at(11)).toEqual(["standard: Name a standard and tier only for a reading in % of a limit."]);
    expect(at(12)).toEqual([expect.stringMatching(/^value: Enter the reading from 0 to/)]);
  });

  it("reports rows with too few or too many fields, and an unclosed quote", () => {
    const got = readingsFromCsv(csv("R1,Main roof,1,2", "R2,Main roof,1,2,1.5,3,V/m,,,,,extra", 'R3,"Main roof,1,2,1.5,3,V/m,,,,'), surfaces);
    expect(got.valid).toEqual([]);
    expect(got.problems.find((p) => p.row === 2)?.message).toBe("This row has 4 fields; the header has 11.");
    expect(got.problems.find((p) => p.row === 3)?.message).toBe("This row has 12 fields; the header has 11.");
    expect(got.problems.find((p) => p.row === 4)?.message).toMatch(/cannot be read|fields/);
  });

  it("refuses a file of more rows than one import takes (5 MB of rows), without checking them one by one", () => {
    const line = "R,Main roof,12.345,67.891,1.5,3.25,V/m,,,,a note to make the line longer than usual\n";
    const rows = Math.ceil((5 * 1024 * 1024) / line.length);
    const got = parseReadingsCsv(header + "\n" + line.repeat(rows));
    expect(rows).toBeGreaterThan(READINGS_MAX_ROWS);
    expect(got.rows).toEqual([]);
    expect(got.problems).toEqual([{ row: null, column: null, message: `The file has ${rows} readings; import at most ${READINGS_MAX_ROWS} at a time.` }]);
  });

  it("keeps HTML and script in text fields as text", () => {
    const got = readingsFromCsv(csv('<b>R1</b>,Main roof,1,2,1.5,3,V/m,,,,"<script>alert(1)</script>"'), surfaces);
    expect(got.valid[0].reading).toMatchObject({ label: "<b>R1</b>", notes: "<script>alert(1)</script>" });
  });
});
