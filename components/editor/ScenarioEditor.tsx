"use client";

/**
 * The scenario editor, Branchline's main screen: loads the scenario and the caller's rights in the project, then
 * mounts one editor store (read-only for a viewer) with the Diagram, Offsets, Protocol, Parameters, Budget
 * and Sweep around it.
 */
import Link from "next/link";
import type { ReactNode } from "react";
import { EditorProvider, useEditor, useEditorStore } from "@/canvas/EditorProvider";
import { DiagramSizeProvider } from "@/components/export/diagram-size";
import { useProject, type ProjectDto } from "@/components/api/projects";
import { useScenario, type ScenarioDto } from "@/components/api/scenarios";
import { NotFoundNotice } from "@/components/ui/NotFoundNotice";
import { Notice } from "@/components/ui/Notice";
import { QueryView } from "@/components/ui/QueryStates";
import type { ScenarioDocument } from "@/physics/scenario/schema";
import { BudgetPanel } from "./BudgetPanel";
import { ConflictDialog } from "./ConflictDialog";
import { DiagramPanel } from "./DiagramPanel";
import { EditorToolbar } from "./EditorToolbar";
import { OffsetsPanel } from "./OffsetsPanel";
import { NewerVersionBanner } from "./NewerVersionBanner";
import { ParametersPanel } from "./ParametersPanel";
import { ProtocolStrip } from "./ProtocolStrip";
import { filesPath, historyPath, sharingPath } from "@/components/sharing/ScenarioSharingIndex";
import { EditorSequencerImport } from "@/components/uploads/EditorSequencerImport";
import { SweepPanel } from "./SweepPanel";
import { MapPanel } from "./MapPanel";
import { useAutosave } from "./useAutosave";
import { useUndoShortcuts } from "./useUndoShortcuts";

export interface ScenarioEditorProps {
  projectId: string;
  scenarioId: string;
  /** The page a scenario's editor lives at (where "save my edits as a copy" goes). */
  editPath(projectId: string, scenarioId: string): string;
  /** Shown under the editor (the revision list), given the version the editor last loaded or saved. */
  footer?(version: number): ReactNode;
}

export function ScenarioEditor({ projectId, scenarioId, editPath, footer }: ScenarioEditorProps) {
  const { data: project } = useProject(projectId);
  const scenario = useScenario(projectId, scenarioId);
  if (!project) return null;
  return (
    <QueryView query={scenario} what="the scenario" lines={10} notFound={<NotFoundNotice what="scenario" />}>
      {(loaded) =>
        loaded.document ? (
          <EditorProvider key={loaded.id} document={loaded.document} version={loaded.version} readOnly={!project.can.includes("scenario:write")}>
            <DiagramSizeProvider>
              <EditorBody project={project} scenario={loaded} document={loaded.document} editPath={(id) => editPath(projectId, id)} footer={footer} />
            </DiagramSizeProvider>
          </EditorProvider>
        ) : (
          <Notice tone="invalid">
            This scenario's document cannot be read, so it cannot be edited:{" "}
            {(loaded.documentIssues ?? []).map((i) => `${i.message}${i.path ? ` (${i.path})` : ""}`).join("; ")}
          </Notice>
        )
      }
    </QueryView>
  );
}

function EditorBody({
  project,
  scenario,
  editPath,
  footer,
}: {
  project: ProjectDto;
  scenario: ScenarioDto;
  document: ScenarioDocument;
  editPath(scenarioId: string): string;
  footer?(version: number): ReactNode;
}) {
  const store = useEditorStore();
  const { saveNow } = useAutosave(store, project.id, scenario.id);
  useUndoShortcuts(store);
  const version = useEditor((s) => s.save.baseVersion);
  return (
    <article className="space-y-6" aria-label={`Editor for ${scenario.title}`} data-editor="">
      <title>{`${scenario.title} · Branchline`}</title>
      <nav aria-label="Around this scenario" className="flex flex-wrap items-baseline justify-between gap-x-6 gap-y-1 text-sm">
        <Link href={`/projects/${project.id}`} className="text-ink-faint hover:text-ink">
          ← All scenarios
        </Link>
        <span className="flex gap-4">
          {project.can.includes("share:manage") && (
            <Link href={sharingPath(project.id, scenario.id)} className="text-ink-soft hover:text-ink">
              Share links
            </Link>
          )}
          <Link href={historyPath(project.id, scenario.id)} className="text-ink-soft hover:text-ink">
            History
          </Link>
          <Link href={filesPath(project.id, scenario.id)} className="text-ink-soft hover:text-ink">
            Files
          </Link>
        </span>
      </nav>
      <EditorToolbar title={scenario.title} onRetrySave={saveNow} />
      <NewerVersionBanner projectId={project.id} scenarioId={scenario.id} title={scenario.title} editPath={editPath} />
      <div className="grid gap-6 lg:grid-cols-[minmax(0,5fr)_minmax(0,7fr)]">
        <DiagramPanel />
        <OffsetsPanel />
      </div>
      <div className="space-y-2">
        <ProtocolStrip />
        {project.can.includes("scenario:write") && <EditorSequencerImport projectId={project.id} scenarioId={scenario.id} />}
      </div>
      <div className="grid gap-6 lg:grid-cols-[minmax(0,4fr)_minmax(0,8fr)]">
        <ParametersPanel />
        <div className="space-y-8">
          <BudgetPanel title={scenario.title} />
          <SweepPanel />
          <MapPanel projectId={project.id} scenarioId={scenario.id} title={scenario.title} />
        </div>
      </div>
      <ConflictDialog projectId={project.id} scenarioId={scenario.id} title={scenario.title} editPath={editPath} />
      {footer?.(version)}
    </article>
  );
}
