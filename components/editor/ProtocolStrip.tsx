"use client";

/**
 * The Protocol: which kind of profile the branches follow (ramps, a formula, a measured profile), switched in one
 * undo step with the peak separation kept (canvas/kernels/protocol-kind.ts), and the fields of that kind: the
 * ramps' durations and shapes; a formula's σ(t) and duration; a measured profile's duration and interpolation (its
 * peak is d, set under Parameters).
 */
import { memo, useDeferredValue } from "react";
import { useEditor } from "@/canvas/EditorProvider";
import { withFormula, withRampShape, withSegmentDuration } from "@/canvas/kernels/document-edits";
import { withInterpolation, withProtocolKind, withSampledDuration, type ProtocolKind } from "@/canvas/kernels/protocol-kind";
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
  cubic: "cubic (3u² − 2u³)",
  cosine: "cosine",
  linear: "linear (kinked)",
};

const SEGMENT_WORDS: Record<SegmentName, string> = { separation: "Separation", hold: "Hold", recombination: "Recombination" };

const FORMULA_HINT =
  "σ(t): 0 together, 1 fully apart; t in seconds from 0 to the duration. Numbers, t, pi and e (Euler's number here), + − * / ^, comparisons, a ? b : c, sin cos exp log sqrt and the other elementary functions; no units (docs: file formats).";

/** A duration typed with its unit, read-only for a viewer. */
function DurationField({ seconds, testId, onCommit }: { seconds: number; testId: string; onCommit(seconds: number): CommitResult }) {
  const readOnly = useEditor((s) => s.readOnly);
  return (
    <div className="w-40">
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

const KIND_WORDS: Record<ProtocolKind, string> = { segments: "Ramps", formula: "Formula σ(t)", sampled: "Measured profile" };
const KIND_LABELS: Record<ProtocolKind, string> = { segments: "ramps", formula: "a formula", sampled: "a measured profile" };

/**
 * The heading and the kind switch: one radio group, each choice one undo step that keeps the peak separation. The
 * choice reads the store's document itself, not the paced copy the fields below follow, so a click shows at once.
 */
function StripHeading({ readOnly }: { readOnly: boolean }) {
  const edit = useEdit();
  const kind = useEditor((s) => s.document.protocol.kind);
  return (
    <div className="mb-2 flex flex-wrap items-baseline gap-x-4 gap-y-1">
      <h2 id="protocol-heading" className="text-sm font-semibold uppercase tracking-wide text-ink-soft">
        Protocol
      </h2>
      <div role="radiogroup" aria-label="Kind of protocol" className="flex flex-wrap gap-x-3 text-sm" data-testid="protocol-kind">
        {(Object.keys(KIND_WORDS) as ProtocolKind[]).map((option) => (
          <label key={option} className="flex items-center gap-1.5">
            <input
              type="radio"
              name="protocol-kind"
              value={option}
              checked={kind === option}
              disabled={readOnly}
              onChange={() => edit(`Switch to ${KIND_LABELS[option]}`, (d) => withProtocolKind(d, option))}
            />
            {KIND_WORDS[option]}
          </label>
        ))}
      </div>
    </div>
  );
}

const INTERPOLATION_WORDS = { linear: "linear (kinked at every sample)", "cubic-spline": "cubic spline (zero end velocity)" } as const;

/** A measured profile: its duration (stretching the samples in time) and interpolation; its peak is d, under Parameters. */
function MeasuredProfile({ protocol }: { protocol: Extract<ProtocolSpec, { kind: "sampled" }> }) {
  const readOnly = useEditor((s) => s.readOnly);
  const edit = useEdit();
  const samples = protocol.samples;
  const durationSeconds = samples[samples.length - 1].timeSeconds - samples[0].timeSeconds;
  return (
    <div className="flex flex-wrap items-start gap-3 rounded border border-rule bg-paper-deep px-3 py-2" data-testid="sampled-profile">
      <p className="min-w-64 flex-1 text-sm text-ink-soft">
        {samples.length.toLocaleString("en")} samples. The full separation d under Parameters is this profile&apos;s peak: a new d rescales the
        samples; a new duration stretches them in time.
      </p>
      <DurationField
        seconds={durationSeconds}
        testId="sampled-duration"
        onCommit={(seconds) => edit("Set profile duration", (d) => withSampledDuration(d, seconds))}
      />
      <label className="block text-xs font-semibold text-ink-soft">
        Interpolation
        <select
          className="mt-1 block rounded border border-rule-strong bg-white px-2 py-1 text-sm font-normal text-ink disabled:cursor-not-allowed disabled:bg-paper-deep disabled:text-ink-soft"
          value={protocol.interpolation}
          disabled={readOnly}
          data-testid="sampled-interpolation"
          onChange={(e) => edit("Set profile interpolation", (d) => withInterpolation(d, e.target.value as keyof typeof INTERPOLATION_WORDS))}
        >
          {(Object.keys(INTERPOLATION_WORDS) as (keyof typeof INTERPOLATION_WORDS)[]).map((option) => (
            <option key={option} value={option}>
              {INTERPOLATION_WORDS[option]}
            </option>
          ))}
        </select>
      </label>
    </div>
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
        <StripHeading readOnly={readOnly} />
        <FormulaProfile protocol={protocol} />
      </section>
    );
  }
  if (protocol.kind === "sampled") {
    return (
      <section aria-labelledby="protocol-heading">
        <StripHeading readOnly={readOnly} />
        <MeasuredProfile protocol={protocol} />
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
      <StripHeading readOnly={readOnly} />
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
