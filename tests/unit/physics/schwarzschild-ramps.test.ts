/**
 * The ramps' quanta near a black hole (issue 17, item 2), right in both limits:
 * - slow ramps: N(ℐ⁺) = β²·f·N_flat, f = 1 − 2GM/(c²b), β² = f (radial), f² (tangential). β is checked here
 *   numerically against the dipole at infinity of the Copson–Linet potential (E. T. Copson, Proc. R. Soc. A 118, 184
 *   (1928); B. Linet, J. Phys. A 9, 1081 (1976)); the factor f is the Killing-time stretch t = τ/√f of a count ∝ T⁻²;
 * - near the horizon: the Rindler spectral count at the lab's acceleration (Boyer, PRD 21, 2137 (1980); Takagi,
 *   Prog. Theor. Phys. Suppl. 88, 1 (1986)), computed by the engine's own Rindler background as the independent route.
 */
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { computeScenario } from "@/physics/compute";
import { G, c } from "@/physics/constants";
import { copsonLinetPotential } from "@/physics/horizon/schwarzschild-exact/copson-field";
import { parseScenarioDocument, type ScenarioDocument } from "@/physics/scenario/schema";
import { scenario, segments, valueOf, withSeparation } from "./scenarios";

const solarMassKg = 1.3271244e20 / G; // IAU 2015 nominal GM☉
const massLength = (G * solarMassKg) / c ** 2;

/** The dipole moment at infinity, in units of q·GM/c², of the Copson–Linet field of a charge at b (in GM/c²). */
function dipoleAtInfinity(bOverM: number): number {
  // r²(Φ(r, 0) − Φ(r, π))/2 is the dipole up to relative corrections O(GM/(c²r)): removed by Richardson extrapolation.
  const at = (r: number) => (r * r * (copsonLinetPotential(r, 0, bOverM) - copsonLinetPotential(r, Math.PI, bOverM))) / 2;
  return 2 * at(2e5) - at(1e5);
}

describe("the dipole that a static charge and the hole present at infinity (Copson–Linet)", () => {
  it("is q(b − 2GM/c²), so a proper shift d gives β = √f radially and β = f tangentially", () => {
    for (const bOverM of [2.5, 3, 6, 40]) {
      const f = 1 - 2 / bOverM;
      expect(dipoleAtInfinity(bOverM) / (bOverM - 2)).toBeCloseTo(1, 6);
      // radial: dp/db by a central difference, times db/dℓ = √f
      const h = 1e-4;
      const dpdb = (dipoleAtInfinity(bOverM + h) - dipoleAtInfinity(bOverM - h)) / (2 * h);
      expect((dpdb * Math.sqrt(f)) ** 2 / f).toBeCloseTo(1, 5);
      // tangential: the dipole turns by d/b
      expect((dipoleAtInfinity(bOverM) / bOverM) ** 2 / (f * f)).toBeCloseTo(1, 6);
    }
  });
});

const hovering = (bOverM: number, axis: ScenarioDocument["separation"]["axis"], protocol: ScenarioDocument["protocol"]) =>
  withSeparation(
    scenario({ background: { kind: "schwarzschild", massKg: solarMassKg }, lab: { placement: "areal-radius", arealRadiusMetres: bOverM * massLength }, protocol }),
    { axis, split: "one-branch-stays" },
  );
const flat = (protocol: ScenarioDocument["protocol"]) => withSeparation(scenario({ protocol }), { split: "one-branch-stays" });
const rampFlag = (doc: ScenarioDocument) => computeScenario(doc).flags.find((f) => f.code === "schwarzschild-ramp-model")!;

describe("the ramps' quanta around a black hole", () => {
  it("tend to β²·f·N_flat for slow ramps far from the hole (f² radial, f³ tangential for photons; f² for gravitons)", () => {
    const slow = segments({ separationSeconds: 0.1, recombinationSeconds: 0.1, holdSeconds: 1 });
    const nFlat = computeScenario(flat(slow));
    const bOverM = 400;
    const f = 1 - 2 / bOverM;
    for (const [axis, power] of [["radial", 2], ["tangential", 3]] as const) {
      const result = computeScenario(hovering(bOverM, axis, slow));
      expect(valueOf(result.electromagnetic.rampDrivenQuanta) / valueOf(nFlat.electromagnetic.rampDrivenQuanta) / f ** power, axis).toBeCloseTo(1, 3);
      expect(valueOf(result.gravitational.rampDrivenQuanta) / valueOf(nFlat.gravitational.rampDrivenQuanta) / f ** 2, axis).toBeCloseTo(1, 3);
      expect(result.flags.find((x) => x.code === "schwarzschild-ramp-model")!.status).toBe("note");
    }
  });

  it("are the Rindler count at the lab's acceleration near the horizon (30 m above a solar-mass hole, 1 µs minimum-jerk ramps)", () => {
    const fast = segments({ separationSeconds: 1e-6, recombinationSeconds: 1e-6, holdSeconds: 1e-5, shape: "minimum-jerk" });
    const near = withSeparation(
      scenario({ background: { kind: "schwarzschild", massKg: solarMassKg }, lab: { placement: "proper-distance-from-horizon", properDistanceMetres: 30 }, protocol: fast }),
      { split: "one-branch-stays" },
    );
    const result = computeScenario(near);
    const a = valueOf(result.background.labProperAcceleration);
    const rindler = computeScenario(withSeparation(scenario({ background: { kind: "rindler", accelerationMetresPerSecondSquared: a }, lab: { placement: "uniformly-accelerated" }, protocol: fast }), { split: "one-branch-stays" }));
    for (const channel of ["electromagnetic", "gravitational"] as const) {
      expect(valueOf(result[channel].rampDrivenQuanta) / valueOf(rindler[channel].rampDrivenQuanta), channel).toBeCloseTo(1, 4);
    }
    expect(result.flags.find((x) => x.code === "schwarzschild-ramp-model")).toMatchObject({ status: "note", message: expect.stringMatching(/Rindler/) });
    // and not the flat-space count, which is several times smaller there
    const nFlat = computeScenario(flat(fast));
    expect(valueOf(result.electromagnetic.rampDrivenQuanta) / valueOf(nFlat.electromagnetic.rampDrivenQuanta)).toBeGreaterThan(2);
  });

  it("are the flat count for fast ramps far from the hole (wavelengths short against b)", () => {
    const fast = segments({ separationSeconds: 1e-8, recombinationSeconds: 1e-8, holdSeconds: 1e-6 });
    const result = computeScenario(hovering(1e6, "radial", fast));
    expect(valueOf(result.electromagnetic.rampDrivenQuanta) / valueOf(computeScenario(flat(fast)).electromagnetic.rampDrivenQuanta)).toBeCloseTo(1, 3);
  });

  it("carry a caution with the factor between the two limits where neither holds, and no count to ℐ⁺ of their own", () => {
    const between = hovering(4, "radial", segments({ separationSeconds: 1e-4, recombinationSeconds: 1e-4, holdSeconds: 1e-3 }));
    const raised = rampFlag(between);
    expect(raised.status).toBe("caution");
    expect(raised.message).toMatch(/differ by a factor [0-9.]+/);
    const em = computeScenario(between).electromagnetic;
    expect(em.farFieldQuanta).toBeNull();
    expect(em.horizonQuanta).toEqual(em.holdDrivenQuanta);
  });

  it("raise the flag in examples/schwarzschild.json (b ≈ 20 GM/c², ramps slow against b/c): the limits differ by less than 3×", () => {
    const parsed = parseScenarioDocument(JSON.parse(readFileSync("examples/schwarzschild.json", "utf8")));
    if (!parsed.ok) throw new Error("example does not parse");
    const flags = computeScenario(parsed.document).flags;
    const raised = flags.find((f) => f.code === "schwarzschild-ramp-model")!;
    expect(raised.status).toBe("caution");
    expect(Number(/differ by a factor ([0-9.]+)/.exec(raised.message)![1])).toBeLessThan(3);
    expect(raised.measure!).toBeLessThan(0.05);
    expect(flags.find((f) => f.code === "hold-timescale")!.status).toBe("ok");
  });
});
