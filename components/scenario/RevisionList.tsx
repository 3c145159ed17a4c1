"use client";

import { useRevisions } from "@/components/api/scenarios";
import { LoadError, Skeleton } from "@/components/ui/QueryStates";
import { TimeStamp } from "@/components/ui/TimeStamp";
import { tableStyles } from "@/components/ui/styles";

export function RevisionList({ projectId, scenarioId, currentVersion }: { projectId: string; scenarioId: string; currentVersion: number }) {
  const revisions = useRevisions(projectId, scenarioId);
  return (
    <section aria-labelledby="revisions-title">
      <h2 id="revisions-title" className="mb-3 font-serif text-xl font-semibold">
        Revisions
      </h2>
      {revisions.isPending ? (
        <Skeleton lines={3} label="Loading revisions" />
      ) : revisions.isError ? (
        <LoadError error={revisions.error} onRetry={() => revisions.refetch()} what="the revisions" />
      ) : (
        <table className={tableStyles.table}>
          <caption className="sr-only">Every saved version of this scenario, newest first</caption>
          <thead>
            <tr>
              <th scope="col" className={`${tableStyles.head} text-right`}>
                Version
              </th>
              <th scope="col" className={tableStyles.head}>
                Title then
              </th>
              <th scope="col" className={tableStyles.head}>
                Saved by
              </th>
              <th scope="col" className={tableStyles.head}>
                When
              </th>
            </tr>
          </thead>
          <tbody>
            {revisions.data.map((revision) => (
              <tr key={revision.version} className={tableStyles.row}>
                <td className={`${tableStyles.cell} tabular text-right`}>
                  v{revision.version}
                  {revision.version === currentVersion && <span className="ml-2 font-sans text-xs text-ink-faint">current</span>}
                </td>
                <td className={tableStyles.cell}>{revision.title}</td>
                <td className={`${tableStyles.cell} text-ink-soft`}>{revision.createdBy?.name ?? "—"}</td>
                <td className={tableStyles.cell}>
                  <TimeStamp iso={revision.createdAt} layout="inline" />
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </section>
  );
}
