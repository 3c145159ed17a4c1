"use client";

/** The editor as the scenario page's body, with the scenario's revisions below it. */
import { RevisionList } from "@/components/scenario/RevisionList";
import { ScenarioEditor } from "./ScenarioEditor";

export const scenarioPath = (projectId: string, scenarioId: string) =>
  `/projects/${encodeURIComponent(projectId)}/scenarios/${encodeURIComponent(scenarioId)}`;

export function ScenarioEditorPage({ projectId, scenarioId }: { projectId: string; scenarioId: string }) {
  return (
    <ScenarioEditor
      projectId={projectId}
      scenarioId={scenarioId}
      editPath={scenarioPath}
      footer={(version) => <RevisionList projectId={projectId} scenarioId={scenarioId} currentVersion={version} />}
    />
  );
}
