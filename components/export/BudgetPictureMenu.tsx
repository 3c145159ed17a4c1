"use client";

/**
 * "Picture ▾" beside the Budget: the Budget table as a PNG (1×, 2×, 4×; 2× by default) or an SVG for a slide, light or
 * dark, with the caption line. Available while the Budget is up to date.
 */
import { useState } from "react";
import { usePopover } from "@/components/ui/usePopover";
import { useEditor } from "@/canvas/EditorProvider";
import { figureCaption } from "@/canvas/export/figure-caption";
import type { FigureTheme } from "@/canvas/export/export-figure";
import { budgetPictureDataUrl } from "./budget-picture";
import { downloadDataUrl } from "./download";
import { budgetPictureFileName } from "@/canvas/export/file-names";

const RATIOS = [1, 2, 4] as const;

export function BudgetPictureMenu({ title }: { title: string }) {
  const { open, setOpen, root, panelId } = usePopover();
  return (
    <div ref={root} className="relative">
      <button type="button" className="rounded border border-rule-strong bg-paper px-2 py-0.5 text-xs hover:border-ink" aria-expanded={open} aria-controls={panelId} onClick={() => setOpen((o) => !o)}>
        Picture ▾
      </button>
      {open && <PicturePanel id={panelId} title={title} anchor={root} />}
    </div>
  );
}

function PicturePanel({ id, title, anchor }: { id: string; title: string; anchor: React.RefObject<HTMLDivElement | null> }) {
  const document = useEditor((s) => s.document);
  const current = useEditor((s) => s.budget.status === "ready" && s.budget.resultRevision === s.revision);
  const [theme, setTheme] = useState<FigureTheme>(document.display.theme);
  const [ratio, setRatio] = useState<(typeof RATIOS)[number]>(2);
  const [caption, setCaption] = useState(true);
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);

  const save = async (kind: "png" | "svg") => {
    const table = anchor.current?.closest('[data-testid="budget"]')?.querySelector("table");
    if (!table) return;
    setBusy(true);
    setProblem(null);
    try {
      const url = await budgetPictureDataUrl(table, { theme, kind, pixelRatio: ratio, caption: caption ? figureCaption(document) : null });
      downloadDataUrl(budgetPictureFileName(title, kind), url);
    } catch (error) {
      setProblem(`The picture could not be drawn: ${error instanceof Error ? error.message : String(error)}`);
    } finally {
      setBusy(false);
    }
  };
  const radio = "flex items-center gap-1";
  return (
    <div id={id} role="group" aria-label="Budget picture" className="absolute right-0 z-20 mt-1 w-64 max-w-[calc(100vw-1rem)] space-y-2 rounded border border-rule-strong bg-paper p-3 text-sm shadow-lg">
      <fieldset className="flex gap-3">
        <legend className="mb-1 text-xs font-semibold text-ink-soft">Colours</legend>
        {(["light", "dark"] as const).map((t) => (
          <label key={t} className={radio}>
            <input type="radio" name={`${id}-theme`} checked={theme === t} onChange={() => setTheme(t)} /> {t}
          </label>
        ))}
      </fieldset>
      <fieldset className="flex gap-3">
        <legend className="mb-1 text-xs font-semibold text-ink-soft">PNG size</legend>
        {RATIOS.map((r) => (
          <label key={r} className={radio}>
            <input type="radio" name={`${id}-ratio`} checked={ratio === r} onChange={() => setRatio(r)} /> {r}×
          </label>
        ))}
      </fieldset>
      <label className={radio}>
        <input type="checkbox" checked={caption} onChange={(e) => setCaption(e.target.checked)} /> Caption line
      </label>
      <div className="grid grid-cols-2 gap-2">
        {(["png", "svg"] as const).map((kind) => (
          <button key={kind} type="button" className="rounded border border-rule-strong bg-white px-2 py-1 hover:border-ink disabled:opacity-40" disabled={!current || busy} onClick={() => save(kind)}>
            Budget {kind.toUpperCase()}
          </button>
        ))}
      </div>
      {!current && <p className="text-xs text-ink-faint">Available when the Budget is up to date.</p>}
      {problem && (
        <p role="alert" className="text-xs text-invalid">
          {problem}
        </p>
      )}
    </div>
  );
}
