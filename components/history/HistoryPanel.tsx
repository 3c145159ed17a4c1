"use client";

import { useState } from "react";
import { messageOf } from "@/components/api/client";
import { useRestoreRevision } from "@/components/api/history";
import { useRevisions, type RevisionSummaryDto, type ScenarioDto } from "@/components/api/scenarios";
import { sentence } from "@/components/format/text";
import { ConfirmDialog } from "@/components/ui/ConfirmDialog";
import { Notice } from "@/components/ui/Notice";
import { QueryView } from "@/components/ui/QueryStates";
import { TableHead } from "@/components/ui/TableHead";
import { buttonStyles, tableStyles } from "@/components/ui/styles";
import { RevisionCells, revisionColumns } from "@/components/scenario/RevisionCells";
import { ParameterComparison } from "./ParameterComparison";

interface Pair {
  older: number;
  newer: number;
}

/** By default the two latest versions (or the only one, with itself). */
const latestPair = (list: RevisionSummaryDto[]): Pair => ({ older: list[Math.min(1, list.length - 1)].version, newer: list[0].version });

/**
 * Every saved version of a scenario (newest first), who saved it and when; two chosen versions compared; and,
 * for editors and owners, restoring an old version as a new one.
 */
export function HistoryPanel({ scenario, canRestore }: { scenario: ScenarioDto; canRestore: boolean }) {
  const revisions = useRevisions(scenario.projectId, scenario.id);
  const restore = useRestoreRevision(scenario.projectId, scenario.id);
  const [chosen, setChosen] = useState<Pair | null>(null);
  const [restoring, setRestoring] = useState<RevisionSummaryDto | null>(null);
  const [restored, setRestored] = useState<string | null>(null);

  const columns = [
    ...revisionColumns,
    { label: "Compare: older" },
    { label: "Compare: newer" },
    ...(canRestore ? [{ label: "Restore", hiddenLabel: true }] : []),
  ];

  return (
    <QueryView query={revisions} what="the history" lines={5}>
      {(list) => {
        const pair = chosen ?? latestPair(list);
        const choose = (side: keyof Pair, version: number) => {
          const next = { ...pair, [side]: version };
          // Keep the older side older, whichever radio was clicked.
          setChosen(next.older <= next.newer ? next : { older: next.newer, newer: next.older });
        };
        return (
          <div className="space-y-10">
            {restored && (
              <Notice tone="success" onDismiss={() => setRestored(null)}>
                {restored}
              </Notice>
            )}
            <section aria-labelledby="versions-title" className="space-y-3">
              <h2 id="versions-title" className="font-serif text-xl font-semibold">
                Versions
              </h2>
              <table className={tableStyles.table}>
                <caption className="sr-only">Every saved version of this scenario, newest first</caption>
                <TableHead columns={columns} />
                <tbody>
                  {list.map((revision) => (
                    <tr key={revision.version} className={tableStyles.row}>
                      <RevisionCells revision={revision} currentVersion={scenario.version} />
                      {(["older", "newer"] as const).map((side) => (
                        <td key={side} className={`${tableStyles.cell} text-center`}>
                          <input
                            type="radio"
                            name={`compare-${side}`}
                            aria-label={`Compare v${revision.version} as the ${side} version`}
                            checked={pair[side] === revision.version}
                            onChange={() => choose(side, revision.version)}
                          />
                        </td>
                      ))}
                      {canRestore && (
                        <td className={`${tableStyles.cell} text-right`}>
                          {revision.version !== scenario.version && (
                            <button type="button" className={buttonStyles.row} onClick={() => setRestoring(revision)} aria-label={`Restore v${revision.version}`}>
                              Restore
                            </button>
                          )}
                        </td>
                      )}
                    </tr>
                  ))}
                </tbody>
              </table>
            </section>

            <ParameterComparison projectId={scenario.projectId} scenarioId={scenario.id} older={pair.older} newer={pair.newer} />

            <ConfirmDialog
              open={restoring !== null}
              title={`Restore v${restoring?.version ?? ""} as a new version?`}
              confirmLabel="Restore"
              pending={restore.isPending}
              error={restore.isError ? sentence(messageOf(restore.error)) : null}
              onCancel={() => {
                setRestoring(null);
                restore.reset();
              }}
              onConfirm={() =>
                restoring &&
                restore.mutate(restoring.version, {
                  onSuccess: (s) => {
                    setRestored(`v${restoring.version} is restored as v${s.version}. Nothing was deleted: v${scenario.version} and every version before it stay here.`);
                    setRestoring(null);
                    setChosen(null);
                  },
                })
              }
            >
              Its title and every parameter become the scenario’s next version, v{scenario.version + 1}. Nothing is deleted: the current version stays in
              the history and can be restored in turn. Anyone editing the scenario right now will be told it changed.
            </ConfirmDialog>
          </div>
        );
      }}
    </QueryView>
  );
}
