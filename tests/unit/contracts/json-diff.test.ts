import { describe, expect, it } from "vitest";
import { diffDocuments, flattenDocument } from "@/contracts/json-diff";
import { defaultScenarioDocument } from "@/physics/scenario/schema";

describe("diffDocuments", () => {
  it("finds nothing between a document and a copy of it with its keys in another order", () => {
    const doc = defaultScenarioDocument();
    const reordered = Object.fromEntries(Object.entries(doc).reverse());
    expect(diffDocuments(doc, reordered)).toEqual({ changes: [], truncated: false });
  });

  it("reports a changed leaf by its dotted path with the old and new values", () => {
    const before = defaultScenarioDocument();
    const after = JSON.parse(JSON.stringify(before));
    after.separation.distanceMetres = 2e-6;
    after.protocol.hold.durationSeconds = 1;
    expect(diffDocuments(before, after).changes).toEqual([
      { path: "protocol.hold.durationSeconds", kind: "changed", before: 0.1, after: 1 },
      { path: "separation.distanceMetres", kind: "changed", before: 1e-6, after: 2e-6 },
    ]);
  });

  it("reports keys that appear or disappear with their whole values, in alphabetical order", () => {
    const changes = diffDocuments({ background: { kind: "minkowski" } }, { background: { kind: "schwarzschild", massKg: 2e31 } }).changes;
    expect(changes).toEqual([
      { path: "background.kind", kind: "changed", before: "minkowski", after: "schwarzschild" },
      { path: "background.massKg", kind: "added", after: 2e31 },
    ]);
    expect(diffDocuments({ a: { b: [1, 2] }, c: 1 }, { c: 1 }).changes).toEqual([{ path: "a", kind: "removed", before: { b: [1, 2] } }]);
  });

  it("compares arrays item by item and reports extra items as added or removed", () => {
    const before = { samples: [{ t: 0 }, { t: 1 }, { t: 2 }] };
    const after = { samples: [{ t: 0 }, { t: 1.5 }] };
    expect(diffDocuments(before, after).changes).toEqual([
      { path: "samples.1.t", kind: "changed", before: 1, after: 1.5 },
      { path: "samples.2", kind: "removed", before: { t: 2 } },
    ]);
    expect(diffDocuments({ xs: [1] }, { xs: [1, 5] }).changes).toEqual([{ path: "xs.1", kind: "added", after: 5 }]);
  });

  it("treats a change of type (object to number, array to object, null to value) as one change of the whole value", () => {
    expect(diffDocuments({ a: { b: 1 } }, { a: 3 }).changes).toEqual([{ path: "a", kind: "changed", before: { b: 1 }, after: 3 }]);
    expect(diffDocuments({ a: [1] }, { a: { 0: 1 } }).changes).toEqual([{ path: "a", kind: "changed", before: [1], after: { 0: 1 } }]);
    expect(diffDocuments({ labMassKg: null }, { labMassKg: 1 }).changes).toEqual([{ path: "labMassKg", kind: "changed", before: null, after: 1 }]);
    expect(diffDocuments(1, 2).changes).toEqual([{ path: "", kind: "changed", before: 1, after: 2 }]);
  });

  it("stops at the limit and says so, so a resampled profile of a million points stays small", () => {
    const before = { samples: Array.from({ length: 1_000_000 }, (_, i) => i) };
    const after = { samples: before.samples.map((x) => x + 1) };
    const diff = diffDocuments(before, after, 200);
    expect(diff.changes).toHaveLength(200);
    expect(diff.changes[199]).toEqual({ path: "samples.199", kind: "changed", before: 199, after: 200 });
    expect(diff.truncated).toBe(true);
    expect(diffDocuments({ a: 1, b: 2 }, { a: 2, b: 3 }, 2).truncated).toBe(false);
  });
});

describe("flattenDocument", () => {
  it("lists a document's leaves in its own order, and a long array as one leaf that counts its items", () => {
    const leaves = flattenDocument({ source: { chargeCoulombs: 1e-17, labMassKg: null }, samples: [1, 2, 3], long: Array(20).fill(0) }, 12);
    expect(leaves).toEqual([
      { path: "source.chargeCoulombs", value: 1e-17 },
      { path: "source.labMassKg", value: null },
      { path: "samples.0", value: 1 },
      { path: "samples.1", value: 2 },
      { path: "samples.2", value: 3 },
      { path: "long", value: { items: 20 } },
    ]);
  });
});
