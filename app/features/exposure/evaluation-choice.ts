// The options form's "Evaluation" choice (spatial average over a span, the value at one height,
// the maximum over a span) as the URL's own keys: "at one height" is one height at `from` with the
// average mode. Pure, for the loader and its test.
import type { ExposureOptions } from "./options";

export type Evaluation = "average" | "at" | "max";

export function evaluationOf(o: Pick<ExposureOptions, "mode" | "heights">): Evaluation {
  if (o.heights.count === 1) return "at";
  return o.mode;
}

/** The search with `evaluation` folded into `mode`, `heights` and `to`, and removed; other keys untouched. */
export function foldEvaluation(search: URLSearchParams): URLSearchParams {
  const out = new URLSearchParams(search);
  const evaluation = out.get("evaluation");
  out.delete("evaluation");
  if (evaluation === "at") {
    out.set("mode", "average");
    out.set("heights", "1");
    out.set("to", out.get("from") ?? "0");
  } else if (evaluation === "average" || evaluation === "max") {
    out.set("mode", evaluation);
    // From "at one height" back to a span: the default span's count when the form still says 1.
    if (out.get("heights") === "1") out.set("heights", "11");
  }
  return out;
}
