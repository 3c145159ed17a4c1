"use client";

/**
 * The Sweep: decoherence against the recombination time, the hold time or the lab's distance, on log–log axes,
 * computed on a worker of its own; with an environment, also against the gas pressure, the surroundings'
 * temperature or the surface distance, drawn as ⟨N⟩ of every channel and the total. The current value and the
 * sweep's smallest decoherence are marked; clicking a point sets the scenario to it (one undo step). A progress bar
 * shows when a sweep takes more than a moment.
 */
import { memo, useCallback, useEffect, useMemo, useState } from "react";
import type { SweepParameter } from "@/canvas/compute-client";
import { useEditor, useEditorObject, useEditorStore } from "@/canvas/EditorProvider";
import { compactNumber } from "@/canvas/kernels/diagram/labels";
import { withRecombinationAndHold } from "@/canvas/kernels/document-edits";
import { defaultSweepRange } from "@/canvas/kernels/sweep-range";
import { buttonStyles } from "@/components/ui/styles";
import type { ScenarioDocument } from "@/physics/scenario/schema";
import { sweepCurves } from "@/canvas/kernels/sweep-channels";
import { canVary, withParameter } from "@/physics/sweeps";
import { formatQuantity } from "@/physics/units";
import { FlagIcon } from "./FlagIcon";
import { RangeFields, SweepResultBox } from "./RangeFields";
import { CompactSelect } from "@/components/ui/Field";
import { dimensionOf, PARAMETER_WORDS, SweepChart, type SweepPoint } from "./SweepChart";
import { SweepChannelsChart } from "./SweepChannelsChart";
import { useEdit } from "./useEdit";
import { usePanelValue } from "./usePacedDuringDrag";

const POINTS = 41;
const SWEEP_ORDER: SweepParameter[] = ["recombination-time", "hold-time", "lab-distance", "gas-pressure", "surroundings-temperature", "surface-distance"];
/** A sweep quicker than this shows no progress bar. */
const PROGRESS_AFTER_MS = 400;

function useShowAfter(active: boolean, ms: number): boolean {
  const [shown, setShown] = useState(false);
  useEffect(() => {
    if (!active) return setShown(false);
    const timer = setTimeout(() => setShown(true), ms);
    return () => clearTimeout(timer);
  }, [active, ms]);
  return shown;
}

export function SweepPanel() {
  // The chart's "now" marker follows the store by itself (SweepChart).
  const document = usePanelValue((s) => s.document);
  const revision = usePanelValue((s) => s.revision);
  return <SweepView document={document} revision={revision} />;
}

const SweepView = memo(function SweepView({ document, revision }: { document: ScenarioDocument; revision: number }) {
  const store = useEditorStore();
  const runner = useEditorObject().jobs;
  const edit = useEdit();
  const readOnly = useEditor((s) => s.readOnly);
  const sweep = useEditor((s) => s.sweep);
  const available = SWEEP_ORDER.filter((p) => canVary(document, p));
  const parameter = available.includes(sweep.parameter) ? sweep.parameter : (available[0] ?? sweep.parameter);
  const dimension = dimensionOf(parameter);
  const [range, setRange] = useState<{ from: number; to: number } | null>(null);
  const shownRange = range ?? defaultSweepRange(document, parameter);
  const showProgress = useShowAfter(sweep.status === "running", PROGRESS_AFTER_MS);

  const run = () => {
    if (!shownRange) return;
    const state = store.getState();
    state.sweepStarted(state.revision);
    runner.run(
      { kind: "sweep", document: state.document, sweep: { parameter, fromValue: shownRange.from, toValue: shownRange.to, points: POINTS } },
      {
        progress: (done, total) => store.getState().sweepProgress(done, total),
        sweep: (result) => store.getState().sweepFinished(result),
        failed: (issues) => store.getState().sweepFailed(issues),
      },
    );
  };

  const findBest = () => {
    const state = store.getState();
    const protocol = state.document.protocol;
    if (protocol.kind !== "segments") return;
    const total = protocol.separation.durationSeconds + protocol.hold.durationSeconds + protocol.recombination.durationSeconds;
    state.sweepStarted(state.revision);
    runner.run(
      { kind: "optimise", document: state.document, request: { totalDurationSeconds: total, tradeAgainst: "hold" } },
      { optimum: (optimum) => store.getState().optimumFound(optimum), failed: (issues) => store.getState().sweepFailed(issues) },
    );
  };
  const optimum = sweep.optimum;
  const useOptimum = () => {
    if (!optimum) return;
    edit("Use the best recombination time", (d) => withRecombinationAndHold(d, optimum.recombinationSeconds, optimum.tradedSeconds));
  };

  const data = useMemo(
    () =>
      (sweep.result?.points ?? [])
        .map((p) => ({ x: p.x, decoherence: p.decoherence.value }))
        .filter((p): p is SweepPoint => p.decoherence !== null && p.decoherence > 0),
    [sweep.result],
  );
  const curves = useMemo(() => sweepCurves(sweep.result?.points ?? []), [sweep.result]);
  const xs = useMemo(() => (sweep.result?.points ?? []).map((p) => p.x), [sweep.result]);
  const best = useMemo(() => data.reduce<SweepPoint | null>((b, p) => (!b || p.decoherence < b.decoherence ? p : b), null), [data]);
  const stale = sweep.result !== null && sweep.requestRevision !== revision;
  const setTo = useCallback((x: number) => edit(`Set ${PARAMETER_WORDS[parameter]} from the sweep`, (d) => withParameter(d, parameter, x)), [edit, parameter]);

  if (available.length === 0) {
    return (
      <section aria-labelledby="sweep-heading" data-testid="sweep">
        <h2 id="sweep-heading" className="mb-2 text-sm font-semibold uppercase tracking-wide text-ink-soft">
          Sweep
        </h2>
        <p className="text-sm text-ink-soft">Nothing to sweep here: a formula or sampled profile in flat spacetime has no segment times and no horizon distance.</p>
      </section>
    );
  }
  return (
    <section aria-labelledby="sweep-heading" data-testid="sweep">
      <h2 id="sweep-heading" className="mb-2 text-sm font-semibold uppercase tracking-wide text-ink-soft">
        Sweep
      </h2>
      <div className="flex flex-wrap items-end gap-3">
        <CompactSelect
          label="Decoherence against"
          value={parameter}
          options={available.map((p) => ({ value: p, words: PARAMETER_WORDS[p] }))}
          onChange={(chosen) => {
            setRange(null);
            store.getState().setSweepParameter(chosen);
          }}
        />
        {shownRange && (
          <>
            <RangeFields range={shownRange} dimension={dimension} labels={["From", "To"]} onChange={setRange} />
          </>
        )}
        <button type="button" className={`${buttonStyles.secondary} py-1.5`} onClick={run} disabled={!shownRange || sweep.status === "running"} data-testid="run-sweep">
          {sweep.status === "running" ? "Sweeping…" : "Run sweep"}
        </button>
      </div>
      {parameter === "recombination-time" && document.protocol.kind === "segments" && (
        <div className="mt-3 flex flex-wrap items-center gap-3 text-sm">
          <button type="button" className={buttonStyles.row} onClick={findBest} disabled={sweep.status === "running"} data-testid="find-best-recombination">
            Find the best recombination time for the same total duration (trading against the hold)
          </button>
          {optimum && (
            <span className="text-ink-soft" data-testid="best-recombination">
              Best: {formatQuantity(optimum.recombinationSeconds, "time")} (hold {formatQuantity(optimum.tradedSeconds, "time")}), 𝒟 ={" "}
              {optimum.decoherence.value === null ? "—" : compactNumber(optimum.decoherence.value, 3)}
              {optimum.onBoundary && " — at the end of the allowed range"}
              {!readOnly && (
                <button type="button" className={`${buttonStyles.row} ml-2`} onClick={useOptimum}>
                  Use it
                </button>
              )}
            </span>
          )}
        </div>
      )}
      {showProgress && sweep.progress && (
        <div className="mt-3 flex items-center gap-3 text-xs text-ink-soft">
          <progress className="h-2 w-64" max={sweep.progress.total} value={sweep.progress.done} aria-label="Sweep progress" />
          {sweep.progress.done} of {sweep.progress.total} points
        </div>
      )}
      {sweep.status === "failed" && (
        <p role="alert" className="mt-3 flex items-start gap-2 text-sm text-invalid">
          <FlagIcon kind="invalid" /> The sweep failed: {sweep.issues.map((i) => i.message).join("; ")}
        </p>
      )}
      {curves.length > 0 && sweep.result && (
        <SweepResultBox stale={stale}>
          <div className="mt-3 h-80 w-full" data-testid="sweep-chart">
            <SweepChannelsChart xs={xs} curves={curves} parameter={sweep.result.parameter} readOnly={readOnly} onPick={setTo} />
          </div>
          {!readOnly && <p className="mt-1 text-xs text-ink-soft">Click a point to set the scenario to it.</p>}
        </SweepResultBox>
      )}
      {curves.length === 0 && data.length > 0 && (
        <SweepResultBox stale={stale}>
          <div className="mt-3 h-64 w-full" data-testid="sweep-chart">
            <SweepChart data={data} best={best} parameter={parameter} readOnly={readOnly} onPick={setTo} />
          </div>
          {best && (
            <p className="mt-1 text-xs text-ink-soft">
              Smallest decoherence on this sweep: {compactNumber(best.decoherence, 3)} at {PARAMETER_WORDS[parameter]} {formatQuantity(best.x, dimension)}.
              {!readOnly && " Click a point to set the scenario to it."}
            </p>
          )}
        </SweepResultBox>
      )}
    </section>
  );
});
