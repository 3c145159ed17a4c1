"use client";

import { useEditor } from "@/canvas/EditorProvider";
import { branchLegend, diagramLegend, drawnRadiation, type LegendEntry, type RadiationKind } from "@/canvas/export/figure-legend";
import { FIGURE_PALETTES } from "@/canvas/theme";

/** The radiation kinds the Diagram draws for the scenario now, in a stable order, as one string (a stable selection). */
function useDrawnRadiation(): RadiationKind[] {
  const drawn = useEditor((s) => {
    const outcome = s.diagramScene(s.document);
    return outcome.ok && outcome.scene.protocol ? drawnRadiation(outcome.scene.protocol.strips).join(" ") : "";
  });
  return drawn ? (drawn.split(" ") as RadiationKind[]) : [];
}

function Swatch({ entry }: { entry: LegendEntry }) {
  if (entry.kind === "area") return <span aria-hidden="true" className="inline-block h-3 w-5 border border-rule" style={{ background: entry.fill }} />;
  return (
    <svg width="26" height="8" aria-hidden="true">
      <line x1="1" y1="4" x2="25" y2="4" stroke={entry.stroke} strokeWidth={entry.width} strokeDasharray={entry.dash.length > 0 ? entry.dash.join(" ") : undefined} />
    </svg>
  );
}

/**
 * The key to the figures, in the colours the figures are drawn in (the scenario's light or dark figure palette):
 * branch A solid orange, branch B dashed blue, and, beside the Diagram, the radiation tints it draws for this
 * background (no horizon entry where there is no horizon). The same entries as an exported figure's legend.
 */
export function BranchLegend({ radiation = false }: { radiation?: boolean }) {
  const drawn = useDrawnRadiation();
  const palette = FIGURE_PALETTES[useEditor((s) => s.document.display.theme)];
  const entries = radiation ? diagramLegend(palette, drawn) : branchLegend(palette);
  return (
    <ul className="flex flex-wrap items-center gap-x-5 gap-y-1 text-xs text-ink-soft" data-testid={radiation ? "diagram-legend" : undefined}>
      {entries.map((entry) => (
        <li key={entry.words} className="flex items-center gap-1.5">
          <Swatch entry={entry} />
          {entry.words}
        </li>
      ))}
    </ul>
  );
}
