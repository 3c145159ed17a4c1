import { describe, expect, it } from "vitest";
import { documentIssues } from "@/canvas/kernels/document-edits";
import { orientationFromAxis, withEnvironmentChange, withEnvironmentPart, withEnvironmentPreset, withNewEnvironmentPart, type EnvironmentPresetName } from "@/canvas/kernels/environment-edits";
import { environmentPresets } from "@/physics/scenario/environment-schema";
import { defaultScenarioDocument } from "@/physics/scenario/schema";

describe("the environment's edits", () => {
  it("apply each preset as a copy the editor accepts, 'none' giving an isolated body", () => {
    for (const preset of Object.keys(environmentPresets) as EnvironmentPresetName[]) {
      const next = withEnvironmentPreset(defaultScenarioDocument(), preset);
      expect(documentIssues(next)).toEqual([]);
      expect(next.environment).toEqual(environmentPresets[preset]);
      if (next.environment) expect(next.environment).not.toBe(environmentPresets[preset]);
    }
    expect(withEnvironmentPreset(defaultScenarioDocument(), "none").environment).toBeNull();
  });

  it("add the body with gas or radiation, since both act on the body's size", () => {
    const withGas = withNewEnvironmentPart(defaultScenarioDocument(), "gas");
    expect(withGas.environment?.body?.radiusMetres).toBeGreaterThan(0);
    expect(documentIssues(withGas)).toEqual([]);
    const noBody = withEnvironmentPart(withGas, "body", null);
    expect(noBody.environment).toBeNull();
  });

  it("orient a new surface from the separation axis and leave an isolated body isolated when the last part goes", () => {
    expect(orientationFromAxis("radial")).toBe("perpendicular");
    expect(orientationFromAxis("tangential")).toBe("parallel");
    const document = defaultScenarioDocument();
    const withSurface = withNewEnvironmentPart(document, "surface");
    expect(withSurface.environment?.surface?.orientation).toBe(orientationFromAxis(document.separation.axis));
    expect(documentIssues(withSurface)).toEqual([]);
    expect(withEnvironmentPart(withSurface, "surface", null).environment).toBeNull();
  });

  it("change one field of a part that exists, and leave an absent part absent", () => {
    const lab = withEnvironmentPreset(defaultScenarioDocument(), "room-temperature-lab-vacuum");
    const lower = withEnvironmentChange(lab, "gas", { pressurePascals: 1e-9 });
    expect(lower.environment?.gas?.pressurePascals).toBe(1e-9);
    expect(lower.environment?.radiation).toBe(lab.environment?.radiation);
    expect(withEnvironmentChange(lab, "surface", { distanceMetres: 1e-5 })).toBe(lab);
  });

  it("are refused by the schema where a value is impossible (a negative pressure)", () => {
    const lab = withEnvironmentPreset(defaultScenarioDocument(), "room-temperature-lab-vacuum");
    const issues = documentIssues(withEnvironmentChange(lab, "gas", { pressurePascals: -1 }));
    expect(issues[0]?.path).toBe("environment.gas.pressurePascals");
  });
});
