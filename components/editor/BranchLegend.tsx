"use client";

import { useEditor } from "@/canvas/EditorProvider";
import { branchLegend, diagramLegend, drawnRadiation, type LegendEntry, type RadiationKind } from "@/canvas/export/figure-legend";
import { FIGURE_PALETTES, type FigurePalette } from "@/canvas/theme";

/** The radiation kinds the Diagram draws for the scenario now, in a stable order, as one string (a stable selection). */
function useDrawnRadiation(): RadiationKind[] {
  const drawn = useEditor((s) => {
    const outcome = s.diagramScene(s.document);
    return outcome.ok && outcome.scene.protocol ? drawnRadiation(outcome.scene.protocol.strips).join(" ") : "";
  });
  return drawn ? (drawn.split(" ") as RadiationKind[]) : [];
}

function Swatch({ entry, palette }: { entry: LegendEntry; palette: FigurePalette }) {
  if (entry.kind === "area") {
    return <span aria-hidden="true" data-swatch={entry.fill} className="inline-block h-3 w-5 border" style={{ background: entry.fill, borderColor: palette.rule }} />;
  }
  return (
    <svg width="26" height="8" aria-hidden="true" data-swatch={entry.stroke}>
      <line x1="1" y1="4" x2="25" y2="4" stroke={entry.stroke} strokeWidth={entry.width} strokeDasharray={entry.dash.length > 0 ? entry.dash.join(" ") : undefined} />
    </svg>
  );
}

/**
 * The key to the figures, in the colours the figures are drawn in (the scenario's light or dark figure palette):
 * branch A solid orange, branch B dashed blue, and, beside the Diagram, the radiation
 * tints it draws for this background (no horizon entry where there is no horizon). The same entries as an exported
 * figure's legend; one component under the editor's figures, on the share page and in the embed. Its words take the
 * ink of what they sit on: the page's, or the figure palette's where the legend sits on the figure's paper (the embed).
 */
export function BranchLegend({ radiation = false, large = false, onFigurePaper = false }: { radiation?: boolean; large?: boolean; onFigurePaper?: boolean }) {
  const drawn = useDrawnRadiation();
  const palette = FIGURE_PALETTES[useEditor((s) => s.document.display.theme)];
  const entries = radiation ? diagramLegend(palette, drawn) : branchLegend(palette);
  return (
    <ul
      className={`flex flex-wrap items-center gap-x-5 gap-y-1 ${large ? "text-sm" : "text-xs"} ${onFigurePaper ? "" : "text-ink-soft"}`}
      style={onFigurePaper ? { color: palette.inkSoft } : undefined}
      aria-label="Key"
      data-testid={radiation ? "diagram-legend" : undefined}
    >
      {entries.map((entry) => (
        <li key={entry.words} className="flex items-center gap-1.5">
          <Swatch entry={entry} palette={palette} />
          {entry.words}
        </li>
      ))}
    </ul>
  );
}
