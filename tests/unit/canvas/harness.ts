/**
 * A headless editor: a store with no DOM and no Konva, driven by the same pointer and key events the Offsets panel
 * sends, with helpers that find a handle's position the way a person's eye would (from the store's own layout).
 */
import { createEditorStore, type EditorStore } from "@/canvas/store/createEditorStore";
import type { HandleId, HandlePlacement } from "@/canvas/kernels/offsets/handles";
import { defaultScenarioDocument, type ScenarioDocument } from "@/physics/scenario/schema";

export interface Harness {
  store: EditorStore;
  document(): ScenarioDocument;
  placement(handle: HandleId): HandlePlacement;
  /** Where to press to take a handle: on its rule half-way down the plot, or on the point itself. */
  grip(handle: HandleId): { x: number; y: number };
  drag(handle: HandleId, frames: { dx: number; dy: number }[], options?: { shiftKey?: boolean; release?: boolean }): void;
  key(key: string, shiftKey?: boolean): boolean;
}

/** A harness around a new store, or around the store of an editor object (`store`). */
export function createHarness(options: { document?: ScenarioDocument; readOnly?: boolean; store?: EditorStore } = {}): Harness {
  const store = options.store ?? createEditorStore({ document: options.document ?? defaultScenarioDocument(), version: 1, readOnly: options.readOnly ?? false });
  store.getState().setOffsetsSize({ width: 800, height: 320 });
  const state = () => store.getState();
  const placement = (handle: HandleId) => {
    const found = state().offsets.handles(state()).find((h) => h.id === handle);
    if (!found) throw new Error(`no ${handle} handle on screen`);
    return found;
  };
  const grip = (handle: HandleId) => {
    const p = placement(handle);
    if (p.axis === "distance") return { x: p.x, y: p.y };
    const plot = state().offsets.viewport(state())!.plot;
    return { x: p.x, y: plot.top + plot.height / 2 };
  };
  return {
    store,
    document: () => state().document,
    placement,
    grip,
    drag(handle, frames, { shiftKey = false, release = true } = {}) {
      const at = grip(handle);
      state().offsetsPointerDown({ ...at, shiftKey });
      let x = at.x;
      let y = at.y;
      for (const frame of frames) {
        x += frame.dx;
        y += frame.dy;
        state().offsetsPointerMove({ x, y, shiftKey });
      }
      if (release) state().offsetsPointerUp({ x, y, shiftKey });
    },
    key: (key, shiftKey = false) => state().offsetsKeyDown({ key, shiftKey }),
  };
}

/** The same horizontal move split into `count` frames, as a pointer sends it. */
export function framesOf(dx: number, dy: number, count: number): { dx: number; dy: number }[] {
  return Array.from({ length: count }, () => ({ dx: dx / count, dy: dy / count }));
}

export function schwarzschildDocument(): ScenarioDocument {
  const document = defaultScenarioDocument();
  return {
    ...document,
    background: { kind: "schwarzschild", massKg: 1.988_409_870_698_051e31 },
    lab: { placement: "areal-radius", arealRadiusMetres: 1.5e5 },
    separation: { ...document.separation, axis: "radial" },
  };
}
