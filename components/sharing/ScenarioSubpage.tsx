"use client";

import Link from "next/link";
import type { ReactNode } from "react";
import { useScenario, type ScenarioDto } from "@/components/api/scenarios";
import { NotFoundNotice } from "@/components/ui/NotFoundNotice";
import { QueryView } from "@/components/ui/QueryStates";
import { filesPath, historyPath, sharingPath } from "./ScenarioSharingIndex";

interface ScenarioSubpageProps {
  projectId: string;
  scenarioId: string;
  page: "sharing" | "history" | "files";
  /** Whether to offer the way to the share links (editors and owners). */
  showSharing: boolean;
  children: (scenario: ScenarioDto) => ReactNode;
}

/** A page about one scenario (its share links, its history): the scenario's title, the ways back and across, then the page. */
const titles = { sharing: "Share links", history: "History", files: "Files" } as const;

export function ScenarioSubpage({ projectId, scenarioId, page: here, showSharing, children }: ScenarioSubpageProps) {
  const scenario = useScenario(projectId, scenarioId);
  const title = titles[here];
  return (
    <QueryView query={scenario} what="the scenario" lines={6} notFound={<NotFoundNotice what="scenario" />}>
      {(s) => (
        <div className="space-y-8">
          <title>{`${title} · ${s.title} · Branchline`}</title>
          <header>
            <Link href={`/projects/${projectId}/scenarios/${scenarioId}`} className="text-sm text-ink-faint hover:text-ink">
              ← {s.title}
            </Link>
            <h1 className="mt-2 font-serif text-3xl font-semibold tracking-tight break-words">
              {title} <span className="text-ink-soft">· {s.title}</span>
            </h1>
            <nav aria-label="About this scenario" className="mt-3 flex gap-4 text-sm">
              {showSharing && (
                <Link href={sharingPath(projectId, scenarioId)} aria-current={here === "sharing" ? "page" : undefined} className={here === "sharing" ? "font-semibold" : "text-ink-soft hover:text-ink"}>
                  Share links
                </Link>
              )}
              <Link href={historyPath(projectId, scenarioId)} aria-current={here === "history" ? "page" : undefined} className={here === "history" ? "font-semibold" : "text-ink-soft hover:text-ink"}>
                History
              </Link>
              <Link href={filesPath(projectId, scenarioId)} aria-current={here === "files" ? "page" : undefined} className={here === "files" ? "font-semibold" : "text-ink-soft hover:text-ink"}>
                Files
              </Link>
              <Link href={`/projects/${projectId}/members`} className="text-ink-soft hover:text-ink">
                Members
              </Link>
            </nav>
          </header>
          {children(s)}
        </div>
      )}
    </QueryView>
  );
}
