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
import { branchPositions, fractionAt } from "@/physics/protocols";
import { profileHistory } from "../profile";
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
  /** Where each moving window starts and ends, on the diagram (for segments: the four instants of the protocol). */
  marks: DiagramPoint[];
  strips: RadiationStrip[];
}

/** Drawn Killing time of lab proper time τ (seconds from the start of the separation), centred on t = 0. */
export function drawnTime(chart: DiagramChart, scale: TimeScale, totalSeconds: number, tauSeconds: number): number {
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
  const history = profileHistory(document);
  if (!history || history.windows.length === 0) return null;
  const total = history.totalDurationSeconds;
  const timeScale = timeScaleOf(chart, total);
  const r = chart.background.labRadiusMetres;
  const at = (tau: number) => chart.background.conformal.toDiagram(drawnTime(chart, timeScale, total, tau), r);
  const { aPerSeparation, bPerSeparation } = branchPositions(document.separation.split);
  const largest = Math.max(Math.abs(aPerSeparation), Math.abs(bPerSeparation));

  // Dense in each moving window (where the paths bend), and even across the whole protocol (the hold is a curve too).
  const pad = 0.05 * total;
  const times = new Set<number>(Array.from({ length: 97 }, (_, i) => -pad + ((total + 2 * pad) * i) / 96));
  for (const w of history.windows) for (let i = 0; i <= 32; i++) times.add(w.startSeconds + (w.durationSeconds * i) / 32);
  const branches = [...times]
    .sort((x, y) => x - y)
    .map((tau) => {
      const fraction = tau < 0 || tau > total ? 0 : fractionAt(history, tau);
      return { point: at(tau), a: (aPerSeparation * fraction) / largest, b: (bPerSeparation * fraction) / largest };
    });

  const windows = history.windows;
  const strips: RadiationStrip[] = windows.map((w) => ({
    kind: "far-field" as const,
    polygon: strip(at, w.startSeconds, w.startSeconds + w.durationSeconds, "outgoing", outline),
  }));
  const firstMove = windows[0].startSeconds;
  const lastWindow = windows[windows.length - 1];
  const lastMove = lastWindow.startSeconds + lastWindow.durationSeconds;
  const toHorizon = horizonDirection(chart);
  if (toHorizon === "ingoing") strips.push({ kind: "horizon", polygon: strip(at, firstMove, lastMove, "ingoing", outline) });
  if (toHorizon === "outgoing") {
    // Outward, the horizon's share leaves between the moving windows, while the branches are held apart.
    windows.slice(1).forEach((w, i) => {
      const heldFrom = windows[i].startSeconds + windows[i].durationSeconds;
      if (w.startSeconds > heldFrom && windows[i].fraction(1) > 0) {
        strips.push({ kind: "horizon", polygon: strip(at, heldFrom, w.startSeconds, "outgoing", outline) });
      }
    });
  }
  return {
    timeScale,
    branches,
    marks: [...new Set(windows.flatMap((w) => [w.startSeconds, w.startSeconds + w.durationSeconds]))].map(at),
    strips: strips.filter((s) => s.polygon.length >= 3),
  };
}
