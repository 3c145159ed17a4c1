import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { signInPath } from "@/components/auth/callbackUrl";
import { ScenarioReadView } from "@/components/scenario/ScenarioReadView";
import { currentUser } from "@/lib/session";

export const metadata: Metadata = { title: "Scenario" };

export default async function ScenarioPage({ params }: { params: Promise<{ projectId: string; scenarioId: string }> }) {
  const { projectId, scenarioId } = await params;
  if (!(await currentUser())) redirect(signInPath(`/projects/${projectId}/scenarios/${scenarioId}`));
  return <ScenarioReadView projectId={projectId} scenarioId={scenarioId} />;
}
