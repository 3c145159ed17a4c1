"use client";

import { useEditor } from "@/canvas/EditorProvider";
import type { RadiationStrip } from "@/canvas/kernels/diagram/protocol-path";

const RADIATION_KEY: Record<RadiationStrip["kind"], { words: string; tint: string }> = {
  "far-field": { words: "radiated toward ℐ⁺ by the ramps", tint: "rgba(230, 159, 0, 0.16)" },
  horizon: { words: "taken by the horizon while apart", tint: "rgba(0, 114, 178, 0.13)" },
};

/** The radiation kinds the Diagram draws for the scenario now, in a stable order, as one string (a stable selection). */
function useDrawnRadiation(): RadiationStrip["kind"][] {
  const drawn = useEditor((s) => {
    const outcome = s.diagramScene(s.document);
    if (!outcome.ok || !outcome.scene.protocol) return "";
    const kinds = new Set(outcome.scene.protocol.strips.map((strip) => strip.kind));
    return (["far-field", "horizon"] as const).filter((kind) => kinds.has(kind)).join(" ");
  });
  return drawn ? (drawn.split(" ") as RadiationStrip["kind"][]) : [];
}

/**
 * The key to the figures: branch A solid orange, branch B dashed blue, and, beside the Diagram, the radiation tints
 * it draws for this background (no horizon entry where there is no horizon).
 */
export function BranchLegend({ radiation = false }: { radiation?: boolean }) {
  const drawn = useDrawnRadiation();
  return (
    <ul className="flex flex-wrap items-center gap-x-5 gap-y-1 text-xs text-ink-soft" data-testid={radiation ? "diagram-legend" : undefined}>
      <li className="flex items-center gap-1.5">
        <svg width="26" height="8" aria-hidden="true">
          <line x1="1" y1="4" x2="25" y2="4" stroke="#E69F00" strokeWidth="2.5" />
        </svg>
        branch A (solid)
      </li>
      <li className="flex items-center gap-1.5">
        <svg width="26" height="8" aria-hidden="true">
          <line x1="1" y1="4" x2="25" y2="4" stroke="#0072B2" strokeWidth="2" strokeDasharray="7 4" />
        </svg>
        branch B (dashed)
      </li>
      {radiation &&
        drawn.map((kind) => (
          <li key={kind} className="flex items-center gap-1.5">
            <span aria-hidden="true" className="inline-block h-3 w-5 border border-rule" style={{ background: RADIATION_KEY[kind].tint }} />
            {RADIATION_KEY[kind].words}
          </li>
        ))}
    </ul>
  );
}
