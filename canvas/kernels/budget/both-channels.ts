/**
 * The Budget's "Both" column for the counts the physics reports per channel only (quanta to infinity, into the
 * horizon, ramp- and hold-driven): the electromagnetic and gravitational field states are independent, so their
 * counts add (the rule physics/compute.ts applies to the total, source "combined-channels"). Summed in the logarithm,
 * so counts past the range of a double still add.
 */
import { log10Sum, quantityFromLog10 } from "@/physics/estimators/quantity";
import type { Quantity } from "@/physics/result";

/** log10 of a reported count: −Infinity for an exact zero, null when the quantity holds no number at all. */
function log10OfCount(q: Quantity): number | null {
  if (q.log10 !== null) return q.log10;
  return q.value === 0 ? -Infinity : null;
}

/**
 * Both channels' count together, or null where either channel has no such count (a background where it is not
 * distinct, e.g. quanta into the horizon in flat spacetime) or their units differ.
 */
export function bothChannels(electromagnetic: Quantity | null, gravitational: Quantity | null): Quantity | null {
  if (!electromagnetic || !gravitational || electromagnetic.unit !== gravitational.unit) return null;
  const a = log10OfCount(electromagnetic);
  const b = log10OfCount(gravitational);
  if (a === null || b === null) return null;
  return quantityFromLog10(log10Sum(a, b), electromagnetic.unit, "combined-channels");
}
