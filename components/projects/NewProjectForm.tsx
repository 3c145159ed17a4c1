"use client";

import { useRouter } from "next/navigation";
import { useCreateProject } from "@/components/api/projects";
import { FormProblem } from "@/components/forms/FormProblem";
import { useApiForm } from "@/components/forms/useApiForm";
import { TextAreaField, TextField } from "@/components/ui/Field";
import { buttonStyles } from "@/components/ui/styles";
import { projectCreateSchema } from "@/contracts/requests";

/** Creates a project and opens it. */
export function NewProjectForm() {
  const create = useCreateProject();
  const router = useRouter();
  const { form, problem, submit } = useApiForm(projectCreateSchema, { defaultValues: { name: "", description: "" } });
  const { errors, isSubmitting } = form.formState;

  const onSubmit = submit(async ({ name, description }) => {
    const project = await create.mutateAsync({ name, description: description || undefined });
    router.push(`/projects/${project.id}`);
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      <h2 className="font-serif text-xl font-semibold">New project</h2>
      <FormProblem problem={problem} />
      <TextField label="Project name" autoComplete="off" error={errors.name?.message} {...form.register("name")} />
      <TextAreaField label="Description (optional)" error={errors.description?.message} {...form.register("description")} />
      <button type="submit" disabled={isSubmitting} className={buttonStyles.primary}>
        {isSubmitting ? "Creating…" : "Create project"}
      </button>
    </form>
  );
}
