"use client";

import { useProject } from "@/components/api/projects";
import { ScenarioSubpage } from "@/components/sharing/ScenarioSubpage";
import { HistoryPanel } from "./HistoryPanel";

/** The history page of a scenario; the project frame above speaks for a project that is loading or missing. */
export function HistoryPage({ projectId, scenarioId }: { projectId: string; scenarioId: string }) {
  const { data: project } = useProject(projectId);
  if (!project) return null;
  return (
    <ScenarioSubpage projectId={projectId} scenarioId={scenarioId} page="history" showSharing={project.can.includes("share:manage")}>
      {(scenario) => <HistoryPanel scenario={scenario} canRestore={project.can.includes("scenario:write")} />}
    </ScenarioSubpage>
  );
}
