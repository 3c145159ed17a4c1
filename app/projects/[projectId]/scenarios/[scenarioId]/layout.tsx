import type { ReactNode } from "react";
import { requireVisibleProject } from "@/lib/page-access";

export default async function ScenarioLayout({ children, params }: { children: ReactNode; params: Promise<{ projectId: string; scenarioId: string }> }) {
  const { projectId, scenarioId } = await params;
  await requireVisibleProject(projectId, scenarioId);
  return children;
}
