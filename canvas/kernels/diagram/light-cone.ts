/**
 * The light cone at a point of the diagram, from the background's own maps: step along outgoing light
 * (u = ct − r* fixed) and ingoing light (v = ct + r* fixed) in static coordinates and map the steps back to the
 * diagram. A conformal diagram puts both at 45°; computing them, rather than assuming it, is what shows it.
 */
import type { Background, DiagramPoint } from "@/physics/backgrounds";
import { c } from "@/physics/constants";

export interface LightCone {
  at: DiagramPoint;
  /** Unit directions on the diagram (T up, X across) of future-pointing outgoing and ingoing light. */
  outgoing: DiagramPoint;
  ingoing: DiagramPoint;
  /** The static coordinates of the point, when it lies in the lab's static region (else the cone is the diagram's ±45°). */
  coordinates: { tSeconds: number; rMetres: number } | null;
}

const unit = (d: DiagramPoint): DiagramPoint => {
  const n = Math.hypot(d.T, d.X);
  return { T: d.T / n, X: d.X / n };
};

const DIAGONAL_OUT: DiagramPoint = { T: Math.SQRT1_2, X: Math.SQRT1_2 };
const DIAGONAL_IN: DiagramPoint = { T: Math.SQRT1_2, X: -Math.SQRT1_2 };

/** Displacements on the diagram smaller than this are lost in rounding; a step must move the point further. */
const MEASURABLE_STEP = 1e-6;

/**
 * `scaleMetres`: the diagram's null scale (chart.nullScaleMetres). Each null step starts at 1e-9 of it and
 * doubles until the point measurably moves: near the corners the squeeze is so flat that small steps are lost.
 */
export function lightConeAt(background: Background, at: DiagramPoint, scaleMetres: number): LightCone {
  const coordinates = background.conformal.fromDiagram(at);
  if (!coordinates) return { at, outgoing: DIAGONAL_OUT, ingoing: DIAGONAL_IN, coordinates: null };
  const { tSeconds, rMetres } = coordinates;
  const rStar = background.tortoiseMetres(rMetres);
  const from = background.conformal.toDiagram(tSeconds, rMetres);
  const direction = (sign: 1 | -1): DiagramPoint | null => {
    for (let stepMetres = scaleMetres * 1e-9; stepMetres <= scaleMetres * 10; stepMetres *= 2) {
      const r = background.radiusFromTortoiseMetres(rStar + sign * stepMetres);
      if (r === null) return null;
      const to = background.conformal.toDiagram(tSeconds + stepMetres / c, r);
      const d = { T: to.T - from.T, X: to.X - from.X };
      if (Number.isFinite(d.T) && Number.isFinite(d.X) && Math.hypot(d.T, d.X) > MEASURABLE_STEP) return unit(d);
    }
    return null;
  };
  return { at, outgoing: direction(1) ?? DIAGONAL_OUT, ingoing: direction(-1) ?? DIAGONAL_IN, coordinates };
}
