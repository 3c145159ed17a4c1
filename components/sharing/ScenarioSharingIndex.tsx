"use client";

import Link from "next/link";
import type { ProjectDto } from "@/components/api/projects";
import { useScenarioPage, type ScenarioListQuery } from "@/components/api/scenarios";
import { backgroundName } from "@/components/format/words";
import { EmptyState } from "@/components/ui/EmptyState";
import { QueryView } from "@/components/ui/QueryStates";
import { TableHead } from "@/components/ui/TableHead";
import { linkStyles, tableStyles } from "@/components/ui/styles";

const query: ScenarioListQuery = { page: 1, pageSize: 100, sort: "title", order: "asc" };
const columns = [{ label: "Scenario" }, { label: "Background" }, { label: "Version", className: "text-right" }, { label: "Sharing, history and files", hiddenLabel: true }];

export const sharingPath = (projectId: string, scenarioId: string) => `/projects/${projectId}/scenarios/${scenarioId}/sharing`;
export const historyPath = (projectId: string, scenarioId: string) => `/projects/${projectId}/scenarios/${scenarioId}/history`;
export const filesPath = (projectId: string, scenarioId: string) => `/projects/${projectId}/scenarios/${scenarioId}/files`;

/** Each scenario of the project with the way to its share links (editors and owners), its history and its files (everyone). */
export function ScenarioSharingIndex({ project }: { project: ProjectDto }) {
  const scenarios = useScenarioPage(project.id, query);
  const shares = project.can.includes("share:manage");
  return (
    <section aria-labelledby="sharing-title" className="space-y-4">
      <div>
        <h2 id="sharing-title" className="font-serif text-xl font-semibold">
          Share links, history and files
        </h2>
        <p className="mt-1 text-sm text-ink-soft">
          {shares
            ? "A share link shows one scenario, read-only, to anyone who has it: no account needed. Every saved version stays in the history and can be restored. Figures, notes and data travel with a scenario as its files."
            : "Every saved version of a scenario stays in its history; its figures, notes and data are among its files."}
        </p>
      </div>
      <QueryView query={scenarios} what="the scenarios" lines={3}>
        {(page) =>
          page.items.length === 0 ? (
            <EmptyState title="No scenarios yet" />
          ) : (
            <table className={tableStyles.table}>
              <caption className="sr-only">Share links, history and files of each scenario</caption>
              <TableHead columns={columns} />
              <tbody>
                {page.items.map((s) => (
                  <tr key={s.id} className={tableStyles.row}>
                    <td className={`${tableStyles.cell} font-semibold`}>{s.title}</td>
                    <td className={`${tableStyles.cell} text-ink-soft`}>{backgroundName(s.backgroundKind)}</td>
                    <td className={`${tableStyles.cell} tabular text-right`}>v{s.version}</td>
                    <td className={`${tableStyles.cell} whitespace-nowrap text-right`}>
                      {shares && (
                        <Link href={sharingPath(project.id, s.id)} className={`${linkStyles} mr-4`} aria-label={`Share links of ${s.title}`}>
                          Share links
                        </Link>
                      )}
                      <Link href={historyPath(project.id, s.id)} className={`${linkStyles} mr-4`} aria-label={`History of ${s.title}`}>
                        History
                      </Link>
                      <Link href={filesPath(project.id, s.id)} className={linkStyles} aria-label={`Files of ${s.title}`}>
                        Files
                      </Link>
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          )
        }
      </QueryView>
      {scenarios.data && scenarios.data.total > scenarios.data.items.length && (
        <p className="text-sm text-ink-faint">
          The first {scenarios.data.items.length} of {scenarios.data.total} scenarios, by title.
        </p>
      )}
    </section>
  );
}
