"use client";

import { useEdit } from "@/components/editor/useEdit";
import { withSampledProtocol } from "@/canvas/kernels/document-edits";
import { SequencerProfileImport } from "./SequencerProfileImport";

/**
 * The sequencer dialog inside the editor (mount it within the editor's provider): the server reads the file as a
 * preview only, and "Use this profile" applies it through the editor's own edit, so it is one undo step and the
 * autosave stores it like any other change.
 */
export function EditorSequencerImport({ projectId, scenarioId, disabled }: { projectId: string; scenarioId: string; disabled?: boolean }) {
  const edit = useEdit();
  return (
    <SequencerProfileImport
      projectId={projectId}
      scenarioId={scenarioId}
      disabled={disabled}
      triggerLabel="Import a measured profile…"
      onUse={({ protocol }) => {
        const result = edit("Import a measured profile", (document) => withSampledProtocol(document, protocol));
        if (!result.ok) throw new Error(result.message);
      }}
    />
  );
}
