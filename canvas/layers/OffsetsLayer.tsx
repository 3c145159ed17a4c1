"use client";

/**
 * The Offsets figure on a Konva layer: it draws the scene the pure builder makes (canvas/kernels/offsets/scene.ts),
 * then the handles and the focus ring. Subscribed to the store from inside the stage, so a drag re-renders this
 * layer in react-konva's own renderer, not the Stage and the page around it.
 */
import { memo, useMemo } from "react";
import { Circle, Group, Layer, Line, Rect, Text } from "react-konva";
import { useEditor } from "../EditorProvider";
import type { HandlePlacement } from "../kernels/offsets/handles";
import { buildOffsetsScene, type OffsetsLabel, type OffsetsScene, type OffsetsTick } from "../kernels/offsets/scene";
import type { PlotRect } from "../kernels/offsets/viewport";
import { DASHES, FIGURE_PALETTES, type FigurePalette } from "../theme";
import { useFigureFonts, type FigureFonts } from "./useFigureFonts";

export type FocusMode = "none" | "pointer" | "keyboard";

/** A ring around the selected handle while the panel has focus: round on the point, tall on a rule's grip. */
function FocusRing({ handle, plot, palette }: { handle: HandlePlacement; plot: PlotRect; palette: FigurePalette }) {
  if (handle.axis === "distance") return <Circle x={handle.x} y={handle.y} radius={17} stroke={palette.focus} strokeWidth={2} dash={[4, 3]} />;
  const bottom = plot.top + plot.height;
  return <Rect x={handle.x - 9} y={bottom - 11} width={18} height={20} cornerRadius={4} stroke={palette.focus} strokeWidth={2} dash={[4, 3]} />;
}

/** A handle: a grip on a rule across the plot (an instant), or a point with arrows (the separation). Memoized on values. */
const Handle = memo(function Handle({
  axis,
  x,
  y,
  plotTop,
  plotBottom,
  palette,
  state,
}: {
  axis: HandlePlacement["axis"];
  x: number;
  /** The point's height (the separation handle); unused for an instant. */
  y: number;
  plotTop: number;
  plotBottom: number;
  palette: FigurePalette;
  state: "plain" | "hover" | "selected";
}) {
  const colour = state === "selected" ? palette.focus : state === "hover" ? palette.ink : palette.inkSoft;
  if (axis === "distance") {
    return (
      <Group>
        <Circle x={x} y={y} radius={state === "plain" ? 5.5 : 7} fill={palette.paper} stroke={colour} strokeWidth={2} />
        <Line points={[x, y - 13, x - 3, y - 9, x + 3, y - 9]} closed fill={colour} />
        <Line points={[x, y + 13, x - 3, y + 9, x + 3, y + 9]} closed fill={colour} />
      </Group>
    );
  }
  return (
    <Group>
      <Line points={[x, plotTop, x, plotBottom]} stroke={colour} strokeWidth={state === "plain" ? 1 : 1.5} dash={state === "plain" ? [3, 3] : []} />
      <Rect x={x - 4.5} y={plotBottom - 7} width={9} height={14} cornerRadius={2} fill={palette.paper} stroke={colour} strokeWidth={state === "plain" ? 1.25 : 2} />
    </Group>
  );
});

const samePlot = (a: PlotRect, b: PlotRect) => a.left === b.left && a.top === b.top && a.width === b.width && a.height === b.height;
const sameTicks = (a: OffsetsTick[], b: OffsetsTick[]) => a.length === b.length && a.every((t, i) => t.px === b[i].px && t.valueSI === b[i].valueSI);

/**
 * The offset axis' grid lines, the zero line and the axes' frame: what a drag of an instant leaves as it was.
 * Memoized on values, so react-konva does not touch these nodes on such a drag.
 */
const OffsetGrid = memo(
  function OffsetGrid({ plot, ticks, zeroY, palette }: { plot: PlotRect; ticks: OffsetsTick[]; zeroY: number; palette: FigurePalette }) {
    const bottom = plot.top + plot.height;
    return (
      <>
        {ticks.map((t) => (
          <Line key={t.valueSI} points={[plot.left, t.px, plot.left + plot.width, t.px]} stroke={palette.rule} strokeWidth={t.valueSI === 0 ? 0 : 0.75} />
        ))}
        <Line points={[plot.left, zeroY, plot.left + plot.width, zeroY]} stroke={palette.inkFaint} strokeWidth={1} />
        <Line points={[plot.left, plot.top, plot.left, bottom, plot.left + plot.width, bottom]} stroke={palette.ink} strokeWidth={1} />
      </>
    );
  },
  (a, b) => samePlot(a.plot, b.plot) && sameTicks(a.ticks, b.ticks) && a.zeroY === b.zeroY && a.palette === b.palette,
);

/** A placed label: its box is where the layout put it; a label running upward starts at the box's foot. */
function Label({ label, palette, fonts }: { label: OffsetsLabel; palette: FigurePalette; fonts: FigureFonts }) {
  const { box } = label;
  const fill = label.tone === "ink" ? palette.ink : label.tone === "soft" ? palette.inkSoft : palette.inkFaint;
  const common = { text: label.text, fontSize: label.fontSize, fontFamily: fonts[label.face], fill, wrap: "none" as const, align: label.align, listening: false };
  if (label.rotation === -90) {
    return <Text {...common} x={box.left + (box.width - label.fontSize) / 2} y={box.top + box.height} width={box.height} rotation={-90} />;
  }
  return <Text {...common} x={box.left} y={box.top + (box.height - label.fontSize) / 2} width={box.width} />;
}

function SceneShapes({ scene, palette, fonts }: { scene: OffsetsScene; palette: FigurePalette; fonts: FigureFonts }) {
  const { plot } = scene;
  const bottom = plot.top + plot.height;
  return (
    <>
      <Rect x={0} y={0} width={scene.width} height={scene.height} fill={palette.paper} />
      {scene.bands.filter((b) => b.shaded).map((b) => (
        <Rect key={b.name} x={b.left} y={plot.top} width={b.width} height={plot.height} fill={palette.contextPaper} />
      ))}
      <OffsetGrid plot={plot} ticks={scene.offsetTicks} zeroY={scene.zeroY} palette={palette} />
      {scene.scaleBreaks.map((x) => (
        <Group key={x}>
          <Line points={[x - 4, bottom + 4, x, bottom - 4]} stroke={palette.inkFaint} strokeWidth={1} />
          <Line points={[x, bottom + 4, x + 4, bottom - 4]} stroke={palette.inkFaint} strokeWidth={1} />
        </Group>
      ))}
      {scene.labels.map((label) => (
        <Label key={label.id} label={label} palette={palette} fonts={fonts} />
      ))}
      {scene.branchB.map((points, i) => (
        <Line key={`b${i}`} points={points} stroke={palette.branchB} strokeWidth={2} dash={DASHES.branchB} lineJoin="round" />
      ))}
      {scene.branchA.map((points, i) => (
        <Line key={`a${i}`} points={points} stroke={palette.branchA} strokeWidth={2.25} lineJoin="round" />
      ))}
    </>
  );
}

export function OffsetsLayer({ width, height, focus }: { width: number; height: number; focus: FocusMode }) {
  const protocol = useEditor((s) => s.document.protocol);
  const separation = useEditor((s) => s.document.separation);
  const theme = useEditor((s) => s.document.display.theme);
  const viewport = useEditor((s) => s.offsets.viewport(s));
  const originSeconds = useEditor((s) => s.offsets.originSeconds(s));
  const handles = useEditor((s) => s.offsets.handles(s));
  const hover = useEditor((s) => s.hover);
  const selection = useEditor((s) => s.selection);
  const fonts = useFigureFonts();
  const palette = FIGURE_PALETTES[theme];
  const scene = useMemo(() => (viewport ? buildOffsetsScene({ document: { protocol, separation }, viewport, originSeconds }) : null), [protocol, separation, viewport, originSeconds]);
  if (!scene) return null;
  const { plot } = scene;
  const bottom = plot.top + plot.height;
  const selected = handles.find((h) => h.id === selection);
  return (
    <Layer>
      <SceneShapes scene={scene} palette={palette} fonts={fonts} />
      {handles.map((h) => (
        <Handle
          key={h.id}
          axis={h.axis}
          x={h.x}
          y={h.axis === "distance" ? h.y : 0}
          plotTop={plot.top}
          plotBottom={bottom}
          palette={palette}
          state={selection === h.id ? "selected" : hover === h.id ? "hover" : "plain"}
        />
      ))}
      {focus !== "none" && selected && <FocusRing handle={selected} plot={plot} palette={palette} />}
      {/* The page's focus outline would sit under the canvas: the stage draws its own when focus came from the keyboard. */}
      {focus === "keyboard" && <Rect x={1} y={1} width={width - 2} height={height - 2} stroke={palette.focus} strokeWidth={2} cornerRadius={3} />}
    </Layer>
  );
}
