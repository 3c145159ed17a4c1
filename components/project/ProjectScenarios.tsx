"use client";

import { Suspense } from "react";
import { useProject } from "@/components/api/projects";
import { roleNames } from "@/components/format/words";
import { Notice } from "@/components/ui/Notice";
import { Skeleton } from "@/components/ui/QueryStates";
import { ImportScenarioFile } from "./ImportScenarioFile";
import { NewScenarioForm } from "./NewScenarioForm";
import { ScenarioTable } from "./ScenarioTable";

/** The scenarios tab. The project itself is loaded (and its 404 handled) by the frame around it. */
export function ProjectScenarios({ projectId }: { projectId: string }) {
  const { data: project } = useProject(projectId);
  if (!project) return null;
  const canWrite = project.can.includes("scenario:write");
  return (
    <>
      {canWrite ? (
        <>
          <NewScenarioForm projectId={project.id} />
          <ImportScenarioFile projectId={project.id} />
        </>
      ) : (
        <div className="mb-8">
          <Notice>
            You can look at this project’s scenarios but not change them: your role is {roleNames[project.role].toLowerCase()}.
          </Notice>
        </div>
      )}
      <Suspense fallback={<Skeleton lines={6} label="Loading scenarios" />}>
        <ScenarioTable project={project} />
      </Suspense>
    </>
  );
}
