"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { useCreateScenario } from "@/components/api/scenarios";
import { backgroundKinds, backgroundNames } from "@/components/format/words";
import { sentence } from "@/components/format/text";
import { applyServerErrors } from "@/components/forms/serverErrors";
import { newScenarioDocument } from "@/components/scenario/newScenarioDocument";
import { backgroundSummary, labSummary } from "@/components/scenario/summary";
import { SelectField, TextField } from "@/components/ui/Field";
import { Notice } from "@/components/ui/Notice";
import { buttonStyles } from "@/components/ui/styles";
import { scenarioTitleSchema } from "@/lib/contracts";
import { parseScenarioDocument, type BackgroundKind } from "@/physics/scenario/schema";

const newScenarioSchema = z.object({
  title: scenarioTitleSchema,
  background: z.enum(backgroundKinds as [BackgroundKind, ...BackgroundKind[]], { error: "choose a background" }),
});
type NewScenarioInput = z.input<typeof newScenarioSchema>;

/** What the chosen background starts with, read from the document itself. */
function startingHint(kind: BackgroundKind): string {
  const document = newScenarioDocument(kind);
  return `Starts with: ${backgroundSummary(document.background)}; ${labSummary(document.lab)}.`;
}

export function NewScenarioForm({ projectId }: { projectId: string }) {
  const create = useCreateScenario(projectId);
  const [problem, setProblem] = useState<string | null>(null);
  const [created, setCreated] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    watch,
    formState: { errors, isSubmitting },
  } = useForm<NewScenarioInput, unknown, z.output<typeof newScenarioSchema>>({
    resolver: zodResolver(newScenarioSchema),
    defaultValues: { title: "", background: "minkowski" },
  });

  const onSubmit = handleSubmit(async ({ title, background }) => {
    setProblem(null);
    setCreated(null);
    // Read the starting document through the schema, so defaults of fields added later are filled in here too.
    const parsed = parseScenarioDocument(newScenarioDocument(background));
    if (!parsed.ok) {
      setProblem(`the starting document for this background does not fit the scenario schema (${parsed.issues.map((i) => `${i.path}: ${i.message}`).join("; ")})`);
      return;
    }
    try {
      const scenario = await create.mutateAsync({ title, document: parsed.document });
      reset({ title: "", background });
      setCreated(scenario.title);
    } catch (error) {
      setProblem(applyServerErrors(error, setError, ["title"]));
    }
  });

  const background = watch("background");

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="new-scenario-title" className="mb-10 border-b border-rule pb-8">
      <h2 id="new-scenario-title" className="mb-4 font-serif text-xl font-semibold">
        Add a scenario
      </h2>
      {problem && (
        <div className="mb-4">
          <Notice tone="invalid">{sentence(problem)}</Notice>
        </div>
      )}
      {created && (
        <div className="mb-4">
          <Notice tone="success">Created “{created}”.</Notice>
        </div>
      )}
      <div className="flex flex-wrap items-start gap-4">
        <TextField label="Title" autoComplete="off" className="min-w-64 flex-1" error={errors.title?.message} {...register("title")} />
        <SelectField
          label="Background"
          className="w-64"
          hint={background ? startingHint(background) : undefined}
          error={errors.background?.message}
          {...register("background")}
        >
          {backgroundKinds.map((kind) => (
            <option key={kind} value={kind}>
              {backgroundNames[kind]}
            </option>
          ))}
        </SelectField>
        <button type="submit" disabled={isSubmitting} className={`${buttonStyles.primary} mt-6`}>
          {isSubmitting ? "Creating…" : "New scenario"}
        </button>
      </div>
    </form>
  );
}
