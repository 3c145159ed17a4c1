"use client";

import Link from "next/link";
import { useEffect, useState } from "react";
import { messageOf } from "@/components/api/client";
import type { ProjectDto } from "@/components/api/projects";
import { useDeleteScenario, useDuplicateScenario, useScenarioPage, type ScenarioSummaryDto } from "@/components/api/scenarios";
import { backgroundName } from "@/components/format/words";
import { sentence } from "@/components/format/text";
import { ConfirmDialog } from "@/components/ui/ConfirmDialog";
import { Notice } from "@/components/ui/Notice";
import { LoadError, Skeleton } from "@/components/ui/QueryStates";
import { TimeStamp } from "@/components/ui/TimeStamp";
import { buttonStyles, tableStyles } from "@/components/ui/styles";
import { Pager } from "./Pager";
import { RenameScenarioForm } from "./RenameScenarioForm";
import { ScenarioFilters } from "./ScenarioFilters";
import { SortableHeader } from "./SortableHeader";
import { useScenarioListParams } from "./useScenarioListParams";

export function ScenarioTable({ project }: { project: ProjectDto }) {
  const [query, setQuery] = useScenarioListParams();
  const scenarios = useScenarioPage(project.id, query);
  const duplicate = useDuplicateScenario(project.id);
  const remove = useDeleteScenario(project.id);
  const [renaming, setRenaming] = useState<string | null>(null);
  const [deleting, setDeleting] = useState<ScenarioSummaryDto | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const canWrite = project.can.includes("scenario:write");

  // After deletions (or an old link) the page may lie beyond the last one: step back to the last page.
  const total = scenarios.data?.total;
  useEffect(() => {
    if (total === undefined) return;
    const lastPage = Math.max(1, Math.ceil(total / query.pageSize));
    if (query.page > lastPage) setQuery({ page: lastPage });
  }, [total, query.page, query.pageSize, setQuery]);

  const sort = (key: typeof query.sort, order: typeof query.order) => setQuery({ sort: key, order });
  const filtered = Boolean(query.q || query.background);

  return (
    <section aria-labelledby="scenarios-title" className="space-y-4">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <h2 id="scenarios-title" className="font-serif text-xl font-semibold">
          Scenarios
        </h2>
        <ScenarioFilters query={query} onChange={setQuery} />
      </div>

      {problem && (
        <Notice
          tone="invalid"
          action={
            <button type="button" onClick={() => setProblem(null)} className={`${buttonStyles.row} -my-1`}>
              Dismiss
            </button>
          }
        >
          {sentence(problem)}
        </Notice>
      )}

      {scenarios.isPending ? (
        <Skeleton lines={6} label="Loading scenarios" />
      ) : scenarios.isError ? (
        <LoadError error={scenarios.error} onRetry={() => scenarios.refetch()} what="the scenarios" />
      ) : scenarios.data.total === 0 ? (
        <div className="border-y border-rule py-10 text-center text-ink-soft">
          {filtered ? (
            <>
              <p className="font-serif text-lg text-ink">No scenario matches these filters</p>
              <button type="button" onClick={() => setQuery({ q: undefined, background: undefined })} className={`${buttonStyles.secondary} mt-4`}>
                Clear filters
              </button>
            </>
          ) : (
            <>
              <p className="font-serif text-lg text-ink">No scenarios yet</p>
              <p className="mt-2 text-sm">{canWrite ? "Create the first one with the form above." : "Nobody has added a scenario to this project yet."}</p>
            </>
          )}
        </div>
      ) : (
        <div className={scenarios.isPlaceholderData ? "opacity-60 transition-opacity" : "transition-opacity"} aria-busy={scenarios.isFetching}>
          <div className="overflow-x-auto">
            <table className={tableStyles.table}>
              <caption className="sr-only">Scenarios in {project.name}; column headers with buttons sort the table</caption>
              <thead>
                <tr>
                  <SortableHeader label="Title" sortKey="title" firstOrder="asc" current={query} onSort={sort} />
                  <SortableHeader label="Background" sortKey="backgroundKind" firstOrder="asc" current={query} onSort={sort} />
                  <th scope="col" className={`${tableStyles.head} text-right`}>
                    Version
                  </th>
                  <SortableHeader label="Last change" sortKey="updatedAt" firstOrder="desc" current={query} onSort={sort} />
                  <th scope="col" className={tableStyles.head}>
                    Changed by
                  </th>
                  {canWrite && (
                    <th scope="col" className={`${tableStyles.head} text-right`}>
                      <span className="sr-only">Actions</span>
                    </th>
                  )}
                </tr>
              </thead>
              <tbody>
                {scenarios.data.items.map((scenario) => (
                  <tr key={scenario.id} className={tableStyles.row}>
                    <td className={`${tableStyles.cell} min-w-64`}>
                      {renaming === scenario.id ? (
                        <RenameScenarioForm scenario={scenario} onDone={() => setRenaming(null)} />
                      ) : (
                        <Link href={`/projects/${project.id}/scenarios/${scenario.id}`} className="font-semibold text-ink underline-offset-4 hover:underline">
                          {scenario.title}
                        </Link>
                      )}
                    </td>
                    <td className={`${tableStyles.cell} text-ink-soft`}>{backgroundName(scenario.backgroundKind)}</td>
                    <td className={`${tableStyles.cell} tabular text-right`}>v{scenario.version}</td>
                    <td className={tableStyles.cell}>
                      <TimeStamp iso={scenario.updatedAt} />
                    </td>
                    <td className={`${tableStyles.cell} text-ink-soft`}>{scenario.updatedBy?.name ?? "—"}</td>
                    {canWrite && (
                      <td className={`${tableStyles.cell} whitespace-nowrap text-right`}>
                        <button type="button" onClick={() => setRenaming(scenario.id)} disabled={renaming === scenario.id} className={buttonStyles.row}>
                          Rename
                        </button>
                        <button
                          type="button"
                          disabled={duplicate.isPending && duplicate.variables === scenario.id}
                          onClick={() => {
                            setProblem(null);
                            duplicate.mutate(scenario.id, { onError: (error) => setProblem(`could not duplicate “${scenario.title}”: ${messageOf(error)}`) });
                          }}
                          className={buttonStyles.row}
                        >
                          {duplicate.isPending && duplicate.variables === scenario.id ? "Duplicating…" : "Duplicate"}
                        </button>
                        <button type="button" onClick={() => setDeleting(scenario)} className={buttonStyles.row}>
                          Delete
                        </button>
                      </td>
                    )}
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <Pager page={query.page} pageSize={query.pageSize} total={scenarios.data.total} onPage={(page) => setQuery({ page })} />
        </div>
      )}

      <ConfirmDialog
        open={deleting !== null}
        title={`Delete “${deleting?.title ?? ""}”?`}
        confirmLabel="Delete scenario"
        pending={remove.isPending}
        error={remove.isError ? sentence(messageOf(remove.error)) : null}
        onCancel={() => {
          setDeleting(null);
          remove.reset();
        }}
        onConfirm={() => deleting && remove.mutate(deleting.id, { onSuccess: () => setDeleting(null) })}
      >
        The scenario and all its revisions will be deleted for everyone in this project. This cannot be undone.
      </ConfirmDialog>
    </section>
  );
}
