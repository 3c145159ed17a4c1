"use client";

/**
 * The size the Diagram is drawn at on screen, for the exports: an exported figure uses the same stage size and
 * so the same viewport and label layout as the one on screen. Kept in a ref (reading it never re-renders).
 */
import { createContext, useContext, useEffect, useRef, type MutableRefObject, type ReactNode } from "react";

export interface StageSize {
  width: number;
  height: number;
}

/** Used when no Diagram has reported its size (a figure exported before the stage has been measured). */
export const DEFAULT_FIGURE_SIZE: StageSize = { width: 560, height: 480 };

const DiagramSizeContext = createContext<MutableRefObject<StageSize> | null>(null);

export function DiagramSizeProvider({ children }: { children: ReactNode }) {
  const size = useRef<StageSize>(DEFAULT_FIGURE_SIZE);
  return <DiagramSizeContext.Provider value={size}>{children}</DiagramSizeContext.Provider>;
}

/** Called by the Diagram with the size it draws at; does nothing outside a provider. */
export function useReportDiagramSize(size: StageSize): void {
  const ref = useContext(DiagramSizeContext);
  useEffect(() => {
    if (ref && size.width > 0 && size.height > 0) ref.current = { width: size.width, height: size.height };
  }, [ref, size.width, size.height]);
}

export function useDiagramSize(): () => StageSize {
  const ref = useContext(DiagramSizeContext);
  return () => ref?.current ?? DEFAULT_FIGURE_SIZE;
}
