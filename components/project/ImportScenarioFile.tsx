"use client";

import { useRouter } from "next/navigation";
import { useRef, useState } from "react";
import { useImportScenario } from "@/components/api/uploads";
import { ProblemList } from "@/components/uploads/ProblemList";
import { buttonStyles } from "@/components/ui/styles";
import { SCENARIO_FILE_MAX_BYTES } from "@/contracts/requests";

/**
 * "Import a scenario file": pick a .json scenario file; it becomes a new scenario of the project and the editor
 * opens on it, or every problem the server found is listed by its path in the file.
 */
export function ImportScenarioFile({ projectId }: { projectId: string }) {
  const router = useRouter();
  const input = useRef<HTMLInputElement>(null);
  const importing = useImportScenario(projectId);
  const [fileName, setFileName] = useState<string | null>(null);

  const pick = (file: File | undefined) => {
    if (!file) return;
    setFileName(file.name);
    importing.mutate(file, { onSuccess: (scenario) => router.push(`/projects/${projectId}/scenarios/${scenario.id}`) });
  };

  return (
    <section aria-labelledby="import-title" className="mb-10 space-y-3 border-b border-rule pb-8">
      <div className="flex flex-wrap items-center gap-4">
        <div className="flex-1">
          <h2 id="import-title" className="font-serif text-xl font-semibold">
            Import a scenario file
          </h2>
          <p className="mt-1 text-sm text-ink-soft">
            A Branchline scenario file (.json, up to {SCENARIO_FILE_MAX_BYTES / 1024 / 1024} MB) becomes a new scenario here, with its own history.
          </p>
        </div>
        <input
          ref={input}
          type="file"
          accept=".json,application/json"
          className="sr-only"
          aria-label="Scenario file to import"
          data-testid="import-scenario-input"
          onChange={(event) => {
            pick(event.target.files?.[0]);
            event.target.value = "";
          }}
        />
        <button type="button" className={buttonStyles.secondary} disabled={importing.isPending} onClick={() => input.current?.click()}>
          {importing.isPending ? `Importing ${fileName ?? ""}…` : "Choose a file…"}
        </button>
      </div>
      {importing.isError && <ProblemList error={importing.error} title={`“${fileName}” was not imported.`} />}
    </section>
  );
}
