/**
 * The background of a document prepared for drawing: the physics Background (its conformal map), and the ranges of
 * tortoise coordinate and time over which curves are sampled so that they reach the corners of the diagram.
 */
import { c } from "@/physics/constants";
import { BackgroundInputError, deSitterDiagramRatePerSecond, makeBackground, type Background } from "@/physics/backgrounds";
import { protocolDurationSeconds as protocolLengthSeconds } from "@/physics/scenario/ranges";
import type { ScenarioDocument, SchemaIssue } from "@/physics/scenario/schema";
import { ladderStepAtLeast } from "../round-numbers";

export interface DiagramChart {
  background: Background;
  /** Length over which the diagram's squeeze changes by order one: L for Minkowski, c/κ with a horizon, c/k of the de Sitter frame (metres). */
  nullScaleMetres: number;
  /** Tortoise coordinates of the lab's static region to sample, metres (cut where the diagram has converged). */
  tortoiseRange: [number, number];
  /** Killing times to sample static worldlines over, seconds. */
  timeRange: [number, number];
  labTortoiseMetres: number;
  /** Radius of the horizon in the static radial coordinate, metres; null without one. */
  horizonRadiusMetres: number | null;
}

/** How many null scales the sampled ranges reach: the diagram's squeeze is within 1e-12 of its limit beyond ~28. */
const REACH = 32;

/** The whole protocol's length in seconds of lab time, whatever its kind (the one reading in physics/scenario/ranges). */
export function protocolDurationSeconds(document: ScenarioDocument): number {
  return protocolLengthSeconds(document.protocol);
}

/**
 * Near a horizon r approaches the horizon radius exponentially in r*, and a few tens of null scales in, r − r_h is
 * below a double's resolution (r rounds to the horizon and the map gives NaN). Pull the end of the range toward the
 * lab until the map gives a point again.
 */
function representableEnd(background: Background, labTortoiseMetres: number, end: number): number {
  let candidate = end;
  for (let i = 0; i < 200; i++) {
    const r = background.radiusFromTortoiseMetres(candidate);
    const p = r === null ? null : background.conformal.toDiagram(0, r);
    if (p && Number.isFinite(p.T) && Number.isFinite(p.X) && r !== background.horizon?.radiusMetres) return candidate;
    candidate = labTortoiseMetres + 0.9 * (candidate - labTortoiseMetres);
  }
  return labTortoiseMetres;
}

/**
 * The Minkowski diagram's length L over c: a quarter of the protocol's duration rounded up to a 1–2–5 value, so the
 * protocol, centred on the middle, spans about half the lab's worldline (ct/L ≈ ±1 at its ends). Round, so that the
 * diagram (and its grid) only rescales when the protocol's length changes a lot.
 */
export function minkowskiScaleSeconds(durationSeconds: number): number {
  return durationSeconds > 0 ? ladderStepAtLeast(durationSeconds / 4) : 1;
}

export type ChartOutcome = { ok: true; chart: DiagramChart } | { ok: false; issue: SchemaIssue };

/**
 * The chart of `document`. Minkowski has no scale of its own: its diagram length L is set from the protocol's
 * duration (minkowskiScaleSeconds), so the protocol spans a readable part of the diagram.
 */
export function makeDiagramChart(document: ScenarioDocument): ChartOutcome {
  const duration = protocolDurationSeconds(document);
  const minkowskiScale = c * minkowskiScaleSeconds(duration);
  let background: Background;
  try {
    background = makeBackground(document.background, document.lab, {
      minkowskiDiagramScaleMetres: minkowskiScale,
      // The lab's worldline through the middle of the exterior, whatever its radius (schwarzschild.ts).
      schwarzschildDiagramFrame: "lab-centred",
      // The same for the lab in the de Sitter static patch (de-sitter.ts).
      deSitterDiagramFrame: "lab-centred",
    });
  } catch (error) {
    if (error instanceof BackgroundInputError) return { ok: false, issue: { path: error.path, message: error.message } };
    throw error;
  }
  const labTortoiseMetres = background.tortoiseMetres(background.labRadiusMetres);
  // The length over which the diagram's squeeze converges: c/κ, or in de Sitter the lab-centred frame's own scale.
  const scale =
    background.kind === "de-sitter" && background.horizon
      ? c / deSitterDiagramRatePerSecond(background.horizon.surfaceGravityPerSecond, labTortoiseMetres, "lab-centred")
      : background.horizon
        ? c / background.horizon.surfaceGravityPerSecond
        : minkowskiScale;
  const reach = REACH * scale;
  // The arctan squeeze of Minkowski converges slowly (as 1/x), so its ranges reach further.
  const stretch = background.kind === "minkowski" ? 40 : 1;
  // The de Sitter chart stops at the centre r = 0; the Minkowski one is the whole line through the lab (x of either sign).
  const lowest = background.kind === "de-sitter" ? 0 : background.kind === "minkowski" ? -reach * stretch : Math.min(-reach, labTortoiseMetres - reach);
  const tortoiseRange: [number, number] = [
    representableEnd(background, labTortoiseMetres, lowest),
    representableEnd(background, labTortoiseMetres, Math.max(reach, labTortoiseMetres + reach) * stretch),
  ];
  const timeReach = ((reach + Math.abs(labTortoiseMetres)) / c) * stretch;
  return {
    ok: true,
    chart: {
      background,
      nullScaleMetres: scale,
      tortoiseRange,
      timeRange: [-timeReach, timeReach],
      labTortoiseMetres,
      horizonRadiusMetres: background.horizon?.radiusMetres ?? null,
    },
  };
}
