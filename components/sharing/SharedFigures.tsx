"use client";

/**
 * The figures of a shared scenario: the editor's Diagram, Offsets, Protocol and Budget, mounted on a
 * read-only editor store that never saves (nothing here can write), with the Budget the server computed; and
 * Export, so that the link holder can take the figure, the numbers and the scenario file away.
 */
import { useEffect } from "react";
import { EditorProvider, useEditorStore } from "@/canvas/EditorProvider";
import { BudgetPanel } from "@/components/editor/BudgetPanel";
import { DiagramPanel } from "@/components/editor/DiagramPanel";
import { OffsetsPanel } from "@/components/editor/OffsetsPanel";
import { ProtocolStrip } from "@/components/editor/ProtocolStrip";
import { DiagramSizeProvider } from "@/components/export/diagram-size";
import { ExportMenu } from "@/components/export/ExportMenu";
import type { ComputeOutcome } from "@/physics/result";
import type { ScenarioDocument } from "@/physics/scenario/schema";

/** Hands the server's result to the store, as the compute worker would (the document never changes here). */
function ServerBudget({ outcome }: { outcome: ComputeOutcome }) {
  const store = useEditorStore();
  useEffect(() => {
    const { revision, budgetFinished } = store.getState();
    budgetFinished(revision, outcome);
  }, [store, outcome]);
  return null;
}

export function SharedFigures({
  title,
  document,
  version,
  outcome,
}: {
  title: string;
  document: ScenarioDocument;
  version: number;
  outcome: ComputeOutcome;
}) {
  return (
    <EditorProvider document={document} version={version} readOnly>
      <DiagramSizeProvider>
        <ServerBudget outcome={outcome} />
        <div className="space-y-6" data-testid="shared-figures">
          <div className="flex justify-end">
            <ExportMenu title={title} />
          </div>
          <div className="grid gap-6 lg:grid-cols-[minmax(0,5fr)_minmax(0,7fr)]">
            <DiagramPanel />
            <OffsetsPanel />
          </div>
          <ProtocolStrip />
          <div className="max-w-3xl">
            <BudgetPanel title={title} />
          </div>
        </div>
      </DiagramSizeProvider>
    </EditorProvider>
  );
}
