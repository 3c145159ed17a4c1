import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { signInPath } from "@/components/auth/callbackUrl";
import { HistoryPage } from "@/components/history/HistoryPage";
import { currentUser } from "@/lib/session";

export const metadata: Metadata = { title: "History" };

export default async function ScenarioHistoryPage({ params }: { params: Promise<{ projectId: string; scenarioId: string }> }) {
  const { projectId, scenarioId } = await params;
  if (!(await currentUser())) redirect(signInPath(`/projects/${projectId}/scenarios/${scenarioId}/history`));
  return <HistoryPage projectId={projectId} scenarioId={scenarioId} />;
}
