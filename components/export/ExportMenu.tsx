"use client";

/**
 * Export: the Diagram and the Sweep's chart as PNG (1×, 2×, 4×), SVG (fonts embedded, or labels as outlines) or
 * vector PDF, each with a legend and a caption line unless unticked, on a solid or transparent ground; the Budget
 * as CSV; the scenario as a scenario file. Everything is written in the browser from what is on screen, through
 * the same code as the figure command (canvas/export/render-figure.ts); nothing is saved.
 */
import { useId, useState } from "react";
import { usePopover } from "@/components/ui/usePopover";
import { useEditor } from "@/canvas/EditorProvider";
import { DEFAULT_STANDALONE, exportDiagramDrawing, type FigureGround, type StandaloneOptions } from "@/canvas/export/export-figure";
import { measureWith, renderFigureFile, type FigureFileRequest } from "@/canvas/export/render-figure";
import type { ExportDrawing } from "@/canvas/export/standalone-figure";
import { SCENARIO_FILE_MEDIA_TYPE, scenarioFileText, toScenarioFile } from "@/physics/scenario/exchange";
import { browserFigureToolkit } from "./browser-figure-toolkit";
import { budgetCsv } from "@/canvas/export/budget-csv";
import { useDiagramSize } from "./diagram-size";
import { downloadBytes, downloadText } from "./download";
import { budgetFileName, diagramFileName, scenarioFileNameFor, sweepFileName, type FigureFormat } from "@/canvas/export/file-names";
import { DEFAULT_SWEEP_FIGURE_SIZE, sweepDrawing } from "./sweep-export";

const RATIOS = [1, 2, 4] as const;
type Lettering = "embedded" | "outlines";
type FileKind = FigureFileRequest["format"];

const small = "rounded border border-rule-strong bg-paper px-3 py-1.5 text-sm hover:border-ink disabled:cursor-not-allowed disabled:opacity-40";
const action = "w-full rounded border border-rule-strong bg-white px-3 py-1.5 text-left text-sm hover:border-ink disabled:cursor-not-allowed disabled:opacity-40";

function Tick({ label, checked, onChange }: { label: string; checked: boolean; onChange(v: boolean): void }) {
  return (
    <label className="flex items-center gap-1 text-sm">
      <input type="checkbox" checked={checked} onChange={(e) => onChange(e.target.checked)} />
      {label}
    </label>
  );
}

function Choice<T extends string | number>({ legend, options, value, onChange, words }: { legend: string; options: readonly T[]; value: T; onChange(v: T): void; words(v: T): string }) {
  const name = useId();
  return (
    <fieldset className="flex flex-wrap items-center gap-x-3 gap-y-1 text-sm">
      <legend className="mb-1 text-xs font-semibold text-ink-soft">{legend}</legend>
      {options.map((option) => (
        <label key={option} className="flex items-center gap-1">
          <input type="radio" name={name} checked={value === option} onChange={() => onChange(option)} />
          {words(option)}
        </label>
      ))}
    </fieldset>
  );
}

export function ExportMenu({ title, description }: { title: string; description?: string | null }) {
  const { open, setOpen, root, panelId } = usePopover();


  return (
    <div ref={root} className="relative">
      <button type="button" className={small} aria-expanded={open} aria-controls={panelId} onClick={() => setOpen((o) => !o)}>
        Export ▾
      </button>
      {open && <ExportPanel id={panelId} title={title} description={description} />}
    </div>
  );
}

/** The open menu. Mounted only while open, so the closed menu follows no edits (a drag re-renders nothing here). */
function ExportPanel({ id: panelId, title, description }: { id: string; title: string; description?: string | null }) {
  const [ratio, setRatio] = useState<(typeof RATIOS)[number]>(2);
  const [ground, setGround] = useState<FigureGround>(DEFAULT_STANDALONE.ground);
  const [legend, setLegend] = useState(DEFAULT_STANDALONE.legend);
  const [caption, setCaption] = useState(DEFAULT_STANDALONE.caption);
  const [lettering, setLettering] = useState<Lettering>("embedded");
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const document = useEditor((s) => s.document);
  const scene = useEditor((s) => s.diagramScene(s.document));
  const sweep = useEditor((s) => s.sweep.result);
  const result = useEditor((s) => (s.budget.status === "ready" && s.budget.resultRevision === s.revision ? s.budget.result : null));
  const figureSize = useDiagramSize();
  const theme = document.display.theme;
  const options: StandaloneOptions = { theme, ground, legend, caption };
  const notes = scene.ok ? scene.scene.notes.join(" ") : "";

  const request = (kind: FileKind): FigureFileRequest => (kind === "svg" ? { format: "svg", lettering } : kind === "png" ? { format: "png", pixelRatio: ratio } : { format: "pdf" });
  const format = (kind: FileKind): FigureFormat => (kind === "png" ? { kind, pixelRatio: ratio } : { kind });

  const save = async (kind: FileKind, what: "diagram" | "sweep") => {
    setProblem(null);
    setBusy(true);
    try {
      const toolkit = await browserFigureToolkit();
      const measure = measureWith(toolkit);
      let drawing: ExportDrawing;
      if (what === "diagram") {
        if (!scene.ok) return;
        drawing = exportDiagramDrawing(document, scene.scene, figureSize(), options, measure);
      } else {
        if (!sweep) return;
        drawing = sweepDrawing(document, sweep, DEFAULT_SWEEP_FIGURE_SIZE, options, measure);
      }
      const file = await renderFigureFile(drawing, { title, description: what === "diagram" ? notes : undefined }, request(kind), toolkit);
      downloadBytes((what === "diagram" ? diagramFileName : sweepFileName)(title, format(kind)), file.bytes, file.mediaType);
    } catch (error) {
      setProblem(`The ${kind.toUpperCase()} could not be written: ${error instanceof Error ? error.message : String(error)}`);
    } finally {
      setBusy(false);
    }
  };
  const saveCsv = () => result && downloadText(budgetFileName(title), budgetCsv(result, document), "text/csv");
  const saveScenario = () => downloadText(scenarioFileNameFor(title), scenarioFileText(toScenarioFile({ title, description, document })), SCENARIO_FILE_MEDIA_TYPE);

  const figureButtons = (what: "diagram" | "sweep", enabled: boolean, name: string) => (
    <div className="grid grid-cols-3 gap-2">
      {(["png", "svg", "pdf"] as const).map((kind) => (
        <button key={kind} type="button" className={action} disabled={!enabled || busy} onClick={() => save(kind, what)} aria-label={`Download ${name} ${kind.toUpperCase()}`}>
          {kind.toUpperCase()}
        </button>
      ))}
    </div>
  );

  return (
    <div id={panelId} role="group" aria-label="Export" className="absolute right-0 z-20 mt-1 w-80 max-w-[calc(100vw-1rem)] space-y-4 rounded border border-rule-strong bg-paper p-4 shadow-lg">
      <section className="space-y-2" aria-labelledby={`${panelId}-figure`}>
        <h3 id={`${panelId}-figure`} className="text-xs font-semibold uppercase tracking-wide text-ink-soft">
          Figures
        </h3>
        <div className="flex flex-wrap gap-x-4 gap-y-1">
          <Tick label="Legend" checked={legend} onChange={setLegend} />
          <Tick label="Caption" checked={caption} onChange={setCaption} />
        </div>
        <Choice<(typeof RATIOS)[number]> legend="PNG size" options={RATIOS} value={ratio} onChange={setRatio} words={(r) => `${r}×`} />
        <Choice<FigureGround> legend="Fill" options={["solid", "transparent"] as const} value={ground} onChange={setGround} words={(g) => (g === "solid" ? (theme === "light" ? "white" : "dark") : "transparent")} />
        <Choice<Lettering> legend="SVG labels" options={["embedded", "outlines"] as const} value={lettering} onChange={setLettering} words={(l) => (l === "embedded" ? "text, fonts embedded" : "outlines")} />
        <p className="text-xs font-semibold text-ink-soft">Diagram</p>
        {figureButtons("diagram", scene.ok, "Diagram")}
        <p className="text-xs font-semibold text-ink-soft">Sweep chart</p>
        {figureButtons("sweep", sweep !== null, "sweep chart")}
        {sweep === null && <p className="text-xs text-ink-faint">Available when a sweep has been run.</p>}
        <p className="text-xs text-ink-faint">SVG and PDF are vector: lines stay sharp at any size. The PDF draws its labels as outlines.</p>
      </section>
      <section className="space-y-2" aria-labelledby={`${panelId}-numbers`}>
        <h3 id={`${panelId}-numbers`} className="text-xs font-semibold uppercase tracking-wide text-ink-soft">
          Budget numbers
        </h3>
        <button type="button" className={action} disabled={!result} onClick={saveCsv}>
          Download Budget (CSV)
        </button>
        {!result && <p className="text-xs text-ink-faint">Available when the Budget is up to date.</p>}
      </section>
      <section className="space-y-2" aria-labelledby={`${panelId}-scenario`}>
        <h3 id={`${panelId}-scenario`} className="text-xs font-semibold uppercase tracking-wide text-ink-soft">
          Scenario
        </h3>
        <button type="button" className={action} onClick={saveScenario}>
          Download scenario file (JSON)
        </button>
      </section>
      {problem && (
        <p role="alert" className="text-sm text-invalid">
          {problem}
        </p>
      )}
    </div>
  );
}
