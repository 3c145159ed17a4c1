/**
 * A clock for what follows a drag at a reading pace (the editor's panels, components/editor/usePacedDuringDrag.ts):
 * while an Offsets handle is dragged it ticks at most every `everyMs`, only when the editor changed, and once more
 * after the last change (nothing is dropped); outside a drag it is still. No React: it observes an editor store.
 */
import type { EditorStore } from "./createEditorStore";

export interface PaceClock {
  subscribe(listener: () => void): () => void;
  /** Counts the moments at which the paced panels take the editor's values. */
  tick(): number;
  /** Stops observing the store. */
  dispose(): void;
}

export function createPaceClock(store: EditorStore, everyMs: number): PaceClock {
  const listeners = new Set<() => void>();
  let tick = 0;
  let lastAt = -Infinity;
  let timer: ReturnType<typeof setTimeout> | null = null;
  const fire = () => {
    timer = null;
    lastAt = performance.now();
    tick++;
    listeners.forEach((listener) => listener());
  };
  const stopObserving = store.subscribe((s, prev) => {
    if (s.offsetsTool.name !== "dragging") {
      if (timer !== null) clearTimeout(timer);
      timer = null;
      return;
    }
    // Trailing and regular: changes arriving each frame are taken every `everyMs`, and the last one is never dropped.
    if (timer === null && s !== prev) timer = setTimeout(fire, Math.max(0, Math.ceil(lastAt + everyMs - performance.now())));
  });
  return {
    subscribe(listener) {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
    tick: () => tick,
    dispose() {
      stopObserving();
      if (timer !== null) clearTimeout(timer);
      listeners.clear();
    },
  };
}
