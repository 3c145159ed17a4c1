/**
 * The sweep options the command-line tools share (`figure --what sweep`, `branchline sweep`): --vary, --from, --to
 * read into a sweep request for a document, with the editor's default range where --from or --to is left out.
 * Problems are added to `issues` as "--option: message" lines; the caller refuses them together.
 */
import { defaultSweepRange } from "../canvas/kernels/sweep-range";
import type { ScenarioDocument } from "../physics/scenario/schema";
import { SWEEP_PARAMETERS, parameterDimension, type SweepParameter } from "../physics/sweeps";
import { parseQuantity } from "../physics/units";
import type { InputIssue } from "./scenario-input";

export interface SweepOptionValues {
  vary?: string;
  from?: string;
  to?: string;
}

export function sweepBounds(document: ScenarioDocument, values: SweepOptionValues, issues: InputIssue[]): { parameter: SweepParameter; fromValue: number; toValue: number } {
  const asked = values.vary ?? (document.protocol.kind === "segments" ? "recombination-time" : "lab-distance");
  const known = (SWEEP_PARAMETERS as readonly string[]).includes(asked);
  if (!known) issues.push({ path: "--vary", message: `must be ${SWEEP_PARAMETERS.join(", ")}; got "${asked}"` });
  const parameter = known ? (asked as SweepParameter) : SWEEP_PARAMETERS[0];
  const range = defaultSweepRange(document, parameter);
  const dimension = parameterDimension(parameter);
  const bound = (name: "from" | "to", fallback: number | undefined): number => {
    const text = values[name];
    if (text === undefined) {
      if (fallback === undefined) issues.push({ path: `--${name}`, message: "this scenario has no default range for the sweep: give --from and --to" });
      return fallback ?? NaN;
    }
    const value = parseQuantity(text, dimension);
    if (value.ok) return value.valueSI;
    issues.push({ path: `--${name}`, message: value.message });
    return NaN;
  };
  const fromValue = bound("from", range?.from);
  const toValue = bound("to", range?.to);
  if (issues.length === 0 && !(toValue > fromValue)) issues.push({ path: "--to", message: "must be above --from" });
  return { parameter, fromValue, toValue };
}
