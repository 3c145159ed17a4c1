"use client";

import dynamic from "next/dynamic";
import { useEditor } from "@/canvas/EditorProvider";
import { useReportDiagramSize } from "@/components/export/diagram-size";
import { DIAGRAM_MIN_HEIGHT, diagramHeightFor } from "@/components/export/figure-size";
import { BranchLegend } from "./BranchLegend";
import { useElementSize } from "./useElementSize";
import { usePanelValue } from "./usePacedDuringDrag";

const DiagramStage = dynamic(() => import("@/canvas/layers/DiagramStage"), {
  ssr: false,
  loading: () => <p className="p-4 text-sm text-ink-faint">Drawing the diagram…</p>,
});

/**
 * Notes under the figure: what is exaggerated or rescaled (from the same scene the stage draws). Some carry the
 * drawn lengths, which change with a drag: they follow it at the panels' pace (a new line of text each frame would
 * lay the page out again on every frame).
 */
function DiagramNotes() {
  // One string, so that a frame whose notes did not change re-renders nothing here.
  const joined = usePanelValue((s) => {
    const outcome = s.diagramScene(s.document);
    return outcome.ok ? outcome.scene.notes.join("\n") : "";
  });
  if (!joined) return null;
  return (
    <ul className="mt-2 space-y-0.5 text-xs text-ink-faint">
      {joined.split("\n").map((note) => (
        <li key={note}>{note}</li>
      ))}
    </ul>
  );
}

function useDiagramHeight(width: number): number {
  const bounds = useEditor((s) => {
    const outcome = s.diagramScene(s.document);
    return outcome.ok ? outcome.scene.bounds : null;
  });
  return diagramHeightFor(bounds, width);
}

export function DiagramPanel() {
  const [ref, size] = useElementSize<HTMLDivElement>({ width: 480, height: DIAGRAM_MIN_HEIGHT });
  const height = useDiagramHeight(size.width);
  useReportDiagramSize({ width: size.width, height });
  return (
    <section aria-labelledby="diagram-heading" className="min-w-0">
      <h2 id="diagram-heading" className="mb-2 text-sm font-semibold uppercase tracking-wide text-ink-soft">
        Diagram
      </h2>
      <div ref={ref} className="overflow-hidden rounded border border-rule" style={{ height }} data-testid="diagram">
        {size.width > 0 && <DiagramStage width={size.width} height={height} />}
      </div>
      <div className="mt-2">
        <BranchLegend radiation />
      </div>
      <DiagramNotes />
    </section>
  );
}
