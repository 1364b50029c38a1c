import { describe, expect, it } from "vitest";
import { patternFromCsv } from "./pattern-csv";

describe("pattern CSV", () => {
  it("reads both cuts into the engine's tabulated pattern, any case, h/v shorthand, with a BOM", () => {
    const { pattern, problems } = patternFromCsv("\uFEFFCut,Angle_deg,Attenuation_dB\nh,-180,25\nhorizontal,0,0\nH,90,20\nv,-90,30\nvertical,0,0\nV,90,30\n");
    expect(problems).toEqual([]);
    expect(pattern).toEqual({
      type: "tabulated",
      horizontal: [{ angleDeg: -180, attenuationDb: 25 }, { angleDeg: 0, attenuationDb: 0 }, { angleDeg: 90, attenuationDb: 20 }],
      vertical: [{ angleDeg: -90, attenuationDb: 30 }, { angleDeg: 0, attenuationDb: 0 }, { angleDeg: 90, attenuationDb: 30 }],
    });
  });

  it("reports an empty file, missing and unknown columns, and a gain column for what it is", () => {
    expect(patternFromCsv("").problems).toEqual([{ row: null, column: null, message: "The file is empty." }]);
    const { problems } = patternFromCsv("cut,angle_deg,gain_db\nh,0,0\n");
    expect(problems).toContainEqual({ row: 1, column: "gain_db", message: expect.stringMatching(/attenuation relative to boresight/) });
    expect(problems).toContainEqual({ row: 1, column: "attenuation_db", message: expect.stringMatching(/required column “attenuation_db” is missing/) });
  });

  it("reports bad cells by row and column, and a missing cut", () => {
    const { pattern, problems } = patternFromCsv("cut,angle_deg,attenuation_db\nh,0,0\nx,0,0\nh,ninety,3\nh,90,-3\nh,400,3\n");
    expect(pattern).toBeNull();
    expect(problems).toEqual([
      { row: 3, column: "cut", message: "Write horizontal or vertical, not “x”." },
      { row: 4, column: "angle_deg", message: "“ninety” is not a number of degrees." },
      { row: 5, column: "attenuation_db", message: expect.stringMatching(/relative to boresight: 0 or more dB/) },
      { row: 6, column: "angle_deg", message: "Enter an angle from −180 to 360 degrees." },
      { row: null, column: "cut", message: "The file has no vertical cut." },
    ]);
  });
});
