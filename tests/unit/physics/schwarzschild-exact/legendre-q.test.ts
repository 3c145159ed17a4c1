/**
 * Legendre functions of the second kind Q_ℓ(1 + ε) from the module's backward recurrence, against references computed
 * in 300-digit arithmetic (mathjs BigNumber) by the forward recurrence (ℓ+1)Q_{ℓ+1} = (2ℓ+1)xQ_ℓ − ℓQ_{ℓ−1}
 * (DLMF 14.10.3) from Q_0 = ½ ln((x+1)/(x−1)) (DLMF 14.5.17 with μ = 0, from memory) and Q_1 = xQ_0 − 1. Forward
 * recurrence amplifies rounding by up to (x + √(x²−1))^{2ℓ}; with 300 digits that is harmless for the cases below.
 */
import { describe, expect, it } from "vitest";
import { all, create, type BigNumber } from "mathjs";
import { legendreQ } from "@/physics/horizon/schwarzschild-exact";

const big = create(all, { number: "BigNumber", precision: 300 });

function referenceQ(eps: string, lMax: number): number[] {
  const e = big.bignumber(eps);
  const x = big.add(e, 1) as BigNumber;
  const q: BigNumber[] = [big.multiply(0.5, big.log(big.divide(big.add(x, 1), e) as BigNumber)) as BigNumber];
  q.push(big.subtract(big.multiply(x, q[0]), 1) as BigNumber);
  for (let l = 1; l < lMax; l++) {
    const recurrence = big.subtract(big.multiply(big.multiply(x, 2 * l + 1), q[l]), big.multiply(q[l - 1], l));
    q.push(big.divide(recurrence, l + 1) as BigNumber);
  }
  return q.map((value) => Number(value));
}

describe("Legendre Q by backward recurrence", () => {
  it("matches 300-digit references from the horizon (x − 1 = 1e-9) to far away (x − 1 = 1e8)", () => {
    const cases: Array<[string, number]> = [["1e-9", 200], ["1e-4", 100], ["0.5", 40], ["3", 40], ["1e4", 20], ["1e8", 12]];
    for (const [eps, lMax] of cases) {
      const reference = referenceQ(eps, lMax);
      const computed = legendreQ(Number(eps), lMax);
      for (let l = 0; l <= lMax; l++) expect(Math.abs(computed[l] / reference[l] - 1)).toBeLessThan(1e-13);
    }
  });
});
