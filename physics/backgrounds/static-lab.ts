import { staticConformalMap, type NullSqueeze, type StaticChart } from "./compactify";
import type { Background, BackgroundFlag, HorizonInfo, StaticLabPosition } from "./types";

export interface StaticLabParts {
  kind: Background["kind"];
  horizon: HorizonInfo | null;
  position: StaticLabPosition;
  accelerationMetresPerSecondSquared: number;
  chart: StaticChart;
  squeezes: { p: NullSqueeze; q: NullSqueeze };
  flags: BackgroundFlag[];
}

/**
 * Assembles a Background for a lab at rest in a static chart. Local temperature by Tolman's law,
 * T_local = T_horizon / lapse (R. C. Tolman, Phys. Rev. 35, 904 (1930)); zero without a horizon.
 */
export function staticLabBackground(parts: StaticLabParts): Background {
  const { position, horizon, chart } = parts;
  return {
    kind: parts.kind,
    labProperAccelerationMetresPerSecondSquared: parts.accelerationMetresPerSecondSquared,
    labRedshiftFactor: position.lapse,
    labRedshiftDeficit: position.lapseDeficit,
    labRadiusMetres: position.rMetres,
    labProperDistanceToHorizonMetres: horizon ? position.properDistanceToHorizonMetres : null,
    horizon,
    labLocalTemperatureKelvin: horizon ? horizon.temperatureKelvin / position.lapse : 0,
    tortoiseMetres: chart.tortoiseMetres,
    radiusFromTortoiseMetres: chart.radiusFromTortoiseMetres,
    conformal: staticConformalMap(chart, parts.squeezes.p, parts.squeezes.q),
    flags: parts.flags,
  };
}
