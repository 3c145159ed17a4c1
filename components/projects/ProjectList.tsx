"use client";

import Link from "next/link";
import { useProjects } from "@/components/api/projects";
import { roleNames } from "@/components/format/words";
import { LoadError, Skeleton } from "@/components/ui/QueryStates";
import { TimeStamp } from "@/components/ui/TimeStamp";
import { tableStyles } from "@/components/ui/styles";

export function ProjectList() {
  const projects = useProjects();

  if (projects.isPending) return <Skeleton lines={4} label="Loading your projects" />;
  if (projects.isError) return <LoadError error={projects.error} onRetry={() => projects.refetch()} what="your projects" />;
  if (projects.data.length === 0) {
    return (
      <div className="border-y border-rule py-10 text-center text-ink-soft">
        <p className="font-serif text-lg text-ink">No projects yet</p>
        <p className="mt-2 text-sm">A project holds scenarios and the people you share them with. Create one to begin.</p>
      </div>
    );
  }

  return (
    <table className={tableStyles.table}>
      <caption className="sr-only">Your projects</caption>
      <thead>
        <tr>
          <th scope="col" className={tableStyles.head}>
            Project
          </th>
          <th scope="col" className={tableStyles.head}>
            Your role
          </th>
          <th scope="col" className={`${tableStyles.head} text-right`}>
            Scenarios
          </th>
          <th scope="col" className={tableStyles.head}>
            Last change
          </th>
        </tr>
      </thead>
      <tbody>
        {projects.data.map((project) => (
          <tr key={project.id} className={tableStyles.row}>
            <td className={tableStyles.cell}>
              <Link href={`/projects/${project.id}`} className="font-semibold text-ink underline-offset-4 hover:underline">
                {project.name}
              </Link>
              {project.description && <p className="mt-1 line-clamp-1 text-ink-faint">{project.description}</p>}
            </td>
            <td className={`${tableStyles.cell} text-ink-soft`}>{roleNames[project.role]}</td>
            <td className={`${tableStyles.cell} tabular text-right`}>{project.scenarioCount}</td>
            <td className={tableStyles.cell}>
              <TimeStamp iso={project.lastChangedAt} />
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
