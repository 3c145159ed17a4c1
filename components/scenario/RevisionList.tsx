"use client";

import { useRevisions } from "@/components/api/scenarios";
import { QueryView } from "@/components/ui/QueryStates";
import { TimeStamp } from "@/components/ui/TimeStamp";
import { TableHead } from "@/components/ui/TableHead";
import { tableStyles } from "@/components/ui/styles";

const revisionColumns = [{ label: "Version", className: "text-right" }, { label: "Title then" }, { label: "Saved by" }, { label: "When" }];

export function RevisionList({ projectId, scenarioId, currentVersion }: { projectId: string; scenarioId: string; currentVersion: number }) {
  const revisions = useRevisions(projectId, scenarioId);
  return (
    <section aria-labelledby="revisions-title">
      <h2 id="revisions-title" className="mb-3 font-serif text-xl font-semibold">
        Revisions
      </h2>
      <QueryView query={revisions} what="the revisions" lines={3}>
        {(list) => (
          <table className={tableStyles.table}>
            <caption className="sr-only">Every saved version of this scenario, newest first</caption>
            <TableHead columns={revisionColumns} />
            <tbody>
              {list.map((revision) => (
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
      </QueryView>
    </section>
  );
}
