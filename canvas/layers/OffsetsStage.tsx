"use client";

/**
 * The Offsets panel's canvas: the figure (OffsetsLayer, drawn from the pure scene builder) inside the element that
 * takes the pointer and the keyboard. Pointer events go to the store's drag-handle tool (captured, so a drag may leave
 * the stage). From the keyboard, Tab and Shift+Tab walk the handles in protocol order (a ring marks the one selected
 * while the view has focus, and a live line names it with its value), arrow keys nudge it, Escape lets it go.
 */
import { useEffect, useId, useRef, useState, type KeyboardEvent, type PointerEvent } from "react";
import { Stage } from "react-konva";
import { useEditor, useEditorStore } from "../EditorProvider";
import { selectionWords } from "../kernels/offsets/selection-words";
import type { EditorState } from "../store/state";
import { OffsetsLayer, type FocusMode } from "./OffsetsLayer";

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
  // Written only when they moved (the selector answers the same array then): a Budget answer leaves the element alone.
  useEffect(() => {
    let written: unknown = null;
    const write = () => {
      const state = store.getState();
      const handles = state.offsets.handles(state);
      if (handles === written) return;
      written = handles;
      container.current?.setAttribute("data-handles", handlesAttribute(state));
    };
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
