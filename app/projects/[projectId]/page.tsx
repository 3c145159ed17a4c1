import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { signInPath } from "@/components/auth/callbackUrl";
import { ProjectScenarios } from "@/components/project/ProjectScenarios";
import { currentUser } from "@/lib/session";

export const metadata: Metadata = { title: "Project" };

export default async function ProjectPage({ params }: { params: Promise<{ projectId: string }> }) {
  const { projectId } = await params;
  if (!(await currentUser())) redirect(signInPath(`/projects/${projectId}`));
  return <ProjectScenarios projectId={projectId} />;
}
