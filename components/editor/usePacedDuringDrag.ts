"use client";

/**
 * The panels around the canvases (Budget, Protocol, handle fields, Sweep) follow a drag in the Offsets panel at a
 * reading pace rather than on every frame: while a handle is dragged they show what the editor holds at most every
 * DRAG_PACE_MS (canvas/editor.ts), all of them at the same instant (one render, one layout, one paint), and at once otherwise (a typed
 * value, a key press, the end of the drag). Redrawing those tables and fields costs the page about as much per frame
 * as the two canvases; ten times a second is as fast as anyone reads a changing number (common practice for live
 * readouts), and it leaves each frame to the Diagram and the Offsets panel.
 */
import { useDeferredValue, useState, useSyncExternalStore } from "react";
import { useEditor, useEditorObject } from "@/canvas/EditorProvider";
import type { EditorState } from "@/canvas/store/state";

/** `value` itself, except during a drag: then the value it had at the editor's last pace tick. */
export function usePacedDuringDrag<T>(value: T): T {
  const clock = useEditorObject().paceClock;
  const tick = useSyncExternalStore(clock.subscribe, clock.tick, clock.tick);
  const dragging = useEditor((s) => s.offsetsTool.name === "dragging");
  const [held, setHeld] = useState({ tick, value });
  // Adjusting state while rendering (React's pattern for state derived from props): not dragging, the held value
  // keeps up, so that a drag starts from what was shown; dragging, it is taken again at each new tick.
  if (dragging ? held.tick !== tick : !Object.is(held.value, value) || held.tick !== tick) setHeld({ tick, value });
  return dragging ? held.value : value;
}

/**
 * What a panel beside the canvases shows of the editor: paced during a drag (above) and deferred, so the Diagram and
 * the Offsets panel are drawn first. A panel renders a memoized view of these values, so its urgent render (which still
 * has the old ones) is free; edits read the store, not these values.
 */
export function usePanelValue<T>(selector: (state: EditorState) => T): T {
  return useDeferredValue(usePacedDuringDrag(useEditor(selector)));
}
