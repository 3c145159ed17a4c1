import { describe, expect, it } from "vitest";
import { decoherenceFromQuanta, decoherenceTimeFromRate, visibilityFromQuanta } from "@/physics/decoherence";
import { log10Sum, quantityFromLog10 } from "@/physics/estimators/quantity";

describe("decoherence from the number of entangling quanta", () => {
  it("keeps the digits of small counts (𝒟 = 1 − e^{−N/2} ≈ N/2 by −expm1)", () => {
    expect(decoherenceFromQuanta(-30).value! / 5e-31).toBeCloseTo(1, 12);
    expect(decoherenceFromQuanta(-320).log10!).toBeCloseTo(-320 - Math.log10(2), 12);
  });

  it("gives 𝒟 = 1 − e^{−N/2} and the visibility e^{−N/2} (coherent-state overlap)", () => {
    for (const n of [0.1, 1, 7]) {
      expect(decoherenceFromQuanta(Math.log10(n)).value!).toBeCloseTo(1 - Math.exp(-n / 2), 14);
      expect(visibilityFromQuanta(Math.log10(n)).value!).toBeCloseTo(Math.exp(-n / 2), 14);
    }
  });

  it("reports a visibility that underflows by its log10, −N/(2 ln 10)", () => {
    const v = visibilityFromQuanta(4);
    expect(v.value).toBeNull();
    expect(v.log10!).toBeCloseTo(-1e4 / (2 * Math.LN10), 9);
    expect(decoherenceFromQuanta(4).value).toBe(1);
  });

  it("gives zero decoherence and full visibility for zero quanta, and no decoherence time without a rate", () => {
    expect(decoherenceFromQuanta(-Infinity)).toMatchObject({ value: 0, log10: null });
    expect(visibilityFromQuanta(-Infinity).value).toBe(1);
    expect(decoherenceTimeFromRate(-Infinity)).toBeNull();
    expect(decoherenceTimeFromRate(-3)!.value!).toBeCloseTo(1000, 9);
  });

  it("carries values outside the range of a double in logarithms, never as Infinity or 0", () => {
    expect(quantityFromLog10(400, "1", "decoherence")).toMatchObject({ value: null, log10: 400 });
    expect(quantityFromLog10(-400, "1", "decoherence")).toMatchObject({ value: null, log10: -400 });
    expect(log10Sum(400, 400)).toBeCloseTo(400 + Math.log10(2), 12);
    expect(log10Sum(-Infinity, 3)).toBe(3);
  });
});
