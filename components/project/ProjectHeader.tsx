"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";
import type { ProjectDto } from "@/components/api/projects";
import { roleNames } from "@/components/format/words";
import { PageHeader } from "@/components/ui/PageHeader";
import { ProjectSettings } from "./ProjectSettings";

export function ProjectHeader({ project }: { project: ProjectDto }) {
  const pathname = usePathname();
  const base = `/projects/${project.id}`;
  const tabs = [
    { href: base, label: "Scenarios", current: pathname === base || pathname.startsWith(`${base}/scenarios`) },
    { href: `${base}/members`, label: "Members", current: pathname === `${base}/members` },
  ];
  const manages = project.can.includes("project:rename") || project.can.includes("project:delete");
  const roleBadge = (
    <span className="rounded-sm border border-rule px-2 py-0.5 text-sm text-ink-soft">
      Your role: <span className="font-semibold text-ink">{roleNames[project.role]}</span>
    </span>
  );

  // Inside a scenario the page has its own title: the project shrinks to a trail back to it.
  if (pathname.startsWith(`${base}/scenarios/`)) {
    return (
      <nav aria-label="Breadcrumb" className="mb-6 flex flex-wrap items-center gap-x-2 gap-y-2 border-b border-rule pb-3 text-sm text-ink-soft">
        <Link href="/projects" className="hover:text-ink">
          Projects
        </Link>
        <span aria-hidden="true">/</span>
        <Link href={base} className="font-semibold text-ink hover:underline">
          {project.name}
        </Link>
        <span className="flex-1" />
        {roleBadge}
      </nav>
    );
  }

  return (
    <div className="mb-8">
      <PageHeader
        title={project.name}
        kicker={
          <Link href="/projects" className="hover:text-ink">
            ← Projects
          </Link>
        }
        actions={roleBadge}
      >
        {project.description ? <p className="max-w-3xl whitespace-pre-line leading-relaxed">{project.description}</p> : null}
      </PageHeader>
      <div className="-mt-8 flex flex-wrap items-end justify-between gap-4 border-b border-rule">
        <nav aria-label="Project" className="flex gap-6 text-sm">
          {tabs.map((tab) => (
            <Link
              key={tab.href}
              href={tab.href}
              aria-current={tab.current ? "page" : undefined}
              className={`-mb-px border-b-2 py-3 ${tab.current ? "border-ink font-semibold text-ink" : "border-transparent text-ink-soft hover:text-ink"}`}
            >
              {tab.label}
            </Link>
          ))}
        </nav>
      </div>
      {manages && <ProjectSettings project={project} />}
    </div>
  );
}
