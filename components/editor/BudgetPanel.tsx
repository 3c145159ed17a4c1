"use client";

/**
 * The Budget: first the channel table — one row per channel (the body's own fields: quanta to null infinity ℐ⁺ and
 * into the horizon; the lab's environment: gas, thermal scattering, absorption, emission, a nearby surface) with its
 * ⟨N⟩ and share, the dominant channel named in words, and the whole budget's total, decoherence and decoherence time;
 * then the body's own fields by field (electromagnetic, gravitational, both) with the ramp/hold split; then the
 * margin of each environmental channel. Each number links to its formula on the Methods page. Numbers for an older
 * revision of the scenario stay on screen, visibly marked, until the new ones arrive.
 */
import { memo } from "react";
import { useEditor } from "@/canvas/EditorProvider";
import { bothChannels } from "@/canvas/kernels/budget/both-channels";
import { channelTable } from "@/canvas/kernels/budget/channel-table";
import { budgetIsStale } from "@/canvas/store/selectors";
import { BudgetPictureMenu } from "@/components/export/BudgetPictureMenu";
import type { BudgetState } from "@/canvas/store/state";
import type { ChannelResult, Quantity, ScenarioResult, ValidityFlag } from "@/physics/result";
import { EstimateComparison } from "./EstimateComparison";
import { FlagIcon } from "./FlagIcon";
import { ChannelTableView, MarginList, QuantityLink } from "./BudgetChannels";
import { usePanelValue } from "./usePacedDuringDrag";

/** A Budget row: its number per channel and for both together (the physics' own where it has one, else the counts summed). */
type Row = { key: string; words: string; of(channel: ChannelResult): Quantity | null; combined(result: ScenarioResult): Quantity | null };

/** A count the physics reports per channel only: both together is the sum. */
function countRow(key: string, words: string, of: Row["of"]): Row {
  return { key, words, of, combined: (r) => bothChannels(of(r.electromagnetic), of(r.gravitational)) };
}

const ROWS: Row[] = [
  countRow("far-field", "To null infinity ℐ⁺", (c) => c.farFieldQuanta),
  countRow("horizon", "Into the horizon", (c) => c.horizonQuanta),
  { key: "total", words: "Total ⟨N⟩", of: (c) => c.totalQuanta, combined: (r) => r.combined.totalQuanta },
  // The total split by what drives it: the two add up to the total above them.
  countRow("ramp", "of which ramp-driven", (c) => c.rampDrivenQuanta),
  countRow("hold", "of which hold-driven", (c) => c.holdDrivenQuanta),
  { key: "decoherence", words: "Decoherence 𝒟", of: (c) => c.decoherence, combined: (r) => r.combined.decoherence },
  { key: "decoherence-time", words: "Decoherence time", of: (c) => c.decoherenceTime, combined: (r) => r.combined.decoherenceTime },
];

function Cell({ quantity, testId, label }: { quantity: Quantity | null; testId: string; label: string }) {
  if (!quantity) return <td className="px-1 py-1.5 text-right text-ink-faint sm:px-2" data-testid={testId}>—</td>;
  return (
    <td className="whitespace-nowrap px-1 py-1.5 text-right sm:px-2">
      <QuantityLink quantity={quantity} testId={testId} label={label} />
    </td>
  );
}

const FLAG_LOOK: Partial<Record<ValidityFlag["status"], { icon: "invalid" | "caution" | "note"; words: string; box: string }>> = {
  invalid: { icon: "invalid", words: "Invalid", box: "border-invalid-line bg-invalid-bg text-invalid" },
  caution: { icon: "caution", words: "Caution", box: "border-caution-line bg-caution-bg text-caution" },
  note: { icon: "note", words: "Note", box: "border-rule bg-paper-deep text-ink-soft" },
};

function Flags({ flags }: { flags: ValidityFlag[] }) {
  const shown = flags.filter((f) => FLAG_LOOK[f.status]);
  if (shown.length === 0) return null;
  return (
    <ul className="mt-3 space-y-1.5" aria-label="Validity flags">
      {shown.map((flag) => {
        const look = FLAG_LOOK[flag.status]!;
        return (
          <li key={flag.code} className={`flex gap-2 rounded border px-2 py-1.5 text-xs ${look.box}`} data-testid={`flag-${flag.code}`}>
            <FlagIcon kind={look.icon} />
            <span>
              <strong className="font-semibold">{look.words}:</strong> {flag.message}
            </span>
          </li>
        );
      })}
    </ul>
  );
}

/** `title`: the scenario's, for the name of the Budget's picture (the "Picture" menu shows only with it). */
export function BudgetPanel({ title }: { title?: string }) {
  // Both on the same pace tick: a settled Budget always shows the latest result and its true state.
  const budget = usePanelValue((s) => s.budget);
  const stale = usePanelValue((s) => budgetIsStale(s) || s.budget.status === "computing");
  return <BudgetView budget={budget} stale={stale} title={title} />;
}

const BudgetView = memo(function BudgetView({ budget, stale, title }: { budget: BudgetState; stale: boolean; title?: string }) {
  const result = budget.result;
  const failedNow = budget.status === "failed";
  const channels = result ? [result.electromagnetic, result.gravitational] : [];
  const sameQuanta = result && (result.background.kind === "rindler" || result.background.kind === "de-sitter");
  const table = result ? channelTable(result) : null;
  return (
    <section aria-labelledby="budget-heading" data-testid="budget" data-state={stale ? "stale" : failedNow ? "failed" : "current"}>
      <div className="mb-2 flex items-baseline justify-between">
        <h2 id="budget-heading" className="text-sm font-semibold uppercase tracking-wide text-ink-soft">
          Budget
        </h2>
        <span className="flex items-baseline gap-3">
          <span role="status" aria-live="polite" className="text-xs text-ink-faint">
            {stale ? "Updating… (numbers below are for the previous state)" : failedNow ? "" : result ? "Up to date" : ""}
          </span>
          {title !== undefined && result && <BudgetPictureMenu title={title} />}
        </span>
      </div>
      {failedNow && (
        <div role="alert" className="mb-2 flex items-start gap-2 rounded border border-invalid-line bg-invalid-bg px-3 py-2 text-sm text-invalid">
          <FlagIcon kind="invalid" />
          <span>
            This scenario cannot be computed: {budget.issues.map((i) => `${i.message}${i.path ? ` (${i.path})` : ""}`).join("; ")}
            {result && " The numbers below are from the last scenario that could."}
          </span>
        </div>
      )}
      {!result ? (
        <p className="text-sm text-ink-faint">{failedNow ? "" : "Computing…"}</p>
      ) : (
        <div className={stale || failedNow ? "opacity-55 transition-opacity" : "transition-opacity"}>
          <ChannelTableView table={table!} />
          <h3 className="mb-1 mt-4 text-xs font-semibold text-ink-soft">The body&apos;s own fields, by field</h3>
          <table className="w-full border-collapse text-xs sm:text-sm" data-testid="budget-fields">
            <thead>
              <tr className="border-b border-ink/60 text-xs text-ink-soft">
                <th className="px-2 py-1 text-left font-semibold" />
                <th className="px-1 py-1 text-right font-semibold sm:px-2">
                  Electro&shy;magnetic
                </th>
                <th className="px-1 py-1 text-right font-semibold sm:px-2">
                  Gravi&shy;tational
                </th>
                <th className="px-1 py-1 text-right font-semibold sm:px-2">Both</th>
              </tr>
            </thead>
            <tbody>
              {ROWS.map((row) => (
                <tr key={row.key} className={`border-b border-rule ${row.key === "total" ? "border-t border-t-ink/40" : ""}`}>
                  <th scope="row" className={`px-1 py-1.5 text-left font-normal sm:px-2 ${row.key === "ramp" || row.key === "hold" ? "pl-3 text-ink-soft sm:pl-5" : ""}`}>
                    {row.words}
                  </th>
                  {channels.map((c) => (
                    <Cell key={c.channel} quantity={row.of(c)} testId={`budget-${c.channel}-${row.key}`} label={`${row.words}, ${c.channel}`} />
                  ))}
                  <Cell quantity={row.combined(result)} testId={`budget-combined-${row.key}`} label={`${row.words}, both`} />
                </tr>
              ))}
            </tbody>
          </table>
          {sameQuanta && (
            <p className="mt-2 text-xs text-ink-faint">
              In the Rindler wedge and the de Sitter static patch the quanta crossing the horizon are the ones reaching infinity: they are counted once,
              split by what drives them (the ramps, or the time spent apart).
            </p>
          )}
          {channels
            .filter((c) => c.exactZeroReason)
            .map((c) => (
              <p key={c.channel} className="mt-1 text-xs text-ink-faint">
                {c.channel === "electromagnetic" ? "Electromagnetic" : "Gravitational"}: exactly zero — {c.exactZeroReason}.
              </p>
            ))}
          <MarginList margins={table!.margins} />
          <EstimateComparison channels={channels} />
          <Flags flags={result.flags} />
        </div>
      )}
    </section>
  );
});
