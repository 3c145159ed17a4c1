import type { ChannelResult, Quantity, ScenarioResult, ValidityFlag } from "@/physics/result";
import { quantityText } from "./resultText";

interface BudgetRow {
  label: string;
  of: (channel: ChannelResult) => Quantity | null;
  both?: (result: ScenarioResult) => Quantity | null;
}

const rows: BudgetRow[] = [
  { label: "Quanta to null infinity", of: (c) => c.farFieldQuanta },
  { label: "Quanta into the horizon", of: (c) => c.horizonQuanta },
  { label: "Total quanta ⟨N⟩", of: (c) => c.totalQuanta, both: (r) => r.combined.totalQuanta },
  { label: "Decoherence 𝒟", of: (c) => c.decoherence, both: (r) => r.combined.decoherence },
  { label: "Decoherence time", of: (c) => c.decoherenceTime, both: (r) => r.combined.decoherenceTime },
];

const flagLook: Partial<Record<ValidityFlag["status"], { icon: string; words: string; box: string }>> = {
  invalid: { icon: "⛔", words: "Invalid input", box: "border-invalid-line bg-invalid-bg text-invalid" },
  caution: { icon: "⚠", words: "Approximation stretched", box: "border-caution-line bg-caution-bg text-caution" },
  note: { icon: "→", words: "Note", box: "border-rule bg-paper-deep text-ink-soft" },
};

const channelName = { electromagnetic: "Electromagnetic", gravitational: "Gravitational" } as const;

function Cell({ quantity }: { quantity: Quantity | null }) {
  return <td className={`px-3 py-2 text-right ${quantity ? "tabular" : "text-ink-faint"}`}>{quantityText(quantity)}</td>;
}

/** The Budget of a shared scenario as the server computed it: each channel, both together, and the validity flags. */
export function SharedBudget({ result }: { result: ScenarioResult }) {
  const channels = [result.electromagnetic, result.gravitational];
  const raised = result.flags.filter((f) => flagLook[f.status]);
  const passed = result.flags.filter((f) => f.status === "ok").length;
  return (
    <section aria-labelledby="budget-title" className="space-y-4">
      <h2 id="budget-title" className="font-serif text-xl font-semibold">
        Budget
      </h2>
      <table className="w-full border-collapse text-sm">
        <caption className="sr-only">Quanta, decoherence and decoherence time for each channel and both together</caption>
        <thead>
          <tr className="border-b border-ink/70 text-xs uppercase tracking-wide text-ink-soft">
            <th scope="col" className="px-3 py-2 text-left font-semibold">
              <span className="sr-only">Quantity</span>
            </th>
            {channels.map((c) => (
              <th key={c.channel} scope="col" className="px-3 py-2 text-right font-semibold">
                {channelName[c.channel]}
              </th>
            ))}
            <th scope="col" className="px-3 py-2 text-right font-semibold">
              Both
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={row.label} className="border-b border-rule">
              <th scope="row" className="px-3 py-2 text-left font-normal">
                {row.label}
              </th>
              {channels.map((c) => (
                <Cell key={c.channel} quantity={row.of(c)} />
              ))}
              <Cell quantity={row.both ? row.both(result) : null} />
            </tr>
          ))}
        </tbody>
      </table>
      {channels
        .filter((c) => c.exactZeroReason)
        .map((c) => (
          <p key={c.channel} className="text-sm text-ink-faint">
            {channelName[c.channel]}: exactly zero, because {c.exactZeroReason}.
          </p>
        ))}
      <p className="text-sm text-ink-faint">
        Counts are dimensionless; a dash means the quantity does not apply in this background. Each number’s formula, its source and its
        assumptions are on the Methods page.
      </p>
      <div>
        <h3 className="mb-2 text-xs font-semibold uppercase tracking-wide text-ink-soft">Validity flags</h3>
        <ul className="space-y-1.5" aria-label="Validity flags">
          {raised.map((flag) => {
            const look = flagLook[flag.status]!;
            return (
              <li key={flag.code} className={`flex gap-2 rounded border px-3 py-2 text-sm ${look.box}`}>
                <span aria-hidden="true">{look.icon}</span>
                <span>
                  <strong className="font-semibold">{look.words}:</strong> {flag.message}
                </span>
              </li>
            );
          })}
        </ul>
        <p className="mt-2 text-sm text-ink-faint">
          {passed} {passed === 1 ? "check" : "checks"} passed{raised.length === 0 ? "; nothing to flag." : "."}
        </p>
      </div>
    </section>
  );
}
