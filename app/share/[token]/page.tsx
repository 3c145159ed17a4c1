import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { SharedScenarioView } from "@/components/sharing/SharedScenarioView";
import { getDb } from "@/db";
import { AppError } from "@/db/errors";
import { openSharedScenarioRecord } from "@/db/share-links";
import { computeShared } from "@/lib/shared-budget";

export const metadata: Metadata = { title: "Shared scenario", robots: { index: false, follow: false } };

/** A scenario through its share link: no sign-in, read-only, computed on the server. Counts a view. */
export default async function SharedScenarioPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const db = getDb();
  const { scenarioId, scenario } = await openSharedScenarioRecord(db, token).catch((error: unknown) => {
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  });
  const { result, resultIssues } = await computeShared(db, { scenarioId, version: scenario.version, document: scenario.document });
  return (
    <>
      <title>{`${scenario.title} · Branchline`}</title>
      <SharedScenarioView scenario={scenario} result={result} resultIssues={resultIssues} />
    </>
  );
}
