/**
 * Where the computation is defined: each physical parameter of a scenario document with the range of values the
 * engine computes without overflow or loss of every digit (found by computing every background over decades of
 * each parameter, 1e-300 to 1e300, and keeping several decades of margin inside the values that worked), and the
 * numerics' cross-field bounds. docs/formats.md lists the same table.
 *
 * A document outside a range still parses (a stored document that predates the ranges stays readable and editable),
 * but saving, importing and computing it answer the field, the range and the unit in words.
 */
import type { ScenarioDocument } from "./schema";

export interface ParameterRange {
  /** Dotted path into the document. */
  path: string;
  label: string;
  min: number;
  max: number;
  unit: string;
  /** When the parameter may also be exactly zero (below min otherwise). */
  zeroAllowed?: boolean;
  /** When the range bounds |value| (the sign is free). */
  magnitude?: boolean;
}

const range = (path: string, label: string, min: number, max: number, unit: string, extra: Partial<ParameterRange> = {}): ParameterRange => ({
  path,
  label,
  min,
  max,
  unit,
  ...extra,
});

/** The ranges, in the document's order. Kept a few decades inside where the engine was seen to fail. */
export const PARAMETER_RANGES = {
  blackHoleMass: range("background.massKg", "black-hole mass", 1e-8, 1e60, "kg"),
  acceleration: range("background.accelerationMetresPerSecondSquared", "lab acceleration", 1e-30, 1e50, "m s^-2"),
  hubbleRate: range("background.hubbleRatePerSecond", "Hubble rate", 1e-40, 1e40, "s^-1"),
  arealRadius: range("lab.arealRadiusMetres", "lab areal radius", 1e-30, 1e30, "m", { zeroAllowed: true }),
  properDistance: range("lab.properDistanceMetres", "lab proper distance from the horizon", 1e-30, 1e30, "m"),
  charge: range("source.chargeCoulombs", "charge", 1e-40, 1e20, "C", { zeroAllowed: true, magnitude: true }),
  sourceMass: range("source.massKg", "source mass", 1e-40, 1e60, "kg", { zeroAllowed: true }),
  labMass: range("source.labMassKg", "lab mass", 1e-40, 1e60, "kg", { zeroAllowed: true }),
  separation: range("separation.distanceMetres", "separation", 1e-40, 1e30, "m", { zeroAllowed: true }),
  // A hold computes up to 1e300 s (a count beyond a double is then reported by its log10 alone). A ramp many
  // decades longer than a horizon's thermal time (about 1e140 thermal times) loses every digit, and below about
  // 1e-110 s a ramp near a black hole does: ramps and whole profiles keep to 1e-30..1e20 s (the age of the
  // universe is 4e17 s).
  rampDuration: range("protocol.*.durationSeconds", "ramp duration", 1e-30, 1e20, "s"),
  holdDuration: range("protocol.hold.durationSeconds", "hold duration", 1e-30, 1e300, "s", { zeroAllowed: true }),
  protocolDuration: range("protocol.durationSeconds", "protocol duration", 1e-30, 1e20, "s"),
  sampleSeparation: range("protocol.samples.*.separationMetres", "sampled separation", 1e-40, 1e30, "m", { zeroAllowed: true, magnitude: true }),
} as const satisfies Record<string, ParameterRange>;

/** The finest kink time resolution, as a fraction of the protocol's total duration. */
export const KINK_RESOLUTION_MIN_FRACTION = 1e-12;

export interface RangeIssue {
  path: string;
  message: string;
}

const fmt = (x: number) => x.toExponential(0).replace("e+", "e");

/** The range in words, e.g. "from 1e-30 to 1e50 m s^-2 (or 0)". */
export function rangeText(r: ParameterRange): string {
  const span = r.magnitude ? `between -${fmt(r.max)} and ${fmt(r.max)} ${r.unit}, with magnitude at least ${fmt(r.min)} ${r.unit}` : `from ${fmt(r.min)} to ${fmt(r.max)} ${r.unit}`;
  return `${span}${r.zeroAllowed ? " (or exactly 0)" : ""}`;
}

function check(issues: RangeIssue[], r: ParameterRange, value: number | null | undefined, path = r.path): void {
  if (value === null || value === undefined) return;
  if (r.zeroAllowed && value === 0) return;
  const size = r.magnitude ? Math.abs(value) : value;
  if (Number.isFinite(size) && size >= r.min && size <= r.max) return;
  issues.push({ path, message: `the ${r.label} must be ${rangeText(r)}, where the computation is defined; it is ${value} ${r.unit}` });
}

/** The protocol's total duration in seconds, from the document alone (no sampling). */
export function protocolDurationSeconds(protocol: ScenarioDocument["protocol"]): number {
  switch (protocol.kind) {
    case "segments":
      return protocol.separation.durationSeconds + protocol.hold.durationSeconds + protocol.recombination.durationSeconds;
    case "formula":
      return protocol.durationSeconds;
    case "sampled":
      return protocol.samples[protocol.samples.length - 1].timeSeconds - protocol.samples[0].timeSeconds;
  }
}

/** Every parameter outside its range, and every numerics setting outside its bounds; empty when all is well. */
export function rangeIssues(document: ScenarioDocument): RangeIssue[] {
  const issues: RangeIssue[] = [];
  const R = PARAMETER_RANGES;
  const { background, lab, source, separation, protocol } = document;
  if (background.kind === "schwarzschild") check(issues, R.blackHoleMass, background.massKg);
  if (background.kind === "rindler") check(issues, R.acceleration, background.accelerationMetresPerSecondSquared);
  if (background.kind === "de-sitter") check(issues, R.hubbleRate, background.hubbleRatePerSecond);
  if (lab.placement === "areal-radius") check(issues, R.arealRadius, lab.arealRadiusMetres);
  if (lab.placement === "proper-distance-from-horizon") check(issues, R.properDistance, lab.properDistanceMetres);
  check(issues, R.charge, source.chargeCoulombs);
  check(issues, R.sourceMass, source.massKg);
  check(issues, R.labMass, source.labMassKg);
  check(issues, R.separation, separation.distanceMetres);
  switch (protocol.kind) {
    case "segments":
      check(issues, R.rampDuration, protocol.separation.durationSeconds, "protocol.separation.durationSeconds");
      check(issues, R.holdDuration, protocol.hold.durationSeconds);
      check(issues, R.rampDuration, protocol.recombination.durationSeconds, "protocol.recombination.durationSeconds");
      break;
    case "formula":
      check(issues, R.protocolDuration, protocol.durationSeconds);
      break;
    case "sampled": {
      const span = protocolDurationSeconds(protocol);
      if (span > 0) check(issues, R.protocolDuration, span, "protocol.samples");
      const outside = protocol.samples.findIndex((s) => {
        const size = Math.abs(s.separationMetres);
        return size !== 0 && !(size >= R.sampleSeparation.min && size <= R.sampleSeparation.max);
      });
      if (outside >= 0) check(issues, R.sampleSeparation, protocol.samples[outside].separationMetres, `protocol.samples.${outside}.separationMetres`);
      break;
    }
  }
  const resolution = document.numerics.kinkTimeResolutionSeconds;
  const total = protocolDurationSeconds(protocol);
  if (resolution !== null && issues.length === 0 && total > 0) {
    const finest = total * KINK_RESOLUTION_MIN_FRACTION;
    if (resolution < finest) {
      issues.push({
        path: "numerics.kinkTimeResolutionSeconds",
        message: `the kink time resolution must be at least ${fmt(KINK_RESOLUTION_MIN_FRACTION)} of the protocol's duration (${total} s), i.e. at least ${finest.toPrecision(3)} s; it is ${resolution} s`,
      });
    } else if (resolution > total) {
      issues.push({ path: "numerics.kinkTimeResolutionSeconds", message: `the kink time resolution must not exceed the protocol's duration (${total} s); it is ${resolution} s` });
    }
  }
  return issues;
}
