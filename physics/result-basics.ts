/**
 * The small shapes every estimator returns — a number with its unit and source, a validity flag, a kink — kept
 * apart from the whole result (physics/result.ts) so that the estimators that build the result can use them
 * without importing the result itself.
 */
import type { SourceKey } from "./estimators/sources";

/**
 * A reported number. `value` is null when the number lies outside the range of a double (then only `log10`
 * holds it); `log10` is null when the value is exactly zero.
 */
export interface Quantity {
  value: number | null;
  log10: number | null;
  unit: string;
  sourceKey: SourceKey;
}

export type Channel = "electromagnetic" | "gravitational";

export type FlagStatus = "ok" | "note" | "caution" | "invalid" | "not-applicable";

export interface ValidityFlag {
  code: string;
  status: FlagStatus;
  message: string;
  /** The dimensionless measure the status was judged on, when there is one. */
  measure?: number;
}

export interface KinkReport {
  timeSeconds: number;
  kind: "kink" | "jump";
}
