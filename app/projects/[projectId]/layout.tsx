import type { ReactNode } from "react";
import { ProjectFrame } from "@/components/project/ProjectFrame";
import { requireVisibleProject } from "@/lib/page-access";

export default async function ProjectLayout({ children, params }: { children: ReactNode; params: Promise<{ projectId: string }> }) {
  const { projectId } = await params;
  await requireVisibleProject(projectId);
  return <ProjectFrame projectId={projectId}>{children}</ProjectFrame>;
}
