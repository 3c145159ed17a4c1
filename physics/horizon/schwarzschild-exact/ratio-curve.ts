/**
 * Data for the methods-page plot: exact hold rate divided by the published far-zone estimate, versus b/M.
 *
 * Both scale as q²d² and depend on the mass only through b/M (M = GM/c²), so the ratio is a function of b/M alone;
 * it is read off schwarzschildHorizonRate for a reference hole. Far away it tends to 2/(3π²) ≈ 0.0675 (radial) and
 * 1/(6π²) ≈ 0.0169 (tangential); near the horizon it grows as (b/M − 2)^{−3/2}.
 */
import { solarMass } from "../../constants";
import { massLengthMetres } from "./geometrized-units";
import { schwarzschildHorizonRate } from "./horizon-rate";
import type { MemoryAxis } from "./multipoles";

export interface RatioPoint {
  bOverM: number;
  radial: number;
  tangential: number;
}

/** Exact rate / published estimate (coefficient 1) at each b/M > 2, for radial and tangential separations. */
export function ratioCurve(bOverMValues: readonly number[]): RatioPoint[] {
  const massKg = solarMass.value;
  const m = massLengthMetres(massKg);
  const ratio = (bOverM: number, axis: MemoryAxis): number =>
    schwarzschildHorizonRate({
      massKg,
      labArealRadiusMetres: bOverM * m,
      chargeCoulombs: 1,
      separationMetres: 1,
      axis,
      multipoleCheck: "never",
    }).ratioToFarZoneEstimate;
  return bOverMValues.map((bOverM) => {
    if (!(bOverM > 2)) throw new RangeError("b/M must exceed 2");
    return { bOverM, radial: ratio(bOverM, "radial"), tangential: ratio(bOverM, "tangential") };
  });
}
