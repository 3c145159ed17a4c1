/**
 * The faint grid of the diagram: curves of constant radius, chosen so that they spread
 * evenly over the diagram (not evenly in t or r, which would bunch them into the corners), then rounded to one
 * significant digit so each carries a round SI label. Inside a Schwarzschild black hole (region II, drawn for
 * context) a few curves of constant r, spacelike there, spread evenly between the horizon and the singularity and
 * left unlabelled.
 */
import { blackHoleInteriorToDiagram, type DiagramPoint } from "@/physics/backgrounds";
import { c } from "@/physics/constants";
import { nearestLadderValue, significantDigits } from "../round-numbers";
import type { DiagramChart } from "./chart";
import { bisect, sampleCurve } from "./geometry";
import { radiusLabel, type RadiusLabelStyle } from "./labels";

export interface GridLine {
  /** Only radius lines now: the slices of constant time are the protocol's own events (protocol-path.ts). */
  family: "time" | "radius";
  valueSI: number;
  /** Empty for a line drawn for context only (inside the black hole). */
  label: string;
  points: DiagramPoint[];
  /** Where the label goes: for time lines, the lab's worldline or the centre; for radius lines, the slice t = 0. */
  labelAt: DiagramPoint;
}

const RADIUS_LINES = 7;
const INTERIOR_RADIUS_LINES = 3;
/** Killing time reached along an interior curve, in units of r_s/c: there U or V is e^{−30} of the other, at a corner. */
const INTERIOR_TIME_REACH = 60;

/** The slice t = tSeconds across the lab's static region. */
export function timeCurve(chart: DiagramChart, tSeconds: number, seeds = 96): DiagramPoint[] {
  const { background } = chart;
  return sampleCurve(
    (rStar) => {
      const r = background.radiusFromTortoiseMetres(rStar);
      return r === null ? null : background.conformal.toDiagram(tSeconds, r);
    },
    chart.tortoiseRange[0],
    chart.tortoiseRange[1],
    { seeds },
  );
}

function radiusCurve(chart: DiagramChart, rMetres: number): DiagramPoint[] {
  return sampleCurve((t) => chart.background.conformal.toDiagram(t, rMetres), chart.timeRange[0], chart.timeRange[1], { seeds: 96 });
}

/** The lab's worldline across the whole diagram. */
export function labWorldline(chart: DiagramChart): DiagramPoint[] {
  return radiusCurve(chart, chart.background.labRadiusMetres);
}

/** Values whose curves cross a reference curve at evenly spaced diagram positions, rounded and without repeats. */
function evenlySpread(count: number, positionOf: (value: number) => number, range: [number, number], round: (value: number) => number): number[] {
  const low = positionOf(range[0]);
  const high = positionOf(range[1]);
  const values = new Set<number>();
  for (let j = 1; j <= count; j++) {
    const target = low + ((high - low) * j) / (count + 1);
    values.add(round(bisect((v) => positionOf(v) - target, range[0], range[1])));
  }
  // Bisection leaves crumbs such as 1e-22 s where the answer is 0.
  const tiny = 1e-9 * (Math.abs(range[0]) + Math.abs(range[1]));
  for (const v of values) {
    if (v !== 0 && Math.abs(v) < tiny) {
      values.delete(v);
      values.add(0);
    }
  }
  return [...values];
}

function radiusStyle(chart: DiagramChart, rMetres: number): RadiusLabelStyle {
  const { kind } = chart.background;
  const h = chart.horizonRadiusMetres;
  if (kind === "rindler") return "distance-from-horizon";
  if (kind === "minkowski") return "position";
  if (kind === "schwarzschild" && h !== null && rMetres - h < 0.1 * h) return "above-horizon";
  if (kind === "de-sitter" && h !== null && h - rMetres < 0.1 * h) return "below-horizon";
  return "radius";
}

/**
 * r rounded so that its label is round: a 1–2–5 value of r (or, near a horizon, of the distance from it), and two
 * significant digits of r for a Schwarzschild or de Sitter radius away from the horizon.
 */
function roundRadius(chart: DiagramChart, rMetres: number): number {
  const h = chart.horizonRadiusMetres ?? 0;
  const nearHorizon = Math.abs(rMetres - h) < 0.1 * h;
  switch (chart.background.kind) {
    case "schwarzschild":
      return nearHorizon ? h + nearestLadderValue(rMetres - h) : significantDigits(rMetres, 2);
    case "de-sitter":
      return nearHorizon ? h - nearestLadderValue(h - rMetres) : significantDigits(rMetres, 2);
    default:
      return nearestLadderValue(rMetres);
  }
}

/**
 * Curves r = const inside the hole (0 < r < r_s), where r is a time: each runs from one end of the singularity to the
 * other, bowing down toward the bifurcation point. They cross the symmetry line t = 0 at evenly spaced diagram
 * heights between the horizon (T = 0) and the singularity (T = ½), so they do not bunch at either (their radii are
 * not round: they carry no label).
 */
function interiorRadiusLines(chart: DiagramChart): GridLine[] {
  const rs = chart.horizonRadiusMetres;
  if (chart.background.kind !== "schwarzschild" || rs === null) return [];
  const at = (tSeconds: number, rMetres: number) => blackHoleInteriorToDiagram(rs, tSeconds, rMetres);
  const heightAtSymmetryLine = (r: number) => at(0, r)?.T ?? 0;
  const radii = Array.from({ length: INTERIOR_RADIUS_LINES }, (_, i) => {
    const target = (0.5 * (i + 1)) / (INTERIOR_RADIUS_LINES + 1);
    return bisect((r) => heightAtSymmetryLine(r) - target, 0, rs);
  });
  const reach = (INTERIOR_TIME_REACH * rs) / c;
  return radii.map((r) => ({
    family: "radius",
    valueSI: r,
    label: "",
    points: sampleCurve((t) => at(t, r), -reach, reach, { seeds: 96 }),
    labelAt: at(0, r)!,
  }));
}

export function gridLines(chart: DiagramChart): GridLine[] {
  const { background } = chart;
  const { conformal } = background;
  const labR = background.labRadiusMetres;
  const centreAtInnerEnd = background.kind === "de-sitter";

  const radii = evenlySpread(
    RADIUS_LINES,
    (rStar) => conformal.toDiagram(0, background.radiusFromTortoiseMetres(rStar) ?? labR).X,
    chart.tortoiseRange,
    (rStar) => roundRadius(chart, background.radiusFromTortoiseMetres(rStar) ?? labR),
  ).filter((r) =>
    background.kind === "minkowski"
      ? r !== 0
      : r > (centreAtInnerEnd ? 0 : (chart.horizonRadiusMetres ?? 0)) && (background.kind !== "de-sitter" || r < chart.horizonRadiusMetres!),
  );
  const radiusLines = radii.map((r): GridLine => ({
    family: "radius",
    valueSI: r,
    label: radiusLabel(r, radiusStyle(chart, r), chart.horizonRadiusMetres),
    points: radiusCurve(chart, r),
    labelAt: conformal.toDiagram(0, r),
  }));
  return [...radiusLines, ...interiorRadiusLines(chart)];
}
