/**
 * The protocol on the diagram: where on the lab's worldline the separation, hold and recombination happen, how far
 * apart the branches are drawn there, and the regions their radiation reaches.
 *
 * The protocol is centred on t = 0. Near a horizon a protocol of many e-folding times 1/κ would crowd into i⁻ and
 * i⁺, and one much shorter than 1/κ would shrink to a point, so there the time along the branches is drawn
 * compressed or stretched until it spans a readable stretch of the worldline, and the diagram says so; Minkowski
 * needs neither (its scale L is chosen from the protocol's duration, see chart.ts).
 */
import type { DiagramPoint } from "@/physics/backgrounds";
import { branchOffsetsMetres, pathSampleTimes, segmentTimes, separationFraction, type SegmentsProtocol, type SegmentTimes } from "../timeline";
import type { DiagramChart } from "./chart";
import { bisect, clipToConvex } from "./geometry";
import type { ScenarioDocument } from "@/physics/scenario/schema";

/**
 * Where on the lab's worldline the protocol's ends are drawn, as a fraction of the way from t = 0 to i⁺ (in T):
 * true lengths landing in TRUE_SCALE_RANGE are drawn as they are, others are rescaled to land at DRAWN_REACH.
 */
const TRUE_SCALE_RANGE: [number, number] = [0.2, 0.85];
const DRAWN_REACH = 0.6;

export type TimeScale =
  | { kind: "true" }
  | { kind: "rescaled"; protocolEfolds: number; drawnEfolds: number; efoldSeconds: number };

export interface BranchSample {
  point: DiagramPoint;
  /** Branch offsets along the separation axis as fractions of the largest one, in [−1, 1]. */
  a: number;
  b: number;
}

export interface RadiationStrip {
  /** far-field: quanta radiated toward null infinity by the ramps; horizon: quanta the horizon takes while apart. */
  kind: "far-field" | "horizon";
  polygon: DiagramPoint[];
}

export interface ProtocolOnDiagram {
  timeScale: TimeScale;
  /** Samples along the lab's worldline from just before the separation to just after the recombination. */
  branches: BranchSample[];
  /** The instants of the protocol on the diagram (start of separation, end of separation, end of hold, end of recombination). */
  marks: DiagramPoint[];
  strips: RadiationStrip[];
}

/** Drawn Killing time of lab proper time τ (seconds from the start of the separation). */
function drawnTime(chart: DiagramChart, scale: TimeScale, totalSeconds: number, tauSeconds: number): number {
  const killing = (tauSeconds - totalSeconds / 2) / chart.background.labRedshiftFactor;
  return scale.kind === "true" ? killing : killing * (scale.drawnEfolds / scale.protocolEfolds);
}

function timeScaleOf(chart: DiagramChart, totalSeconds: number): TimeScale {
  const { background } = chart;
  const horizon = background.horizon;
  if (!horizon || totalSeconds <= 0) return { kind: "true" };
  const T = (t: number) => background.conformal.toDiagram(t, background.labRadiusMetres).T;
  const latest = chart.timeRange[1];
  const reachOf = (t: number) => (T(t) - T(0)) / (T(latest) - T(0));
  const trueHalf = totalSeconds / 2 / background.labRedshiftFactor;
  const reach = trueHalf >= latest ? 1 : reachOf(trueHalf);
  if (reach >= TRUE_SCALE_RANGE[0] && reach <= TRUE_SCALE_RANGE[1]) return { kind: "true" };
  const drawnHalf = bisect((t) => reachOf(t) - DRAWN_REACH, 0, latest);
  const efoldSeconds = 1 / horizon.surfaceGravityPerSecond;
  return { kind: "rescaled", protocolEfolds: (2 * trueHalf) / efoldSeconds, drawnEfolds: (2 * drawnHalf) / efoldSeconds, efoldSeconds };
}

/** Which way radiation that the horizon takes leaves the lab: inward to a black-hole or Rindler horizon, outward in de Sitter. */
function horizonDirection(chart: DiagramChart): "outgoing" | "ingoing" | null {
  switch (chart.background.kind) {
    case "minkowski":
      return null;
    case "de-sitter":
      return "outgoing";
    default:
      return "ingoing";
  }
}

/** A strip between the null rays leaving the lab's worldline over [from, to], clipped to the diagram. */
function strip(
  chart: DiagramChart,
  at: (tau: number) => DiagramPoint,
  from: number,
  to: number,
  direction: "outgoing" | "ingoing",
  outline: DiagramPoint[],
): DiagramPoint[] {
  const along = Array.from({ length: 33 }, (_, i) => at(from + ((to - from) * i) / 32));
  // Outgoing light keeps u = ct − r*, so T − X is constant: up and to the right at 45°; ingoing keeps T + X.
  const reach = 4;
  const dX = direction === "outgoing" ? reach : -reach;
  const far = [...along].reverse().map((p) => ({ T: p.T + reach, X: p.X + dX }));
  return clipToConvex([...along, ...far], outline);
}

export function protocolOnDiagram(chart: DiagramChart, document: ScenarioDocument, outline: DiagramPoint[]): ProtocolOnDiagram | null {
  if (document.protocol.kind !== "segments") return null;
  const protocol: SegmentsProtocol = document.protocol;
  const times: SegmentTimes = segmentTimes(protocol);
  const total = times.recombinationEnd;
  const timeScale = timeScaleOf(chart, total);
  const r = chart.background.labRadiusMetres;
  const at = (tau: number) => chart.background.conformal.toDiagram(drawnTime(chart, timeScale, total, tau), r);

  const pad = 0.05 * total;
  const largest = Math.max(...Object.values(branchOffsetsMetres({ ...document.separation, distanceMetres: 1 }, 1)).map(Math.abs));
  // The ramps' own samples, plus even ones across the whole protocol: on the diagram the hold is a curve too.
  const even = Array.from({ length: 97 }, (_, i) => -pad + ((total + 2 * pad) * i) / 96);
  const samples = [...new Set([...pathSampleTimes(times, -pad, total + pad, 32), ...even])].sort((x, y) => x - y);
  const branches = samples.map((tau) => {
    const offsets = branchOffsetsMetres({ ...document.separation, distanceMetres: 1 }, separationFraction(protocol, times, tau));
    return { point: at(tau), a: offsets.a / largest, b: offsets.b / largest };
  });

  const strips: RadiationStrip[] = [
    { kind: "far-field", polygon: strip(chart, at, times.separationStart, times.separationEnd, "outgoing", outline) },
    { kind: "far-field", polygon: strip(chart, at, times.holdEnd, times.recombinationEnd, "outgoing", outline) },
  ];
  const toHorizon = horizonDirection(chart);
  if (toHorizon === "ingoing") strips.push({ kind: "horizon", polygon: strip(chart, at, times.separationStart, times.recombinationEnd, "ingoing", outline) });
  if (toHorizon === "outgoing" && times.holdEnd > times.separationEnd) {
    strips.push({ kind: "horizon", polygon: strip(chart, at, times.separationEnd, times.holdEnd, "outgoing", outline) });
  }
  return {
    timeScale,
    branches,
    marks: [times.separationStart, times.separationEnd, times.holdEnd, times.recombinationEnd].map(at),
    strips: strips.filter((s) => s.polygon.length >= 3),
  };
}
