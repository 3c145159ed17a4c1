"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { z } from "zod";
import { ApiError } from "@/components/api/client";
import { scenarioKeys, useRenameScenario, type ScenarioSummaryDto } from "@/components/api/scenarios";
import { sentence } from "@/components/format/text";
import { useApiForm } from "@/components/forms/useApiForm";
import { FieldMessage } from "@/components/ui/Field";
import { buttonStyles, fieldStyles } from "@/components/ui/styles";
import { scenarioTitleSchema } from "@/contracts/requests";

const renameSchema = z.object({ title: scenarioTitleSchema });

/**
 * Renames in place, sending the version the row shows. When someone saved in between, the server answers 409
 * and nothing is overwritten; "Reload" fetches the current row and keeps what was typed.
 */
export function RenameScenarioForm({ scenario, onDone }: { scenario: ScenarioSummaryDto; onDone: () => void }) {
  const queryClient = useQueryClient();
  const rename = useRenameScenario(scenario.projectId);
  const [stale, setStale] = useState(false);
  const { form, problem, submit } = useApiForm(renameSchema, { defaultValues: { title: scenario.title } });
  const { errors, isSubmitting } = form.formState;

  const onSubmit = submit(async ({ title }) => {
    if (title === scenario.title) return onDone();
    try {
      await rename.mutateAsync({ scenarioId: scenario.id, version: scenario.version, title });
      onDone();
    } catch (error) {
      if (error instanceof ApiError && error.status === 409) setStale(true);
      else throw error;
    }
  });

  const reload = async () => {
    await queryClient.invalidateQueries({ queryKey: scenarioKeys.all(scenario.projectId) });
    setStale(false);
  };

  const titleError = errors.title?.message;
  const messageId = `rename-${scenario.id}-message`;

  return (
    <form
      onSubmit={onSubmit}
      noValidate
      onKeyDown={(event) => {
        if (event.key === "Escape") onDone();
      }}
    >
      <div className="flex items-center gap-2">
        <input
          aria-label="New title"
          autoFocus
          autoComplete="off"
          aria-invalid={Boolean(titleError)}
          aria-describedby={titleError || stale || problem ? messageId : undefined}
          className={`${fieldStyles.control} mt-0 w-auto min-w-48 flex-1 py-1`}
          {...form.register("title")}
        />
        <button type="submit" disabled={isSubmitting || stale} className={`${buttonStyles.primary} py-1`}>
          Save
        </button>
        <button type="button" onClick={onDone} className={`${buttonStyles.secondary} py-1`}>
          Cancel
        </button>
      </div>
      <div id={messageId}>
        {titleError && <FieldMessage>{titleError}</FieldMessage>}
        {problem && <FieldMessage>{sentence(problem)}</FieldMessage>}
        {stale && (
          <p role="alert" className="mt-2 flex flex-wrap items-center gap-2 text-sm text-caution">
            <span aria-hidden="true">⚠</span>
            <span>Someone changed it — reload to get the current version, then save again.</span>
            <button type="button" onClick={reload} className={`${buttonStyles.secondary} py-0.5`}>
              Reload
            </button>
          </p>
        )}
      </div>
    </form>
  );
}
