"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { useCreateProject } from "@/components/api/projects";
import { sentence } from "@/components/format/text";
import { applyServerErrors } from "@/components/forms/serverErrors";
import { TextAreaField, TextField } from "@/components/ui/Field";
import { Notice } from "@/components/ui/Notice";
import { buttonStyles } from "@/components/ui/styles";
import { projectCreateSchema } from "@/lib/contracts";

type ProjectInput = z.input<typeof projectCreateSchema>;

export function NewProjectForm() {
  const router = useRouter();
  const create = useCreateProject();
  const [problem, setProblem] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<ProjectInput, unknown, z.output<typeof projectCreateSchema>>({
    resolver: zodResolver(projectCreateSchema),
    defaultValues: { name: "", description: "" },
  });

  const onSubmit = handleSubmit(async (input) => {
    setProblem(null);
    try {
      const project = await create.mutateAsync({ name: input.name, description: input.description || undefined });
      router.push(`/projects/${project.id}`);
    } catch (error) {
      setProblem(applyServerErrors(error, setError, ["name", "description"]));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-labelledby="new-project-title">
      <h2 id="new-project-title" className="font-serif text-xl font-semibold">
        New project
      </h2>
      {problem && <Notice tone="invalid">{sentence(problem)}</Notice>}
      <TextField label="Project name" autoComplete="off" error={errors.name?.message} {...register("name")} />
      <TextAreaField label="Description (optional)" error={errors.description?.message} {...register("description")} />
      <button type="submit" disabled={isSubmitting} className={buttonStyles.primary}>
        {isSubmitting ? "Creating…" : "Create project"}
      </button>
    </form>
  );
}
