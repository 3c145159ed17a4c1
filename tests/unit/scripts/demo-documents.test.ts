import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { computeScenario, computeScenarioFromJson } from "@/physics/compute";
import { parseScenarioDocument } from "@/physics/scenario/schema";
import { acceleratedLab, flatSpaceStudy, hoveringLab, neutralDiamondLongHold, silicaAboveGoldChip } from "../../../scripts/demo-documents";

describe("the demo's scenarios", () => {
  it("are all documents the schema accepts as they are (the current version, so the seed needs no upgrade)", () => {
    for (const document of [flatSpaceStudy(), hoveringLab(), acceleratedLab(), silicaAboveGoldChip(), neutralDiamondLongHold()]) {
      const parsed = parseScenarioDocument(JSON.parse(JSON.stringify(document)));
      expect(parsed.ok, JSON.stringify(parsed.ok ? null : parsed.issues)).toBe(true);
      if (parsed.ok) expect(parsed.document).toEqual(document);
    }
  });

  it("carry charges that are whole multiples of the elementary charge (CODATA 2018, exact: 1.602176634e-19 C)", () => {
    for (const [document, electrons] of [[flatSpaceStudy(), 100], [hoveringLab(), 100], [acceleratedLab(), 10], [silicaAboveGoldChip(), 200]] as const) {
      expect(document.source.chargeCoulombs / 1.602176634e-19).toBeCloseTo(electrons, 9);
    }
  });

  it("are documents the schema accepts as they are, and compute every channel their environment switches on", () => {
    for (const document of [silicaAboveGoldChip(), neutralDiamondLongHold()]) {
      const parsed = parseScenarioDocument(JSON.parse(JSON.stringify(document)));
      expect(parsed.ok).toBe(true);
      if (!parsed.ok) continue;
      expect(parsed.document).toEqual(document);
      const result = computeScenario(document);
      expect(result.environment).not.toBeNull();
      expect(result.environment!.margins.length).toBe(result.environment!.channels.length);
    }
  });

  it("give the body's density of its material: silica 2200 kg/m³, diamond 3510 kg/m³ (CRC Handbook, from memory)", () => {
    const density = (d: ReturnType<typeof silicaAboveGoldChip>) => d.source.massKg / ((4 / 3) * Math.PI * d.environment!.body!.radiusMetres ** 3);
    expect(density(silicaAboveGoldChip())).toBeCloseTo(2200, 6);
    expect(density(neutralDiamondLongHold())).toBeCloseTo(3510, 6);
  });

  it("put the sphere 40 µm above a gold film and leave the diamond neutral, as their titles say", () => {
    expect(silicaAboveGoldChip().environment!.surface!.distanceMetres).toBe(40e-6);
    expect(neutralDiamondLongHold().source.chargeCoulombs).toBe(0);
    expect(neutralDiamondLongHold().environment!.body!.material).toBe("diamond");
  });
});

describe("the examples of each environment block", () => {
  it.each([
    ["environment-gas.json", ["gas"]],
    ["environment-thermal.json", ["thermal-scattering", "thermal-absorption", "thermal-emission"]],
    ["environment-surface.json", ["surface"]],
    ["environment-body.json", ["thermal-scattering", "thermal-absorption", "thermal-emission"]],
    ["environment-cryogenic-chip.json", ["gas", "thermal-scattering", "thermal-absorption", "thermal-emission", "surface"]],
  ] as const)("%s parses and computes its channels", (file, channels) => {
    const outcome = computeScenarioFromJson(JSON.parse(readFileSync(`examples/${file}`, "utf8")));
    expect(outcome.ok).toBe(true);
    if (!outcome.ok) return;
    expect(outcome.result.environment!.channels.map((c) => c.channel)).toEqual(channels);
  });

  it("environment-body.json gives the body's ε directly, not a material from the table", () => {
    const document = JSON.parse(readFileSync("examples/environment-body.json", "utf8"));
    expect(document.environment.body.material).toBeNull();
    expect(document.environment.body.permittivity.imaginary).toBeGreaterThan(0);
  });
});
