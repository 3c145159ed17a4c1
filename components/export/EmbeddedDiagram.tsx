"use client";

/**
 * An embedded Diagram: the figure alone, filling its frame, in the light or dark figure theme, with larger labels
 * for projection if asked, and optionally a time scrubber that plays the protocol along lab time (the branches
 * drawn up to the cursor, and running counts of the quanta, flagged as an approximation). Read-only: the store
 * it mounts never saves.
 */
import dynamic from "next/dynamic";
import { useEffect, useMemo, useState } from "react";
import { EditorProvider, useEditor } from "@/canvas/EditorProvider";
import { timeCursor } from "@/canvas/export/time-cursor";
import { createPlaybackClock, playbackStart, type PlaybackClock } from "@/canvas/kernels/embed/playback";
import { countText, createRunningCounts, type RunningCountRow } from "@/canvas/kernels/embed/running-counts";
import { FIGURE_PALETTES, type FigurePalette } from "@/canvas/theme";
import { BranchLegend } from "@/components/editor/BranchLegend";
import { FlagIcon } from "@/components/editor/FlagIcon";
import { useElementSize } from "@/components/editor/useElementSize";
import type { ScenarioResult } from "@/physics/result";
import type { ScenarioDocument } from "@/physics/scenario/schema";
import { formatQuantity } from "@/physics/units";
import { LARGE_TYPE_SCALE, type EmbedOptions } from "./embed-options";

const DiagramStage = dynamic(() => import("@/canvas/layers/DiagramStage"), { ssr: false });

const SLIDER_STEPS = 1000;

/** The browser's animation frames, for the playback clock. */
const ANIMATION_FRAMES = { request: (callback: (nowMs: number) => void) => requestAnimationFrame(callback), cancel: (handle: number) => cancelAnimationFrame(handle) };

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

/** The running counts at the cursor, each beside its total, in the words of the Budget. */
function RunningCounts({ rows }: { rows: RunningCountRow[] }) {
  return (
    <span className="flex flex-wrap items-baseline gap-x-4" data-testid="running-counts">
      {rows.map((r) => (
        <span key={r.key} data-testid={`running-${r.key}`} data-log10={Number.isFinite(r.log10Now) ? r.log10Now : ""}>
          quanta {r.words}: <span className="tabular">≈ {countText(r.log10Now)}</span> <span className="tabular opacity-70">of {countText(r.log10Total)}</span>
        </span>
      ))}
    </span>
  );
}

/** τ on the scrubber, and the clock that plays it (owned here only to be started, stopped and disposed with the embed). */
function usePlayback(totalSeconds: number, enabled: boolean) {
  const [tau, setTau] = useState(totalSeconds);
  const [clock, setClock] = useState<PlaybackClock | null>(null);
  useEffect(() => {
    if (!enabled) return;
    const made = createPlaybackClock(totalSeconds, setTau, ANIMATION_FRAMES);
    setClock(made);
    setTau(totalSeconds);
    return () => {
      made.stop();
      setClock(null);
    };
  }, [totalSeconds, enabled]);
  const [playing, setPlaying] = useState(false);
  return {
    tau,
    playing,
    toggle() {
      if (!clock) return;
      if (clock.playing) clock.stop();
      else clock.play(playbackStart(tau, totalSeconds));
      setPlaying(clock.playing);
    },
    scrubTo(tauSeconds: number) {
      clock?.stop();
      setPlaying(false);
      setTau(tauSeconds);
    },
  };
}

function EmbedBody({ title, result, resultIssues, sharePath, options, palette }: Omit<EmbeddedDiagramProps, "document" | "version"> & { palette: FigurePalette }) {
  const document = useEditor((s) => s.document);
  const outcome = useEditor((s) => s.diagramScene(s.document));
  const counts = useMemo(() => (result ? createRunningCounts(document, result) : null), [document, result]);
  const total = counts?.totalSeconds ?? 0;
  const [ref, size] = useElementSize<HTMLDivElement>({ width: 0, height: 0 });
  const [chromeRef, chromeSize] = useElementSize<HTMLDivElement>({ width: 0, height: 0 });
  const scrubbing = options.scrub && outcome.ok && outcome.scene.protocol !== null && total > 0;
  const playback = usePlayback(total, scrubbing);
  const { tau } = playback;

  const cursor = scrubbing && outcome.ok && tau < total ? timeCursor(outcome.scene, total, tau) : null;
  const scale = options.largeType ? LARGE_TYPE_SCALE : 1;
  // Large type is for the figure's labels, read from afar; the lines beside it stay small, so the Diagram keeps the frame.
  const text = options.largeType ? "text-sm" : "text-xs";
  const rows = scrubbing && counts ? counts.rows(tau) : null;
  const side = chromeBeside(size);
  const inset = side ? { right: side, bottom: 0 } : { right: 0, bottom: chromeSize.height };

  return (
    <div className="relative h-screen overflow-hidden" style={{ background: palette.paper, color: palette.inkSoft }} data-testid="embed" data-theme={document.display.theme}>
      <div ref={ref} className="absolute inset-0" data-testid="embed-diagram">
        {size.width > 0 && size.height > 0 && <DiagramStage width={size.width} height={size.height} labelScale={scale} cursor={cursor} inset={inset} />}
      </div>
      <div
        ref={chromeRef}
        className={side ? "absolute bottom-0 right-0 top-0 flex flex-col justify-end overflow-y-auto" : "absolute inset-x-0 bottom-0"}
        style={{ background: palette.paper, width: side || undefined }}
        data-testid="embed-chrome"
      >
        {scrubbing && (
          <div className={`flex flex-wrap items-center gap-x-3 gap-y-1 px-3 pt-1 ${text}`} role="group" aria-label="Time scrubber">
            <button type="button" onClick={playback.toggle} className="rounded border px-2 py-0.5" style={{ borderColor: palette.inkFaint, color: palette.ink }} aria-pressed={playback.playing}>
              {playback.playing ? "❚❚ Pause" : "▶ Play"}
            </button>
            <input
              type="range"
              min={0}
              max={SLIDER_STEPS}
              value={Math.round((tau / total) * SLIDER_STEPS)}
              onChange={(e) => playback.scrubTo((Number(e.target.value) / SLIDER_STEPS) * total)}
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
        {rows && (
          <div className={`flex flex-wrap items-baseline gap-x-3 gap-y-0.5 px-3 pt-1 ${text}`}>
            <RunningCounts rows={rows} />
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
          <p className="px-3 pt-1 text-xs opacity-80" data-testid="embed-notes">
            {outcome.scene.notes.join(" ")}
          </p>
        )}
        <div className={`flex flex-wrap items-center justify-between gap-x-4 gap-y-1 px-3 py-1.5 ${text}`}>
          <BranchLegend radiation onFigurePaper large={options.largeType} />
          <span className="min-w-0 truncate">
            {title} ·{" "}
            <a href={sharePath} target="_blank" rel="noopener" className="underline underline-offset-2" style={{ color: palette.ink }}>
              Branchline
            </a>
          </span>
        </div>
      </div>
    </div>
  );
}

/** Width of the column of controls beside a landscape Diagram, and the height a band of them at the foot takes, about. */
const COLUMN_PX = { least: 240, most: 320 };
const BAND_ESTIMATE_PX = 120;

/**
 * Where the controls, counts, notes and key go: in a column at the right when that leaves the Diagram (about as tall
 * as it is wide) more room than a band along the foot would, as in a landscape frame; else in the band. The Diagram's
 * canvas fills the whole frame either way, and the figure keeps clear of the controls. Returns the column's width, or
 * 0 for the band.
 */
export function chromeBeside(frame: { width: number; height: number }): number {
  const column = Math.min(COLUMN_PX.most, Math.max(COLUMN_PX.least, frame.width - frame.height));
  const besideRoom = Math.min(frame.width - column, frame.height);
  const belowRoom = Math.min(frame.width, frame.height - BAND_ESTIMATE_PX);
  return besideRoom > belowRoom ? column : 0;
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
