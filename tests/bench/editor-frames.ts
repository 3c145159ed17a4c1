/**
 * Bench for the editor: prints figures, asserts nothing on time. Per drag frame on the main thread: the store's
 * pointer-move (plan, preview, revision), the Diagram's scene on a kept backdrop, the Diagram's figure (the shapes
 * its layers draw) and the Offsets scene; off it, one computeScenario as the worker runs it. Also the backdrop
 * itself (paid when the background or lab changes). The browser's own share (React, Konva, drawing) is in
 * tests/bench/editor-browser.ts. Target: this pure work a small part of a frame's 8 ms budget.
 * Run: npx tsx tests/bench/editor-frames.ts
 */
import { createEditorStore } from "../../canvas/store/createEditorStore";
import { buildDiagramBackdrop, createSceneBuilder } from "../../canvas/kernels/diagram/scene";
import { diagramFigure } from "../../canvas/export/diagram-figure";
import { buildOffsetsScene } from "../../canvas/kernels/offsets/scene";
import { FIGURE_PALETTES } from "../../canvas/theme";
import { computeScenario } from "../../physics/compute";
import type { BackgroundKind, ScenarioDocument } from "../../physics/scenario/schema";
import { newScenarioDocument } from "../../physics/scenario/starting";

const FRAMES = 300;

const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];
const time = (run: () => void) => {
  const start = performance.now();
  run();
  return performance.now() - start;
};

/** Each background's starting scenario (physics/scenario/starting.ts). */
const BACKGROUNDS: Record<string, BackgroundKind> = { Minkowski: "minkowski", Schwarzschild: "schwarzschild", Rindler: "rindler", "de Sitter": "de-sitter" };

for (const [name, kind] of Object.entries(BACKGROUNDS)) {
  const document: ScenarioDocument = newScenarioDocument(kind);
  const store = createEditorStore({ document, version: 1, readOnly: false });
  store.getState().setOffsetsSize({ width: 700, height: 300 });
  const scene = createSceneBuilder();
  scene(document);
  const handle = store.getState().offsets.handles(store.getState()).find((h) => h.id === "recombination-end")!;
  const y = 150;
  store.getState().offsetsPointerDown({ x: handle.x, y, shiftKey: false });
  const frame: number[] = [];
  const drawn: number[] = [];
  const figured: number[] = [];
  const offsetsScened: number[] = [];
  const computed: number[] = [];
  for (let i = 1; i <= FRAMES; i++) {
    frame.push(time(() => store.getState().offsetsPointerMove({ x: handle.x + (i % 120), y, shiftKey: false })));
    let outcome: ReturnType<typeof scene> | undefined;
    drawn.push(time(() => (outcome = scene(store.getState().document))));
    if (outcome?.ok) {
      const built = outcome.scene;
      figured.push(time(() => diagramFigure(built, { width: 700, height: 700 }, FIGURE_PALETTES.light)));
    }
    const state = store.getState();
    const viewport = state.offsets.viewport(state);
    if (viewport) {
      const input = { document: state.document, viewport, originSeconds: state.offsets.originSeconds(state) };
      offsetsScened.push(time(() => buildOffsetsScene(input)));
    }
    if (i % 10 === 0) computed.push(time(() => computeScenario(store.getState().document)));
  }
  store.getState().offsetsPointerUp({ x: handle.x, y, shiftKey: false });
  const backdrop = median(Array.from({ length: 7 }, () => time(() => buildDiagramBackdrop(document))));
  console.log(
    `${name.padEnd(14)} store frame ${median(frame).toFixed(3)} ms, scene on kept backdrop ${median(drawn).toFixed(2)} ms, ` +
      `Diagram figure ${median(figured).toFixed(2)} ms, Offsets scene ${median(offsetsScened).toFixed(2)} ms, backdrop ${backdrop.toFixed(1)} ms, worker compute ${median(computed).toFixed(1)} ms (medians)`,
  );
}
