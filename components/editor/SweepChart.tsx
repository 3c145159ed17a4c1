"use client";

/**
 * The Sweep's log–log chart of decoherence against the swept parameter. Drawn again only when the sweep, the
 * parameter or the read-only state changes: the "now" marker reads the scenario's current value from the store
 * itself, so a drag in the Lab view moves one SVG line, not the whole chart.
 */
import { memo } from "react";
import { CartesianGrid, Line, LineChart, ReferenceDot, ResponsiveContainer, Tooltip, XAxis, YAxis, usePlotArea, useXAxisScale } from "recharts";
import type { SweepParameter } from "@/canvas/compute-client";
import { useEditor } from "@/canvas/EditorProvider";
import { compactNumber, compactQuantity } from "@/canvas/kernels/diagram/labels";
import { memoizeLast } from "@/canvas/kernels/memoize";
import { currentSweepValue, labDistanceMetres } from "@/canvas/kernels/sweep-range";
import type { ScenarioDocument } from "@/physics/scenario/schema";
import { formatQuantity } from "@/physics/units";

export interface SweepPoint {
  x: number;
  decoherence: number;
}

export const PARAMETER_WORDS: Record<SweepParameter, string> = {
  "recombination-time": "recombination time",
  "hold-time": "hold time",
  "lab-distance": "lab distance",
};

export const dimensionOf = (parameter: SweepParameter) => (parameter === "lab-distance" ? "length" : "time");

const NOW_COLOUR = "#E69F00";

/** The lab's distance builds a background: remembered for the last background and lab, read on every store change. */
const rememberedLabDistance = memoizeLast(labDistanceMetres);

function sweptValueNow(document: ScenarioDocument, parameter: SweepParameter): number | null {
  return parameter === "lab-distance" ? rememberedLabDistance(document.background, document.lab) : currentSweepValue(document, parameter);
}

/** A vertical rule at the scenario's current value of the swept parameter, where it falls inside the sweep. */
function NowMarker({ parameter, from, to }: { parameter: SweepParameter; from: number; to: number }) {
  const current = useEditor((s) => sweptValueNow(s.document, parameter));
  const scale = useXAxisScale();
  const plot = usePlotArea();
  if (current === null || !(current >= from && current <= to) || !scale || !plot) return null;
  const x = scale(current);
  if (typeof x !== "number" || !Number.isFinite(x)) return null;
  return (
    <g data-testid="sweep-now" data-value={current}>
      <line x1={x} x2={x} y1={plot.y} y2={plot.y + plot.height} stroke={NOW_COLOUR} strokeWidth={2} />
      <text x={x} y={plot.y - 2} textAnchor="middle" fontSize={11} fill="#5b6168">
        now
      </text>
    </g>
  );
}

export const SweepChart = memo(function SweepChart({
  data,
  best,
  parameter,
  readOnly,
  onPick,
}: {
  data: SweepPoint[];
  /** The point of smallest decoherence, marked. */
  best: SweepPoint | null;
  parameter: SweepParameter;
  readOnly: boolean;
  /** A point of the sweep was clicked: its parameter value, SI. */
  onPick(x: number): void;
}) {
  const dimension = dimensionOf(parameter);
  return (
    <ResponsiveContainer width="100%" height="100%">
      <LineChart
        data={data}
        margin={{ top: 10, right: 20, bottom: 24, left: 10 }}
        onClick={(state) => {
          const index = Number(state?.activeIndex);
          if (!readOnly && Number.isInteger(index) && data[index]) onPick(data[index].x);
        }}
        style={{ cursor: readOnly ? "default" : "pointer" }}
      >
        <CartesianGrid stroke="#d9d6cf" strokeDasharray="2 4" />
        <XAxis
          dataKey="x"
          type="number"
          scale="log"
          domain={["dataMin", "dataMax"]}
          tickFormatter={(v: number) => compactQuantity(v, dimension)}
          tick={{ fontSize: 11 }}
          label={{ value: PARAMETER_WORDS[parameter], position: "insideBottom", offset: -14, fontSize: 11 }}
        />
        <YAxis dataKey="decoherence" type="number" scale="log" domain={["auto", "auto"]} tickFormatter={(v: number) => compactNumber(v)} tick={{ fontSize: 11 }} width={72} label={{ value: "𝒟", angle: -90, position: "insideLeft", fontSize: 12 }} />
        <Tooltip
          formatter={(v) => [compactNumber(Number(v), 3), "decoherence 𝒟"]}
          labelFormatter={(x) => `${PARAMETER_WORDS[parameter]} ${formatQuantity(Number(x), dimension)}`}
        />
        <Line dataKey="decoherence" stroke="#0072B2" strokeWidth={2} dot={{ r: 2 }} isAnimationActive={false} />
        {data.length > 0 && <NowMarker parameter={parameter} from={data[0].x} to={data[data.length - 1].x} />}
        {best && <ReferenceDot x={best.x} y={best.decoherence} r={5} fill="#fbfaf7" stroke="#1c2024" strokeWidth={2} />}
      </LineChart>
    </ResponsiveContainer>
  );
});
