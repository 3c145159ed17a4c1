/**
 * Round numbers for snapping and for axis ticks: steps from the 1–2–5 ladder (…, 0.1, 0.2, 0.5, 1, 2, 5, 10, …),
 * the steps a person reads off a ruler without arithmetic.
 */

const LADDER = [1, 2, 5] as const;

/** Drops the binary noise of a product such as 0.1 × 3 = 0.30000000000000004. */
function clean(value: number): number {
  return Number(value.toPrecision(12));
}

/** The power of ten at or below `value`, immune to log10 rounding up just below a power of ten. */
function decadeOf(value: number): number {
  const decade = 10 ** Math.floor(Math.log10(value));
  return decade > value ? decade / 10 : decade;
}

/** The largest 1–2–5 ladder step that does not exceed `value` (> 0). */
export function ladderStepAtMost(value: number): number {
  if (!(value > 0) || !Number.isFinite(value)) throw new RangeError(`a ladder step needs a positive finite value, got ${value}`);
  const decade = decadeOf(value);
  let step = decade;
  for (const m of LADDER) if (clean(m * decade) <= value) step = clean(m * decade);
  return step;
}

/** The smallest 1–2–5 ladder step not below `value` (> 0). */
export function ladderStepAtLeast(value: number): number {
  const below = ladderStepAtMost(value);
  if (below === value) return below;
  const decade = decadeOf(value);
  for (const m of [...LADDER, 10]) if (clean(m * decade) >= value) return clean(m * decade);
  return clean(10 * decade);
}

export function roundToMultiple(value: number, step: number): number {
  return clean(Math.round(value / step) * step);
}

/**
 * Snap a non-negative value to a round one: a multiple of the ladder step near a tenth of the value, never finer
 * than `finestStep` (what a few pixels of pointer travel are worth), so a shift-drag moves in visible, round jumps.
 */
export function snapToRoundValue(value: number, finestStep: number): number {
  const natural = Math.abs(value) / 10;
  const step = natural > finestStep ? ladderStepAtMost(natural) : ladderStepAtLeast(finestStep);
  return roundToMultiple(value, step);
}

/** Evenly spaced round ticks covering [from, to], about `count` of them. */
export function roundTicks(from: number, to: number, count: number): number[] {
  if (!(to > from)) return [from];
  const step = ladderStepAtLeast((to - from) / Math.max(1, count));
  const ticks: number[] = [];
  for (let k = Math.ceil(from / step); k * step <= to * (1 + 1e-12); k++) ticks.push(clean(k * step));
  return ticks;
}

/** The 1–2–5 ladder value nearest to `value` in ratio (3.7e-4 → 5e-4, 1.3 → 1), keeping its sign; zero stays zero. */
export function nearestLadderValue(value: number): number {
  if (value === 0) return 0;
  const magnitude = Math.abs(value);
  const below = ladderStepAtMost(magnitude);
  const above = ladderStepAtLeast(magnitude);
  return Math.sign(value) * (magnitude / below <= above / magnitude ? below : above);
}

/** A value rounded to `digits` significant digits. */
export function significantDigits(value: number, digits: number): number {
  return value === 0 ? 0 : Number(value.toPrecision(digits));
}
