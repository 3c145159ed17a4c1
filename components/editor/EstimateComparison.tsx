"use client";

/**
 * Beside the exact Schwarzschild hold rate, the published order-of-magnitude estimate for the same lab and
 * source, greyed, with the ratio: a reader sees at once how far the exact coefficient moves the estimate.
 */
import Link from "next/link";
import type { ChannelResult, EstimateRegime } from "@/physics/result";
import { quantityText } from "./quantity-text";

const regimeWords: Record<EstimateRegime, string> = {
  far: "far-zone estimate",
  "near-horizon": "near-horizon (Rindler) estimate",
  interpolated: "interpolated estimate",
};

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
                <Link href={`/methods#${c.holdRate.sourceKey}`} className="tabular underline decoration-rule-strong underline-offset-4">
                  {quantityText(c.holdRate)}
                </Link>
              </td>
              <td className="py-0.5 pr-2 text-right text-ink-faint" title={regimeWords[c.comparison!.estimateRegime]}>
                <Link href={`/methods#${c.comparison!.estimateHoldRate.sourceKey}`} className="tabular">
                  ~{quantityText(c.comparison!.estimateHoldRate)}
                </Link>
              </td>
              <td className="py-0.5 text-right text-ink-faint">
                <Link href={`/methods#${c.comparison!.ratioExactToEstimate.sourceKey}`} className="tabular">
                  ratio {quantityText(c.comparison!.ratioExactToEstimate)}
                </Link>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="mt-1 text-ink-faint">
        The estimate (greyed) is the published order of magnitude; the exact value comes from the horizon&apos;s
        field change at this radius (<Link href="/methods/schwarzschild-exact" className="underline">derivation</Link>).
      </p>
    </div>
  );
}
