"use client";

/**
 * The Diagram: the conformal diagram of the scenario's background with the lab, the two branches and where their
 * radiation goes. Client-only (Konva); it reads the store and draws, and reports the pointer for the light cone.
 */
import { Circle, Group, Layer, Line, Stage, Text } from "react-konva";
import type { KonvaEventObject } from "konva/lib/Node";
import { useEditor, useEditorStore } from "../EditorProvider";
import { hatchTicks, layoutLabels, offsetPolyline, wavyLine } from "../kernels/diagram/decorations";
import { compactQuantity } from "../kernels/diagram/labels";
import { lightConeAt } from "../kernels/diagram/light-cone";
import type { DiagramScene, SceneBoundary } from "../kernels/diagram/scene";
import { fitDiagramViewport, flatPx, fromPx, toPx, type DiagramViewport } from "../kernels/diagram/viewport";
import { DASHES, FIGURE_PALETTES, type FigurePalette } from "../theme";
import { diagramLabelCandidates } from "./diagram-labels";
import { useFigureFonts } from "./useFigureFonts";

/** How far, in pixels, the branches are drawn from the lab's worldline at full separation. */
const BRANCH_OFFSET_PX = 7;
const CONE_LENGTH_PX = 34;
/** Room round the diagram for its labels; de Sitter's square needs more at the sides (time labels, the far pole). */
const PADDING = { left: 48, right: 48, top: 48, bottom: 48 };
const DE_SITTER_PADDING = { left: 100, right: 64, top: 44, bottom: 44 };
const LABEL_SLACK_PX = 24;

function Boundary({ boundary, viewport, palette }: { boundary: SceneBoundary; viewport: DiagramViewport; palette: FigurePalette }) {
  const pts = boundary.points.map((p) => toPx(viewport, p));
  const context = !boundary.bordersLabRegion;
  switch (boundary.kind) {
    case "timelike-infinity":
    case "spatial-infinity":
      return <Circle x={pts[0].x} y={pts[0].y} radius={3} stroke={palette.ink} strokeWidth={1.25} fill={palette.paper} />;
    case "singularity":
      return <Line points={wavyLine(pts[0], pts[pts.length - 1], 2.5, 9)} stroke={palette.ink} strokeWidth={1.5} lineJoin="round" />;
    case "null-infinity":
      return <Line points={flatPx(viewport, boundary.points)} stroke={context ? palette.inkSoft : palette.ink} strokeWidth={1} dash={DASHES.nullInfinity} />;
    case "centre":
      return <Line points={flatPx(viewport, boundary.points)} stroke={context ? palette.inkFaint : palette.inkSoft} strokeWidth={1} />;
    case "horizon": {
      const far = toPx(viewport, boundary.farSide);
      const ticks = context ? [] : hatchTicks(pts[0], pts[pts.length - 1], far, 7, 6);
      return (
        <Group>
          {ticks.map((t, i) => (
            <Line key={i} points={t} stroke={palette.inkFaint} strokeWidth={0.75} />
          ))}
          <Line points={flatPx(viewport, boundary.points)} stroke={context ? palette.inkSoft : palette.ink} strokeWidth={context ? 1 : 2} />
        </Group>
      );
    }
  }
}

function Branches({ scene, viewport, palette }: { scene: DiagramScene; viewport: DiagramViewport; palette: FigurePalette }) {
  const samples = scene.protocol?.branches;
  if (!samples || samples.length < 2) return null;
  const points = samples.map((s) => toPx(viewport, s.point));
  // A lab on the centre line r = 0 has nothing to its left: draw its branches beside the line, not across it.
  const shift = scene.chart.background.labRadiusMetres === 0 ? BRANCH_OFFSET_PX + 5 : 0;
  return (
    <Group listening={false}>
      <Line points={offsetPolyline(points, samples.map((s) => shift + s.b * BRANCH_OFFSET_PX))} stroke={palette.branchB} strokeWidth={2} dash={DASHES.branchB} lineJoin="round" />
      <Line points={offsetPolyline(points, samples.map((s) => shift + s.a * BRANCH_OFFSET_PX))} stroke={palette.branchA} strokeWidth={2} lineJoin="round" />
      {scene.protocol!.marks.map((m, i) => {
        const p = toPx(viewport, m);
        return <Line key={i} points={[p.x - 4, p.y, p.x + 4, p.y]} stroke={palette.inkSoft} strokeWidth={1} />;
      })}
    </Group>
  );
}

function pointerReadout(scene: DiagramScene, cone: ReturnType<typeof lightConeAt>): string {
  if (!cone.coordinates) return "outside the lab's static region";
  const radius = scene.chart.background.kind === "rindler" ? "ξ" : "r";
  return `t = ${compactQuantity(cone.coordinates.tSeconds, "time")}   ${radius} = ${compactQuantity(cone.coordinates.rMetres, "length")}`;
}

function LightConeGizmo({ scene, viewport, palette, font }: { scene: DiagramScene; viewport: DiagramViewport; palette: FigurePalette; font: string }) {
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
      <Text x={viewport.width - 410} y={viewport.height - 18} width={400} align="right" wrap="none" text={pointerReadout(scene, cone)} fontSize={11} fontFamily={font} fill={palette.inkSoft} />
    </Group>
  );
}

export default function DiagramStage({ width, height }: { width: number; height: number }) {
  const store = useEditorStore();
  const theme = useEditor((s) => s.document.display.theme);
  const outcome = useEditor((s) => s.diagramScene(s.document));
  const palette = FIGURE_PALETTES[theme];
  const fonts = useFigureFonts();

  if (!outcome.ok) {
    return (
      <Stage width={width} height={height}>
        <Layer>
          <Text x={16} y={16} width={width - 32} text={`The diagram cannot be drawn: ${outcome.issue.message}`} fill={palette.ink} fontSize={14} />
        </Layer>
      </Stage>
    );
  }
  const scene = outcome.scene;
  const viewport = fitDiagramViewport(scene.bounds, { width, height }, scene.chart.background.kind === "de-sitter" ? DE_SITTER_PADDING : PADDING);
  const labels = layoutLabels(diagramLabelCandidates(scene, viewport), { width, height });
  const tone = { ink: palette.ink, soft: palette.inkSoft, faint: palette.inkFaint };

  const onMove = (event: KonvaEventObject<MouseEvent>) => {
    const pos = event.target.getStage()?.getPointerPosition();
    if (pos) store.getState().setDiagramPointer(fromPx(viewport, pos.x, pos.y));
  };

  return (
    <Stage width={width} height={height} onMouseMove={onMove} onMouseLeave={() => store.getState().setDiagramPointer(null)}>
      <Layer listening={false}>
        <Line points={[0, 0, width, 0, width, height, 0, height]} closed fill={palette.paper} />
        <Line points={flatPx(viewport, scene.outline)} closed fill={palette.contextPaper} />
        <Line points={flatPx(viewport, scene.labRegion)} closed fill={palette.paper} />
        {scene.protocol?.strips.map((s, i) => (
          <Line key={i} points={flatPx(viewport, s.polygon)} closed fill={s.kind === "far-field" ? palette.farFieldTint : palette.horizonTint} />
        ))}
        {scene.grid.map((g, i) => (
          <Line key={i} points={flatPx(viewport, g.points)} stroke={palette.rule} strokeWidth={0.75} />
        ))}
        {scene.boundaries.map((b, i) => (
          <Boundary key={i} boundary={b} viewport={viewport} palette={palette} />
        ))}
        <Line points={flatPx(viewport, scene.labWorldline)} stroke={palette.inkSoft} strokeWidth={1.25} />
        <Branches scene={scene} viewport={viewport} palette={palette} />
        {labels.map((l) => {
          // The layout's widths are estimates; give Konva room to spare (it crops text wider than its box),
          // split so that left, centre and right alignment still sit where the layout put them.
          const along = (l.rotation === 0 ? l.box.width : l.box.height) + LABEL_SLACK_PX;
          const shift = l.align === "left" ? 0 : l.align === "center" ? LABEL_SLACK_PX / 2 : LABEL_SLACK_PX;
          return (
            <Text
              key={l.id}
              text={l.text}
              x={l.rotation === 0 ? l.box.left - shift : l.box.left}
              y={l.rotation === 0 ? l.box.top : l.box.top + l.box.height + shift}
              width={along}
              rotation={l.rotation}
              align={l.align}
              fontSize={l.fontSize}
              fontFamily={fonts.serif}
              fill={tone[l.tone]}
              wrap="none"
            />
          );
        })}
      </Layer>
      <Layer listening={false}>
        <LightConeGizmo scene={scene} viewport={viewport} palette={palette} font={fonts.mono} />
      </Layer>
    </Stage>
  );
}
