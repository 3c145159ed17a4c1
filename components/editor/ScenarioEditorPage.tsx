"use client";

/** The editor as a page body: a client boundary so the route file stays a thin server component. */
import { ScenarioEditor } from "./ScenarioEditor";

export const scenarioEditPath = (projectId: string, scenarioId: string) =>
  `/projects/${encodeURIComponent(projectId)}/scenarios/${encodeURIComponent(scenarioId)}/edit`;

export function ScenarioEditorPage({ projectId, scenarioId }: { projectId: string; scenarioId: string }) {
  return <ScenarioEditor projectId={projectId} scenarioId={scenarioId} editPath={scenarioEditPath} />;
}
