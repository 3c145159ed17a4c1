"use client";

/**
 * The Sweep's log–log chart of decoherence against the swept parameter, on paper-grade axes: decades labelled with
 * minor ticks between, one unit per axis named in its title, labels at 13 px, and the hover readout above the
 * plot rather than over it. One curve, so no legend (the marker and the dot are explained under the chart). Drawn again only when the sweep, the
 * parameter or the read-only state changes: the "now" marker reads the scenario's current value from the store
 * itself, so a drag in the Offsets panel moves one SVG line, not the whole chart.
 */
import { memo, useMemo, useState, type ReactNode } from "react";
import { CartesianGrid, Line, LineChart, ReferenceDot, ResponsiveContainer, Tooltip, XAxis, YAxis, usePlotArea, useXAxisScale, useYAxisScale } from "recharts";
import type { SweepParameter } from "@/canvas/compute-client";
import { useEditor } from "@/canvas/EditorProvider";
import { axisTickLabels, axisTitle, axisUnit, logTicks, tickLabel } from "@/canvas/kernels/diagram/axis-scale";
import { compactNumber } from "@/canvas/kernels/diagram/labels";
import { memoizeLast } from "@/canvas/kernels/memoize";
import { currentSweepValue, labDistanceMetres } from "@/canvas/kernels/sweep-range";
import type { ScenarioDocument } from "@/physics/scenario/schema";
import { SWEEP_PARAMETER_WORDS as PARAMETER_WORDS } from "@/components/export/sweep-export";
import { parameterDimension } from "@/physics/sweeps";
import { formatQuantity } from "@/physics/units";
import { usePacedDuringDrag } from "./usePacedDuringDrag";

export interface SweepPoint {
  x: number;
  decoherence: number;
}

export { SWEEP_PARAMETER_WORDS as PARAMETER_WORDS } from "@/components/export/sweep-export";

export const dimensionOf = parameterDimension;

const NOW_COLOUR = "#E69F00";

/** The lab's distance builds a background: remembered for the last background and lab, read on every store change. */
const rememberedLabDistance = memoizeLast(labDistanceMetres);

function sweptValueNow(document: ScenarioDocument, parameter: SweepParameter): number | null {
  return parameter === "lab-distance" ? rememberedLabDistance(document.background, document.lab) : currentSweepValue(document, parameter);
}

/** A vertical rule at the scenario's current value of the swept parameter, where it falls inside the sweep. */
export function NowMarker({ parameter, from, to }: { parameter: SweepParameter; from: number; to: number }) {
  // A readout like the Budget's: it follows a drag at the panels' pace, not on every frame.
  const current = usePacedDuringDrag(useEditor((s) => sweptValueNow(s.document, parameter)));
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

/** Short unlabelled ticks at the log axes' minor values (2…9 × 10ⁿ), drawn inward from each axis line. */
export function MinorTicks({ x, y }: { x: number[]; y: number[] }) {
  const xScale = useXAxisScale();
  const yScale = useYAxisScale();
  const plot = usePlotArea();
  if (!xScale || !yScale || !plot) return null;
  const bottom = plot.y + plot.height;
  const at = (scale: (v: number) => unknown, v: number) => {
    const px = scale(v);
    return typeof px === "number" && Number.isFinite(px) ? px : null;
  };
  return (
    <g data-testid="sweep-minor-ticks" stroke={AXIS_COLOUR} strokeWidth={1}>
      {x.map((v) => {
        const px = at(xScale, v);
        return px === null ? null : <line key={`x${v}`} x1={px} x2={px} y1={bottom} y2={bottom - MINOR_TICK_PX} />;
      })}
      {y.map((v) => {
        const py = at(yScale, v);
        return py === null ? null : <line key={`y${v}`} x1={plot.x} x2={plot.x + MINOR_TICK_PX} y1={py} y2={py} />;
      })}
    </g>
  );
}

export const AXIS_COLOUR = "#5b6168";
const MINOR_TICK_PX = 4;
/** Tick labels at a size that survives a slide or a printed column. */
export const TICK_FONT_PX = 13;

/** What both log axes share: our own decade ticks and labels (axis-scale.ts), drawn in the chart's colours. */
export function logAxisProps(axis: NonNullable<ReturnType<typeof logAxis>>) {
  return {
    type: "number" as const,
    scale: "log" as const,
    domain: [axis.from, axis.to],
    ticks: axis.ticks.major,
    interval: 0,
    allowDataOverflow: true,
    tickFormatter: axis.label,
    tick: { fontSize: TICK_FONT_PX, fill: AXIS_COLOUR },
    stroke: AXIS_COLOUR,
  };
}

/** One log axis over the positive values given: its ticks, unit and labels (kernels/diagram/axis-scale.ts). */
export function logAxis(values: number[], dimension: ReturnType<typeof parameterDimension> | "number") {
  const positive = values.filter((v) => v > 0 && Number.isFinite(v));
  if (positive.length === 0) return null;
  const [from, to] = [Math.min(...positive), Math.max(...positive)];
  const ticks = from === to ? { major: [from], minor: [] } : logTicks(from, to);
  const unit = axisUnit(to, dimension);
  const labels = new Map(ticks.major.map((v, i) => [v, axisTickLabels(ticks.major, unit)[i]]));
  return { from, to, ticks, unit, label: (v: number) => labels.get(v) ?? tickLabel(v, unit) };
}

/** The log y axis of a sweep chart: its ticks, its title turned up the left edge (80 px, so a "6 × 10⁻¹⁹" tick clears the title). */
export function sweepYAxis(axis: NonNullable<ReturnType<typeof logAxis>>, title: string, dataKey?: string) {
  return (
    <YAxis
      dataKey={dataKey}
      {...logAxisProps(axis)}
      width={80}
      label={{ value: title, angle: -90, position: "insideLeft", offset: 4, fontSize: TICK_FONT_PX, fill: AXIS_COLOUR, style: { textAnchor: "middle" } }}
    />
  );
}

/**
 * What both sweep charts share: the hover readout above the plot (so it never covers the curves, their axes or
 * labels), the log x axis with its title, the grid, the cursor line, and a click that sets the scenario to a point.
 * `children` are the y axis (sweepYAxis), the curves and the marks.
 */
export function SweepChartFrame<Row extends { x: number }>({
  data,
  xAxis,
  parameter,
  readOnly,
  readout,
  onPick,
  children,
}: {
  data: Row[];
  xAxis: NonNullable<ReturnType<typeof logAxis>>;
  parameter: SweepParameter;
  readOnly: boolean;
  /** The words of the readout for the point at this index. */
  readout(index: number): string;
  onPick(x: number): void;
  children: ReactNode;
}) {
  const [hovered, setHovered] = useState<number | null>(null);
  const pointAt = (state: { activeIndex?: unknown } | null | undefined) => {
    const index = Number(state?.activeIndex);
    return Number.isInteger(index) && data[index] ? index : null;
  };
  return (
    <>
      <p className="h-5 shrink-0 truncate text-right font-mono text-xs text-ink-soft" data-testid="sweep-readout" aria-live="polite">
        {hovered !== null && data[hovered] ? readout(hovered) : ""}
      </p>
      <div className="min-h-0 flex-1">
        <ResponsiveContainer width="100%" height="100%">
          <LineChart
            data={data}
            margin={{ top: 14, right: 24, bottom: 30, left: 14 }}
            onMouseMove={(state) => setHovered(pointAt(state))}
            onMouseLeave={() => setHovered(null)}
            onClick={(state) => {
              const index = pointAt(state);
              if (!readOnly && index !== null) onPick(data[index].x);
            }}
            style={{ cursor: readOnly ? "default" : "pointer" }}
          >
            <CartesianGrid stroke="#d9d6cf" strokeDasharray="2 4" />
            <XAxis
              dataKey="x"
              {...logAxisProps(xAxis)}
              label={{ value: axisTitle(PARAMETER_WORDS[parameter], xAxis.unit), position: "insideBottom", offset: -20, fontSize: TICK_FONT_PX, fill: AXIS_COLOUR }}
            />
            {/* The cursor line shows where the pointer is; the numbers go to the readout above. */}
            <Tooltip content={() => null} cursor={{ stroke: AXIS_COLOUR, strokeDasharray: "3 3" }} isAnimationActive={false} />
            {children}
          </LineChart>
        </ResponsiveContainer>
      </div>
    </>
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
  const xAxis = useMemo(() => logAxis(data.map((p) => p.x), dimension), [data, dimension]);
  const yAxis = useMemo(() => logAxis(data.map((p) => p.decoherence), "number"), [data]);
  if (!xAxis || !yAxis) return null;
  return (
    <div className="flex h-full w-full flex-col">
      <SweepChartFrame
        data={data}
        xAxis={xAxis}
        parameter={parameter}
        readOnly={readOnly}
        readout={(i) => `${PARAMETER_WORDS[parameter]} ${formatQuantity(data[i].x, dimension)}   𝒟 = ${compactNumber(data[i].decoherence, 3)}`}
        onPick={onPick}
      >
        {sweepYAxis(yAxis, "decoherence 𝒟", "decoherence")}
        <Line dataKey="decoherence" stroke="#0072B2" strokeWidth={2} dot={{ r: 2 }} isAnimationActive={false} />
        <MinorTicks x={xAxis.ticks.minor} y={yAxis.ticks.minor} />
        {data.length > 0 && <NowMarker parameter={parameter} from={data[0].x} to={data[data.length - 1].x} />}
        {best && <ReferenceDot x={best.x} y={best.decoherence} r={5} fill="#fbfaf7" stroke="#1c2024" strokeWidth={2} />}
      </SweepChartFrame>
    </div>
  );
});
