"use client";

import type { ReactNode } from "react";
import { useProject } from "@/components/api/projects";
import { NotFoundNotice } from "@/components/ui/NotFoundNotice";
import { QueryView } from "@/components/ui/QueryStates";
import { ProjectHeader } from "./ProjectHeader";

/**
 * Everything under /projects/[projectId]: the project's header and tabs above the page. A project the visitor
 * cannot see answers 404 from the API and shows the not-found page, the same as one that does not exist.
 *
 * The page below is always mounted, even before the project has loaded: it carries the server's redirect of a
 * signed-out visitor to the sign-in page. Each page renders nothing until the project is there.
 */
export function ProjectFrame({ projectId, children }: { projectId: string; children: ReactNode }) {
  const project = useProject(projectId);
  return (
    <>
      <QueryView query={project} what="the project" lines={5} notFound={<NotFoundNotice what="project" />}>
        {(loaded) => (
          <>
            <title>{`${loaded.name} · Branchline`}</title>
            <ProjectHeader project={loaded} />
          </>
        )}
      </QueryView>
      {children}
    </>
  );
}
