"use client";

import { useEffect, useState } from "react";
import { messageOf } from "@/components/api/client";
import type { ProjectDto } from "@/components/api/projects";
import { useDeleteScenario, useDuplicateScenario, useScenarioPage, type ScenarioSummaryDto } from "@/components/api/scenarios";
import { sentence } from "@/components/format/text";
import { ConfirmDialog } from "@/components/ui/ConfirmDialog";
import { EmptyState } from "@/components/ui/EmptyState";
import { Notice } from "@/components/ui/Notice";
import { QueryView } from "@/components/ui/QueryStates";
import { Pager } from "./Pager";
import { ScenarioFilters } from "./ScenarioFilters";
import { ScenarioGrid } from "./ScenarioGrid";
import { useScenarioListParams } from "./useScenarioListParams";

/** The project's scenarios: filters, the sortable table, paging, and the row actions' mutations. */
export function ScenarioTable({ project }: { project: ProjectDto }) {
  const [query, setQuery] = useScenarioListParams();
  const scenarios = useScenarioPage(project.id, query);
  const duplicate = useDuplicateScenario(project.id);
  const remove = useDeleteScenario(project.id);
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

  const onDuplicate = (scenario: ScenarioSummaryDto) => {
    setProblem(null);
    duplicate.mutate(scenario.id, { onError: (error) => setProblem(`could not duplicate “${scenario.title}”: ${messageOf(error)}`) });
  };

  return (
    <section aria-labelledby="scenarios-title" className="space-y-4">
      <h2 id="scenarios-title" className="font-serif text-xl font-semibold">
        Scenarios
      </h2>
      <ScenarioFilters query={query} onChange={setQuery} />

      {problem && (
        <Notice tone="invalid" onDismiss={() => setProblem(null)}>
          {sentence(problem)}
        </Notice>
      )}

      <QueryView query={scenarios} what="the scenarios" lines={6}>
        {(page) =>
          page.total > 0 ? (
            <div className={scenarios.isPlaceholderData ? "opacity-60 transition-opacity" : "transition-opacity"} aria-busy={scenarios.isFetching}>
              <ScenarioGrid
                project={project}
                scenarios={page.items}
                sort={query}
                onSort={(sort, order) => setQuery({ sort, order })}
                actions={canWrite ? { onDuplicate, duplicatingId: duplicate.isPending ? duplicate.variables : null, onDelete: setDeleting } : null}
              />
              <Pager page={query.page} pageSize={query.pageSize} total={page.total} onPage={(n) => setQuery({ page: n })} />
            </div>
          ) : query.q || query.background ? (
            <EmptyState title="No scenario matches these filters">Change the search or the background shown, or clear the filters.</EmptyState>
          ) : (
            <EmptyState title="No scenarios yet">
              {canWrite ? "Create the first one with the form above." : "Nobody has added a scenario to this project yet."}
            </EmptyState>
          )
        }
      </QueryView>

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
