"use client";

/**
 * Export: the Diagram as a PNG (1×, 2×, 4×, solid or transparent ground) or an SVG, the Budget as CSV, and the
 * scenario as a scenario file. Everything is written in the browser from what is on screen; nothing is saved.
 */
import { useEffect, useId, useRef, useState } from "react";
import { useEditor } from "@/canvas/EditorProvider";
import { diagramPngDataUrl } from "@/canvas/export/diagram-png";
import { diagramSvg } from "@/canvas/export/diagram-svg";
import { exportFigure, type FigureGround } from "@/canvas/export/export-figure";
import { useFigureFonts } from "@/canvas/layers/useFigureFonts";
import { SCENARIO_FILE_MEDIA_TYPE, scenarioFileText, toScenarioFile } from "@/physics/scenario/exchange";
import { budgetCsv } from "./budget-csv";
import { useDiagramSize } from "./diagram-size";
import { downloadDataUrl, downloadText } from "./download";
import { budgetFileName, diagramFileName, scenarioFileNameFor } from "./file-names";

const RATIOS = [1, 2, 4] as const;

const small = "rounded border border-rule-strong bg-paper px-3 py-1.5 text-sm hover:border-ink disabled:cursor-not-allowed disabled:opacity-40";
const action = "w-full rounded border border-rule-strong bg-white px-3 py-1.5 text-left text-sm hover:border-ink disabled:cursor-not-allowed disabled:opacity-40";

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
  const [open, setOpen] = useState(false);
  const panelId = useId();
  const root = useRef<HTMLDivElement>(null);

  useEffect(() => {
    if (!open) return;
    const onKey = (e: KeyboardEvent) => e.key === "Escape" && setOpen(false);
    const onPointer = (e: PointerEvent) => root.current && !root.current.contains(e.target as Node) && setOpen(false);
    window.addEventListener("keydown", onKey);
    window.addEventListener("pointerdown", onPointer);
    return () => {
      window.removeEventListener("keydown", onKey);
      window.removeEventListener("pointerdown", onPointer);
    };
  }, [open]);

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
  const [ground, setGround] = useState<FigureGround>("solid");
  const [problem, setProblem] = useState<string | null>(null);
  const document = useEditor((s) => s.document);
  const scene = useEditor((s) => s.diagramScene(s.document));
  const result = useEditor((s) => (s.budget.status === "ready" && s.budget.resultRevision === s.revision ? s.budget.result : null));
  const fonts = useFigureFonts();
  const figureSize = useDiagramSize();
  const theme = document.display.theme;

  const figure = () => (scene.ok ? exportFigure(scene.scene, figureSize(), theme, ground) : null);
  const notes = scene.ok ? scene.scene.notes.join(" ") : "";

  const savePng = async () => {
    const f = figure();
    if (!f) return;
    setProblem(null);
    try {
      downloadDataUrl(diagramFileName(title, { kind: "png", pixelRatio: ratio }), await diagramPngDataUrl(f, fonts, ratio));
    } catch (error) {
      setProblem(`The PNG could not be written: ${error instanceof Error ? error.message : String(error)}`);
    }
  };
  const saveSvg = () => {
    const f = figure();
    if (f) downloadText(diagramFileName(title, { kind: "svg" }), diagramSvg(f, { title, description: notes }), "image/svg+xml");
  };
  const saveCsv = () => result && downloadText(budgetFileName(title), budgetCsv(result), "text/csv");
  const saveScenario = () => downloadText(scenarioFileNameFor(title), scenarioFileText(toScenarioFile({ title, description, document })), SCENARIO_FILE_MEDIA_TYPE);

  return (
    <div id={panelId} role="group" aria-label="Export" className="absolute right-0 z-20 mt-1 w-80 space-y-4 rounded border border-rule-strong bg-paper p-4 shadow-lg">
      <section className="space-y-2" aria-labelledby={`${panelId}-figure`}>
        <h3 id={`${panelId}-figure`} className="text-xs font-semibold uppercase tracking-wide text-ink-soft">
          Diagram figure
        </h3>
        <Choice<(typeof RATIOS)[number]> legend="PNG size" options={RATIOS} value={ratio} onChange={setRatio} words={(r) => `${r}×`} />
        <Choice<FigureGround> legend="Ground" options={["solid", "transparent"] as const} value={ground} onChange={setGround} words={(g) => (g === "solid" ? (theme === "light" ? "white" : "dark") : "transparent")} />
        <div className="grid grid-cols-2 gap-2">
          <button type="button" className={action} disabled={!scene.ok} onClick={savePng}>
            Download PNG
          </button>
          <button type="button" className={action} disabled={!scene.ok} onClick={saveSvg}>
            Download SVG
          </button>
        </div>
        <p className="text-xs text-ink-faint">The SVG is vector: lines stay sharp at any size, and the labels stay text.</p>
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
