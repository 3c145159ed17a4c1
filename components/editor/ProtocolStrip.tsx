"use client";

/**
 * The Protocol strip: separation, hold and recombination as bars, each with its duration and ramp shape; for a
 * formula profile, its expression and duration. A sampled profile is shown in the Offsets panel and not edited here.
 */
import { memo, useDeferredValue } from "react";
import { useEditor } from "@/canvas/EditorProvider";
import { withFormula, withRampShape, withSegmentDuration } from "@/canvas/kernels/document-edits";
import type { HandleId } from "@/canvas/kernels/offsets/handles";
import { segmentShares } from "@/canvas/kernels/offsets/viewport";
import type { SegmentName } from "@/canvas/kernels/timeline";
import { rampShapeSchema, type ProtocolSpec, type RampShape } from "@/physics/scenario/schema";
import { formatQuantity } from "@/physics/units";
import { DraftField, QuantityField, type CommitResult } from "./QuantityField";
import { useEdit } from "./useEdit";
import { usePanelValue } from "./usePacedDuringDrag";

const SHAPE_WORDS: Record<RampShape, string> = {
  "minimum-jerk": "minimum jerk",
  smoothstep: "smoothstep",
  cosine: "cosine",
  linear: "linear (kinked)",
};

const SEGMENT_WORDS: Record<SegmentName, string> = { separation: "Separation", hold: "Hold", recombination: "Recombination" };

const FORMULA_HINT = "σ(t): 0 together, 1 fully apart; t in seconds from 0 to the duration; t, pi, e, arithmetic and elementary functions.";

/** A duration typed with its unit, read-only for a viewer. */
function DurationField({ seconds, testId, onCommit }: { seconds: number; testId: string; onCommit(seconds: number): CommitResult }) {
  const readOnly = useEditor((s) => s.readOnly);
  return (
    <div className="w-32">
      <QuantityField
        compact
        label="Duration"
        dimension="time"
        shown={formatQuantity(seconds, "time", { digits: 4 })}
        disabled={readOnly}
        testId={testId}
        onCommit={onCommit}
      />
    </div>
  );
}

/** A formula profile: its expression (checked by the physics on commit) and its duration, one undo step each. */
function FormulaProfile({ protocol }: { protocol: Extract<ProtocolSpec, { kind: "formula" }> }) {
  const readOnly = useEditor((s) => s.readOnly);
  const edit = useEdit();
  return (
    <div className="flex flex-wrap items-start gap-3 rounded border border-rule bg-paper-deep px-3 py-2" data-testid="formula-profile">
      <div className="min-w-64 flex-1">
        <DraftField
          compact
          label="Separation profile σ(t)"
          shown={protocol.expression}
          parse={(text) => ({ ok: true, value: text.trim() })}
          controlClassName="font-mono"
          hint={FORMULA_HINT}
          disabled={readOnly}
          testId="formula-expression"
          onCommit={(expression) => edit("Set profile formula", (d) => withFormula(d, { expression }))}
        />
      </div>
      <DurationField
        seconds={protocol.durationSeconds}
        testId="formula-duration"
        onCommit={(durationSeconds) => edit("Set profile duration", (d) => withFormula(d, { durationSeconds }))}
      />
    </div>
  );
}

function StripHeading() {
  return (
    <h2 id="protocol-heading" className="mb-2 text-sm font-semibold uppercase tracking-wide text-ink-soft">
      Protocol strip
    </h2>
  );
}

export function ProtocolStrip() {
  const protocol = usePanelValue((s) => s.document.protocol);
  const readOnly = useEditor((s) => s.readOnly);
  const selection = useDeferredValue(useEditor((s) => s.selection));
  return <ProtocolStripView protocol={protocol} readOnly={readOnly} selection={selection} />;
}

const ProtocolStripView = memo(function ProtocolStripView({
  protocol,
  readOnly,
  selection,
}: {
  protocol: ProtocolSpec;
  readOnly: boolean;
  selection: HandleId | null;
}) {
  const edit = useEdit();
  if (protocol.kind === "formula") {
    return (
      <section aria-labelledby="protocol-heading">
        <StripHeading />
        <FormulaProfile protocol={protocol} />
      </section>
    );
  }
  if (protocol.kind === "sampled") {
    return (
      <section aria-labelledby="protocol-heading">
        <StripHeading />
        <p className="rounded border border-rule p-3 text-sm text-ink-soft" data-testid="sampled-profile">
          A sampled profile of {protocol.samples.length.toLocaleString("en")} samples ({protocol.interpolation === "linear" ? "linear" : "cubic-spline"}{" "}
          interpolation), shown in the Offsets panel; its samples are not edited here.
        </p>
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
      <StripHeading />
      <div className="flex flex-col gap-1 sm:flex-row">
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
                <DurationField
                  seconds={part.durationSeconds}
                  testId={`duration-${segment}`}
                  onCommit={(seconds) => edit(`Set ${segment} duration`, (d) => withSegmentDuration(d, segment, seconds))}
                />
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
});
