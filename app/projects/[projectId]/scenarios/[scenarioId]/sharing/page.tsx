import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { signInPath } from "@/components/auth/callbackUrl";
import { SharingPage } from "@/components/sharing/SharingPage";
import { currentUser } from "@/lib/session";

export const metadata: Metadata = { title: "Share links" };

export default async function ScenarioSharingPage({ params }: { params: Promise<{ projectId: string; scenarioId: string }> }) {
  const { projectId, scenarioId } = await params;
  if (!(await currentUser())) redirect(signInPath(`/projects/${projectId}/scenarios/${scenarioId}/sharing`));
  return <SharingPage projectId={projectId} scenarioId={scenarioId} />;
}
