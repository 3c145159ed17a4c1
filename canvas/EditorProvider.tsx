"use client";

/**
 * Creates one editor (canvas/editor.ts) per mounted scenario editor and disposes it on unmount, and hands it to the
 * canvases and the panels through context. Components subscribe to its store and dispatch to it; they own nothing.
 */
import { createContext, useContext, useEffect, useState, type ReactNode } from "react";
import { useStore } from "zustand";
import type { ScenarioDocument } from "@/physics/scenario/schema";
import { createEditor, type Editor } from "./editor";
import type { EditorStore } from "./store/createEditorStore";
import type { EditorState } from "./store/state";
import { spawnComputeWorker } from "./worker/spawn";

const EditorContext = createContext<Editor | null>(null);

export function EditorProvider({
  document,
  version,
  readOnly,
  children,
}: {
  document: ScenarioDocument;
  version: number;
  readOnly: boolean;
  children: ReactNode;
}) {
  const [editor, setEditor] = useState<Editor | null>(null);
  // Created in an effect, so each mount has its own editor and its cleanup disposes exactly that one (workers
  // included). The provider is keyed by scenario: its first props are the editor's starting point.
  useEffect(() => {
    const created = createEditor({ document, version, readOnly, spawnWorker: spawnComputeWorker });
    setEditor(created);
    return () => created.dispose();
  }, []);
  if (!editor) return null;
  return <EditorContext.Provider value={editor}>{children}</EditorContext.Provider>;
}

/** The editor object: its store, pace clock and sweep runner. */
export function useEditorObject(): Editor {
  const editor = useContext(EditorContext);
  if (!editor) throw new Error("useEditorObject must be used inside an EditorProvider");
  return editor;
}

export function useEditorStore(): EditorStore {
  return useEditorObject().store;
}

/** Subscribe to one slice of the editor's state. */
export function useEditor<T>(selector: (state: EditorState) => T): T {
  return useStore(useEditorStore(), selector);
}
