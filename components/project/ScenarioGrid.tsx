"use client";

import Link from "next/link";
import { useState } from "react";
import type { ProjectDto } from "@/components/api/projects";
import type { ScenarioListQuery, ScenarioSummaryDto } from "@/components/api/scenarios";
import { backgroundName } from "@/components/format/words";
import { TimeStamp } from "@/components/ui/TimeStamp";
import { buttonStyles, tableStyles } from "@/components/ui/styles";
import { RenameScenarioForm } from "./RenameScenarioForm";
import { SortableHeader } from "./SortableHeader";
import type { SortKey } from "./useScenarioListParams";

export interface RowActions {
  onDuplicate: (scenario: ScenarioSummaryDto) => void;
  /** The scenario being duplicated right now, if any. */
  duplicatingId: string | null | undefined;
  onDelete: (scenario: ScenarioSummaryDto) => void;
}

interface ScenarioGridProps {
  project: ProjectDto;
  scenarios: ScenarioSummaryDto[];
  sort: Pick<ScenarioListQuery, "sort" | "order">;
  onSort: (sort: SortKey, order: "asc" | "desc") => void;
  /** Null for a role that may not change scenarios: the table then has no action column at all. */
  actions: RowActions | null;
}

/** One page of scenarios; clicking a column header sorts on the server. */
export function ScenarioGrid({ project, scenarios, sort, onSort, actions }: ScenarioGridProps) {
  const [renaming, setRenaming] = useState<string | null>(null);
  return (
    <div className="relative overflow-x-auto">
      <table className={tableStyles.table}>
        <caption className="sr-only">Scenarios in {project.name}; column headers with buttons sort the table</caption>
        <thead>
          <tr>
            <SortableHeader label="Title" sortKey="title" firstOrder="asc" current={sort} onSort={onSort} />
            <SortableHeader label="Background" sortKey="backgroundKind" firstOrder="asc" current={sort} onSort={onSort} className="w-44" />
            <th scope="col" className={`${tableStyles.head} w-20 text-right`}>
              Version
            </th>
            <SortableHeader label="Last change" sortKey="updatedAt" firstOrder="desc" current={sort} onSort={onSort} className="w-44" />
            <th scope="col" className={`${tableStyles.head} w-40`}>
              Changed by
            </th>
            {actions && (
              <th scope="col" className={`${tableStyles.head} text-right`}>
                <span className="sr-only">Actions</span>
              </th>
            )}
          </tr>
        </thead>
        <tbody>
          {scenarios.map((scenario) => (
            <tr key={scenario.id} className={tableStyles.row}>
              <td className={`${tableStyles.cell} min-w-72`}>
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
              <td className={`${tableStyles.cell} whitespace-nowrap`}>
                <TimeStamp iso={scenario.updatedAt} />
              </td>
              <td className={`${tableStyles.cell} text-ink-soft`}>{scenario.updatedBy?.name ?? "—"}</td>
              {actions && (
                <td className={`${tableStyles.cell} whitespace-nowrap text-right`}>
                  <button type="button" onClick={() => setRenaming(scenario.id)} disabled={renaming === scenario.id} className={buttonStyles.row}>
                    Rename
                  </button>
                  <button
                    type="button"
                    disabled={actions.duplicatingId === scenario.id}
                    onClick={() => actions.onDuplicate(scenario)}
                    className={buttonStyles.row}
                  >
                    {actions.duplicatingId === scenario.id ? "Duplicating…" : "Duplicate"}
                  </button>
                  <button type="button" onClick={() => actions.onDelete(scenario)} className={buttonStyles.row}>
                    Delete
                  </button>
                </td>
              )}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
