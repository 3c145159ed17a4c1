"use client";

/** One editor store per mounted editor, handed to the canvas and the panels through context. */
import { createContext, useContext, useState, type ReactNode } from "react";
import { useStore } from "zustand";
import type { ScenarioDocument } from "@/physics/scenario/schema";
import { createEditorStore, type EditorStore } from "./store/createEditorStore";
import type { EditorState } from "./store/state";

const EditorStoreContext = createContext<EditorStore | null>(null);

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
  const [store] = useState(() => createEditorStore({ document, version, readOnly }));
  return <EditorStoreContext.Provider value={store}>{children}</EditorStoreContext.Provider>;
}

export function useEditorStore(): EditorStore {
  const store = useContext(EditorStoreContext);
  if (!store) throw new Error("useEditorStore must be used inside an EditorProvider");
  return store;
}

/** Subscribe to one slice of the editor's state. */
export function useEditor<T>(selector: (state: EditorState) => T): T {
  return useStore(useEditorStore(), selector);
}
