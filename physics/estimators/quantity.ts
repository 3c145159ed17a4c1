/**
 * Numbers carried as base-10 logarithms, so that products of constants such as G⁶M⁵ or c¹⁰ and long holds never
 * overflow or underflow a double before the answer is known; and their conversion to reported Quantities.
 * A zero is log10 = −Infinity, internally only: reported Quantities carry null instead.
 */
import type { Quantity } from "../result-basics";
import type { SourceKey } from "./sources";

/** Largest and smallest magnitudes reported as plain doubles (with a little headroom below the subnormals). */
const LOG10_MAX_DOUBLE = Math.log10(Number.MAX_VALUE);
const LOG10_MIN_REPORTED = -307;

export function log10Of(value: number): number {
  if (value < 0 || Number.isNaN(value)) throw new RangeError(`log10Of expects a non-negative number, got ${value}`);
  return Math.log10(value);
}

/** log10(10^a + 10^b), exact for zeros (−Infinity). */
export function log10Sum(a: number, b: number): number {
  if (a === -Infinity) return b;
  if (b === -Infinity) return a;
  const high = Math.max(a, b);
  return high + Math.log10(1 + 10 ** (Math.min(a, b) - high));
}

/** log10 of a product, given the log10 of each factor; any zero factor gives an exact zero. */
export function log10Product(...factors: number[]): number {
  let sum = 0;
  for (const f of factors) {
    if (f === -Infinity) return -Infinity;
    sum += f;
  }
  return sum;
}

export function valueFromLog10(log10: number): number | null {
  if (log10 === -Infinity) return 0;
  if (!Number.isFinite(log10) || log10 > LOG10_MAX_DOUBLE || log10 < LOG10_MIN_REPORTED) return null;
  return 10 ** log10;
}

export function quantityFromLog10(log10: number, unit: string, sourceKey: SourceKey): Quantity {
  if (Number.isNaN(log10)) throw new RangeError(`a ${sourceKey} quantity came out as NaN`);
  return {
    value: valueFromLog10(log10),
    log10: log10 === -Infinity ? null : Number.isFinite(log10) ? log10 + 0 : null, // + 0 turns −0 into 0
    unit,
    sourceKey,
  };
}

/** A quantity from an ordinary (possibly signed) double. */
export function quantityFromValue(value: number, unit: string, sourceKey: SourceKey): Quantity {
  if (!Number.isFinite(value)) throw new RangeError(`a ${sourceKey} quantity came out as ${value}`);
  return { value, log10: value === 0 ? null : Math.log10(Math.abs(value)), unit, sourceKey };
}

/** True when a reported quantity can only be read from its logarithm. */
export function isOutsideDoubleRange(q: Quantity | null): boolean {
  return q !== null && q.value === null;
}
