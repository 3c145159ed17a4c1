"use client";

import { superscript } from "@/physics/superscript";
import { CartesianGrid, Legend, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";

export interface RatioPlotPoint {
  heightOverM: number;
  radial: number;
  tangential: number;
}

const powerOfTen = (v: number) => `10${superscript(Math.round(Math.log10(v)))}`;

function decades(values: number[]): number[] {
  const lo = Math.floor(Math.log10(Math.min(...values)));
  const hi = Math.ceil(Math.log10(Math.max(...values)));
  return Array.from({ length: hi - lo + 1 }, (_, i) => 10 ** (lo + i));
}

/** Exact horizon rate over the published far-zone estimate, against the lab's height above the horizon (log–log). */
export function RatioPlot({ points }: { points: RatioPlotPoint[] }) {
  const yTicks = decades(points.flatMap((p) => [p.radial, p.tangential])).filter((_, i, all) => all.length < 8 || i % 2 === 0);
  return (
    <figure className="my-6">
      <div className="h-80 w-full">
        <ResponsiveContainer>
          <LineChart data={points} margin={{ top: 10, right: 20, bottom: 30, left: 30 }}>
            <CartesianGrid stroke="#d9d6cf" strokeDasharray="2 4" />
            <XAxis
              dataKey="heightOverM"
              type="number"
              scale="log"
              domain={["dataMin", "dataMax"]}
              ticks={[1e-6, 1e-4, 1e-2, 1, 1e2, 1e4]}
              tickFormatter={powerOfTen}
              label={{ value: "b/M − 2   (M = GM/c²)", position: "bottom", offset: 10 }}
              stroke="#1c2024"
            />
            <YAxis
              type="number"
              scale="log"
              domain={[yTicks[0], yTicks[yTicks.length - 1]]}
              ticks={yTicks}
              tickFormatter={powerOfTen}
              label={{ value: "exact ÷ estimate", angle: -90, position: "insideLeft", offset: -15 }}
              stroke="#1c2024"
            />
            <Tooltip formatter={(v) => Number(v).toPrecision(4)} labelFormatter={(v) => `b/M − 2 = ${Number(v).toPrecision(3)}`} />
            <Legend verticalAlign="top" iconType="plainline" />
            <Line dataKey="radial" name="radial separation" stroke="#E69F00" strokeWidth={2} dot={false} isAnimationActive={false} />
            <Line dataKey="tangential" name="tangential separation" stroke="#0072B2" strokeWidth={2} strokeDasharray="6 4" dot={false} isAnimationActive={false} />
          </LineChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="mt-2 text-sm text-ink-soft">
        The ratio tends to a constant far from the hole (the far-zone law holds there with a definite coefficient) and
        grows near the horizon, where the lab&apos;s acceleration diverges and the Rindler limit takes over.
      </figcaption>
    </figure>
  );
}
