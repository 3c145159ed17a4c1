import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { FilesPage } from "@/components/attachments/FilesPage";
import { signInPath } from "@/components/auth/callbackUrl";
import { currentUser } from "@/lib/session";

export const metadata: Metadata = { title: "Files" };

export default async function ScenarioFilesPage({ params }: { params: Promise<{ projectId: string; scenarioId: string }> }) {
  const { projectId, scenarioId } = await params;
  if (!(await currentUser())) redirect(signInPath(`/projects/${projectId}/scenarios/${scenarioId}/files`));
  return <FilesPage projectId={projectId} scenarioId={scenarioId} />;
}
