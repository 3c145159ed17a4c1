import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { EmbeddedDiagram } from "@/components/export/EmbeddedDiagram";
import { embedOptions } from "@/components/export/embed-options";
import { getDb } from "@/db";
import { AppError } from "@/db/errors";
import { openSharedScenarioRecord } from "@/db/share-links";
import { computeShared } from "@/lib/shared-budget";

export const metadata: Metadata = { title: "Diagram", robots: { index: false, follow: false } };

/**
 * The Diagram of a shared scenario alone, for framing in slides and pages (any origin may frame it; see
 * next.config.mjs). The token is a share link's; a dead one is not found, as on /share. Counts a view.
 */
export default async function EmbedPage({ params, searchParams }: { params: Promise<{ token: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { token } = await params;
  const options = embedOptions(await searchParams);
  const db = getDb();
  const { scenarioId, scenario } = await openSharedScenarioRecord(db, token).catch((error: unknown) => {
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  });
  const { result, resultIssues } = await computeShared(db, { scenarioId, version: scenario.version, document: scenario.document });
  return (
    <>
      <title>{`${scenario.title} · Branchline`}</title>
      <EmbeddedDiagram title={scenario.title} document={scenario.document} version={scenario.version} result={result} resultIssues={resultIssues} sharePath={`/share/${encodeURIComponent(token)}`} options={options} />
    </>
  );
}
