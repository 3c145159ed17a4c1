"use client";

/** The Protocol strip: separation, hold and recombination as bars, each with its duration and ramp shape. */
import { useEditor } from "@/canvas/EditorProvider";
import { withRampShape, withSegmentDuration } from "@/canvas/kernels/document-edits";
import { segmentShares } from "@/canvas/kernels/lab-view/viewport";
import type { SegmentName } from "@/canvas/kernels/timeline";
import { rampShapeSchema, type RampShape } from "@/physics/scenario/schema";
import { formatQuantity } from "@/physics/units";
import { QuantityField } from "./QuantityField";
import { useEdit } from "./useEdit";

const SHAPE_WORDS: Record<RampShape, string> = {
  "minimum-jerk": "minimum jerk",
  smoothstep: "smoothstep",
  cosine: "cosine",
  linear: "linear (kinked)",
};

const SEGMENT_WORDS: Record<SegmentName, string> = { separation: "Separation", hold: "Hold", recombination: "Recombination" };

export function ProtocolStrip() {
  const protocol = useEditor((s) => s.document.protocol);
  const readOnly = useEditor((s) => s.readOnly);
  const selection = useEditor((s) => s.selection);
  const edit = useEdit();
  if (protocol.kind !== "segments") {
    return (
      <section aria-label="Protocol strip" className="rounded border border-rule p-3 text-sm text-ink-soft">
        This scenario's protocol is a {protocol.kind} profile; the strip edits segment protocols.
      </section>
    );
  }
  const segments: SegmentName[] = ["separation", "hold", "recombination"];
  const durations = segments.map((s) => protocol[s].durationSeconds);
  const shares = segmentShares(durations);
  const highlighted: Record<SegmentName, boolean> = {
    separation: selection === "separation-start" || selection === "separation-end",
    hold: selection === "hold-end",
    recombination: selection === "recombination-end",
  };
  return (
    <section aria-labelledby="protocol-heading">
      <h2 id="protocol-heading" className="mb-2 text-sm font-semibold uppercase tracking-wide text-ink-soft">
        Protocol strip
      </h2>
      <div className="flex gap-1">
        {segments.map((segment, i) => {
          const part = protocol[segment];
          const ramp = segment !== "hold" ? protocol[segment as "separation" | "recombination"] : null;
          return (
            <div
              key={segment}
              data-testid={`segment-${segment}`}
              className={`min-w-0 rounded border px-3 py-2 ${segment === "hold" ? "bg-paper" : "bg-paper-deep"} ${
                highlighted[segment] ? "border-focus" : "border-rule"
              }`}
              style={{ flexGrow: Math.max(shares[i], 0.18), flexBasis: 0 }}
            >
              <div className="mb-1 text-xs font-semibold text-ink">{SEGMENT_WORDS[segment]}</div>
              <div className="flex flex-wrap items-start gap-2">
                <div className="w-32">
                  <QuantityField
                    compact
                    label="Duration"
                    dimension="time"
                    shown={formatQuantity(part.durationSeconds, "time", { digits: 4 })}
                    disabled={readOnly}
                    testId={`duration-${segment}`}
                    onCommit={(seconds) => edit(`Set ${segment} duration`, (d) => withSegmentDuration(d, segment, seconds))}
                  />
                </div>
                {ramp && (
                  <label className="block text-xs font-semibold text-ink-soft">
                    Ramp shape
                    <select
                      className="mt-1 block rounded border border-rule-strong bg-white px-2 py-1 text-sm font-normal text-ink disabled:cursor-not-allowed disabled:bg-paper-deep disabled:text-ink-soft"
                      value={ramp.shape}
                      disabled={readOnly}
                      onChange={(e) => edit(`Set ${segment} shape`, (d) => withRampShape(d, segment as "separation" | "recombination", e.target.value as RampShape))}
                    >
                      {rampShapeSchema.options.map((shape) => (
                        <option key={shape} value={shape}>
                          {SHAPE_WORDS[shape]}
                        </option>
                      ))}
                    </select>
                  </label>
                )}
              </div>
            </div>
          );
        })}
      </div>
    </section>
  );
}
