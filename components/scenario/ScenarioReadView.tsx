"use client";

import Link from "next/link";
import { useProject, type ProjectDto } from "@/components/api/projects";
import { useScenario, type ScenarioDto } from "@/components/api/scenarios";
import { backgroundName, roleNames } from "@/components/format/words";
import { NotFoundNotice } from "@/components/ui/NotFoundNotice";
import { Notice } from "@/components/ui/Notice";
import { QueryView } from "@/components/ui/QueryStates";
import { TimeStamp } from "@/components/ui/TimeStamp";
import { DocumentDetails } from "./DocumentDetails";
import { RevisionList } from "./RevisionList";

/** A plain read of a stored scenario: its settings with units and its revisions. */
export function ScenarioReadView({ projectId, scenarioId }: { projectId: string; scenarioId: string }) {
  const { data: project } = useProject(projectId);
  const scenario = useScenario(projectId, scenarioId);

  // The project frame above speaks for a project that is loading, missing or failed.
  if (!project) return null;
  return (
    <QueryView query={scenario} what="the scenario" lines={8} notFound={<NotFoundNotice what="scenario" />}>
      {(loaded) => <ScenarioDetails project={project} scenario={loaded} />}
    </QueryView>
  );
}

function ScenarioDetails({ project, scenario: s }: { project: ProjectDto; scenario: ScenarioDto }) {
  const readOnly = !project.can.includes("scenario:write");

  return (
    <article aria-labelledby="scenario-title" className="space-y-10">
      <title>{`${s.title} · Branchline`}</title>
      <header>
        <Link href={`/projects/${project.id}`} className="text-sm text-ink-faint hover:text-ink">
          ← All scenarios
        </Link>
        <h1 id="scenario-title" className="mt-2 font-serif text-3xl font-semibold tracking-tight break-words">
          {s.title}
        </h1>
        <p className="mt-2 flex flex-wrap gap-x-2 text-sm text-ink-soft">
          <span>{backgroundName(s.backgroundKind)}</span>
          <span aria-hidden="true">·</span>
          <span className="tabular">v{s.version}</span>
          <span aria-hidden="true">·</span>
          <span>
            changed <TimeStamp iso={s.updatedAt} layout="inline" />
            {s.updatedBy && <> by {s.updatedBy.name}</>}
          </span>
        </p>
      </header>

      {readOnly && (
        <Notice>
          Read-only: your role in this project ({roleNames[project.role].toLowerCase()}) lets you look at this scenario but
          not change it.
        </Notice>
      )}

      {s.document ? (
        <DocumentDetails document={s.document} />
      ) : (
        <Notice tone="caution">
          <p>This scenario’s stored document cannot be read by this version of Branchline. It is kept unchanged.</p>
          <ul className="mt-2 list-disc pl-5">
            {(s.documentIssues ?? []).map((issue, i) => (
              <li key={i}>
                <span className="font-mono">{issue.path || "document"}</span>: {issue.message}
              </li>
            ))}
          </ul>
        </Notice>
      )}

      <RevisionList projectId={project.id} scenarioId={s.id} currentVersion={s.version} />
    </article>
  );
}
