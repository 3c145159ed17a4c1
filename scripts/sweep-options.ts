/**
 * The sweep options the command-line tools share (`figure --what sweep`, `branchline sweep`, and each axis of
 * `branchline map`): a parameter and its range read into SI values for a document, with the editor's default range
 * where an end is left out.
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

/** The option names one parameter's range is read from (a sweep's --vary/--from/--to, a map axis' --x/--x-from/--x-to). */
export interface RangeOptionNames {
  vary: string;
  from: string;
  to: string;
}

/**
 * A parameter and its range from the options named in `names`, with the editor's default range where from or to
 * is left out; `fallback` is the parameter when none is named.
 */
export function parameterBounds(
  document: ScenarioDocument,
  values: SweepOptionValues,
  names: RangeOptionNames,
  fallback: SweepParameter,
  issues: InputIssue[],
): { parameter: SweepParameter; fromValue: number; toValue: number } {
  const asked = values.vary ?? fallback;
  const known = (SWEEP_PARAMETERS as readonly string[]).includes(asked);
  if (!known) issues.push({ path: names.vary, message: `must be ${SWEEP_PARAMETERS.join(", ")}; got "${asked}"` });
  const parameter = known ? (asked as SweepParameter) : SWEEP_PARAMETERS[0];
  const range = defaultSweepRange(document, parameter);
  const dimension = parameterDimension(parameter);
  const problemsBefore = issues.length;
  const bound = (name: "from" | "to", fallbackValue: number | undefined): number => {
    const text = values[name];
    if (text === undefined) {
      if (fallbackValue === undefined) issues.push({ path: names[name], message: `this scenario has no default range for ${parameter}: give ${names.from} and ${names.to}` });
      return fallbackValue ?? NaN;
    }
    const value = parseQuantity(text, dimension);
    if (value.ok) return value.valueSI;
    issues.push({ path: names[name], message: value.message });
    return NaN;
  };
  const fromValue = bound("from", range?.from);
  const toValue = bound("to", range?.to);
  if (issues.length === problemsBefore && !(toValue > fromValue)) issues.push({ path: names.to, message: `must be above ${names.from}` });
  return { parameter, fromValue, toValue };
}

export function sweepBounds(document: ScenarioDocument, values: SweepOptionValues, issues: InputIssue[]): { parameter: SweepParameter; fromValue: number; toValue: number } {
  const fallback = document.protocol.kind === "segments" ? "recombination-time" : "lab-distance";
  return parameterBounds(document, values, { vary: "--vary", from: "--from", to: "--to" }, fallback, issues);
}
