"use client";

import { useEffect, useId, useRef, useState } from "react";
import { ApiError, messageOf } from "@/components/api/client";
import { previewSequencerProfile, type SequencerProfileSummary, type SequencerSettings } from "@/components/api/uploads";
import { formatDuration, formatLength } from "@/components/format/quantities";
import { sentence } from "@/components/format/text";
import { Notice } from "@/components/ui/Notice";
import { buttonStyles, fieldStyles, tableStyles } from "@/components/ui/styles";
import { SEPARATION_UNIT_CHOICES, TIME_UNIT_CHOICES, SEQUENCER_CSV_LIMITS, type SampledProtocol } from "@/canvas/import/sequencer-csv";
import { ProblemList } from "./ProblemList";
import { ProfileSketch } from "./ProfileSketch";

export interface SequencerChoice {
  protocol: SampledProtocol;
  profile: SequencerProfileSummary;
  file: File;
  settings: SequencerSettings;
}

interface SequencerProfileImportProps {
  projectId: string;
  scenarioId: string;
  /**
   * What "Use this profile" does. In the editor: apply `protocol` through the editor's own edit (one undo step,
   * autosave stores it). Elsewhere: save it as a new revision. A rejection is shown in the dialog.
   */
  onUse: (choice: SequencerChoice) => Promise<void> | void;
  /** The button that opens the dialog. */
  triggerLabel?: string;
  disabled?: boolean;
}

const unitLabel = (u: string) => u.replace(/^u/, "µ");
const PREVIEW_ROWS = 6;

type Preview = { state: "idle" } | { state: "reading" } | { state: "ready"; profile: SequencerProfileSummary; protocol: SampledProtocol } | { state: "failed"; error: unknown };

/**
 * A dialog to read a lab sequencer's CSV export as a sampled separation profile: choose the file, the units when
 * its header names none, look at the first rows and a sketch of the whole profile, then use it. The file is read
 * on the server without storing anything (a preview); what happens on "Use this profile" is the caller's.
 */
export function SequencerProfileImport({ projectId, scenarioId, onUse, triggerLabel = "Import a measured profile…", disabled }: SequencerProfileImportProps) {
  const dialog = useRef<HTMLDialogElement>(null);
  const [open, setOpen] = useState(false);
  const [file, setFile] = useState<File | null>(null);
  const [settings, setSettings] = useState<SequencerSettings>({ interpolation: "linear" });
  const [preview, setPreview] = useState<Preview>({ state: "idle" });
  const [using, setUsing] = useState<{ pending: boolean; error: string | null }>({ pending: false, error: null });
  const ids = { title: useId(), file: useId(), time: useId(), separation: useId(), interpolation: useId() };

  useEffect(() => {
    const el = dialog.current;
    if (!el) return;
    if (open && !el.open) el.showModal();
    else if (!open && el.open) el.close();
  }, [open]);

  useEffect(() => {
    if (!file) return;
    let current = true;
    setPreview({ state: "reading" });
    previewSequencerProfile(projectId, scenarioId, file, settings).then(
      (r) => current && setPreview({ state: "ready", profile: r.profile, protocol: r.protocol }),
      (error: unknown) => current && setPreview({ state: "failed", error }),
    );
    return () => {
      current = false;
    };
  }, [file, settings, projectId, scenarioId]);

  const close = () => {
    setOpen(false);
    setFile(null);
    setPreview({ state: "idle" });
    setSettings({ interpolation: "linear" });
    setUsing({ pending: false, error: null });
  };

  const missingUnits =
    preview.state === "failed" && preview.error instanceof ApiError && Array.isArray(preview.error.details.missingUnits) ? (preview.error.details.missingUnits as string[]) : [];

  const use = async () => {
    if (preview.state !== "ready" || !file) return;
    setUsing({ pending: true, error: null });
    try {
      await onUse({ protocol: preview.protocol, profile: preview.profile, file, settings });
      close();
    } catch (error) {
      // An ApiError carries the server's words; an edit the editor refused carries its own.
      setUsing({ pending: false, error: error instanceof Error ? error.message : messageOf(error) });
    }
  };

  const unitSelect = (which: "time" | "separation") => {
    const choices = which === "time" ? TIME_UNIT_CHOICES : SEPARATION_UNIT_CHOICES;
    const key = which === "time" ? "timeUnit" : "separationUnit";
    const missing = missingUnits.includes(which);
    return (
      <div>
        <label htmlFor={ids[which]} className={fieldStyles.label}>
          {which === "time" ? "Time unit" : "Separation unit"}
        </label>
        <select
          id={ids[which]}
          value={settings[key] ?? ""}
          aria-invalid={missing}
          onChange={(event) => setSettings((s) => ({ ...s, [key]: event.target.value || undefined }))}
          className={fieldStyles.control}
        >
          <option value="">As the header says</option>
          {choices.map((u) => (
            <option key={u} value={u}>
              {unitLabel(u)}
            </option>
          ))}
        </select>
        {missing && <p className="mt-1 text-sm text-invalid">⚠ The header names no {which} unit: choose one.</p>}
      </div>
    );
  };

  return (
    <>
      <button type="button" className={buttonStyles.secondary} disabled={disabled} onClick={() => setOpen(true)}>
        {triggerLabel}
      </button>
      <dialog
        ref={dialog}
        aria-labelledby={ids.title}
        onClose={() => open && close()}
        className="m-auto max-h-[92vh] w-full max-w-3xl overflow-y-auto rounded border border-rule bg-paper p-0 text-ink shadow-sheet backdrop:bg-ink/30"
      >
        <div className="space-y-5 p-6">
          <div>
            <h2 id={ids.title} className="font-serif text-xl font-semibold">
              Measured profile from a sequencer CSV
            </h2>
            <p className="mt-1 text-sm text-ink-soft">
              A CSV with a time column and a separation column, units in the header (“t [ms]”, “separation [um]”) or chosen below; up to{" "}
              {SEQUENCER_CSV_LIMITS.maxRows.toLocaleString("en")} rows and {SEQUENCER_CSV_LIMITS.maxBytes / 1024 / 1024} MB. It becomes the scenario’s protocol, as
              samples.
            </p>
          </div>
          <div className="grid gap-4 sm:grid-cols-2">
            <div className="sm:col-span-2">
              <label htmlFor={ids.file} className={fieldStyles.label}>
                Sequencer CSV
              </label>
              <input
                id={ids.file}
                type="file"
                accept=".csv,.txt,text/csv,text/plain"
                className={`${fieldStyles.control} file:mr-3 file:rounded file:border-0 file:bg-paper-deep file:px-3 file:py-1 file:text-sm file:font-semibold`}
                onChange={(event) => setFile(event.target.files?.[0] ?? null)}
              />
            </div>
            {unitSelect("time")}
            {unitSelect("separation")}
            <div>
              <label htmlFor={ids.interpolation} className={fieldStyles.label}>
                Between samples
              </label>
              <select
                id={ids.interpolation}
                value={settings.interpolation}
                onChange={(event) => setSettings((s) => ({ ...s, interpolation: event.target.value as SequencerSettings["interpolation"] }))}
                className={fieldStyles.control}
              >
                <option value="linear">Straight lines (a kink at every bend)</option>
                <option value="cubic-spline">Smooth curve (clamped cubic spline)</option>
              </select>
            </div>
          </div>

          <div aria-live="polite">
            {preview.state === "reading" && <p className="text-sm text-ink-soft">Reading {file?.name}…</p>}
            {preview.state === "failed" && <ProblemList error={preview.error} title={`“${file?.name}” cannot be used as it is.`} />}
            {preview.state === "ready" && <ProfilePreview profile={preview.profile} protocol={preview.protocol} />}
          </div>

          {using.error && <Notice tone="invalid">{sentence(using.error)}</Notice>}
          <div className="flex justify-end gap-3 border-t border-rule pt-4">
            <button type="button" className={buttonStyles.secondary} onClick={close}>
              Cancel
            </button>
            <button type="button" className={buttonStyles.primary} disabled={preview.state !== "ready" || using.pending} onClick={use}>
              {using.pending ? "Working…" : "Use this profile"}
            </button>
          </div>
        </div>
      </dialog>
    </>
  );
}

function ProfilePreview({ profile, protocol }: { profile: SequencerProfileSummary; protocol: SampledProtocol }) {
  const columnText = (c: SequencerProfileSummary["time"]) => `${c.header ? `“${c.header}”` : "unnamed column"}, in ${unitLabel(c.unit)}${c.unitSource === "chosen" ? " (chosen)" : ""}`;
  return (
    <div className="space-y-4">
      <dl className="grid grid-cols-2 gap-x-6 gap-y-1 text-sm sm:grid-cols-4">
        <div>
          <dt className="text-ink-faint">Samples</dt>
          <dd className="tabular font-mono" data-testid="profile-rows">
            {profile.rowCount.toLocaleString("en")}
          </dd>
        </div>
        <div>
          <dt className="text-ink-faint">Duration</dt>
          <dd className="tabular font-mono">{formatDuration(profile.durationSeconds)}</dd>
        </div>
        <div>
          <dt className="text-ink-faint">Peak separation</dt>
          <dd className="tabular font-mono">{formatLength(profile.maxSeparationMetres)}</dd>
        </div>
        <div>
          <dt className="text-ink-faint">Columns read</dt>
          <dd>
            {columnText(profile.time)}; {columnText(profile.separation)}
          </dd>
        </div>
      </dl>
      {profile.flags.map((flag) => (
        <Notice key={flag.code} tone="caution">
          {sentence(flag.message)}
        </Notice>
      ))}
      <div className="grid gap-4 sm:grid-cols-[minmax(0,1fr)_minmax(0,1.4fr)]">
        <table className={tableStyles.table}>
          <caption className="mb-1 text-left text-xs text-ink-faint">
            The first {Math.min(PREVIEW_ROWS, profile.preview.length)} of {profile.rowCount.toLocaleString("en")} samples
          </caption>
          <thead>
            <tr>
              <th className={tableStyles.head}>Time</th>
              <th className={`${tableStyles.head} text-right`}>Separation</th>
            </tr>
          </thead>
          <tbody>
            {profile.preview.slice(0, PREVIEW_ROWS).map((s, i) => (
              <tr key={i} className={tableStyles.row}>
                <td className="tabular px-3 py-1 font-mono">{formatDuration(s.timeSeconds)}</td>
                <td className="tabular px-3 py-1 text-right font-mono">{formatLength(s.separationMetres)}</td>
              </tr>
            ))}
          </tbody>
        </table>
        <ProfileSketch samples={protocol.samples} durationSeconds={profile.durationSeconds} maxSeparationMetres={profile.maxSeparationMetres} />
      </div>
    </div>
  );
}
