/**
 * Ramer–Douglas–Peucker thinning of measured profiles (physics/protocols/thin-profile.ts): the bound it promises
 * (every dropped sample within the tolerance of the kept samples' straight line, measured independently here by
 * linear interpolation) holds over random profiles; the ends are kept; a straight line thins to its two ends.
 * Algorithm: U. Ramer (1972); D. H. Douglas and T. K. Peucker (1973).
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { douglasPeuckerIndices, THIN_ABOVE_SAMPLES, thinProfile, type ProfileSample } from "@/physics/protocols/thin-profile";

function interpolate(kept: ProfileSample[], t: number): number {
  let j = 0;
  while (j + 2 < kept.length && kept[j + 1].timeSeconds <= t) j++;
  const [a, b] = [kept[j], kept[j + 1]];
  return a.separationMetres + ((b.separationMetres - a.separationMetres) * (t - a.timeSeconds)) / (b.timeSeconds - a.timeSeconds);
}

const profiles = fc
  .array(fc.double({ min: -1e-6, max: 1e-6, noNaN: true }), { minLength: 3, maxLength: 400 })
  .map((values) => values.map((s, i) => ({ timeSeconds: i * 1e-3, separationMetres: s })));

describe("profile thinning", () => {
  it("keeps every dropped sample within the tolerance of the thinned line, and keeps both ends", () => {
    fc.assert(
      fc.property(profiles, fc.double({ min: 1e-10, max: 1e-6, noNaN: true }), (samples, tolerance) => {
        const kept = douglasPeuckerIndices(samples, tolerance);
        expect(kept[0]).toBe(0);
        expect(kept[kept.length - 1]).toBe(samples.length - 1);
        const keptSamples = kept.map((i) => samples[i]);
        for (const s of samples) expect(Math.abs(interpolate(keptSamples, s.timeSeconds) - s.separationMetres)).toBeLessThanOrEqual(tolerance * (1 + 1e-9) + 1e-30);
      }),
      { numRuns: 200, seed: 5 },
    );
  });

  it("thins a straight ramp to its two ends", () => {
    const ramp = Array.from({ length: 1000 }, (_, i) => ({ timeSeconds: i, separationMetres: 2 * i }));
    expect(douglasPeuckerIndices(ramp, 1e-9)).toEqual([0, 999]);
  });

  it("leaves a profile of up to THIN_ABOVE_SAMPLES samples as it is, and reports the measured error of a thinned one", () => {
    const short = Array.from({ length: 100 }, (_, i) => ({ timeSeconds: i, separationMetres: Math.sin(i) }));
    expect(thinProfile(short).samples).toEqual(short);
    const long = Array.from({ length: THIN_ABOVE_SAMPLES * 2 }, (_, i) => ({ timeSeconds: i, separationMetres: Math.sin(i / 3000) }));
    const thinned = thinProfile(long);
    expect(thinned.samples.length).toBeLessThan(long.length / 10);
    expect(thinned.largestErrorMetres).toBeLessThanOrEqual(thinned.toleranceMetres);
    expect(thinned.largestErrorMetres).toBeGreaterThan(0);
  });
});
