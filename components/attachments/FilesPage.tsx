"use client";

import { useState } from "react";
import { useProject } from "@/components/api/projects";
import { useSaveSequencerProfile } from "@/components/api/uploads";
import { formatDuration, formatLength } from "@/components/format/quantities";
import { roleNames } from "@/components/format/words";
import { ScenarioSubpage } from "@/components/sharing/ScenarioSubpage";
import { SequencerProfileImport } from "@/components/uploads/SequencerProfileImport";
import { Notice } from "@/components/ui/Notice";
import { AttachmentList } from "./AttachmentList";
import { AttachmentUpload } from "./AttachmentUpload";

/** The files page of a scenario: what is kept with it, adding files, and a sequencer profile as its protocol. */
export function FilesPage({ projectId, scenarioId }: { projectId: string; scenarioId: string }) {
  const { data: project } = useProject(projectId);
  const save = useSaveSequencerProfile(projectId, scenarioId);
  const [saved, setSaved] = useState<string | null>(null);
  if (!project) return null;
  const canWrite = project.can.includes("scenario:write");
  return (
    <ScenarioSubpage projectId={projectId} scenarioId={scenarioId} page="files" showSharing={project.can.includes("share:manage")}>
      {(scenario) => (
        <div className="space-y-8">
          {canWrite ? (
            <AttachmentUpload projectId={projectId} scenarioId={scenarioId} />
          ) : (
            <Notice>You can download these files but not add or delete them: your role is {roleNames[project.role].toLowerCase()}.</Notice>
          )}
          <AttachmentList projectId={projectId} scenarioId={scenarioId} canDelete={canWrite} />
          {canWrite && (
            <section aria-labelledby="sequencer-title" className="space-y-3 border-t border-rule pt-6">
              <h2 id="sequencer-title" className="font-serif text-lg font-semibold">
                Measured profile from a sequencer CSV
              </h2>
              <p className="text-sm text-ink-soft">
                Read a lab sequencer’s CSV of separation against time and save it as this scenario’s protocol, as a new version (v{scenario.version + 1}); the
                history keeps the one before.
              </p>
              <SequencerProfileImport
                projectId={projectId}
                scenarioId={scenarioId}
                onUse={async ({ file, settings, profile }) => {
                  setSaved(null);
                  const next = await save.mutateAsync({ file, settings, version: scenario.version });
                  setSaved(`Saved version ${next.version}: ${profile.rowCount.toLocaleString("en")} samples over ${formatDuration(profile.durationSeconds)}, up to ${formatLength(profile.maxSeparationMetres)}.`);
                }}
              />
              {saved && <Notice tone="success">{saved}</Notice>}
            </section>
          )}
        </div>
      )}
    </ScenarioSubpage>
  );
}
