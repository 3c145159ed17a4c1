/**
 * Formula protocol → separation history: one moving window over [0, duration], σ(t) given by a restricted mathjs
 * formula (physics/protocols/formula.ts), its velocity differenced numerically, its kinks and jumps found by
 * physics/protocols/kinks.ts.
 */
import type { ProtocolSpec } from "../scenario/schema";
import { compileProfileFormula } from "./formula";
import { detectProfileFeatures } from "./kinks";
import type { SeparationHistory } from "./types";

type FormulaProtocol = Extract<ProtocolSpec, { kind: "formula" }>;

export function formulaHistory(protocol: FormulaProtocol, distanceMetres: number): SeparationHistory {
  const profile = compileProfileFormula(protocol.expression);
  const durationSeconds = protocol.durationSeconds;
  const fraction = (u: number) => profile.fractionAt(u * durationSeconds);
  const { features, peakRate } = detectProfileFeatures(fraction);
  return {
    protocolKind: "formula",
    peakSeparationMetres: distanceMetres,
    totalDurationSeconds: durationSeconds,
    windows: [
      {
        startSeconds: 0,
        durationSeconds,
        fraction,
        rate: null,
        cacheKey: null,
        smoothness: features.length > 0 ? 0 : 2,
      },
    ],
    peakRatePerSecond: peakRate / durationSeconds,
    kinks: features.map((f) => ({ timeSeconds: f.u * durationSeconds, kind: f.kind })),
    interpolation: null,
  };
}
