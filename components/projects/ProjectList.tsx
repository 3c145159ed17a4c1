"use client";

import Link from "next/link";
import { useProjects, type ProjectDto } from "@/components/api/projects";
import { roleNames } from "@/components/format/words";
import { EmptyState } from "@/components/ui/EmptyState";
import { QueryView } from "@/components/ui/QueryStates";
import { TimeStamp } from "@/components/ui/TimeStamp";
import { TableHead } from "@/components/ui/TableHead";
import { tableStyles } from "@/components/ui/styles";

const projectColumns = [{ label: "Project" }, { label: "Your role" }, { label: "Scenarios", className: "text-right" }, { label: "Last change" }];

export function ProjectList() {
  const projects = useProjects();
  return (
    <QueryView query={projects} what="your projects">
      {(list) =>
        list.length === 0 ? (
          <EmptyState title="No projects yet">A project holds scenarios and the people you share them with. Create one to begin.</EmptyState>
        ) : (
          <ProjectTable projects={list} />
        )
      }
    </QueryView>
  );
}

function ProjectTable({ projects }: { projects: ProjectDto[] }) {
  return (
    <table className={tableStyles.table}>
      <caption className="sr-only">Your projects</caption>
      <TableHead columns={projectColumns} />
      <tbody>
        {projects.map((project) => (
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
