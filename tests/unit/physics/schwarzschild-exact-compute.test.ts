/**
 * computeScenario in Schwarzschild: the electromagnetic hold rate is the exact horizon-method rate (cross-checked
 * against the module's exported function and, for a tangential separation, against the Rindler formula), the
 * gravitational one the far-zone rate, each with the published estimate beside it in the `comparison` block.
 */
import { spawnSync } from "node:child_process";
import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { computeScenario, computeScenarioFromJson } from "@/physics/compute";
import { G, c, epsilon0, hbar, solarMass } from "@/physics/constants";
import { publishedEstimateRateModel } from "@/physics/estimators/schwarzschild-horizon-rate";
import { schwarzschildGravityFarZoneRate, schwarzschildHorizonRate } from "@/physics/horizon/schwarzschild-exact";
import type { ScenarioResult } from "@/physics/result";
import type { ScenarioDocument } from "@/physics/scenario/schema";
import { scenario, segments, valueOf, withSeparation, withSource } from "./scenarios";

const M = 10 * solarMass.value;
/** GM/c², with the same floating-point operations as the module, so that both see the same b − 2GM/c². */
const m = (G * M) / (c * c);

function hovering(bOverM: number, axis: ScenarioDocument["separation"]["axis"], holdSeconds = 10): ScenarioDocument {
  return withSeparation(
    scenario({ background: { kind: "schwarzschild", massKg: M }, lab: { placement: "areal-radius", arealRadiusMetres: bOverM * m }, protocol: segments({ holdSeconds }) }),
    { axis },
  );
}

const flag = (result: ScenarioResult, code: string) => result.flags.find((f) => f.code === code);

/**
 * Rindler reference, written here from its source: a dipole difference Δp = qd held on a uniformly accelerated
 * worldline in the Minkowski vacuum decoheres at |Δp|² S(0)/ħ² = q²d²a³/(6π²ε0ħc⁶) per proper second, S(0) the
 * zero-frequency electric-field noise (T. H. Boyer, PRD 21, 2137 (1980)). A static lab at areal radius b needs
 * a = GM/(b²√(1 − 2GM/(c²b))) (Wald, General Relativity (1984), ch. 6).
 */
function rindlerRate(b: number, q: number, d: number): number {
  const a = (G * M) / (b * b * Math.sqrt((b - 2 * m) / b));
  return (q * q * d * d * a ** 3) / (6 * Math.PI ** 2 * epsilon0 * hbar * c ** 6);
}

describe("the Schwarzschild electromagnetic hold rate of computeScenario", () => {
  it("is the exact module's rate for the document's axis, charge and separation, per second of lab proper time", () => {
    for (const axis of ["radial", "tangential"] as const) {
      for (const bOverM of [2.001, 2.5, 6, 20, 1e3]) {
        const doc = hovering(bOverM, axis);
        const em = computeScenario(doc).electromagnetic;
        const module = schwarzschildHorizonRate({
          massKg: M,
          labArealRadiusMetres: bOverM * m,
          chargeCoulombs: doc.source.chargeCoulombs,
          separationMetres: doc.separation.distanceMetres,
          axis,
        });
        expect(valueOf(em.holdRate) / module.ratePerLabSecond, `${axis} at b/M = ${bOverM}`).toBeCloseTo(1, 12);
        expect(em.regime).toBe("exact");
        expect(em.holdRate.sourceKey).toBe("schwarzschild-exact-em");
      }
    }
  });

  it("equals the Rindler rate q²d²a³/(6π²ε0ħc⁶) with the lab's local acceleration at every radius for a tangential separation (Boyer 1980)", () => {
    for (const bOverM of [2.01, 3, 10, 100]) {
      const doc = hovering(bOverM, "tangential");
      const expected = rindlerRate(bOverM * m, doc.source.chargeCoulombs, doc.separation.distanceMetres);
      expect(valueOf(computeScenario(doc).electromagnetic.holdRate) / expected, `b/M = ${bOverM}`).toBeCloseTo(1, 10);
    }
  });

  // Far away the estimate is G³M³q²d²/(ε0ħc⁶b⁶) (coefficient 1, arXiv:2205.06279). The tangential rate is the
  // Rindler rate with a → GM/b² (above), q²d²G³M³/(6π²ε0ħc⁶b⁶): 1/(6π²) of it. A radial shift changes the
  // Coulomb field at the hole by ∂_b(q/b²)·d = 2qd/b³, a tangential one by qd/b³ (a rotation), and the far-zone
  // rate is quadratic in that change: radial = 4 × tangential, 2/(3π²) of the estimate. Corrections are O(GM/(c²b)).
  it("reports the ratio to the published estimate, 2/(3π²) radial and 1/(6π²) tangential far away (b/M = 1e5)", () => {
    for (const [axis, limit] of [["radial", 2 / (3 * Math.PI ** 2)], ["tangential", 1 / (6 * Math.PI ** 2)]] as const) {
      const em = computeScenario(hovering(1e5, axis)).electromagnetic;
      expect(em.comparison).not.toBeNull();
      expect(em.comparison!.estimateRegime).toBe("far");
      expect(em.comparison!.estimateHoldRate.sourceKey).toBe("schwarzschild-far-em");
      expect(em.comparison!.ratioExactToEstimate.unit).toBe("1");
      expect(valueOf(em.comparison!.ratioExactToEstimate) / limit, axis).toBeCloseTo(1, 4);
      expect(valueOf(em.comparison!.ratioExactToEstimate)).toBeCloseTo(valueOf(em.holdRate) / valueOf(em.comparison!.estimateHoldRate), 12);
    }
  });

  it("makes the hold-driven count the rate times ∫(Δp/Δp_max)²dτ, growing linearly with the hold, as in the Rindler split", () => {
    // Minimum-jerk ramps σ = 10u³ − 15u⁴ + 6u⁵ have ∫₀¹σ²du = 181/462 (elementary polynomial integral).
    const holds = [1, 10, 100];
    const counts = holds.map((hold) => computeScenario(hovering(6, "radial", hold)).electromagnetic);
    for (const [i, em] of counts.entries()) {
      const timeApart = holds[i] + (0.01 + 0.01) * (181 / 462);
      expect(valueOf(em.holdDrivenQuanta) / (valueOf(em.holdRate) * timeApart)).toBeCloseTo(1, 9);
      expect(valueOf(em.horizonQuanta)).toBe(valueOf(em.holdDrivenQuanta));
    }
    const increments = [1, 2].map((i) => valueOf(counts[i].holdDrivenQuanta) - valueOf(counts[i - 1].holdDrivenQuanta));
    expect(increments[1] / increments[0]).toBeCloseTo((100 - 10) / (10 - 1), 6);
    // The same protocol in the Rindler wedge: its hold-driven part is the same rate × ∫σ²dτ.
    const rindler = computeScenario({ ...hovering(6, "radial", 10), background: { kind: "rindler", accelerationMetresPerSecondSquared: 1e17 }, lab: { placement: "uniformly-accelerated" } }).electromagnetic;
    expect(valueOf(rindler.holdDrivenQuanta) / valueOf(rindler.holdRate)).toBeCloseTo(valueOf(counts[1].holdDrivenQuanta) / valueOf(counts[1].holdRate), 9);
  });

  it("keeps the published estimate selectable as the model, and then reports no comparison", () => {
    const doc = hovering(1e3, "radial");
    const alone = computeScenario(doc, { schwarzschildRateModel: publishedEstimateRateModel }).electromagnetic;
    expect(alone.comparison).toBeNull();
    expect(alone.holdRate).toEqual(computeScenario(doc).electromagnetic.comparison!.estimateHoldRate);
  });

  it("reports the near-horizon limit for a lab whose areal radius rounds onto the horizon, and says so", () => {
    const rs = 2 * m;
    const doc = { ...hovering(3, "tangential"), lab: { placement: "proper-distance-from-horizon", properDistanceMetres: 1e-9 * rs } } as ScenarioDocument;
    const result = computeScenario(doc);
    const a = valueOf(result.background.labProperAcceleration);
    const qd = doc.source.chargeCoulombs * doc.separation.distanceMetres;
    expect(valueOf(result.electromagnetic.holdRate) / ((qd * qd * a ** 3) / (6 * Math.PI ** 2 * epsilon0 * hbar * c ** 6))).toBeCloseTo(1, 9);
    expect(flag(result, "schwarzschild-exact:lab-radius-at-horizon-in-double")?.status).toBe("caution");
  });
});

describe("the Schwarzschild gravitational hold rate of computeScenario", () => {
  const oneSided = (bOverM: number, axis: ScenarioDocument["separation"]["axis"]) => withSeparation(hovering(bOverM, axis), { split: "one-branch-stays" });

  it("is the far-zone module's rate for the channel's quadrupole m_eff d², with the estimate beside it", () => {
    for (const axis of ["radial", "tangential"] as const) {
      const doc = withSource(oneSided(1e3, axis), { labMassKg: 1e-13 });
      const gw = computeScenario(doc).gravitational;
      const mEff = (doc.source.massKg * doc.source.labMassKg!) / (doc.source.massKg + doc.source.labMassKg!);
      const module = schwarzschildGravityFarZoneRate({ massKg: M, labArealRadiusMetres: 1e3 * m, bodyMassKg: mEff, separationMetres: doc.separation.distanceMetres, axis });
      expect(valueOf(gw.holdRate) / module.ratePerLabSecond, axis).toBeCloseTo(1, 12);
      expect(gw.regime).toBe("far-zone");
      expect(gw.holdRate.sourceKey).toBe("schwarzschild-exact-gw-far-zone");
      expect(gw.comparison!.estimateRegime).toBe("far");
      expect(valueOf(gw.comparison!.ratioExactToEstimate)).toBeCloseTo(valueOf(gw.holdRate) / valueOf(gw.comparison!.estimateHoldRate), 12);
      expect(flag(computeScenario(doc), "schwarzschild-gravity-model")).toMatchObject({ status: "note", message: expect.stringMatching(/relative corrections of order GM\/\(c²b\) = 1 × 10⁻³ \(b = 1000 GM\/c²\)/) });
    }
  });

  it("keeps the computed far-zone rate inside 100 GM/c² (no estimate swapped in), with the estimate beside it and the size of its corrections", () => {
    // Issue 17, item 1: at b = 99 GM/c² the rate once fell 6× below its value at 100 GM/c². The b⁻¹⁰ law
    // (gravity-far-zone.ts; the published scaling of arXiv:2205.06279) gives (100/99)¹⁰ ≈ 1.105 between them, times
    // the lapse ratio √((1 − 2/100)/(1 − 2/99)) ≈ 1.0001.
    const at = (bOverM: number) => computeScenario(oneSided(bOverM, "radial"));
    const ratio = valueOf(at(99).gravitational.holdRate) / valueOf(at(100).gravitational.holdRate);
    expect(ratio / ((100 / 99) ** 10 * Math.sqrt((1 - 2 / 100) / (1 - 2 / 99)))).toBeCloseTo(1, 9);
    const result = at(20);
    expect(result.gravitational.regime).toBe("far-zone");
    expect(result.gravitational.comparison!.estimateRegime).toBe("far");
    expect(flag(result, "schwarzschild-gravity-model")).toMatchObject({ status: "caution", message: expect.stringMatching(/= 0.05 \(b = 20 GM\/c²\)/) });
    expect(flag(result, "schwarzschild-gravity-model")!.measure!).toBeCloseTo(0.05, 9);
    expect(flag(at(5), "schwarzschild-gravity-model")).toMatchObject({ status: "invalid", message: expect.stringMatching(/order one/) });
  });

});

describe("validity flags of the Schwarzschild rate", () => {
  it("say the exact value is used at every radius and name the estimate's regime", () => {
    for (const [bOverM, regime] of [[1e3, "far"], [2.005, "near-horizon"], [6, "interpolated"]] as const) {
      const result = computeScenario(hovering(bOverM, "radial"));
      expect(result.electromagnetic.comparison!.estimateRegime).toBe(regime);
      const regimeFlag = flag(result, "schwarzschild-regime")!;
      expect(regimeFlag.status).toBe("note");
      expect(regimeFlag.message).toMatch(/exact value .* every radius/);
      expect(regimeFlag.message).toContain(`its ${regime} regime`);
    }
  });

  it("carry the multipole check, the near-horizon precision and the separation against the distance to the horizon", () => {
    const checked = computeScenario(hovering(6, "radial"));
    expect(flag(checked, "schwarzschild-multipole-check")).toMatchObject({ status: "ok" });
    expect(flag(checked, "schwarzschild-multipole-check")!.measure!).toBeLessThan(1e-10);

    const close = computeScenario(hovering(2 + 1e-12, "radial"));
    expect(flag(close, "schwarzschild-exact:near-horizon-input-precision")?.status).toBe("caution");
    expect(flag(close, "schwarzschild-multipole-check")?.status).toBe("note");

    const wide = computeScenario(withSeparation(hovering(2.001, "tangential"), { distanceMetres: 0.5 * valueOf(computeScenario(hovering(2.001, "tangential")).background.labProperDistanceToHorizon) }));
    expect(flag(wide, "schwarzschild-exact:separation-not-small")?.status).toBe("caution");
  });

  it("are present but not applicable, with no comparison, in other backgrounds and for an exactly zero channel", () => {
    const flat = computeScenario(scenario());
    expect(flag(flat, "schwarzschild-multipole-check")?.status).toBe("not-applicable");
    expect(flag(flat, "schwarzschild-gravity-model")?.status).toBe("not-applicable");
    expect(flat.electromagnetic.comparison).toBeNull();
    const neutral = computeScenario(withSource(hovering(6, "radial"), { chargeCoulombs: 0 }));
    expect(neutral.electromagnetic.comparison).toBeNull();
    expect(flag(neutral, "schwarzschild-regime")?.message).toMatch(/exactly zero/);
  });
});

describe("the result format with the comparison block", () => {
  const root = path.resolve(__dirname, "../../..");
  const example = path.join(root, "examples/schwarzschild.json");

  it("adds only `comparison` to the channel result (docs/formats.md), and the example shows it", () => {
    const outcome = computeScenarioFromJson(JSON.parse(readFileSync(example, "utf8")));
    expect(outcome.ok).toBe(true);
    if (!outcome.ok) return;
    const em = outcome.result.electromagnetic;
    expect(Object.keys(em).sort()).toEqual(
      [
        "channel", "sourceStrength", "exactZeroReason", "totalQuanta", "rampDrivenQuanta", "holdDrivenQuanta", "farFieldQuanta", "horizonQuanta",
        "holdRate", "regime", "comparison", "decoherence", "visibility", "decoherenceTime", "convergence",
      ].sort(),
    );
    expect(Object.keys(em.comparison!).sort()).toEqual(["estimateHoldRate", "estimateRegime", "ratioExactToEstimate"]);
    // Cross-check with the module: its ratio is to the estimate per Killing second; ours divides that by the lapse.
    const doc = JSON.parse(readFileSync(example, "utf8"));
    const module = schwarzschildHorizonRate({
      massKg: doc.background.massKg,
      labArealRadiusMetres: doc.lab.arealRadiusMetres,
      chargeCoulombs: doc.source.chargeCoulombs,
      separationMetres: doc.separation.distanceMetres,
      axis: doc.separation.axis,
    });
    expect(valueOf(em.comparison!.ratioExactToEstimate) / (module.ratioToFarZoneEstimate * module.labRedshiftFactor)).toBeCloseTo(1, 12);
  });

  it("is what the CLI prints for the example", () => {
    const run = spawnSync(process.execPath, ["--import", "tsx", path.join(root, "scripts/compute.ts"), example], { cwd: root, encoding: "utf8" });
    expect(run.status).toBe(0);
    const printed = JSON.parse(run.stdout) as ScenarioResult;
    const outcome = computeScenarioFromJson(JSON.parse(readFileSync(example, "utf8")));
    expect(outcome.ok && printed.electromagnetic.comparison).toEqual(outcome.ok && JSON.parse(JSON.stringify(outcome.result.electromagnetic.comparison)));
    expect(printed.electromagnetic.comparison?.estimateHoldRate.sourceKey).toBe("schwarzschild-far-em");
  }, 60_000);
});
