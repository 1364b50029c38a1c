import { describe, expect, it } from "vitest";
import { defaultOptions, optionsFromSearch, optionsToSearch } from "./options";

describe("options in the URL", () => {
  it("round-trips every field", () => {
    const o = { ...defaultOptions, standard: "icnirp-2020" as const, tier: "occupational" as const, gridStepM: 0.5, heights: { fromM: 0.5, toM: 1.8, count: 5 }, mode: "max" as const, reflectionFactor: 2.56 as const, defaultModel: "cylindrical" as const };
    expect(optionsFromSearch(optionsToSearch(o))).toEqual({ options: o, errors: {} });
  });
  it("leaves the defaults out of the URL", () => {
    expect(optionsToSearch(defaultOptions).toString()).toBe("");
  });
  it("refuses a bad value field by field and keeps the others", () => {
    const { options, errors } = optionsFromSearch(new URLSearchParams("standard=nope&step=0.5&reflection=3"));
    expect(options.standard).toBe(defaultOptions.standard);
    expect(options.reflectionFactor).toBe(defaultOptions.reflectionFactor);
    expect(options.gridStepM).toBe(0.5);
    expect(Object.keys(errors).sort()).toEqual(["reflectionFactor", "standard"]);
  });
  it("refuses a height span upside down", () => {
    const { options, errors } = optionsFromSearch(new URLSearchParams("from=2&to=1"));
    expect(options.heights).toEqual(defaultOptions.heights);
    expect(errors["heights.toM"]).toMatch(/highest height/);
  });
});
