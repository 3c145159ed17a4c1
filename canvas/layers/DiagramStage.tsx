"use client";

/**
 * The Diagram: the conformal diagram of the scenario's background with the lab, the two branches and where their
 * radiation goes. Client-only (Konva); it reads the store and draws, and reports the pointer for the light cone.
 */
import { memo } from "react";
import { Circle, Group, Layer, Line, Stage, Text } from "react-konva";
import type { KonvaEventObject } from "konva/lib/Node";
import { useEditor, useEditorStore } from "../EditorProvider";
import { diagramFigure, diagramViewport, NO_INSET } from "../export/diagram-figure";
import { konvaShape, type KonvaFonts } from "../export/konva-shapes";
import type { TimeCursor } from "../export/time-cursor";
import { lightConeAt } from "../kernels/diagram/light-cone";
import { pointerReadout } from "../kernels/diagram/pointer-readout";
import type { DiagramScene } from "../kernels/diagram/scene";
import { fromPx, toPx, type DiagramViewport } from "../kernels/diagram/viewport";
import { FIGURE_PALETTES, type FigurePalette } from "../theme";
import type { FigureGroup, FigureGroupId, FigureInset, FigureShape } from "../export/diagram-figure";
import { useFigureFonts } from "./useFigureFonts";

const CONE_LENGTH_PX = 34;

/** One figure shape as react-konva draws it (the same attributes the PNG export hands to Konva). */
function Shape({ shape, fonts }: { shape: FigureShape; fonts: KonvaFonts }) {
  const { className, attrs } = konvaShape(shape, fonts);
  if (className === "Circle") return <Circle {...attrs} />;
  if (className === "Text") return <Text {...(attrs as { text: string })} />;
  return <Line {...attrs} />;
}

/**
 * The figure's groups in stacked Konva layers, bottom to top. A drag changes only the protocol's layers (the
 * radiation and the branches); the others keep equal shapes, are not touched, and so are not redrawn.
 */
const LAYERS: FigureGroupId[][] = [
  ["background", "regions"],
  ["radiation"],
  ["grid", "boundaries", "lab-worldline"],
  ["branch-b", "branch-a", "protocol-marks", "time-cursor", "slice-labels"],
  ["labels"],
];

function sameValue(a: unknown, b: unknown): boolean {
  if (a === b) return true;
  if (Array.isArray(a) && Array.isArray(b)) return a.length === b.length && a.every((x, i) => sameValue(x, b[i]));
  return false;
}

/** Two lists of figure shapes with the same content (shapes are flat records of numbers, strings and number arrays). */
export function sameShapes(a: FigureShape[], b: FigureShape[]): boolean {
  if (a === b) return true;
  if (a.length !== b.length) return false;
  return a.every((shape, i) => {
    const other = b[i] as unknown as Record<string, unknown>;
    const entries = Object.entries(shape);
    return entries.length === Object.keys(other).length && entries.every(([key, value]) => sameValue(value, other[key]));
  });
}

const FigureLayer = memo(
  function FigureLayer({ groups, fonts }: { groups: FigureGroup[]; fonts: KonvaFonts }) {
    return (
      <Layer listening={false}>
        {groups.map((group) => (
          <Group key={group.id} name={group.id}>
            {group.shapes.map((shape, i) => (
              <Shape key={i} shape={shape} fonts={fonts} />
            ))}
          </Group>
        ))}
      </Layer>
    );
  },
  (before, after) =>
    before.fonts === after.fonts &&
    before.groups.length === after.groups.length &&
    before.groups.every((g, i) => g.id === after.groups[i].id && sameShapes(g.shapes, after.groups[i].shapes)),
);

function LightConeGizmo({ scene, viewport, palette, font, inset }: { scene: DiagramScene; viewport: DiagramViewport; palette: FigurePalette; font: string; inset: FigureInset }) {
  const pointer = useEditor((s) => s.diagramPointer);
  if (!pointer) return null;
  const cone = lightConeAt(scene.chart.background, pointer, scene.chart.nullScaleMetres);
  const at = toPx(viewport, pointer);
  const end = (d: { T: number; X: number }, sign: 1 | -1) => ({ x: at.x + sign * d.X * CONE_LENGTH_PX, y: at.y - sign * d.T * CONE_LENGTH_PX });
  const [fo, fi, po, pi] = [end(cone.outgoing, 1), end(cone.ingoing, 1), end(cone.ingoing, -1), end(cone.outgoing, -1)];
  return (
    <Group listening={false}>
      <Line points={[at.x, at.y, fo.x, fo.y, fi.x, fi.y]} closed fill={palette.rule} opacity={0.45} />
      <Line points={[fi.x, fi.y, at.x, at.y, fo.x, fo.y]} stroke={palette.inkSoft} strokeWidth={1} />
      <Line points={[pi.x, pi.y, at.x, at.y, po.x, po.y]} stroke={palette.inkFaint} strokeWidth={1} dash={[2, 3]} />
      <Circle x={at.x} y={at.y} radius={2} fill={palette.ink} />
      <Text x={viewport.width - inset.right - 510} y={viewport.height - inset.bottom - 18} width={500} align="right" wrap="none" text={pointerReadout(scene, viewport, at, cone.coordinates)} fontSize={11} fontFamily={font} fill={palette.inkSoft} />
    </Group>
  );
}

export interface DiagramStageProps {
  width: number;
  height: number;
  /** Multiplies the label sizes (large type for projection). */
  labelScale?: number;
  /** Draw the protocol only up to this instant (the embed's scrubber). */
  cursor?: TimeCursor | null;
  /** Room kept clear at the right and bottom edges (the embed's controls lie over it). */
  inset?: FigureInset;
}


/**
 * What the stage draws, subscribed to the store from inside the stage: a drag re-renders this component in
 * react-konva's own renderer, not the Stage and the page around it.
 */
function DiagramLayers({ width, height, labelScale, cursor, inset }: Required<DiagramStageProps>) {
  const theme = useEditor((s) => s.document.display.theme);
  const outcome = useEditor((s) => s.diagramScene(s.document));
  const palette = FIGURE_PALETTES[theme];
  const fonts = useFigureFonts();
  if (!outcome.ok) {
    return (
      <Layer>
        <Text x={16} y={16} width={width - 32} text={`The diagram cannot be drawn: ${outcome.issue.message}`} fill={palette.ink} fontSize={14 * labelScale} />
      </Layer>
    );
  }
  const scene = outcome.scene;
  const figure = diagramFigure(scene, { width, height }, palette, { labelScale, cursor, inset });
  return (
    <>
      {LAYERS.map((ids) => (
        <FigureLayer key={ids[0]} groups={figure.groups.filter((g) => ids.includes(g.id))} fonts={fonts} />
      ))}
      <Layer listening={false}>
        <LightConeGizmo scene={scene} viewport={figure.viewport} palette={palette} font={fonts.mono} inset={inset} />
      </Layer>
    </>
  );
}

export default function DiagramStage({ width, height, labelScale = 1, cursor = null, inset = NO_INSET }: DiagramStageProps) {
  const store = useEditorStore();
  const onMove = (event: KonvaEventObject<MouseEvent>) => {
    const pos = event.target.getStage()?.getPointerPosition();
    const outcome = store.getState().diagramScene(store.getState().document);
    if (pos && outcome.ok) store.getState().setDiagramPointer(fromPx(diagramViewport(outcome.scene, { width, height }, labelScale, inset), pos.x, pos.y));
  };
  return (
    <Stage width={width} height={height} onMouseMove={onMove} onMouseLeave={() => store.getState().setDiagramPointer(null)}>
      <DiagramLayers width={width} height={height} labelScale={labelScale} cursor={cursor} inset={inset} />
    </Stage>
  );
}
