"use client";

/**
 * The Offsets panel: both branches' offsets along the separation axis against the lab's proper time, at a scale where
 * a micrometre reads, with the handles that set the protocol. Pointer events go to the store's drag-handle tool
 * (captured, so a drag may leave the stage). From the keyboard, Tab and Shift+Tab walk the handles in protocol order
 * (a ring marks the one selected while the view has focus, and a live line names it with its value), arrow keys
 * nudge it, Escape lets it go.
 */
import { memo, useEffect, useId, useRef, useState, type KeyboardEvent, type PointerEvent } from "react";
import { Circle, Group, Layer, Line, Rect, Stage, Text } from "react-konva";
import { formatQuantity } from "@/physics/units";
import { useEditor, useEditorStore } from "../EditorProvider";
import { compactQuantity } from "../kernels/diagram/labels";
import { boundaryTicks, offsetTicks, timeAxisLabels, type Tick } from "../kernels/offsets/axis-ticks";
import { HANDLE_WORDS, handleValueSI, isTimeHandle, type HandleId, type HandlePlacement } from "../kernels/offsets/handles";
import { metresToPx, pxToTime, scaleBreaksPx, timeToPx, type OffsetsViewport, type PlotRect } from "../kernels/offsets/viewport";
import { branchOffsetsMetres, pathSampleTimes, segmentTimes, separationFraction, SEGMENT_NAMES, type SegmentsProtocol } from "../kernels/timeline";
import { profilePaths } from "../kernels/profile";
import type { EditorState } from "../store/state";
import { DASHES, FIGURE_PALETTES, type FigurePalette } from "../theme";
import { useFigureFonts, type FigureFonts } from "./useFigureFonts";

function branchPaths(viewport: OffsetsViewport, protocol: SegmentsProtocol, separation: Parameters<typeof branchOffsetsMetres>[0], origin: number) {
  const times = segmentTimes(protocol, origin);
  const first = viewport.pieces[0];
  const last = viewport.pieces[viewport.pieces.length - 1];
  const from = Math.min(first.fromSeconds, pxToTime(viewport, viewport.plot.left));
  const to = Math.max(last.toSeconds, pxToTime(viewport, viewport.plot.left + viewport.plot.width));
  const a: number[] = [];
  const b: number[] = [];
  for (const t of pathSampleTimes(times, from, to, 64)) {
    const x = timeToPx(viewport, t);
    const offsets = branchOffsetsMetres(separation, separationFraction(protocol, times, t));
    a.push(x, metresToPx(viewport, offsets.a));
    b.push(x, metresToPx(viewport, offsets.b));
  }
  return { a, b };
}

const TIME_AXIS_TITLE = "lab proper time";
/** Estimated advance per character, in ems: the monospace figures, and the sans title (a little wide, to be safe). */
const MONO_EM = 0.61;
const SANS_EM = 0.51;
const AXIS_FONT_PX = 11;

/** A formula or sampled profile, as the physics library samples it (shown, not edited: it has no handles). */
function profileCurves(viewport: OffsetsViewport, document: Parameters<typeof profilePaths>[0]) {
  const a: number[] = [];
  const b: number[] = [];
  for (const p of profilePaths(document, 400)) {
    const x = timeToPx(viewport, p.timeSeconds);
    a.push(x, metresToPx(viewport, p.branchAMetres));
    b.push(x, metresToPx(viewport, p.branchBMetres));
  }
  return { a, b };
}

/** A ring around the selected handle while the Offsets panel has focus: round on the point, tall on a rule's grip. */
function FocusRing({ handle, viewport, palette }: { handle: HandlePlacement; viewport: OffsetsViewport; palette: FigurePalette }) {
  if (handle.axis === "distance") return <Circle x={handle.x} y={handle.y} radius={17} stroke={palette.focus} strokeWidth={2} dash={[4, 3]} />;
  const bottom = viewport.plot.top + viewport.plot.height;
  return <Rect x={handle.x - 9} y={bottom - 11} width={18} height={20} cornerRadius={4} stroke={palette.focus} strokeWidth={2} dash={[4, 3]} />;
}

/** What the live line says about the selected handle: its name and the value it sets. */
function selectionWords(handle: HandleId | null, protocol: SegmentsProtocol | null, separation: Parameters<typeof handleValueSI>[2]): string {
  if (!handle || !protocol) return "";
  const value = formatQuantity(handleValueSI(handle, protocol, separation), isTimeHandle(handle) ? "time" : "length", { digits: 4 });
  return `${HANDLE_WORDS[handle]} selected: ${value}${isTimeHandle(handle) ? " from the start of the separation" : ""}.`;
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
const sameTicks = (a: Tick[], b: Tick[]) => a.length === b.length && a.every((t, i) => t.px === b[i].px && t.valueSI === b[i].valueSI);

/**
 * The offset axis (grid lines and labels), the zero line, the axes' frame and the offset axis' title: what a drag of
 * an instant leaves as it was. Memoized on values, so react-konva does not touch these nodes on such a drag.
 */
const OffsetAxis = memo(
  function OffsetAxis({ plot, ticks, zeroY, title, palette, fonts }: { plot: PlotRect; ticks: Tick[]; zeroY: number; title: string; palette: FigurePalette; fonts: FigureFonts }) {
    const bottom = plot.top + plot.height;
    return (
      <>
        {ticks.map((t) => (
          <Group key={t.valueSI}>
            <Line points={[plot.left, t.px, plot.left + plot.width, t.px]} stroke={palette.rule} strokeWidth={t.valueSI === 0 ? 0 : 0.75} />
            <Text x={0} y={t.px - 6} width={plot.left - 8} align="right" text={t.valueSI === 0 ? "0" : compactQuantity(t.valueSI, "length")} fontSize={11} fontFamily={fonts.mono} fill={palette.inkSoft} wrap="none" />
          </Group>
        ))}
        <Line points={[plot.left, zeroY, plot.left + plot.width, zeroY]} stroke={palette.inkFaint} strokeWidth={1} />
        <Line points={[plot.left, plot.top, plot.left, bottom, plot.left + plot.width, bottom]} stroke={palette.ink} strokeWidth={1} />
        <Text x={14} y={plot.top + plot.height / 2 + 80} rotation={-90} width={160} align="center" text={title} fontSize={11} fontFamily={fonts.sans} fill={palette.inkFaint} wrap="none" />
      </>
    );
  },
  (a, b) => samePlot(a.plot, b.plot) && sameTicks(a.ticks, b.ticks) && a.zeroY === b.zeroY && a.title === b.title && a.palette === b.palette && a.fonts === b.fonts,
);

type FocusMode = "none" | "pointer" | "keyboard";

/**
 * What the stage draws, subscribed to the store from inside the stage: a drag re-renders this layer in react-konva's
 * own renderer, not the Stage and the page around it.
 */
function OffsetsLayer({ width, height, focus }: { width: number; height: number; focus: FocusMode }) {
  const document = useEditor((s) => s.document);
  const viewport = useEditor((s) => s.offsets.viewport(s));
  const origin = useEditor((s) => s.offsets.originSeconds(s));
  const handles = useEditor((s) => s.offsets.handles(s));
  const hover = useEditor((s) => s.hover);
  const selection = useEditor((s) => s.selection);
  const fonts = useFigureFonts();
  const palette = FIGURE_PALETTES[document.display.theme];
  const protocol = document.protocol.kind === "segments" ? document.protocol : null;
  if (!viewport) return null;
  const selected = handles.find((h) => h.id === selection);
  const drawn = protocol ? branchPaths(viewport, protocol, document.separation, origin) : profileCurves(viewport, document);
  const { a, b } = drawn;
  const { plot } = viewport;
  const bottom = plot.top + plot.height;
  const zeroY = metresToPx(viewport, 0);
  const bounds = protocol
    ? boundaryTicks(viewport, segmentTimes(protocol, origin))
    : [viewport.pieces[1].fromSeconds, viewport.pieces[viewport.pieces.length - 2].toSeconds].map((t) => ({ px: timeToPx(viewport, t), valueSI: t }));
  const axisWords = `offset along the ${document.separation.axis} axis`;
  const timeTexts = bounds.map((t) => formatQuantity(t.valueSI - origin, "time"));
  const timeLabels = timeAxisLabels({
    ticks: bounds.map((t, i) => ({ px: t.px, text: timeTexts[i] })),
    title: TIME_AXIS_TITLE,
    plot: { left: plot.left, width: plot.width, bottom },
    stage: { width, height },
    fontSize: AXIS_FONT_PX,
    monoEm: MONO_EM,
    sansEm: SANS_EM,
  });

  return (
    <Layer>
      <Rect x={0} y={0} width={width} height={height} fill={palette.paper} />
      {protocol && SEGMENT_NAMES.map((name, i) => {
        const x0 = bounds[i].px;
        const x1 = bounds[i + 1].px;
        return (
          <Group key={name}>
            {name !== "hold" && <Rect x={x0} y={plot.top} width={Math.max(0, x1 - x0)} height={plot.height} fill={palette.contextPaper} />}
            <Text x={x0} y={plot.top + 4} width={Math.max(0, x1 - x0)} align="center" text={x1 - x0 > 60 ? name : ""} fontSize={11} fontFamily={fonts.sans} fill={palette.inkFaint} />
          </Group>
        );
      })}
      <OffsetAxis plot={plot} ticks={offsetTicks(viewport)} zeroY={zeroY} title={axisWords} palette={palette} fonts={fonts} />
      {scaleBreaksPx(viewport).map((x) => (
        <Group key={x}>
          <Line points={[x - 4, bottom + 4, x, bottom - 4]} stroke={palette.inkFaint} strokeWidth={1} />
          <Line points={[x, bottom + 4, x + 4, bottom - 4]} stroke={palette.inkFaint} strokeWidth={1} />
        </Group>
      ))}
      {timeLabels.map((label) => (
        <Text
          key={label.id}
          x={label.box.left}
          y={label.box.top + (label.box.height - AXIS_FONT_PX) / 2}
          width={label.box.width}
          align={label.align}
          text={label.text}
          fontSize={AXIS_FONT_PX}
          fontFamily={label.id === "time-title" ? fonts.sans : fonts.mono}
          fill={label.id === "time-title" ? palette.inkFaint : palette.inkSoft}
          wrap="none"
        />
      ))}
      <Line points={b} stroke={palette.branchB} strokeWidth={2} dash={DASHES.branchB} lineJoin="round" />
      <Line points={a} stroke={palette.branchA} strokeWidth={2.25} lineJoin="round" />
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
      {focus !== "none" && selected && <FocusRing handle={selected} viewport={viewport} palette={palette} />}
      {/* The page's focus outline would sit under the canvas: the stage draws its own when focus came from the keyboard. */}
      {focus === "keyboard" && <Rect x={1} y={1} width={width - 2} height={height - 2} stroke={palette.focus} strokeWidth={2} cornerRadius={3} />}
    </Layer>
  );
}

/** Where the pointer may grab: the cursor for the handle under it, or the one being dragged. */
function cursorFor(state: EditorState): string {
  if (state.offsetsTool.name === "dragging") return "grabbing";
  const hovered = state.offsets.handles(state).find((h) => h.id === state.hover);
  return hovered ? (hovered.axis === "time" ? "ew-resize" : "ns-resize") : "default";
}

/** The handles' positions in stage pixels, for tests and benches that drive the view with a mouse. */
function handlesAttribute(state: EditorState): string {
  return JSON.stringify(state.offsets.handles(state).map((h) => ({ id: h.id, x: Math.round(h.x), y: h.axis === "distance" ? Math.round(h.y) : null })));
}

/** The live line naming the selected handle and its value; quiet while dragging (a value a frame would flood a screen reader). */
function SelectionLine({ id }: { id: string }) {
  const dragging = useEditor((s) => s.offsetsTool.name === "dragging");
  const words = useEditor((s) => (s.document.protocol.kind === "segments" ? selectionWords(s.selection, s.document.protocol, s.document.separation) : ""));
  return (
    <p id={id} aria-live="polite" className="sr-only" data-testid="offsets-selection">
      {dragging ? "" : words}
    </p>
  );
}

export default function OffsetsStage({ width, height }: { width: number; height: number }) {
  const store = useEditorStore();
  const readable = useEditor((s) => s.offsets.viewport(s) !== null);
  const protocolKind = useEditor((s) => s.document.protocol.kind);
  const selection = useEditor((s) => s.selection);
  const cursor = useEditor(cursorFor);
  const container = useRef<HTMLDivElement>(null);
  const [focus, setFocus] = useState<FocusMode>("none");
  const selectionLineId = useId();

  // The handles' positions change on every frame of a drag: written straight onto the element, not re-rendered.
  useEffect(() => {
    const write = () => container.current?.setAttribute("data-handles", handlesAttribute(store.getState()));
    write();
    return store.subscribe(write);
  }, [store, readable]);

  // The stage's box is read once when a drag starts and kept until it ends, or until the page scrolls or resizes:
  // reading it on every move would make the browser lay the page out again right after each frame's changes.
  const dragBox = useRef<DOMRect | null>(null);
  useEffect(() => {
    const forget = () => {
      dragBox.current = null;
    };
    window.addEventListener("scroll", forget, { capture: true, passive: true });
    window.addEventListener("resize", forget, { passive: true });
    return () => {
      window.removeEventListener("scroll", forget, { capture: true });
      window.removeEventListener("resize", forget);
    };
  }, []);
  const local = (event: PointerEvent) => {
    if (store.getState().offsetsTool.name === "dragging") dragBox.current ??= container.current!.getBoundingClientRect();
    const box = dragBox.current ?? container.current!.getBoundingClientRect();
    return { x: event.clientX - box.left, y: event.clientY - box.top, shiftKey: event.shiftKey };
  };
  const onPointerDown = (event: PointerEvent<HTMLDivElement>) => {
    if (event.button !== 0) return;
    container.current?.focus();
    event.currentTarget.setPointerCapture(event.pointerId);
    store.getState().offsetsPointerDown(local(event));
  };
  const endDrag = () => {
    dragBox.current = null;
  };
  const onKeyDown = (event: KeyboardEvent<HTMLDivElement>) => {
    if (store.getState().offsetsKeyDown({ key: event.key, shiftKey: event.shiftKey })) event.preventDefault();
  };
  if (!readable) {
    return <div className="flex h-full items-center justify-center p-6 text-sm text-ink-soft">This scenario's {protocolKind} profile cannot be read.</div>;
  }
  return (
    <div
      ref={container}
      tabIndex={0}
      role="application"
      aria-label="Offsets: branch offsets against lab time; Tab selects the next handle, the arrow keys move it, Escape lets it go"
      aria-describedby={selectionLineId}
      data-testid="offsets"
      data-selected={selection ?? ""}
      style={{ cursor, touchAction: "none", outline: "none" }}
      onFocus={(e) => setFocus(e.currentTarget.matches(":focus-visible") ? "keyboard" : "pointer")}
      onBlur={() => setFocus("none")}
      onPointerDown={onPointerDown}
      onPointerMove={(e) => store.getState().offsetsPointerMove(local(e))}
      onPointerUp={(e) => {
        store.getState().offsetsPointerUp(local(e));
        endDrag();
      }}
      onPointerCancel={() => {
        store.getState().offsetsCancel();
        endDrag();
      }}
      onLostPointerCapture={() => {
        if (store.getState().offsetsTool.name === "dragging") store.getState().offsetsCancel();
        endDrag();
      }}
      onPointerLeave={() => store.getState().offsetsTool.name === "idle" && store.getState().setHover(null)}
      onKeyDown={onKeyDown}
    >
      <Stage width={width} height={height} listening={false}>
        <OffsetsLayer width={width} height={height} focus={focus} />
      </Stage>
      <SelectionLine id={selectionLineId} />
    </div>
  );
}
