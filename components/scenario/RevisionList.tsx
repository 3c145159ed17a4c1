"use client";

import { useRevisions } from "@/components/api/scenarios";
import { QueryView } from "@/components/ui/QueryStates";
import { TableHead } from "@/components/ui/TableHead";
import { tableStyles } from "@/components/ui/styles";
import { RevisionCells, revisionColumns } from "./RevisionCells";

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
                  <RevisionCells revision={revision} currentVersion={currentVersion} />
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </QueryView>
    </section>
  );
}
