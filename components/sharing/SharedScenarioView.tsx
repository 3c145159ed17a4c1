import Link from "next/link";
import { backgroundName } from "@/components/format/words";
import { DocumentDetails } from "@/components/scenario/DocumentDetails";
import { Notice } from "@/components/ui/Notice";
import { TimeStamp } from "@/components/ui/TimeStamp";
import { linkStyles } from "@/components/ui/styles";
import type { SharedScenarioDto } from "@/contracts/dto";
import type { ComputeIssue, ScenarioResult } from "@/physics/result";
import { SharedFigures } from "./SharedFigures";

function IssueList({ issues }: { issues: { path: string; message: string }[] }) {
  return (
    <ul className="mt-2 list-disc pl-5">
      {issues.map((issue, i) => (
        <li key={i}>
          <span className="font-mono">{issue.path || "document"}</span>: {issue.message}
        </li>
      ))}
    </ul>
  );
}

/**
 * A scenario as a share link shows it: read-only, with nothing of its project but the scenario itself (no project
 * name, no members, no other scenarios): the Diagram, Offsets, Protocol and Budget, then every parameter.
 */
export function SharedScenarioView({ scenario, result, resultIssues }: { scenario: SharedScenarioDto; result: ScenarioResult | null; resultIssues: ComputeIssue[] | null }) {
  return (
    <article aria-labelledby="shared-title" className="space-y-10">
      <header>
        <p className="text-sm text-ink-faint">Shared scenario · read-only</p>
        <h1 id="shared-title" className="mt-1 font-serif text-3xl font-semibold tracking-tight break-words">
          {scenario.title}
        </h1>
        <p className="mt-2 flex flex-wrap gap-x-2 text-sm text-ink-soft">
          <span>{backgroundName(scenario.backgroundKind)}</span>
          <span aria-hidden="true">·</span>
          <span className="tabular">v{scenario.version}</span>
          <span aria-hidden="true">·</span>
          <span>
            changed <TimeStamp iso={scenario.updatedAt} layout="inline" />
          </span>
        </p>
      </header>

      <Notice>
        You are looking at this scenario through a share link: you can read it, not change it. It shows the scenario as it is now
        {scenario.linkExpiresAt ? (
          <>
            , until the link expires <TimeStamp iso={scenario.linkExpiresAt} layout="inline" />
          </>
        ) : null}
        . How each number is computed is on the{" "}
        <Link href="/methods" className={linkStyles}>
          Methods
        </Link>{" "}
        page.
      </Notice>

      {scenario.document && (result || resultIssues) && (
        <SharedFigures
          title={scenario.title}
          document={scenario.document}
          version={scenario.version}
          outcome={result ? { ok: true, result } : { ok: false, issues: resultIssues ?? [] }}
        />
      )}

      {scenario.document ? (
        <section aria-labelledby="parameters-title" className="space-y-4">
          <h2 id="parameters-title" className="font-serif text-xl font-semibold">
            Parameters
          </h2>
          <DocumentDetails document={scenario.document} />
        </section>
      ) : (
        <Notice tone="caution">
          <p>This scenario’s stored document cannot be read by this version of Branchline.</p>
          <IssueList issues={scenario.documentIssues ?? []} />
        </Notice>
      )}

    </article>
  );
}
