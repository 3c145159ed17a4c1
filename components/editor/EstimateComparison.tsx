"use client";

/**
 * Beside the exact Schwarzschild hold rate, the published order-of-magnitude estimate for the same lab and
 * source, greyed, with the ratio: a reader sees at once how far the exact coefficient moves the estimate.
 */
import { besideTheEditor, methodsHref } from "@/components/methods/methods-href";
import type { ChannelResult, EstimateRegime, Quantity } from "@/physics/result";
import { quantityText } from "./quantity-text";

const regimeWords: Record<EstimateRegime, string> = {
  far: "far-zone estimate",
  "near-horizon": "near-horizon (Rindler) estimate",
  interpolated: "interpolated estimate",
};

/** A number linking to its formula on the Methods page, opened beside the editor with the number echoed there. */
function MethodsNumber({ quantity, label, className, prefix = "" }: { quantity: Quantity; label: string; className: string; prefix?: string }) {
  const value = quantityText(quantity);
  return (
    <a href={methodsHref(quantity.sourceKey, { label, value })} {...besideTheEditor} className={className}>
      {prefix}
      {value}
    </a>
  );
}

export function EstimateComparison({ channels }: { channels: ChannelResult[] }) {
  const compared = channels.filter((c) => c.comparison);
  if (compared.length === 0) return null;
  return (
    <div className="mt-3 rounded border border-rule px-3 py-2 text-xs" data-testid="estimate-comparison">
      <p className="font-semibold text-ink-soft">Hold rate into the horizon: exact vs published estimate</p>
      <table className="mt-1 w-full">
        <tbody>
          {compared.map((c) => (
            <tr key={c.channel}>
              <th scope="row" className="py-0.5 pr-2 text-left font-normal">
                {c.channel === "electromagnetic" ? "Electromagnetic" : "Gravitational"}
              </th>
              <td className="py-0.5 pr-2 text-right">
                <MethodsNumber quantity={c.holdRate} label={`Hold rate into the horizon, ${c.channel}, exact`} className="tabular underline decoration-rule-strong underline-offset-4" />
              </td>
              <td className="py-0.5 pr-2 text-right text-ink-faint" title={regimeWords[c.comparison!.estimateRegime]}>
                <MethodsNumber quantity={c.comparison!.estimateHoldRate} label={`Hold rate into the horizon, ${c.channel}, published estimate`} className="tabular" prefix="~" />
              </td>
              <td className="py-0.5 text-right text-ink-faint">
                <MethodsNumber quantity={c.comparison!.ratioExactToEstimate} label={`Exact over estimate, ${c.channel}`} className="tabular" prefix="ratio " />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="mt-1 text-ink-faint">
        The estimate (greyed) is the published order of magnitude; the exact value comes from the horizon&apos;s
        field change at this radius (<a href="/methods/schwarzschild-exact" {...besideTheEditor} className="underline">derivation</a>).
      </p>
    </div>
  );
}
