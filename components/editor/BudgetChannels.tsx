"use client";

/**
 * The Budget's channel table and margins (canvas/kernels/budget/channel-table.ts): every channel's ⟨N⟩ and share, the
 * dominant one named in words, the whole budget's total, decoherence and decoherence time; then, for each
 * environmental channel, the value of its control parameter at which it would equal the body's own fields. Numbers
 * never break across lines: in a narrow column the unit shrinks, the number stays whole.
 */
import { shareText, type ChannelTable, type MarginRow } from "@/canvas/kernels/budget/channel-table";
import { useEditorStore } from "@/canvas/EditorProvider";
import { figureCaption } from "@/canvas/export/figure-caption";
import { besideTheEditor, methodsHref } from "@/components/methods/methods-href";
import type { Quantity } from "@/physics/result";
import { quantityParts, quantityText } from "./quantity-text";

/** A number with its unit, linked to its formula on the Methods page, opened beside the editor with the number echoed. */
export function QuantityLink({ quantity, testId, label }: { quantity: Quantity; testId: string; label: string }) {
  const { number, unit } = quantityParts(quantity);
  const store = useEditorStore();
  const echo = { label, value: quantityText(quantity) };
  return (
    <a
      href={methodsHref(quantity.sourceKey, echo)}
      // The inputs are read when the link is followed, not on every edit: a drag does not re-render the Budget's links.
      onClick={(event) => {
        event.currentTarget.href = methodsHref(quantity.sourceKey, { ...echo, inputs: figureCaption(store.getState().document) });
      }}
      {...besideTheEditor}
      className="tabular whitespace-nowrap text-ink underline decoration-rule-strong underline-offset-4 hover:decoration-ink"
      data-testid={testId}
      data-value={quantity.value ?? ""}
      aria-label={`${label}: ${quantityText(quantity)} (formula on the Methods page, in a new tab)`}
    >
      {number}
      {/* A real space, so the visible text reads as the accessible name does ("3.2 ms"). */}
      {unit && (
        <>
          {" "}
          <span className="text-[0.8em]">{unit}</span>
        </>
      )}
    </a>
  );
}

/** A row of the whole budget under the channels: its words, its number, no share. */
function WholeBudgetRow({ words, quantity, testId, label }: { words: string; quantity: Quantity | null; testId: string; label: string }) {
  return (
    <tr className="border-b border-rule">
      <th scope="row" className="px-1 py-1.5 text-left font-normal sm:px-2">
        {words}
      </th>
      <NumberCell quantity={quantity} testId={testId} label={label} />
      <td />
    </tr>
  );
}

function NumberCell({ quantity, testId, label }: { quantity: Quantity | null; testId: string; label: string }) {
  return (
    <td className="whitespace-nowrap px-1 py-1.5 text-right sm:px-2">
      {quantity ? <QuantityLink quantity={quantity} testId={testId} label={label} /> : <span className="text-ink-faint" data-testid={testId}>—</span>}
    </td>
  );
}

export function ChannelTableView({ table }: { table: ChannelTable }) {
  return (
    <>
      <table className="w-full border-collapse text-xs sm:text-sm" data-testid="budget-channels">
        <caption className="mb-1 caption-top text-left text-xs text-ink-soft" data-testid="budget-dominant">
          {table.dominantWords ? (
            <>
              Dominant channel: <strong className="font-semibold text-ink">{table.dominantWords}</strong>
            </>
          ) : (
            "No channel leaks which-path information: every count is exactly zero."
          )}
        </caption>
        <thead>
          <tr className="border-b border-ink/60 text-xs text-ink-soft">
            <th className="px-1 py-1 text-left font-semibold sm:px-2">Channel</th>
            <th className="px-1 py-1 text-right font-semibold sm:px-2">⟨N⟩</th>
            <th className="px-1 py-1 text-right font-semibold sm:px-2">Share</th>
          </tr>
        </thead>
        <tbody>
          {table.rows.map((row) => (
            <tr key={row.key} className={`border-b border-rule ${row.dominant ? "bg-paper-deep" : ""}`} data-testid={`budget-channel-row-${row.key}`} data-dominant={row.dominant}>
              <th scope="row" className="px-1 py-1.5 text-left font-normal sm:px-2">
                {row.words}
                {row.dominant && <span className="ml-1.5 whitespace-nowrap text-xs font-semibold">(dominant)</span>}
              </th>
              <NumberCell quantity={row.quanta} testId={`budget-channel-${row.key}`} label={`${row.words}, ⟨N⟩`} />
              <td className="tabular whitespace-nowrap px-1 py-1.5 text-right text-ink-soft sm:px-2" data-testid={`budget-channel-${row.key}-share`}>
                {shareText(row.share)}
              </td>
            </tr>
          ))}
          <tr className="border-b border-rule border-t border-t-ink/40">
            <th scope="row" className="px-1 py-1.5 text-left font-semibold sm:px-2">
              Total ⟨N⟩
            </th>
            <NumberCell quantity={table.total} testId="budget-whole-total" label="Total ⟨N⟩, every channel" />
            <td className="tabular px-1 py-1.5 text-right text-ink-soft sm:px-2">{table.dominantWords ? "100 %" : "—"}</td>
          </tr>
          <WholeBudgetRow words="Decoherence 𝒟" quantity={table.decoherence} testId="budget-whole-decoherence" label="Decoherence, every channel" />
          <WholeBudgetRow words="Decoherence time" quantity={table.decoherenceTime} testId="budget-whole-decoherence-time" label="Decoherence time, every channel" />
        </tbody>
      </table>
      {table.rows
        .filter((row) => row.exactZeroReason && !["far-field", "horizon", "fields-ramps", "fields-hold"].includes(row.key))
        .map((row) => (
          <p key={row.key} className="mt-1 text-xs text-ink-faint">
            {row.words}: exactly zero — {row.exactZeroReason}.
          </p>
        ))}
      {!table.hasEnvironment && (
        <p className="mt-1 text-xs text-ink-faint" data-testid="budget-isolated">
          An isolated body: no gas, thermal radiation or surface is set (Parameters → Environment adds them).
        </p>
      )}
    </>
  );
}

function MarginOutcome({ margin }: { margin: MarginRow }) {
  const { outcome } = margin;
  if (outcome.kind === "crossing") {
    return (
      <>
        equals the body&apos;s own fields at {margin.parameterWords}{" "}
        <QuantityLink quantity={outcome.value} testId={`budget-margin-${margin.channel}`} label={`${margin.channelWords}, margin`} />
      </>
    );
  }
  if (outcome.kind === "already-below") {
    return (
      <strong className="font-semibold" data-testid={`budget-margin-${margin.channel}`}>
        already below the body&apos;s own fields
      </strong>
    );
  }
  return (
    <>
      <strong className="font-semibold" data-testid={`budget-margin-${margin.channel}`}>
        not reachable
      </strong>{" "}
      ({outcome.reason})
    </>
  );
}

export function MarginList({ margins }: { margins: MarginRow[] }) {
  if (margins.length === 0) return null;
  return (
    <div className="mt-4" data-testid="budget-margins">
      <h3 className="mb-1 text-xs font-semibold text-ink-soft">
        Margin: where each environmental channel would equal the body&apos;s own fields{" "}
        <a href="/methods#environment-margin" {...besideTheEditor} className="font-normal underline decoration-rule-strong underline-offset-4">
          (method)
        </a>
      </h3>
      <ul className="space-y-1 text-xs sm:text-sm">
        {margins.map((margin) => (
          <li key={margin.channel} className="border-b border-rule pb-1">
            <span className="font-semibold">{margin.channelWords}</span> — {margin.parameterWords} now{" "}
            <QuantityLink quantity={margin.current} testId={`budget-margin-${margin.channel}-now`} label={`${margin.channelWords}, ${margin.parameterWords} now`} />;{" "}
            <MarginOutcome margin={margin} />
          </li>
        ))}
      </ul>
    </div>
  );
}
