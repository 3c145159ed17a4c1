"use client";

/**
 * An embedded Diagram: the figure alone, filling its frame, in the light or dark figure theme, with larger labels
 * for projection if asked, and optionally a time scrubber that plays the protocol along lab time (the branches
 * drawn up to the cursor, and running counts of the quanta, flagged as an approximation). Read-only: the store
 * it mounts never saves.
 */
import dynamic from "next/dynamic";
import { useEffect, useMemo, useRef, useState } from "react";
import { EditorProvider, useEditor } from "@/canvas/EditorProvider";
import { timeCursor } from "@/canvas/export/time-cursor";
import { compactNumber, numberFromLog10 } from "@/canvas/kernels/diagram/labels";
import { profileHistory } from "@/canvas/kernels/profile";
import { DASHES, FIGURE_PALETTES, type FigurePalette } from "@/canvas/theme";
import { FlagIcon } from "@/components/editor/FlagIcon";
import { useElementSize } from "@/components/editor/useElementSize";
import { createQuantaAccumulation, type RunningQuanta } from "@/physics/estimators/accumulation";
import { log10Sum } from "@/physics/estimators/quantity";
import type { ScenarioResult } from "@/physics/result";
import type { ScenarioDocument } from "@/physics/scenario/schema";
import { formatQuantity } from "@/physics/units";
import { LARGE_TYPE_SCALE, type EmbedOptions } from "./embed-options";

const DiagramStage = dynamic(() => import("@/canvas/layers/DiagramStage"), { ssr: false });

/** Wall-clock seconds one pass of the protocol takes when playing, and the pause at its end. */
const PASS_SECONDS = 8;
const PAUSE_SECONDS = 1.2;
const SLIDER_STEPS = 1000;

export interface EmbeddedDiagramProps {
  title: string;
  document: ScenarioDocument | null;
  version: number;
  result: ScenarioResult | null;
  /** Why the numbers cannot be computed (a stored document outside the ranges where the computation is defined). */
  resultIssues?: { path: string; message: string }[] | null;
  /** The share page of the same link ("open in Branchline"). */
  sharePath: string;
  options: EmbedOptions;
}

function countText(log10: number): string {
  if (log10 === -Infinity) return "0";
  return log10 >= -3 && log10 < 4 ? compactNumber(10 ** log10, 3) : numberFromLog10(log10, 3);
}

function Legend({ palette, horizon }: { palette: FigurePalette; horizon: boolean }) {
  return (
    <span className="flex flex-wrap items-center gap-x-3 gap-y-0.5" aria-label="Key">
      <span className="flex items-center gap-1">
        <svg width="22" height="8" aria-hidden="true">
          <line x1="1" y1="4" x2="21" y2="4" stroke={palette.branchA} strokeWidth="2.5" />
        </svg>
        branch A
      </span>
      <span className="flex items-center gap-1">
        <svg width="22" height="8" aria-hidden="true">
          <line x1="1" y1="4" x2="21" y2="4" stroke={palette.branchB} strokeWidth="2" strokeDasharray={DASHES.branchB.join(" ")} />
        </svg>
        branch B
      </span>
      <span className="flex items-center gap-1">
        <span aria-hidden="true" className="inline-block h-2.5 w-4" style={{ background: palette.farFieldTint }} />
        toward ℐ⁺ by the ramps
      </span>
      {horizon && (
        <span className="flex items-center gap-1">
          <span aria-hidden="true" className="inline-block h-2.5 w-4" style={{ background: palette.horizonTint }} />
          taken by the horizon
        </span>
      )}
    </span>
  );
}

/** Both channels' ramp-driven and hold-driven totals, log10. */
function totalsOf(result: ScenarioResult): { ramp: number; hold: number } {
  const log10 = (q: { log10: number | null }) => (q.log10 === null ? -Infinity : q.log10);
  const channels = [result.electromagnetic, result.gravitational];
  return {
    ramp: channels.map((c) => log10(c.rampDrivenQuanta)).reduce(log10Sum, -Infinity),
    hold: channels.map((c) => log10(c.holdDrivenQuanta)).reduce(log10Sum, -Infinity),
  };
}

/** The running counts at the cursor, each beside its total, in the words of the Budget. */
function RunningCounts({ running, result }: { running: RunningQuanta; result: ScenarioResult }) {
  const end = totalsOf(result);
  const rows: { key: string; words: string; now: number; of: number }[] =
    running.split === "ramps-and-horizon"
      ? [
          { key: "ramp", words: "ramp-driven", now: running.log10RampDriven, of: end.ramp },
          { key: "horizon", words: "hold-driven, into H⁺", now: running.log10Horizon!, of: end.hold },
        ]
      : running.split === "far-field-only"
        ? [{ key: "far-field", words: "to ℐ⁺", now: running.log10FarField!, of: log10Sum(end.ramp, end.hold) }]
        : [
            { key: "ramp", words: "ramp-driven", now: running.log10RampDriven, of: end.ramp },
            { key: "hold", words: "hold-driven", now: running.log10HoldDriven, of: end.hold },
          ];
  return (
    <span className="flex flex-wrap items-baseline gap-x-4" data-testid="running-counts">
      {rows.map((r) => (
        <span key={r.key} data-testid={`running-${r.key}`} data-log10={Number.isFinite(r.now) ? r.now : ""}>
          quanta {r.words}: <span className="tabular">≈ {countText(r.now)}</span> <span className="tabular opacity-70">of {countText(r.of)}</span>
        </span>
      ))}
    </span>
  );
}

function EmbedBody({ title, result, resultIssues, sharePath, options, palette }: Omit<EmbeddedDiagramProps, "document" | "version"> & { palette: FigurePalette }) {
  const document = useEditor((s) => s.document);
  const outcome = useEditor((s) => s.diagramScene(s.document));
  const history = useMemo(() => profileHistory(document), [document]);
  const total = history?.totalDurationSeconds ?? 0;
  const accumulate = useMemo(() => (history && result ? createQuantaAccumulation(history, result) : null), [history, result]);
  const [ref, size] = useElementSize<HTMLDivElement>({ width: 0, height: 0 });
  const scrubbing = options.scrub && outcome.ok && outcome.scene.protocol !== null && total > 0;
  const [tau, setTau] = useState(total);
  const [playing, setPlaying] = useState(false);
  const clock = useRef<{ last: number; pausedFor: number } | null>(null);

  useEffect(() => {
    if (!playing || !scrubbing) return;
    let frame = 0;
    clock.current = { last: performance.now(), pausedFor: 0 };
    const step = (now: number) => {
      const c = clock.current!;
      const dt = (now - c.last) / 1000;
      c.last = now;
      setTau((t) => {
        if (t >= total) {
          c.pausedFor += dt;
          if (c.pausedFor < PAUSE_SECONDS) return t;
          c.pausedFor = 0;
          return 0;
        }
        return Math.min(total, t + (dt / PASS_SECONDS) * total);
      });
      frame = requestAnimationFrame(step);
    };
    frame = requestAnimationFrame(step);
    return () => cancelAnimationFrame(frame);
  }, [playing, scrubbing, total]);

  const cursor = scrubbing && outcome.ok && tau < total ? timeCursor(outcome.scene, total, tau) : null;
  const scale = options.largeType ? LARGE_TYPE_SCALE : 1;
  const text = options.largeType ? "text-base" : "text-xs";
  const running = scrubbing && accumulate ? accumulate(tau) : null;

  return (
    <div className="flex h-screen flex-col overflow-hidden" style={{ background: palette.paper, color: palette.inkSoft }} data-testid="embed" data-theme={document.display.theme}>
      <div ref={ref} className="min-h-0 flex-1" data-testid="embed-diagram">
        {size.width > 0 && size.height > 0 && <DiagramStage width={size.width} height={size.height} labelScale={scale} cursor={cursor} />}
      </div>
      {scrubbing && (
        <div className={`flex flex-wrap items-center gap-x-3 gap-y-1 px-3 pt-1 ${text}`} role="group" aria-label="Time scrubber">
          <button
            type="button"
            onClick={() => {
              if (!playing && tau >= total) setTau(0);
              setPlaying((p) => !p);
            }}
            className="rounded border px-2 py-0.5"
            style={{ borderColor: palette.inkFaint, color: palette.ink }}
            aria-pressed={playing}
          >
            {playing ? "❚❚ Pause" : "▶ Play"}
          </button>
          <input
            type="range"
            min={0}
            max={SLIDER_STEPS}
            value={Math.round((tau / total) * SLIDER_STEPS)}
            onChange={(e) => {
              setPlaying(false);
              setTau((Number(e.target.value) / SLIDER_STEPS) * total);
            }}
            aria-label="Lab time"
            aria-valuetext={`${formatQuantity(tau, "time")} of ${formatQuantity(total, "time")}`}
            className="min-w-32 flex-1"
            style={{ accentColor: palette.branchB }}
          />
          <span className="tabular" data-testid="scrub-time">
            τ = {formatQuantity(tau, "time")} / {formatQuantity(total, "time")}
          </span>
        </div>
      )}
      {running && result && (
        <div className={`flex flex-wrap items-baseline gap-x-3 gap-y-0.5 px-3 pt-1 ${text}`}>
          <RunningCounts running={running} result={result} />
          <span className="flex items-center gap-1" title="The totals are the computed ones; how they build up in time is an estimate: the ramps' share by their strength, the hold's by the time spent apart.">
            <FlagIcon kind="note" />
            approximation: the computed totals shared out along lab time
          </span>
        </div>
      )}
      {!result && resultIssues && resultIssues.length > 0 && (
        <p className={`px-3 pt-1 ${text}`} role="status" data-testid="embed-issues">
          The numbers cannot be computed: {resultIssues.map((i) => `${i.message}${i.path ? ` (${i.path})` : ""}`).join("; ")}
        </p>
      )}
      {outcome.ok && outcome.scene.notes.length > 0 && (
        <p className={`px-3 pt-1 ${text} opacity-80`} data-testid="embed-notes">
          {outcome.scene.notes.join(" ")}
        </p>
      )}
      <div className={`flex flex-wrap items-center justify-between gap-x-4 gap-y-1 px-3 py-1.5 ${text}`}>
        <Legend palette={palette} horizon={outcome.ok && Boolean(outcome.scene.chart.background.horizon)} />
        <span className="min-w-0 truncate">
          {title} ·{" "}
          <a href={sharePath} target="_blank" rel="noopener" className="underline underline-offset-2" style={{ color: palette.ink }}>
            Branchline
          </a>
        </span>
      </div>
    </div>
  );
}

export function EmbeddedDiagram({ document, version, ...rest }: EmbeddedDiagramProps) {
  const theme = rest.options.theme ?? document?.display.theme ?? "light";
  const shown = useMemo(() => (document ? { ...document, display: { ...document.display, theme } } : null), [document, theme]);
  const palette = FIGURE_PALETTES[theme];
  if (!shown) {
    return (
      <div className="flex h-screen items-center justify-center p-6 text-sm" style={{ background: palette.paper, color: palette.ink }}>
        This scenario’s stored document cannot be read by this version of Branchline.
      </div>
    );
  }
  return (
    <EditorProvider document={shown} version={version} readOnly>
      <EmbedBody {...rest} palette={palette} />
    </EditorProvider>
  );
}
