"use client";

import { useId, useRef, useState } from "react";
import { useUploadAttachment } from "@/components/api/uploads";
import { ProblemList } from "@/components/uploads/ProblemList";
import { Notice } from "@/components/ui/Notice";
import { buttonStyles } from "@/components/ui/styles";
import { ATTACHMENT_EXTENSIONS, ATTACHMENT_MAX_BYTES, fileSize } from "@/contracts/requests";

/** Choose a file and send it, with a progress bar; a file over the limit is refused here before it is sent. */
export function AttachmentUpload({ projectId, scenarioId }: { projectId: string; scenarioId: string }) {
  const upload = useUploadAttachment(projectId, scenarioId);
  const input = useRef<HTMLInputElement>(null);
  const inputId = useId();
  const [progress, setProgress] = useState(0);
  const [file, setFile] = useState<File | null>(null);
  const [localProblem, setLocalProblem] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);

  const send = (chosen: File | undefined) => {
    if (!chosen) return;
    setFile(chosen);
    setDone(null);
    setLocalProblem(null);
    upload.reset();
    if (chosen.size > ATTACHMENT_MAX_BYTES) {
      setLocalProblem(`“${chosen.name}” is ${fileSize(chosen.size)}; files of up to ${fileSize(ATTACHMENT_MAX_BYTES)} are kept.`);
      return;
    }
    if (chosen.size === 0) {
      setLocalProblem(`“${chosen.name}” is empty.`);
      return;
    }
    setProgress(0);
    upload.mutate({ file: chosen, onProgress: setProgress }, { onSuccess: (a) => setDone(a.fileName) });
  };

  return (
    <section aria-labelledby={`${inputId}-title`} className="space-y-3 rounded border border-rule bg-paper-deep/60 p-4">
      <div className="flex flex-wrap items-center gap-4">
        <div className="flex-1">
          <h2 id={`${inputId}-title`} className="font-serif text-lg font-semibold">
            Add a file
          </h2>
          <p className="text-sm text-ink-soft">
            Figures and notes: {ATTACHMENT_EXTENSIONS.map((e) => e.slice(1).toUpperCase()).join(", ")}, up to {ATTACHMENT_MAX_BYTES / 1024 / 1024} MB. Its kind is
            read from its content, not only from its name.
          </p>
        </div>
        <input
          ref={input}
          id={inputId}
          type="file"
          accept={ATTACHMENT_EXTENSIONS.join(",")}
          className="sr-only"
          aria-label="File to add"
          onChange={(event) => {
            send(event.target.files?.[0]);
            event.target.value = "";
          }}
        />
        <button type="button" className={buttonStyles.primary} disabled={upload.isPending} onClick={() => input.current?.click()}>
          {upload.isPending ? "Sending…" : "Choose a file…"}
        </button>
      </div>
      {upload.isPending && file && (
        <div className="space-y-1">
          <p className="text-sm text-ink-soft">
            Sending “{file.name}” ({fileSize(file.size)})
          </p>
          <progress value={progress} max={1} className="h-2 w-full accent-ink" aria-label={`Sending ${file.name}`}>
            {Math.round(progress * 100)}%
          </progress>
        </div>
      )}
      {localProblem && <Notice tone="invalid">{localProblem}</Notice>}
      {upload.isError && <ProblemList error={upload.error} title={`“${file?.name}” was not added.`} />}
      {done && <Notice tone="success">Added “{done}”.</Notice>}
    </section>
  );
}
