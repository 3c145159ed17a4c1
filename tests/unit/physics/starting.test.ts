import { describe, expect, it } from "vitest";
import { withBackgroundKind } from "@/canvas/kernels/document-edits";
import { schwarzschildRadiusMetres } from "@/physics/backgrounds/schwarzschild-geometry";
import { computeScenario } from "@/physics/compute";
import { rangeIssues } from "@/physics/scenario/ranges";
import { defaultScenarioDocument, parseScenarioDocument, type BackgroundKind } from "@/physics/scenario/schema";
import { newScenarioDocument, startingBackground } from "@/physics/scenario/starting";

const kinds: BackgroundKind[] = ["minkowski", "schwarzschild", "rindler", "de-sitter"];

describe("where each background starts", () => {
  it.each(kinds)("%s: the new scenario is a valid document inside every range, and it computes", (kind) => {
    const document = newScenarioDocument(kind);
    const parsed = parseScenarioDocument(document);
    expect(parsed.ok && parsed.document).toEqual(document);
    expect(rangeIssues(document)).toEqual([]);
    const result = computeScenario(document);
    expect(result.combined.totalQuanta.log10 === null || Number.isFinite(result.combined.totalQuanta.log10)).toBe(true);
  });

  it.each(kinds)("%s: switching the background in the editor lands on the same start as a new scenario", (kind) => {
    const from = kind === "minkowski" ? newScenarioDocument("schwarzschild") : defaultScenarioDocument();
    const switched = withBackgroundKind(from, kind);
    expect({ background: switched.background, lab: switched.lab }).toEqual(startingBackground(kind));
    expect(switched.protocol).toEqual(from.protocol);
  });

  it("a black hole of 10 M☉ with the lab at five horizon radii: r_s = 2GM/c² ≈ 29.5 km (IAU 2015 nominal GM☉, from memory: 2.95 km per M☉)", () => {
    const start = startingBackground("schwarzschild");
    if (start.background.kind !== "schwarzschild" || start.lab.placement !== "areal-radius") throw new Error("not a Schwarzschild start");
    expect(schwarzschildRadiusMetres(start.background.massKg) / 1e3).toBeCloseTo(29.53, 1);
    expect(start.lab.arealRadiusMetres / schwarzschildRadiusMetres(start.background.massKg)).toBe(5);
  });

  it("a Rindler lab at the standard acceleration of gravity, 9.806 65 m/s² (CODATA 2018, adopted value)", () => {
    const start = startingBackground("rindler");
    expect(start.background.kind === "rindler" && start.background.accelerationMetresPerSecondSquared).toBe(9.80665);
  });
});
