"use client";

/**
 * A quiet line as soon as someone else has saved a newer version of the open scenario (checked every
 * NEWER_VERSION_CHECK_MS while the page is visible, and when the window regains focus), before any save of mine
 * can meet it: load the newer version, or save my edits as a copy.
 */
import { useQuery } from "@tanstack/react-query";
import { scenarioKeys } from "@/components/api/scenarios";
import { buttonStyles } from "@/components/ui/styles";
import { useEditor } from "@/canvas/EditorProvider";
import { hasUnsavedChanges } from "@/canvas/store/selectors";
import { getScenario } from "./save-scenario";
import { useConflictActions } from "./useConflictActions";

export const NEWER_VERSION_CHECK_MS = 15_000;

export function NewerVersionBanner(props: { projectId: string; scenarioId: string; title: string; editPath(scenarioId: string): string }) {
  const { projectId, scenarioId } = props;
  const latest = useQuery({
    queryKey: [...scenarioKeys.one(projectId, scenarioId), "latest-version"],
    queryFn: () => getScenario(projectId, scenarioId),
    select: (scenario) => ({ version: scenario.version, by: scenario.updatedBy?.name ?? null }),
    refetchInterval: NEWER_VERSION_CHECK_MS,
  });
  const baseVersion = useEditor((s) => s.save.baseVersion);
  const quiet = useEditor((s) => s.save.status === "saving" || s.save.status === "conflict");
  const unsaved = useEditor(hasUnsavedChanges);
  const readOnly = useEditor((s) => s.readOnly);
  const { pending, error, loadNewer, saveMineAsCopy } = useConflictActions(props);

  const newer = latest.data && latest.data.version > baseVersion ? latest.data : null;
  if (!newer || quiet) return null;
  return (
    <div role="status" data-testid="newer-version" className="flex flex-wrap items-center gap-x-4 gap-y-2 rounded border border-rule-strong bg-paper-deep px-4 py-2 text-sm text-ink-soft">
      <span>
        Version {newer.version} was saved{newer.by ? ` by ${newer.by}` : ""} since you opened this scenario
        {unsaved && !readOnly ? "; your edits are not saved yet." : "."}
      </span>
      <span className="flex flex-wrap gap-2">
        <button type="button" className={buttonStyles.row} disabled={pending !== null} onClick={loadNewer}>
          {pending === "theirs" ? "Loading…" : "Load the newer version"}
        </button>
        {unsaved && !readOnly && (
          <button type="button" className={buttonStyles.row} disabled={pending !== null} onClick={saveMineAsCopy}>
            {pending === "mine" ? "Saving a copy…" : "Save my edits as a copy"}
          </button>
        )}
      </span>
      {error && (
        <span role="alert" className="text-invalid">
          <span aria-hidden="true">⚠ </span>
          {error}
        </span>
      )}
    </div>
  );
}
