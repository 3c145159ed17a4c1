/**
 * Axes for paper-grade charts: where the ticks go and what they say.
 *
 * - Linear axes: major ticks at multiples of a 1–2–5 step (the steps read off a ruler without arithmetic).
 * - Log axes: major ticks at the decades, minor ticks at 2…9 × 10ⁿ; an axis shorter than two decades also labels
 *   2 × and 5 × 10ⁿ, so it never shows fewer than two labels.
 * - One unit per axis, chosen for its range (the SI prefix that puts the largest magnitude between 1 and 1000), so
 *   every tick of an axis reads in the same unit and the unit is named once, in the axis title.
 */
import type { QuantityDimension } from "@/physics/units";
import { roundTicks } from "../round-numbers";
import { compactNumber } from "./labels";

export interface AxisTicks {
  /** Labelled ticks, SI values, increasing. */
  major: number[];
  /** Unlabelled ticks between them (log axes), SI values, increasing. */
  minor: number[];
}

export interface AxisUnit {
  /** Symbol in the axis title: "km", "ms", "" for a pure number. */
  symbol: string;
  /** SI value of one unit. */
  siPerUnit: number;
}

const clean = (v: number) => Number(v.toPrecision(12));

/** About `count` ticks at multiples of a 1–2–5 step covering [from, to]. */
export function linearTicks(from: number, to: number, count = 5): AxisTicks {
  return { major: roundTicks(from, to, count), minor: [] };
}

/** Decades (and, on a short axis, 2 × and 5 × 10ⁿ) as majors, the other integer multiples of 10ⁿ as minors. */
export function logTicks(from: number, to: number): AxisTicks {
  if (!(from > 0) || !(to >= from)) throw new RangeError(`a log axis needs 0 < from ≤ to, got [${from}, ${to}]`);
  const inside = (v: number) => v >= from * (1 - 1e-12) && v <= to * (1 + 1e-12);
  const firstDecade = Math.floor(Math.log10(from));
  const lastDecade = Math.ceil(Math.log10(to));
  const short = Math.log10(to / from) < 2;
  const major: number[] = [];
  const minor: number[] = [];
  for (let n = firstDecade; n <= lastDecade; n++) {
    for (let m = 1; m <= 9; m++) {
      const v = clean(m * 10 ** n);
      if (!inside(v)) continue;
      if (m === 1 || (short && (m === 2 || m === 5))) major.push(v);
      else minor.push(v);
    }
  }
  // An axis inside one 1–2–5 step still needs two labels: fall back to linear ticks.
  if (major.length < 2) return { major: roundTicks(from, to, 4).filter((v) => v > 0), minor: [] };
  return { major, minor };
}

const PREFIXES: Record<"length" | "time", AxisUnit[]> = {
  length: [
    { symbol: "nm", siPerUnit: 1e-9 },
    { symbol: "µm", siPerUnit: 1e-6 },
    { symbol: "mm", siPerUnit: 1e-3 },
    { symbol: "m", siPerUnit: 1 },
    { symbol: "km", siPerUnit: 1e3 },
  ],
  time: [
    { symbol: "ps", siPerUnit: 1e-12 },
    { symbol: "ns", siPerUnit: 1e-9 },
    { symbol: "µs", siPerUnit: 1e-6 },
    { symbol: "ms", siPerUnit: 1e-3 },
    { symbol: "s", siPerUnit: 1 },
  ],
};

/**
 * The one unit of an axis showing values up to `largestMagnitude` (SI): the largest prefix whose unit does not
 * exceed it, so the largest label reads between 1 and 1000 of it (beyond the table's ends, its first or last unit).
 */
export function axisUnit(largestMagnitude: number, dimension: QuantityDimension | "number"): AxisUnit {
  // Pressures and temperatures span many decades on a sweep: their axes keep the bare SI unit, labels in powers of ten.
  if (dimension === "pressure") return { symbol: "Pa", siPerUnit: 1 };
  if (dimension === "temperature") return { symbol: "K", siPerUnit: 1 };
  if (dimension !== "length" && dimension !== "time") return { symbol: "", siPerUnit: 1 };
  const units = PREFIXES[dimension];
  let chosen = units[0];
  for (const unit of units) if (largestMagnitude >= unit.siPerUnit * (1 - 1e-12)) chosen = unit;
  return chosen;
}

const SUPERSCRIPT = "⁰¹²³⁴⁵⁶⁷⁸⁹";
const superscript = (n: number) => `${n < 0 ? "⁻" : ""}${[...String(Math.abs(n))].map((d) => SUPERSCRIPT[Number(d)]).join("")}`;

/**
 * A tick's label in the axis' unit, without the unit: plain digits between 0.001 and 9999 ("0.2", "500"), a power
 * of ten as "10ⁿ", anything else as "m × 10ⁿ".
 */
export function tickLabel(valueSI: number, unit: AxisUnit): string {
  const v = clean(valueSI / unit.siPerUnit);
  if (v === 0) return "0";
  const magnitude = Math.abs(v);
  if (magnitude >= 1e-3 && magnitude < 1e4) return String(v);
  const exponent = Math.round(Math.log10(magnitude));
  if (Math.abs(magnitude / 10 ** exponent - 1) < 1e-9) return `${v < 0 ? "−" : ""}10${superscript(exponent)}`;
  return compactNumber(v, 3);
}

/**
 * The labels of an axis' major ticks: on a log axis of decades spanning more than three of them, every label is a
 * power of ten ("10⁻⁴" … "10²", never "0.001" beside "10⁻⁴"); otherwise each reads as tickLabel writes it.
 */
export function axisTickLabels(major: number[], unit: AxisUnit): string[] {
  const inUnit = major.map((v) => clean(v / unit.siPerUnit));
  const exponents = inUnit.map((v) => Math.round(Math.log10(Math.abs(v))));
  const decades = inUnit.every((v, i) => v > 0 && Math.abs(v / 10 ** exponents[i] - 1) < 1e-9);
  if (decades && exponents.length > 1 && exponents[exponents.length - 1] - exponents[0] > 3) return exponents.map((n) => `10${superscript(n)}`);
  return major.map((v) => tickLabel(v, unit));
}

/** An axis title with its unit: "lab distance (km)", or the bare name for a pure number. */
export function axisTitle(name: string, unit: AxisUnit): string {
  return unit.symbol === "" ? name : `${name} (${unit.symbol})`;
}
