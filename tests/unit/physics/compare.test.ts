import { describe, expect, it } from "vitest";
import { differsOnlyInDisplay } from "@/physics/scenario/compare";
import { defaultScenarioDocument } from "@/physics/scenario/schema";

describe("differsOnlyInDisplay", () => {
  const base = defaultScenarioDocument();

  it("is true for a change of theme or grid alone, and for the same document", () => {
    expect(differsOnlyInDisplay(base, { ...base, display: { theme: "dark", showGrid: !base.display.showGrid } })).toBe(true);
    expect(differsOnlyInDisplay(base, structuredClone(base))).toBe(true);
  });

  it("ignores key order, as stored JSON keeps none", () => {
    const reordered: Record<string, unknown> = Object.fromEntries(Object.entries(structuredClone(base)).reverse());
    reordered.source = Object.fromEntries(Object.entries(base.source).reverse());
    expect(differsOnlyInDisplay(base, reordered)).toBe(true);
  });

  it("is false when any number or word outside the display changes, or when a side is not a document", () => {
    expect(differsOnlyInDisplay(base, { ...base, separation: { ...base.separation, distanceMetres: 2e-6 } })).toBe(false);
    expect(differsOnlyInDisplay(base, { ...base, separation: { ...base.separation, axis: "radial" } })).toBe(false);
    expect(differsOnlyInDisplay(base, { ...base, schemaVersion: 2 })).toBe(false);
    expect(differsOnlyInDisplay(base, null)).toBe(false);
    expect(differsOnlyInDisplay([], [])).toBe(false);
  });
});
