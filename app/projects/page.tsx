import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { signInPath } from "@/components/auth/callbackUrl";
import { NewProjectForm } from "@/components/projects/NewProjectForm";
import { ProjectList } from "@/components/projects/ProjectList";
import { PageHeader } from "@/components/ui/PageHeader";
import { currentUser } from "@/lib/session";

export const metadata: Metadata = { title: "Projects" };

export default async function ProjectsPage() {
  if (!(await currentUser())) redirect(signInPath("/projects"));
  return (
    <>
      <PageHeader title="Projects">Each project holds scenarios and the people who may see or change them.</PageHeader>
      <div className="grid gap-12 lg:grid-cols-[minmax(0,1fr)_20rem]">
        <section aria-label="Your projects">
          <ProjectList />
        </section>
        <aside className="lg:border-l lg:border-rule lg:pl-8">
          <NewProjectForm />
        </aside>
      </div>
    </>
  );
}
