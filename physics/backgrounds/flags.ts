import type { BackgroundFlag } from "./types";
import { formatNumber } from "../units";

/** Below this 1 − (horizon term), a static lab's radius keeps fewer than about four significant digits beyond the horizon radius. */
export const NEAR_HORIZON_LAPSE_SQUARED_LIMIT = 1e-12;

/** The caution for a lab whose squared lapse is below NEAR_HORIZON_LAPSE_SQUARED_LIMIT, or null. `lapseSquaredFormula` names it. */
export function nearHorizonPrecisionFlag(lapse: number, lapseSquaredFormula: string): BackgroundFlag | null {
  const lapseSquared = lapse * lapse;
  if (lapseSquared >= NEAR_HORIZON_LAPSE_SQUARED_LIMIT) return null;
  return {
    code: "lab-too-close-to-horizon-for-double",
    severity: "caution",
    message:
      `the lab is so close to the horizon (${lapseSquaredFormula} = ${formatNumber(lapseSquared)}) that its radius ` +
      "is barely distinguishable from the horizon radius in double precision; results derived from r lose digits",
  };
}
