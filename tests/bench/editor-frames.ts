/**
 * Bench for the editor: prints figures, asserts nothing on time. Per drag frame on the main thread: the store's
 * pointer-move (plan, preview, revision) and the Diagram's scene on a kept backdrop; off it, one computeScenario
 * as the worker runs it. Also the backdrop itself (paid when the background or lab changes). Target: main-thread
 * work per frame well under 16 ms, so a drag stays at 60 frames a second while the worker catches up.
 * Run: npx tsx tests/bench/editor-frames.ts
 */
import { createEditorStore } from "../../canvas/store/createEditorStore";
import { buildDiagramBackdrop, createSceneBuilder } from "../../canvas/kernels/diagram/scene";
import { computeScenario } from "../../physics/compute";
import { defaultScenarioDocument, type ScenarioDocument } from "../../physics/scenario/schema";

const FRAMES = 300;

const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];
const time = (run: () => void) => {
  const start = performance.now();
  run();
  return performance.now() - start;
};

function scenarios(): Record<string, ScenarioDocument> {
  const base = defaultScenarioDocument();
  return {
    Minkowski: base,
    Schwarzschild: { ...base, background: { kind: "schwarzschild", massKg: 1.988e31 }, lab: { placement: "areal-radius", arealRadiusMetres: 1.5e5 } },
    Rindler: { ...base, background: { kind: "rindler", accelerationMetresPerSecondSquared: 1e18 } },
    "de Sitter": { ...base, background: { kind: "de-sitter", hubbleRatePerSecond: 2.2e-18 }, lab: { placement: "areal-radius", arealRadiusMetres: 5e25 } },
  };
}

for (const [name, document] of Object.entries(scenarios())) {
  const store = createEditorStore({ document, version: 1, readOnly: false });
  store.getState().setOffsetsSize({ width: 700, height: 300 });
  const scene = createSceneBuilder();
  scene(document);
  const handle = store.getState().offsets.handles(store.getState()).find((h) => h.id === "recombination-end")!;
  const y = 150;
  store.getState().offsetsPointerDown({ x: handle.x, y, shiftKey: false });
  const frame: number[] = [];
  const drawn: number[] = [];
  const computed: number[] = [];
  for (let i = 1; i <= FRAMES; i++) {
    frame.push(time(() => store.getState().offsetsPointerMove({ x: handle.x + (i % 120), y, shiftKey: false })));
    drawn.push(time(() => scene(store.getState().document)));
    if (i % 10 === 0) computed.push(time(() => computeScenario(store.getState().document)));
  }
  store.getState().offsetsPointerUp({ x: handle.x, y, shiftKey: false });
  const backdrop = median(Array.from({ length: 7 }, () => time(() => buildDiagramBackdrop(document))));
  console.log(
    `${name.padEnd(14)} store frame ${median(frame).toFixed(3)} ms, scene on kept backdrop ${median(drawn).toFixed(2)} ms, ` +
      `backdrop ${backdrop.toFixed(1)} ms, worker compute ${median(computed).toFixed(1)} ms (medians)`,
  );
}
