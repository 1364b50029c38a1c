import { describe, expect, it } from "vitest";
import { valuesFromInput } from "./convert";
import { EMITTER_CSV_MAX_BYTES, emittersFromCsv, emittersFromCsvBytes, emittersToCsv } from "./csv";

const library = [{ id: "pat-1", name: "Reference panel 65/7" }];
const header = "label,operator,band,frequency_mhz,power_per_carrier_w,gain_dbi,azimuth_deg,x_m,y_m,z_m";
const good = "A1,Northwind Mobile,LTE 700,739,40,15.5,120,1,2,3";

describe("emitter CSV: reading", () => {
  it("reads a good file into the API's shape", () => {
    const { valid, problems } = emittersFromCsv(`${header}\n${good}\n`, library);
    expect(problems).toEqual([]);
    expect(valid).toHaveLength(1);
    expect(valid[0].row).toBe(2);
    expect(valid[0].emitter).toMatchObject({ label: "A1", operator: "Northwind Mobile", frequencyMHz: 739, powerPerCarrierW: 40, powerUnit: "W", gain: 15.5, gainUnit: "dBi", azimuthDeg: 120, position: { x: 1, y: 2, z: 3 }, carriers: 1, active: true });
  });

  it("reports an empty file", () => {
    expect(emittersFromCsv("", library).problems).toEqual([{ row: null, column: null, message: "The file is empty." }]);
    expect(emittersFromCsv("\uFEFF  \n", library).problems[0].message).toBe("The file is empty.");
    expect(emittersFromCsv(`${header}\n`, library).problems[0].message).toMatch(/no emitters/);
  });

  it("reports missing and unknown columns on row 1", () => {
    const { problems } = emittersFromCsv("label,frequency_mhz,colour,x_m,y_m\nA1,739,red,0,0\n", library);
    expect(problems).toContainEqual(expect.objectContaining({ row: 1, column: "colour", message: expect.stringMatching(/Unknown column “colour”/) }));
    expect(problems).toContainEqual(expect.objectContaining({ row: 1, column: "z_m", message: expect.stringMatching(/required column “z_m” is missing/) }));
    expect(problems).toContainEqual(expect.objectContaining({ row: 1, column: "power_per_carrier_w", message: expect.stringMatching(/power per carrier is missing/) }));
    expect(problems).toContainEqual(expect.objectContaining({ row: 1, column: "gain_dbi", message: expect.stringMatching(/gain is missing/) }));
  });

  it("reports a header in a unit the layout does not take, naming the right one", () => {
    const { problems } = emittersFromCsv("label,frequency_ghz,power_per_carrier_kw,gain_dbi,x_m,y_m,z_m\nA1,0.739,0.04,15,0,0,0\n", library);
    expect(problems).toContainEqual({ row: 1, column: "frequency_ghz", message: expect.stringMatching(/in GHz.*use frequency_mhz \(MHz\)/) });
    expect(problems).toContainEqual({ row: 1, column: "power_per_carrier_kw", message: expect.stringMatching(/in kW.*power_per_carrier_w \(W\) or power_per_carrier_dbm \(dBm\)/) });
  });

  it("reports a value written with another unit than its column's, and non-numeric values, by row and column", () => {
    const text = `${header}\nA1,N,LTE,739,46 dBm,15,0,0,0,0\nA2,N,LTE,seven hundred,40,15,0,0,0,0\nA3,N,LTE,739,"40,5",15,0,0,0,0\n`;
    const { valid, problems } = emittersFromCsv(text, library);
    expect(valid).toEqual([]);
    expect(problems).toContainEqual({ row: 2, column: "power_per_carrier_w", message: expect.stringMatching(/carries a unit \(dBm\); this column is in W/) });
    expect(problems).toContainEqual({ row: 3, column: "frequency_mhz", message: expect.stringMatching(/is not a number/) });
    expect(problems).toContainEqual({ row: 4, column: "power_per_carrier_w", message: expect.stringMatching(/is not a number/) });
  });

  it("reports values out of range with the schema's words, and keeps the good rows apart", () => {
    const text = `${header}\n${good}\nA2,N,LTE,0,40,15,0,0,0,0\nA3,N,LTE,739,40,15,0,0,0,\n`;
    const { valid, problems } = emittersFromCsv(text, library);
    expect(valid.map((v) => v.row)).toEqual([2]);
    expect(problems).toContainEqual({ row: 3, column: "frequency_mhz", message: "Enter the frequency in MHz from 0 to 300,000." });
    expect(problems).toContainEqual({ row: 4, column: "z_m", message: "Enter z in metres from -10,000 to 10,000." });
  });

  it("takes dBm and dBd columns, converting to W and dBi", () => {
    const text = "label,frequency_mhz,power_per_carrier_dbm,gain_dbd,x_m,y_m,z_m,pattern,active\nB1,3700,46,15.85,0,0,0,reference panel 65/7,no\n";
    const { valid, problems } = emittersFromCsv(text, library);
    expect(problems).toEqual([]);
    const values = valuesFromInput(valid[0].emitter);
    expect(values.powerPerCarrierW).toBeCloseTo(39.810717055349734, 12); // 10^((46 − 30)/10), definition of dBm
    expect(values.gainDbi).toBeCloseTo(18, 12); // dBd + 2.15 (OET-65 §1)
    expect(values).toMatchObject({ powerUnit: "dBm", gainUnit: "dBd", patternId: "pat-1", active: false });
  });

  it("reads a UTF-8 file with a BOM, a UTF-16 file and a Latin-1 file alike", () => {
    const text = `${header}\r\nÄ1,Opérateur Süd,LTE,739,40,15.5,120,1,2,3\r\n`;
    const bom = new Uint8Array([0xef, 0xbb, 0xbf, ...new TextEncoder().encode(text)]);
    const utf16 = new Uint8Array([0xff, 0xfe, ...new Uint8Array(Buffer.from(text, "utf16le"))]);
    const latin1 = new Uint8Array(Buffer.from(text, "latin1"));
    for (const [bytes, encoding] of [[bom, "utf-8"], [utf16, "utf-16le"], [latin1, "windows-1252"]] as const) {
      const result = emittersFromCsvBytes(bytes, library);
      expect(result.problems, encoding).toEqual([]);
      expect(result.encoding).toBe(encoding);
      expect(result.valid[0].emitter).toMatchObject({ label: "Ä1", operator: "Opérateur Süd" });
    }
  });

  it("reads 5 MB of rows, and refuses a file over 5 MB before parsing it", () => {
    const row = `${good.replace("A1", "A")},${"x".repeat(900)}`;
    const lines = [`${header},notes`];
    let size = lines[0].length;
    while (size + row.length + 10 < EMITTER_CSV_MAX_BYTES) {
      lines.push(row.replace(/^A/, `A${lines.length}`));
      size += row.length + 10;
    }
    const bytes = new TextEncoder().encode(lines.join("\n"));
    expect(bytes.byteLength).toBeGreaterThan(4.9 * 1024 * 1024);
    const result = emittersFromCsvBytes(bytes, library);
    expect(result.problems).toEqual([]);
    expect(result.valid).toHaveLength(lines.length - 1);
    const over = new Uint8Array(EMITTER_CSV_MAX_BYTES + 1).fill(0x41);
    expect(emittersFromCsvBytes(over, library).problems).toEqual([{ row: null, column: null, message: expect.stringMatching(/larger than 5 MB/) }]);
  });

  it("reports a row with the wrong number of fields", () => {
    const { problems } = emittersFromCsv(`${header}\nA1,N,LTE,739\n`, library);
    expect(problems).toEqual([{ row: 2, column: null, message: "This row has 4 fields; the header has 10." }]);
  });
});

describe("emitter CSV: writing", () => {
  it("exports in the import layout, so importing the export gives the same emitters", () => {
    const text = [
      "label,operator,frequency_mhz,power_per_carrier_dbm,gain_dbd,pattern_model,h_beamwidth_deg,v_beamwidth_deg,x_m,y_m,z_m,model,aperture_m,actual_max_factor,tdd_factor,notes",
      'C1,"Quay, Ltd",3700,49.03,15.85,3gpp-38.901,65,7,1.5,-2,12.25,cylindrical,0.9,0.25,0.74,=SUM(A1)',
      "C2,Other,739,43,12,,,,0,0,0,spherical,,,,",
    ].join("\n");
    const first = emittersFromCsv(text, library);
    expect(first.problems).toEqual([]);
    const values = first.valid.map((v) => valuesFromInput(v.emitter));
    const again = emittersFromCsv(emittersToCsv(values), library);
    expect(again.problems).toEqual([]);
    expect(again.valid.map((v) => valuesFromInput(v.emitter))).toEqual(values);
    expect(values[0].notes).toBe("=SUM(A1)");
  });
});

describe("the README's example", () => {
  it("imports without a problem", async () => {
    const { readFileSync } = await import("node:fs");
    const readme = readFileSync(new URL("../../../README.md", import.meta.url), "utf8");
    const block = readme.slice(readme.indexOf("### Emitter CSV")).match(/```csv\n([\s\S]*?)```/)![1];
    const { valid, problems } = emittersFromCsv(block, library);
    expect(problems).toEqual([]);
    expect(valid.map((v) => v.emitter.label)).toEqual(["A1", "N1"]);
  });
});
