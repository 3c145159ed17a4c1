import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { signInPath } from "@/components/auth/callbackUrl";
import { ScenarioEditorPage } from "@/components/editor/ScenarioEditorPage";
import { currentUser } from "@/lib/session";

export const metadata: Metadata = { title: "Scenario" };

export default async function ScenarioPage({ params }: { params: Promise<{ projectId: string; scenarioId: string }> }) {
  const { projectId, scenarioId } = await params;
  if (!(await currentUser())) redirect(signInPath(`/projects/${projectId}/scenarios/${scenarioId}`));
  return <ScenarioEditorPage projectId={projectId} scenarioId={scenarioId} />;
}
