"use client";

/**
 * The Sweep's chart for a scenario with an environment: ⟨N⟩ of every channel (the body's own fields, each
 * environmental channel) and the total against the swept parameter, on log–log axes, one curve each in its own
 * colour and dash, named in the legend under the chart (canvas/kernels/sweep-channels.ts). The hover readout above
 * the plot gives the total and the dominant channel at the point. Clicking a point sets the scenario to it.
 */
import { memo, useMemo } from "react";
import { Line } from "recharts";
import type { SweepParameter } from "@/canvas/compute-client";
import { compactNumber } from "@/canvas/kernels/diagram/labels";
import type { SweepCurve } from "@/canvas/kernels/sweep-channels";
import { formatQuantity } from "@/physics/units";
import { dimensionOf, logAxis, MinorTicks, NowMarker, PARAMETER_WORDS, SweepChartFrame, sweepYAxis } from "./SweepChart";

function Swatch({ curve }: { curve: SweepCurve }) {
  return (
    <svg width="28" height="8" aria-hidden="true" className="shrink-0">
      <line x1="0" x2="28" y1="4" y2="4" stroke={curve.colour} strokeWidth={curve.width} strokeDasharray={curve.dash.join(" ") || undefined} />
    </svg>
  );
}

export const SweepChannelsChart = memo(function SweepChannelsChart({
  xs,
  curves,
  parameter,
  readOnly,
  onPick,
}: {
  xs: number[];
  curves: SweepCurve[];
  parameter: SweepParameter;
  readOnly: boolean;
  onPick(x: number): void;
}) {
  const dimension = dimensionOf(parameter);
  const data = useMemo(() => xs.map((x, i) => Object.fromEntries([["x", x], ...curves.map((c) => [c.key, c.values[i]])]) as { x: number }), [xs, curves]);
  const xAxis = useMemo(() => logAxis(xs, dimension), [xs, dimension]);
  const yAxis = useMemo(() => logAxis(curves.flatMap((c) => c.values.filter((v): v is number => v !== null)), "number"), [curves]);
  if (!xAxis || !yAxis) return null;
  const readout = (i: number) => {
    const channels = curves.filter((c) => c.key !== "total");
    const dominant = channels.reduce<SweepCurve | null>((best, c) => ((c.values[i] ?? 0) > (best?.values[i] ?? 0) ? c : best), null);
    const total = curves.find((c) => c.key === "total")?.values[i];
    return `${PARAMETER_WORDS[parameter]} ${formatQuantity(xs[i], dimension)}   total ⟨N⟩ = ${total == null ? "0" : compactNumber(total, 3)}${dominant ? `, dominant: ${dominant.words}` : ""}`;
  };
  return (
    <div className="flex h-full w-full flex-col">
      <SweepChartFrame data={data} xAxis={xAxis} parameter={parameter} readOnly={readOnly} readout={readout} onPick={onPick}>
        {sweepYAxis(yAxis, "quanta ⟨N⟩")}
        {curves.map((c) => (
          <Line key={c.key} dataKey={c.key} name={c.words} stroke={c.colour} strokeWidth={c.width} strokeDasharray={c.dash.join(" ") || undefined} dot={false} isAnimationActive={false} connectNulls={false} />
        ))}
        <MinorTicks x={xAxis.ticks.minor} y={yAxis.ticks.minor} />
        <NowMarker parameter={parameter} from={xs[0]} to={xs[xs.length - 1]} />
      </SweepChartFrame>
      <ul className="mt-1 flex shrink-0 flex-wrap gap-x-4 gap-y-0.5 text-xs text-ink-soft" aria-label="Curves" data-testid="sweep-legend">
        {curves.map((c) => (
          <li key={c.key} className="flex items-center gap-1.5">
            <Swatch curve={c} />
            ⟨N⟩, {c.words}
          </li>
        ))}
      </ul>
    </div>
  );
});
