"use client";

/**
 * The Sweep's chart for a scenario with an environment: ⟨N⟩ of every channel (the body's own fields, each
 * environmental channel) and the total against the swept parameter, on log–log axes, one curve each in its own
 * colour and dash, named in the legend under the chart (canvas/kernels/sweep-channels.ts). The hover readout above
 * the plot gives the total and the dominant channel at the point. Clicking a point sets the scenario to it.
 */
import { memo, useMemo, useState } from "react";
import { CartesianGrid, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import type { SweepParameter } from "@/canvas/compute-client";
import { axisTitle } from "@/canvas/kernels/diagram/axis-scale";
import { compactNumber } from "@/canvas/kernels/diagram/labels";
import type { SweepCurve } from "@/canvas/kernels/sweep-channels";
import { formatQuantity } from "@/physics/units";
import { AXIS_COLOUR, dimensionOf, logAxis, logAxisProps, MinorTicks, NowMarker, PARAMETER_WORDS, TICK_FONT_PX } from "./SweepChart";

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
  const [hovered, setHovered] = useState<number | null>(null);
  const data = useMemo(() => xs.map((x, i) => Object.fromEntries([["x", x], ...curves.map((c) => [c.key, c.values[i]])])), [xs, curves]);
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
      <p className="h-5 shrink-0 truncate text-right font-mono text-xs text-ink-soft" data-testid="sweep-readout" aria-live="polite">
        {hovered !== null ? readout(hovered) : ""}
      </p>
      <div className="min-h-0 flex-1">
        <ResponsiveContainer width="100%" height="100%">
          <LineChart
            data={data}
            margin={{ top: 14, right: 24, bottom: 30, left: 14 }}
            onMouseMove={(state) => {
              const index = Number(state?.activeIndex);
              setHovered(Number.isInteger(index) && index < xs.length ? index : null);
            }}
            onMouseLeave={() => setHovered(null)}
            onClick={(state) => {
              const index = Number(state?.activeIndex);
              if (!readOnly && Number.isInteger(index) && index < xs.length) onPick(xs[index]);
            }}
            style={{ cursor: readOnly ? "default" : "pointer" }}
          >
            <CartesianGrid stroke="#d9d6cf" strokeDasharray="2 4" />
            <XAxis dataKey="x" {...logAxisProps(xAxis)} label={{ value: axisTitle(PARAMETER_WORDS[parameter], xAxis.unit), position: "insideBottom", offset: -20, fontSize: TICK_FONT_PX, fill: AXIS_COLOUR }} />
            <YAxis
              {...logAxisProps(yAxis)}
              width={64}
              label={{ value: "quanta ⟨N⟩", angle: -90, position: "insideLeft", offset: 4, fontSize: TICK_FONT_PX, fill: AXIS_COLOUR, style: { textAnchor: "middle" } }}
            />
            <Tooltip content={() => null} cursor={{ stroke: AXIS_COLOUR, strokeDasharray: "3 3" }} isAnimationActive={false} />
            {curves.map((c) => (
              <Line key={c.key} dataKey={c.key} name={c.words} stroke={c.colour} strokeWidth={c.width} strokeDasharray={c.dash.join(" ") || undefined} dot={false} isAnimationActive={false} connectNulls={false} />
            ))}
            <MinorTicks x={xAxis.ticks.minor} y={yAxis.ticks.minor} />
            <NowMarker parameter={parameter} from={xs[0]} to={xs[xs.length - 1]} />
          </LineChart>
        </ResponsiveContainer>
      </div>
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
