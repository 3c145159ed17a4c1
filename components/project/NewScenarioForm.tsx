"use client";

import { useRouter } from "next/navigation";
import { z } from "zod";
import { useCreateScenario } from "@/components/api/scenarios";
import { backgroundKinds, backgroundNames } from "@/components/format/words";
import { FormProblem } from "@/components/forms/FormProblem";
import { useApiForm } from "@/components/forms/useApiForm";
import { newScenarioDocument } from "@/physics/scenario/starting";
import { backgroundSummary, labSummary } from "@/components/scenario/summary";
import { SelectField, TextField } from "@/components/ui/Field";
import { buttonStyles } from "@/components/ui/styles";
import { scenarioTitleSchema } from "@/contracts/requests";
import { parseScenarioDocument, type BackgroundKind } from "@/physics/scenario/schema";

const newScenarioSchema = z.object({
  title: scenarioTitleSchema,
  background: z.enum(backgroundKinds as [BackgroundKind, ...BackgroundKind[]], { error: "choose a background" }),
});

/** What the chosen background starts with, read from the document itself. */
function startingHint(kind: BackgroundKind): string {
  const document = newScenarioDocument(kind);
  return `Starts with: ${backgroundSummary(document.background)}; ${labSummary(document.lab, document.background.kind)}.`;
}

/** Creates a scenario from the chosen background's starting values and opens it in the editor. */
export function NewScenarioForm({ projectId }: { projectId: string }) {
  const create = useCreateScenario(projectId);
  const router = useRouter();
  const { form, problem, setProblem, submit } = useApiForm(newScenarioSchema, { defaultValues: { title: "", background: "minkowski" } });
  const { errors, isSubmitting } = form.formState;

  const onSubmit = submit(async ({ title, background }) => {
    // Read the starting document through the schema, so defaults of fields added later are filled in here too.
    const parsed = parseScenarioDocument(newScenarioDocument(background));
    if (!parsed.ok) {
      setProblem(`the starting document for this background does not fit the scenario schema (${parsed.issues.map((i) => `${i.path}: ${i.message}`).join("; ")})`);
      return;
    }
    const scenario = await create.mutateAsync({ title, document: parsed.document });
    router.push(`/projects/${projectId}/scenarios/${scenario.id}`);
  });

  const background = form.watch("background");

  return (
    <form onSubmit={onSubmit} noValidate className="mb-10 space-y-4 border-b border-rule pb-8">
      <h2 className="font-serif text-xl font-semibold">Add a scenario</h2>
      <FormProblem problem={problem} />
      <div className="flex flex-wrap items-start gap-4">
        <TextField label="Title" autoComplete="off" className="min-w-64 flex-1" error={errors.title?.message} {...form.register("title")} />
        <SelectField
          label="Background"
          className="w-72"
          hint={background ? startingHint(background) : undefined}
          error={errors.background?.message}
          {...form.register("background")}
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
