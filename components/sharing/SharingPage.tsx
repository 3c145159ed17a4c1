"use client";

import { useProject } from "@/components/api/projects";
import { roleNames } from "@/components/format/words";
import { Notice } from "@/components/ui/Notice";
import { ScenarioSubpage } from "./ScenarioSubpage";
import { ShareLinksPanel } from "./ShareLinksPanel";

/** The share links page of a scenario; the project frame above speaks for a project that is loading or missing. */
export function SharingPage({ projectId, scenarioId }: { projectId: string; scenarioId: string }) {
  const { data: project } = useProject(projectId);
  if (!project) return null;
  const shares = project.can.includes("share:manage");
  return (
    <ScenarioSubpage projectId={projectId} scenarioId={scenarioId} page="sharing" showSharing={shares}>
      {() =>
        shares ? (
          <ShareLinksPanel projectId={projectId} scenarioId={scenarioId} />
        ) : (
          <Notice>Editors and owners make share links; your role in this project ({roleNames[project.role].toLowerCase()}) lets you look, not share.</Notice>
        )
      }
    </ScenarioSubpage>
  );
}
