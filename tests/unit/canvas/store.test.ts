import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { segmentTimes, type SegmentsProtocol } from "@/canvas/kernels/timeline";
import { HANDLE_IDS } from "@/canvas/kernels/offsets/handles";
import { hasUnsavedChanges } from "@/canvas/store/selectors";
import { createHarness, framesOf, schwarzschildDocument } from "./harness";

const protocolOf = (h: ReturnType<typeof createHarness>) => h.document().protocol as SegmentsProtocol;

describe("the editor store", () => {
  it("records a drag of many frames as a single undo entry", () => {
    const h = createHarness();
    h.drag("recombination-end", framesOf(120, 0, 30));
    expect(h.store.getState().history.past).toHaveLength(1);
    expect(h.store.getState().history.past[0].label).toBe("Drag end of recombination");
  });

  it("restores the document exactly on undo after a drag, and replays it exactly on redo", () => {
    const h = createHarness({ document: schwarzschildDocument() });
    const before = structuredClone(h.document());
    h.drag("hold-end", framesOf(-60, 0, 12));
    const after = structuredClone(h.document());
    expect(after).not.toEqual(before);
    h.store.getState().undo();
    expect(h.document()).toEqual(before);
    h.store.getState().redo();
    expect(h.document()).toEqual(after);
  });

  it("undoes a sequence of edits back to the opening document, step by step", () => {
    const h = createHarness();
    const opening = structuredClone(h.document());
    h.drag("separation-end", framesOf(30, 0, 5));
    h.drag("separation-size", framesOf(0, -40, 5));
    h.store.getState().edit("Set hold duration", (d) => ({ ...d, protocol: { ...(d.protocol as SegmentsProtocol), hold: { durationSeconds: 0.5 } } }));
    expect(h.store.getState().history.past).toHaveLength(3);
    for (let i = 0; i < 3; i++) h.store.getState().undo();
    expect(h.document()).toEqual(opening);
    expect(h.store.getState().history.future).toHaveLength(3);
  });

  it("rolls a cancelled drag back to the document at pointer-down and records nothing", () => {
    const h = createHarness();
    const before = h.document();
    h.drag("separation-end", framesOf(80, 0, 8), { release: false });
    expect(h.document()).not.toBe(before);
    expect(h.key("Escape")).toBe(true);
    expect(h.document()).toBe(before);
    expect(h.store.getState().history.past).toHaveLength(0);
    expect(h.store.getState().offsetsTool.name).toBe("idle");
  });

  it("records nothing for a press on a handle that does not move it", () => {
    const h = createHarness();
    h.drag("hold-end", []);
    expect(h.store.getState().history.past).toHaveLength(0);
    expect(h.store.getState().selection).toBe("hold-end");
  });

  it("keeps the end of the recombination where it was on the lab clock while the end of the hold is dragged", () => {
    const h = createHarness();
    const endBefore = segmentTimes(protocolOf(h)).recombinationEnd;
    h.drag("hold-end", framesOf(-40, 0, 4));
    expect(segmentTimes(protocolOf(h)).recombinationEnd).toBeCloseTo(endBefore, 12);
  });

  it("lets a slower recombination be dragged out past the right edge of the axis", () => {
    const h = createHarness();
    const before = protocolOf(h).recombination.durationSeconds;
    h.drag("recombination-end", framesOf(400, 0, 20));
    expect(protocolOf(h).recombination.durationSeconds).toBeGreaterThan(before);
  });

  it("refuses an edit that puts the lab inside the horizon, leaving document and history as they were", () => {
    const h = createHarness({ document: schwarzschildDocument() });
    const before = h.document();
    const result = h.store.getState().edit("Set lab radius", (d) => ({ ...d, lab: { placement: "areal-radius", arealRadiusMetres: 1000 } }));
    expect(result.ok).toBe(false);
    expect(result.ok === false && result.issues[0].path).toBe("lab.arealRadiusMetres");
    expect(h.document()).toBe(before);
    expect(h.store.getState().history.past).toHaveLength(0);
    expect(h.store.getState().refused?.issues[0].path).toBe("lab.arealRadiusMetres");
  });

  it("nudges the selected handle with the arrow keys, one undo entry per press", () => {
    const h = createHarness();
    const before = protocolOf(h).hold.durationSeconds;
    h.drag("hold-end", []);
    expect(h.key("ArrowRight")).toBe(true);
    expect(h.key("ArrowRight", true)).toBe(true);
    expect(protocolOf(h).hold.durationSeconds).toBeGreaterThan(before);
    expect(h.store.getState().history.past).toHaveLength(2);
    expect(h.key("ArrowUp")).toBe(false);
  });

  it("shows a viewer no handles and ignores presses, drags and undo", () => {
    const h = createHarness({ readOnly: true });
    expect(h.store.getState().offsets.handles(h.store.getState())).toEqual([]);
    const before = h.document();
    h.store.getState().offsetsPointerDown({ x: 400, y: 150, shiftKey: false });
    h.store.getState().offsetsPointerMove({ x: 500, y: 150, shiftKey: false });
    h.store.getState().offsetsPointerUp({ x: 500, y: 150, shiftKey: false });
    expect(h.document()).toBe(before);
    expect(h.store.getState().edit("Anything", (d) => ({ ...d, separation: { ...d.separation, distanceMetres: 1 } })).ok).toBe(false);
  });

  it("keeps every duration positive (the hold non-negative), the separation non-negative and the segments in order, whatever is dragged", () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...HANDLE_IDS),
        fc.array(fc.record({ dx: fc.integer({ min: -900, max: 900 }), dy: fc.integer({ min: -600, max: 600 }) }), { minLength: 1, maxLength: 6 }),
        fc.boolean(),
        (handle, frames, shiftKey) => {
          const h = createHarness();
          h.drag(handle, frames, { shiftKey });
          const p = protocolOf(h);
          expect(p.separation.durationSeconds).toBeGreaterThan(0);
          expect(p.recombination.durationSeconds).toBeGreaterThan(0);
          expect(p.hold.durationSeconds).toBeGreaterThanOrEqual(0);
          expect(h.document().separation.distanceMetres).toBeGreaterThanOrEqual(0);
          const t = segmentTimes(p);
          expect(t.holdEnd).toBeGreaterThanOrEqual(t.separationEnd);
        },
      ),
      { numRuns: 200 },
    );
  });

  it("counts a revision for every frame of a drag, so the budget can follow the pointer", () => {
    const h = createHarness();
    const start = h.store.getState().revision;
    h.drag("recombination-end", framesOf(50, 0, 5));
    expect(h.store.getState().revision - start).toBeGreaterThanOrEqual(5);
  });

  it("tells its subscribers nothing when a budget request starts while one is already being computed", () => {
    const h = createHarness();
    h.store.getState().budgetStarted(1);
    let told = 0;
    const unsubscribe = h.store.subscribe(() => told++);
    const before = h.store.getState();
    h.store.getState().budgetStarted(2);
    unsubscribe();
    expect(told).toBe(0);
    expect(h.store.getState()).toBe(before);
    expect(h.store.getState().budget.status).toBe("computing");
  });
});

describe("saving state in the store", () => {
  it("counts the document as unsaved after an edit and saved again once the server has that document", () => {
    const h = createHarness();
    h.drag("hold-end", framesOf(-30, 0, 3));
    expect(hasUnsavedChanges(h.store.getState())).toBe(true);
    h.store.getState().saveSucceeded(2, h.document());
    expect(hasUnsavedChanges(h.store.getState())).toBe(false);
    expect(h.store.getState().save.baseVersion).toBe(2);
  });

  it("starts afresh from the server's document after a conflict is resolved by reloading theirs", () => {
    const h = createHarness();
    h.drag("hold-end", framesOf(-30, 0, 3));
    h.store.getState().saveConflicted(5);
    expect(h.store.getState().save.status).toBe("conflict");
    const theirs = schwarzschildDocument();
    h.store.getState().loadDocument(theirs, 5);
    const s = h.store.getState();
    expect(s.document).toBe(theirs);
    expect(s.save).toMatchObject({ status: "idle", baseVersion: 5 });
    expect(s.history.past).toHaveLength(0);
  });
});

describe("the Offsets panel of a profile that is not made of segments", () => {
  it("gets axes over the whole profile but no handles, so a press changes nothing", () => {
    const sampled = {
      ...schwarzschildDocument(),
      protocol: {
        kind: "sampled" as const,
        interpolation: "linear" as const,
        samples: [
          { timeSeconds: 0, separationMetres: 0 },
          { timeSeconds: 0.5, separationMetres: 2e-6 },
          { timeSeconds: 1, separationMetres: 0 },
        ],
      },
    };
    const h = createHarness({ document: sampled });
    const s = h.store.getState();
    const viewport = s.offsets.viewport(s)!;
    expect(viewport.pieces[1].fromSeconds).toBe(0);
    expect(viewport.pieces[viewport.pieces.length - 2].toSeconds).toBe(1);
    expect(s.offsets.handles(s)).toEqual([]);
    expect(s.offsets.handles(s)).toBe(s.offsets.handles(s));
    expect(s.offsets.viewport(s)).toBe(s.offsets.viewport(s));
    s.offsetsPointerDown({ x: 300, y: 150, shiftKey: false });
    s.offsetsPointerUp({ x: 400, y: 150, shiftKey: false });
    expect(h.document()).toBe(sampled);
  });
});
