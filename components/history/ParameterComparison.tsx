"use client";

import { useRevision, useRevisionDiff, type RevisionDto } from "@/components/api/history";
import { QueryView } from "@/components/ui/QueryStates";
import { TableHead } from "@/components/ui/TableHead";
import { tableStyles } from "@/components/ui/styles";
import { flattenDocument } from "@/contracts/json-diff";
import { parameterLabel, parameterValue } from "./parameterText";

interface ComparisonRow {
  path: string;
  before: { present: boolean; value: unknown };
  after: { present: boolean; value: unknown };
}

/** Both versions' parameters in one list: the newer version's order, then what only the older one had. */
function comparisonRows(older: RevisionDto, newer: RevisionDto): ComparisonRow[] {
  const left = new Map(flattenDocument(older.document).map((leaf) => [leaf.path, leaf.value]));
  const right = new Map(flattenDocument(newer.document).map((leaf) => [leaf.path, leaf.value]));
  const paths = [...right.keys(), ...[...left.keys()].filter((path) => !right.has(path))];
  return paths.map((path) => ({
    path,
    before: { present: left.has(path), value: left.get(path) },
    after: { present: right.has(path), value: right.get(path) },
  }));
}

const same = (row: ComparisonRow) => row.before.present === row.after.present && JSON.stringify(row.before.value) === JSON.stringify(row.after.value);

/** What changed from one revision to another (from the server's diff), then every parameter side by side. */
export function ParameterComparison({ projectId, scenarioId, older, newer }: { projectId: string; scenarioId: string; older: number; newer: number }) {
  const diff = useRevisionDiff(projectId, scenarioId, older, newer);
  const left = useRevision(projectId, scenarioId, older);
  const right = useRevision(projectId, scenarioId, newer);

  return (
    <section aria-labelledby="comparison-title" className="space-y-6">
      <h2 id="comparison-title" className="font-serif text-xl font-semibold">
        v{older} and v{newer} side by side
      </h2>
      <QueryView query={diff} what="what changed" lines={2}>
        {(d) => (
          <div className="text-sm" data-testid="what-changed">
            <h3 className="mb-2 text-xs font-semibold uppercase tracking-wide text-ink-soft">What changed</h3>
            {d.changes.length === 0 && !d.title ? (
              <p className="text-ink-soft">Nothing: the two versions are the same.</p>
            ) : (
              <ul className="list-disc space-y-1 pl-5">
                {d.title && (
                  <li>
                    Title: “{d.title.before}” → “{d.title.after}”
                  </li>
                )}
                {d.changes.map((change) => (
                  <li key={change.path}>
                    {parameterLabel(change.path)}:{" "}
                    {change.kind === "added"
                      ? `added, ${parameterValue(change.path, change.after)}`
                      : change.kind === "removed"
                        ? `removed (was ${parameterValue(change.path, change.before)})`
                        : `${parameterValue(change.path, change.before)} → ${parameterValue(change.path, change.after)}`}
                  </li>
                ))}
              </ul>
            )}
            {d.truncated && <p className="mt-2 text-ink-faint">Only the first {d.changes.length} changes are listed.</p>}
          </div>
        )}
      </QueryView>
      <QueryView query={left} what={`version ${older}`} lines={4}>
        {(a) => (
          <QueryView query={right} what={`version ${newer}`} lines={4}>
            {(b) =>
              a.document && b.document ? (
                <table className={tableStyles.table}>
                  <caption className="sr-only">
                    Parameters of version {older} and version {newer}; changed ones are marked
                  </caption>
                  <TableHead columns={[{ label: "Parameter" }, { label: `v${older}` }, { label: `v${newer}` }, { label: "Changed", hiddenLabel: true }]} />
                  <tbody>
                    {comparisonRows(a, b).map((row) => {
                      const changed = !same(row);
                      return (
                        <tr key={row.path} className={`${tableStyles.row} ${changed ? "bg-paper-deep font-semibold" : ""}`}>
                          <td className={tableStyles.cell}>{parameterLabel(row.path)}</td>
                          <td className={`${tableStyles.cell} tabular`}>{parameterValue(row.path, row.before.value, row.before.present)}</td>
                          <td className={`${tableStyles.cell} tabular`}>{parameterValue(row.path, row.after.value, row.after.present)}</td>
                          <td className={`${tableStyles.cell} text-xs`}>{changed ? "◆ changed" : ""}</td>
                        </tr>
                      );
                    })}
                  </tbody>
                </table>
              ) : (
                <p className="text-sm text-ink-soft">One of these versions cannot be read by this Branchline, so its parameters cannot be shown.</p>
              )
            }
          </QueryView>
        )}
      </QueryView>
    </section>
  );
}
