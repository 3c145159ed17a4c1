"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { z } from "zod";
import { useDeleteProject, useUpdateProject, type ProjectDto } from "@/components/api/projects";
import { messageOf } from "@/components/api/client";
import { sentence } from "@/components/format/text";
import { FormProblem } from "@/components/forms/FormProblem";
import { useApiForm } from "@/components/forms/useApiForm";
import { ConfirmDialog } from "@/components/ui/ConfirmDialog";
import { TextAreaField, TextField } from "@/components/ui/Field";
import { Notice } from "@/components/ui/Notice";
import { buttonStyles } from "@/components/ui/styles";
import { projectNameSchema } from "@/contracts/requests";

// The same rules as the PATCH body, with both fields present (the form always sends both).
const settingsSchema = z.object({ name: projectNameSchema, description: z.string().max(2000, "use at most 2000 characters") });

/** Owners only: rename the project, change its description, or delete it. Folded away until asked for. */
export function ProjectSettings({ project }: { project: ProjectDto }) {
  const canRename = project.can.includes("project:rename");
  const canDelete = project.can.includes("project:delete");
  return (
    <details className="group mt-4 rounded border border-transparent open:border-rule open:bg-paper-deep/40 open:p-5">
      <summary className="cursor-pointer text-sm text-ink-soft hover:text-ink">Project settings</summary>
      <div className="mt-5 grid gap-8 md:grid-cols-[minmax(0,1fr)_16rem]">
        {canRename && <RenameProjectForm project={project} />}
        {canDelete && <DeleteProject project={project} />}
      </div>
    </details>
  );
}

function RenameProjectForm({ project }: { project: ProjectDto }) {
  const update = useUpdateProject(project.id);
  const [saved, setSaved] = useState(false);
  const { form, problem, submit } = useApiForm(settingsSchema, {
    values: { name: project.name, description: project.description },
    resetOptions: { keepDirtyValues: true },
  });
  const { errors, isSubmitting, isDirty } = form.formState;

  const onSubmit = submit(async (input) => {
    setSaved(false);
    const updated = await update.mutateAsync(input);
    form.reset({ name: updated.name, description: updated.description });
    setSaved(true);
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      <FormProblem problem={problem} />
      {saved && !isDirty && <Notice tone="success">Saved.</Notice>}
      <TextField label="Project name" autoComplete="off" error={errors.name?.message} {...form.register("name")} />
      <TextAreaField label="Description" error={errors.description?.message} {...form.register("description")} />
      <button type="submit" disabled={isSubmitting || !isDirty} className={buttonStyles.primary}>
        {isSubmitting ? "Saving…" : "Save name and description"}
      </button>
    </form>
  );
}

function DeleteProject({ project }: { project: ProjectDto }) {
  const router = useRouter();
  const remove = useDeleteProject(project.id);
  const [open, setOpen] = useState(false);
  return (
    <div className="space-y-3 md:border-l md:border-rule md:pl-6">
      <h3 className="text-sm font-semibold">Delete this project</h3>
      <p className="text-sm text-ink-soft">Removes the project, all its scenarios and their revisions, for every member. This cannot be undone.</p>
      <button type="button" onClick={() => setOpen(true)} className={buttonStyles.secondary}>
        Delete project…
      </button>
      <ConfirmDialog
        open={open}
        title={`Delete “${project.name}”?`}
        confirmLabel="Delete project"
        typeToConfirm={project.name}
        pending={remove.isPending}
        error={remove.isError ? sentence(messageOf(remove.error)) : null}
        onCancel={() => {
          setOpen(false);
          remove.reset();
        }}
        onConfirm={() => remove.mutate(undefined, { onSuccess: () => router.push("/projects") })}
      >
        Every scenario in it ({project.scenarioCount}) and every revision will be deleted for all members.
      </ConfirmDialog>
    </div>
  );
}
