import { describe, expect, it } from "vitest";
import { withFormula } from "@/canvas/kernels/document-edits";
import type { ScenarioDocument } from "@/physics/scenario/schema";
import { createHarness, schwarzschildDocument } from "./harness";

function formulaDocument(): ScenarioDocument {
  return { ...schwarzschildDocument(), protocol: { kind: "formula", expression: "sin(pi * t / 2)^2", durationSeconds: 2 } };
}

describe("editing a formula profile", () => {
  it("takes a new expression as one undo step, and undo brings the old one back", () => {
    const h = createHarness({ document: formulaDocument() });
    const result = h.store.getState().edit("Set profile formula", (d) => withFormula(d, { expression: "sin(pi * t / 2)^4" }));
    expect(result.ok).toBe(true);
    expect(h.document().protocol).toMatchObject({ kind: "formula", expression: "sin(pi * t / 2)^4", durationSeconds: 2 });
    expect(h.store.getState().history.past).toHaveLength(1);
    h.store.getState().undo();
    expect(h.document().protocol).toMatchObject({ expression: "sin(pi * t / 2)^2" });
  });

  it("takes a new duration and keeps the expression", () => {
    const h = createHarness({ document: formulaDocument() });
    expect(h.store.getState().edit("Set profile duration", (d) => withFormula(d, { durationSeconds: 0.5 })).ok).toBe(true);
    expect(h.document().protocol).toMatchObject({ expression: "sin(pi * t / 2)^2", durationSeconds: 0.5 });
  });

  it("refuses a formula the physics cannot read, with the physics' reason and the expression's path, changing nothing", () => {
    const h = createHarness({ document: formulaDocument() });
    const before = h.document();
    for (const [expression, reason] of [
      ["sin(pi * t / 2", /does not parse/],
      ["sin(pi * x)", /unknown symbol "x"/],
      ["import(1)", /not allowed/],
      ["sqrt(t - 1)", /no finite real number|cannot be evaluated/],
    ] as const) {
      const result = h.store.getState().edit("Set profile formula", (d) => withFormula(d, { expression }));
      expect(result.ok).toBe(false);
      if (!result.ok) {
        expect(result.issues[0].path).toBe("protocol.expression");
        expect(result.issues[0].message).toMatch(reason);
      }
    }
    expect(h.document()).toBe(before);
    expect(h.store.getState().history.past).toHaveLength(0);
  });

  it("refuses a duration that is not positive", () => {
    const h = createHarness({ document: formulaDocument() });
    expect(h.store.getState().edit("Set profile duration", (d) => withFormula(d, { durationSeconds: 0 })).ok).toBe(false);
  });

  it("leaves a segment protocol alone", () => {
    const document = schwarzschildDocument();
    expect(withFormula(document, { expression: "t" })).toBe(document);
  });
});
