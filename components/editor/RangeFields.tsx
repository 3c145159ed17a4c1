"use client";

import type { ReactNode } from "react";
import { formatQuantity, type QuantityDimension } from "@/physics/units";
import { FlagIcon } from "./FlagIcon";
import { QuantityField } from "./QuantityField";

export interface ParameterRange {
  /** SI. */
  from: number;
  to: number;
}

/**
 * The two ends of a parameter's range, typed with their units (the Sweep's range and each axis of the Map): the start
 * positive and below the end, the end above the start; anything else is refused with the reason beside the field.
 */
export function RangeFields({ range, dimension, labels, onChange }: { range: ParameterRange; dimension: QuantityDimension; labels: [string, string]; onChange(range: ParameterRange): void }) {
  return (
    <>
      <div className="w-32">
        <QuantityField compact label={labels[0]} dimension={dimension} shown={formatQuantity(range.from, dimension)} onCommit={(v) => {
          if (!(v > 0) || v >= range.to) return { ok: false, message: "must be positive and below the end of the range" };
          onChange({ ...range, from: v });
          return { ok: true };
        }} />
      </div>
      <div className="w-32">
        <QuantityField compact label={labels[1]} dimension={dimension} shown={formatQuantity(range.to, dimension)} onCommit={(v) => {
          if (!(v > range.from)) return { ok: false, message: "must be above the start of the range" };
          onChange({ ...range, to: v });
          return { ok: true };
        }} />
      </div>
    </>
  );
}

/** A sweep's chart and what goes under it, dimmed with a caution when it was computed for an earlier version. */
export function SweepResultBox({ stale, children }: { stale: boolean; children: ReactNode }) {
  return (
    <div className={stale ? "opacity-60" : undefined}>
      {stale && (
        <p className="mt-2 flex items-start gap-1.5 text-xs text-caution">
          <FlagIcon kind="caution" /> Computed for an earlier version of the scenario: run the sweep again.
        </p>
      )}
      {children}
    </div>
  );
}
