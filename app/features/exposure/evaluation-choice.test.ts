// The form's evaluation choice folded into the URL's keys (common practice, no source).
import { describe, expect, it } from "vitest";
import { evaluationOf, foldEvaluation } from "./evaluation-choice";
import { optionsFromSearch } from "./options";

describe("evaluation choice", () => {
  it("turns 'at one height' into one height at the lowest height", () => {
    const { options, errors } = optionsFromSearch(foldEvaluation(new URLSearchParams("evaluation=at&from=1.5&to=2&heights=11")));
    expect(errors).toEqual({});
    expect(options.heights).toEqual({ fromM: 1.5, toM: 1.5, count: 1 });
    expect(evaluationOf(options)).toBe("at");
  });

  it("keeps the span for the average and the maximum, back to 11 heights from one", () => {
    const { options } = optionsFromSearch(foldEvaluation(new URLSearchParams("evaluation=max&from=0&to=2&heights=1")));
    expect(options.mode).toBe("max");
    expect(options.heights.count).toBe(11);
    expect(evaluationOf(options)).toBe("max");
  });

  it("leaves a URL without the choice alone", () => {
    expect(foldEvaluation(new URLSearchParams("step=0.5")).toString()).toBe("step=0.5");
  });
});
