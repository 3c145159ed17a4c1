/**
 * The protocol on the diagram: where on the lab's worldline the separation, hold and recombination happen, the two
 * branches as worldlines of the spacetime, the slices of constant time through the protocol's own events, and the
 * regions their radiation reaches.
 *
 * Each branch is an actual curve: the lab's worldline r* = r*_lab displaced in the tortoise coordinate by the
 * branch's offset (exaggerated, the same factor for both), r*(t) = r*_lab + Δ·σ(t), then mapped by the background's
 * conformal map. So every point lies inside the diagram's boundary (every finite (t, r*) does), the branch meets the
 * lab's worldline wherever its offset is zero, and it is timelike — steeper than 45°, both null coordinates
 * u = ct − r*, v = ct + r* increasing — because Δ is capped so that |Δ·dσ/dt| stays below c/2 between samples.
 * The Minkowski diagram is the plane through the lab along the separation axis, so a branch may sit on either side.
 * The de Sitter diagram is radial and stops at the pole r = 0: a branch of a lab there is drawn at r* = |r*_lab + Δσ|,
 * the radius it reaches whichever way it moves (both branches of a symmetric split fall on one curve there).
 *
 * The picture is centred on the protocol (drawn Killing time 0 is its middle; a time translation is a symmetry of
 * every background here), while times are labelled from the start of the separation, as in the Offsets panel. Near a horizon a protocol of many e-folding times 1/κ would crowd into i⁻ and
 * i⁺, and one much shorter than 1/κ would shrink to a point, so there the time along the branches is drawn
 * compressed or stretched until it spans a readable stretch of the worldline, and the diagram says so; Minkowski
 * needs neither (its scale L is chosen from the protocol's duration, see chart.ts).
 */
import type { DiagramPoint } from "@/physics/backgrounds";
import { branchPositions, fractionAt } from "@/physics/protocols";
import { profileHistory } from "../profile";
import { c } from "@/physics/constants";
import type { DiagramChart } from "./chart";
import { bisect, clipToConvex } from "./geometry";
import { timeCurve } from "./grid-lines";
import { labTimeLabels } from "./labels";
import { boundsOf, type DiagramBounds } from "./viewport";
import type { ScenarioDocument } from "@/physics/scenario/schema";

/**
 * Where on the lab's worldline the protocol's ends are drawn, as a fraction of the way from t = 0 to i⁺ (in T):
 * true lengths landing in TRUE_SCALE_RANGE are drawn as they are, others are rescaled to land at DRAWN_REACH.
 */
const TRUE_SCALE_RANGE: [number, number] = [0.2, 0.85];
const DRAWN_REACH = 0.6;

/** Share of the protocol's drawn length each stretch between two of its events gets at least. */
const MIN_PIECE_SHARE = 0.2;

/**
 * A piecewise-linear schedule of lab time, as the Offsets panel's axis has: each stretch between two of the protocol's
 * events (ramps, hold) is drawn at least MIN_PIECE_SHARE of the whole, so a 10 ms ramp beside a 1000 s hold is not
 * a point on the worldline (and the branch has the room to move apart while staying timelike). The branches are then
 * the worldlines of a protocol with those drawn durations; the slices' labels give the true times.
 */
export interface TimeWarp {
  /** Lab times of the events, seconds from the start of the separation, increasing, from 0 to the total. */
  events: number[];
  /** Where each is drawn, on the same scale. */
  drawnEvents: number[];
}

export type TimeScale = (
  | { kind: "true" }
  | { kind: "rescaled"; protocolEfolds: number; drawnEfolds: number; efoldSeconds: number }
) & { warp?: TimeWarp };

function timeWarp(events: number[], totalSeconds: number): TimeWarp | undefined {
  const pieces = events.slice(1).map((e, i) => (e - events[i]) / totalSeconds);
  if (pieces.every((share) => share >= MIN_PIECE_SHARE)) return undefined;
  const widened = pieces.map((share) => Math.max(share, MIN_PIECE_SHARE));
  const sum = widened.reduce((a, b) => a + b, 0);
  const drawnEvents = [0];
  for (const share of widened) drawnEvents.push(drawnEvents[drawnEvents.length - 1] + (share / sum) * totalSeconds);
  drawnEvents[drawnEvents.length - 1] = totalSeconds;
  return { events, drawnEvents };
}

/**
 * x through the piecewise-linear map taking each of `from` to the matching one of `to` (both start at 0 and end at the
 * protocol's length); unchanged before and after the protocol.
 */
function alongPieces(from: number[], to: number[], x: number): number {
  const last = from.length - 1;
  if (x <= 0 || x >= from[last]) return x;
  let i = 0;
  while (i < last - 1 && x > from[i + 1]) i++;
  const s = (x - from[i]) / (from[i + 1] - from[i]);
  return to[i] + s * (to[i + 1] - to[i]);
}

/** Lab time as drawn: through the warp inside the protocol, unchanged before and after it. */
function warpedTime(warp: TimeWarp | undefined, tauSeconds: number): number {
  return warp ? alongPieces(warp.events, warp.drawnEvents, tauSeconds) : tauSeconds;
}

/** The inverse of warpedTime: the lab time drawn at a warped instant. */
function unwarpedTime(warp: TimeWarp | undefined, drawnSeconds: number): number {
  return warp ? alongPieces(warp.drawnEvents, warp.events, drawnSeconds) : drawnSeconds;
}

/** Drawn offset of the branches at full separation, as a fraction of the diagram's larger span (before the cap by c). */
const DRAWN_OFFSET_SHARE = 0.016;
/** The branches never stray further than this many times the drawn offset from the lab's worldline (labels keep clear). */
const BRANCH_CORRIDOR_FACTOR = 1.5;

const spanOf = (bounds: DiagramBounds) => Math.max(bounds.maxT - bounds.minT, bounds.maxX - bounds.minX);

/** Largest distance (diagram units) between a drawn branch and the lab's worldline, for a diagram of these bounds. */
export function branchCorridor(bounds: DiagramBounds): number {
  return BRANCH_CORRIDOR_FACTOR * DRAWN_OFFSET_SHARE * spanOf(bounds);
}
/** |Δ·dσ/dt| at most this fraction of c between samples: the branches stay clearly timelike. */
const LIGHT_SPEED_MARGIN = 0.5;

export interface BranchSample {
  /** The lab's worldline at this instant. */
  point: DiagramPoint;
  /** Branch offsets along the separation axis as fractions of the largest one, in [−1, 1]. */
  a: number;
  b: number;
  /** Where the branches are drawn at this instant: the displaced worldlines, mapped (see the file's comment). */
  pointA: DiagramPoint;
  pointB: DiagramPoint;
}

/** A slice of constant time through one of the protocol's events, labelled in lab time from the start of the separation. */
export interface EventSlice {
  tauSeconds: number;
  label: string;
  /** Where it crosses the lab's worldline. */
  labPoint: DiagramPoint;
  points: DiagramPoint[];
}

export interface RadiationStrip {
  /** far-field: quanta radiated toward null infinity by the ramps; horizon: quanta the horizon takes while apart. */
  kind: "far-field" | "horizon";
  polygon: DiagramPoint[];
}

export interface ProtocolOnDiagram {
  timeScale: TimeScale;
  /** The protocol's length in lab proper time, seconds (drawn centred on Killing time 0). */
  totalSeconds: number;
  /** Largest distance on the diagram between a branch and the lab's worldline (diagram units); labels keep clear of it. */
  corridor: number;
  /** Start of separation, start of hold, start of recombination, end (for other protocols: each moving window's ends). */
  slices: EventSlice[];
  /** Samples along the lab's worldline from just before the separation to just after the recombination. */
  branches: BranchSample[];
  /** Where each moving window starts and ends, on the diagram (for segments: the four instants of the protocol). */
  marks: DiagramPoint[];
  strips: RadiationStrip[];
}

/** Drawn Killing time of lab proper time τ (seconds from the start of the separation): the protocol's middle is drawn at 0. */
export function drawnTime(chart: DiagramChart, scale: TimeScale, totalSeconds: number, tauSeconds: number): number {
  const killing = (warpedTime(scale.warp, tauSeconds) - totalSeconds / 2) / chart.background.labRedshiftFactor;
  return scale.kind === "true" ? killing : killing * (scale.drawnEfolds / scale.protocolEfolds);
}

/**
 * The inverse of drawnTime: the lab's proper time τ (seconds from the start of the separation) at the drawn Killing
 * time t of the lab's worldline. Where the drawing is true to scale this is dτ = √(−g_tt) dt, the static lab's
 * redshift factor; a rescaled or warped protocol is undone first, so the readout gives the lab's own clock.
 */
export function labProperTime(chart: DiagramChart, scale: TimeScale, totalSeconds: number, killingSeconds: number): number {
  const killing = scale.kind === "true" ? killingSeconds : killingSeconds * (scale.protocolEfolds / scale.drawnEfolds);
  return unwarpedTime(scale.warp, killing * chart.background.labRedshiftFactor + totalSeconds / 2);
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

/** Which way the branch sits: r* = r*_lab + offset, reflected through the centre where the chart stops at r = 0. */
function branchTortoise(chart: DiagramChart, offsetMetres: number): number {
  const rStar = chart.labTortoiseMetres + offsetMetres;
  return chart.background.kind === "de-sitter" ? Math.abs(rStar) : rStar;
}

/**
 * The tortoise offset Δ drawn for a full separation: DRAWN_OFFSET_SHARE of the diagram's span where the protocol's
 * middle crosses the lab's worldline, no more than keeps the branches timelike between samples, and scaled down
 * where the diagram stretches so that no drawn point strays past the corridor.
 */
function exaggeratedOffset(chart: DiagramChart, times: number[], fractions: { a: number; b: number }[], bounds: DiagramBounds): { offset: number; corridor: number } {
  const map = chart.background.conformal;
  const target = DRAWN_OFFSET_SHARE * spanOf(bounds);
  const h = 1e-4 * chart.nullScaleMetres;
  const from = map.toDiagramAtTortoise(0, branchTortoise(chart, 0));
  const to = map.toDiagramAtTortoise(0, branchTortoise(chart, h));
  const stretch = Math.hypot(to.T - from.T, to.X - from.X) / h;
  let offset = stretch > 0 && Number.isFinite(stretch) ? target / stretch : 0;
  for (let i = 1; i < times.length; i++) {
    const step = Math.max(Math.abs(fractions[i].a - fractions[i - 1].a), Math.abs(fractions[i].b - fractions[i - 1].b));
    if (step > 0) offset = Math.min(offset, (LIGHT_SPEED_MARGIN * c * (times[i] - times[i - 1])) / step);
  }
  const corridor = branchCorridor(bounds);
  const farthestAt = (trial: number) => {
    let farthest = 0;
    times.forEach((t, i) => {
      const lab = map.toDiagramAtTortoise(t, chart.labTortoiseMetres);
      for (const f of [fractions[i].a, fractions[i].b]) {
        const p = map.toDiagramAtTortoise(t, branchTortoise(chart, trial * f));
        farthest = Math.max(farthest, Math.hypot(p.T - lab.T, p.X - lab.X));
      }
    });
    return farthest;
  };
  // The map is not linear in the offset: scale down, with a little to spare, until the branches keep to the corridor.
  for (let i = 0, farthest = farthestAt(offset); i < 8 && farthest > corridor; i++, farthest = farthestAt(offset)) offset *= (0.95 * corridor) / farthest;
  return { offset, corridor };
}

export function protocolOnDiagram(chart: DiagramChart, document: ScenarioDocument, outline: DiagramPoint[]): ProtocolOnDiagram | null {
  const history = profileHistory(document);
  if (!history || history.windows.length === 0) return null;
  const total = history.totalDurationSeconds;
  const windows = history.windows;
  const events = [...new Set([0, ...windows.flatMap((w) => [w.startSeconds, w.startSeconds + w.durationSeconds]), total])].sort((x, y) => x - y);
  const timeScale: TimeScale = { ...timeScaleOf(chart, total), warp: timeWarp(events, total) };
  const r = chart.background.labRadiusMetres;
  const map = chart.background.conformal;
  const drawn = (tau: number) => drawnTime(chart, timeScale, total, tau);
  const at = (tau: number) => map.toDiagram(drawn(tau), r);
  const { aPerSeparation, bPerSeparation } = branchPositions(document.separation.split);
  const largest = Math.max(Math.abs(aPerSeparation), Math.abs(bPerSeparation)) || 1;

  // Dense in each moving window (where the paths bend), and even across the whole protocol (the hold is a curve too).
  const pad = 0.05 * total;
  const times = new Set<number>(Array.from({ length: 97 }, (_, i) => -pad + ((total + 2 * pad) * i) / 96));
  for (const w of history.windows) for (let i = 0; i <= 32; i++) times.add(w.startSeconds + (w.durationSeconds * i) / 32);
  // Instants a rounding error apart (a window's end computed two ways) would be one instant with two fractions.
  const taus = [...times].sort((x, y) => x - y).filter((tau, i, sorted) => i === 0 || tau - sorted[i - 1] > 1e-9 * total);
  const fractions = taus.map((tau) => {
    const fraction = tau < 0 || tau > total ? 0 : fractionAt(history, tau);
    return { a: (aPerSeparation * fraction) / largest, b: (bPerSeparation * fraction) / largest };
  });
  const drawnTimes = taus.map(drawn);
  const { offset, corridor } = exaggeratedOffset(chart, drawnTimes, fractions, boundsOf(outline));
  const branches = taus.map((tau, i): BranchSample => {
    const t = drawnTimes[i];
    const { a, b } = fractions[i];
    return {
      point: at(tau),
      a,
      b,
      pointA: map.toDiagramAtTortoise(t, branchTortoise(chart, offset * a)),
      pointB: map.toDiagramAtTortoise(t, branchTortoise(chart, offset * b)),
    };
  });

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
  const marked = [...new Set(windows.flatMap((w) => [w.startSeconds, w.startSeconds + w.durationSeconds]))];
  const labels = labTimeLabels(marked);
  return {
    timeScale,
    totalSeconds: total,
    corridor,
    slices: marked.map((tau, i) => ({ tauSeconds: tau, label: labels[i], labPoint: at(tau), points: timeCurve(chart, drawn(tau), 48) })),
    branches,
    marks: marked.map(at),
    strips: strips.filter((s) => s.polygon.length >= 3),
  };
}
