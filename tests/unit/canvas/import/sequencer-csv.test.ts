/**
 * Unit conversions below are the SI prefixes (BIPM, The International System of Units, 9th edition (2019),
 * Table 7: milli 10⁻³, micro 10⁻⁶, nano 10⁻⁹). Row numbers are those a spreadsheet shows (header = row 1).
 */
import { describe, expect, it } from "vitest";
import { parseSequencerCsv, SEQUENCER_CSV_LIMITS, toSampledProtocol } from "@/canvas/import/sequencer-csv";
import { withSampledProtocol } from "@/canvas/kernels/document-edits";
import { separationHistory } from "@/physics/protocols";
import { defaultScenarioDocument, parseScenarioDocument } from "@/physics/scenario/schema";
import { createEditorStore } from "@/canvas/store/createEditorStore";

const ramp = ["t [ms], separation [um]", "0, 0", "10, 1.5", "20, 3", "30, 1.5", "40, 0"].join("\n");

function ok(text: string, options = {}) {
  const result = parseSequencerCsv(text, options);
  if (!result.ok) throw new Error(`expected a profile, got ${JSON.stringify(result.problems)}`);
  return result;
}

function failed(text: string, options = {}) {
  const result = parseSequencerCsv(text, options);
  if (result.ok) throw new Error("expected problems, got a profile");
  return result;
}

describe("sequencer CSV", () => {
  it("reads units from the header and answers SI seconds and metres", () => {
    const profile = ok(ramp);
    expect(profile.samples).toHaveLength(5);
    expect(profile.samples[1].timeSeconds).toBeCloseTo(10e-3, 15);
    expect(profile.samples[2].separationMetres).toBeCloseTo(3e-6, 18);
    expect(profile.durationSeconds).toBeCloseTo(40e-3, 15);
    expect(profile.maxSeparationMetres).toBeCloseTo(3e-6, 18);
    expect(profile.time).toEqual({ header: "t [ms]", unit: "ms", unitSource: "header" });
    expect(profile.flags).toEqual([]);
  });

  it("reads the other header spellings: parentheses, a slash, and Greek Δx", () => {
    const profile = ok("time (s),Δx / nm\n0,0\n0.5,250\n1,0\n");
    expect(profile.samples[1]).toEqual({ timeSeconds: 0.5, separationMetres: expect.closeTo(250e-9, 20) });
    expect(profile.separation.header).toBe("Δx / nm");
  });

  it("lets a chosen unit stand in for a header without units, and override one that has them", () => {
    const bare = failed("time,separation\n0,0\n2,4\n4,0");
    expect(bare.missingUnits).toEqual(["time", "separation"]);
    expect(bare.problems[0]).toEqual({ row: 1, message: expect.stringContaining("has no unit") });

    const chosen = ok("time,separation\n0,0\n2,4\n4,0", { timeUnit: "ms", separationUnit: "mm" });
    expect(chosen.samples[1].timeSeconds).toBeCloseTo(2e-3, 15);
    expect(chosen.samples[1].separationMetres).toBeCloseTo(4e-3, 15);
    expect(chosen.time.unitSource).toBe("chosen");

    const overridden = ok(ramp, { timeUnit: "s" });
    expect(overridden.samples[1].timeSeconds).toBe(10);
  });

  it("reads a file without a header when both units are chosen", () => {
    const profile = ok("0,0\n1,2\n2,0\n", { timeUnit: "us", separationUnit: "nm" });
    expect(profile.samples[1].timeSeconds).toBeCloseTo(1e-6, 18);
    expect(profile.time.header).toBeNull();
    expect(failed("0,0\n1,2\n2,0\n").missingUnits).toEqual(["time", "separation"]);
  });

  it("reports a bad row by the number a spreadsheet shows", () => {
    const text = ["t [ms],separation [um]", "0,0", "1,1", "2,2", "3,3", "4,2", "5,abc", "6,0"].join("\n");
    const result = failed(text);
    expect(result.problems).toEqual([{ row: 7, message: "row 7: separation 'abc' is not a number" }]);
  });

  it("counts blank lines as rows, as a spreadsheet does", () => {
    const result = failed("t [s],d [m]\n0,0\n\n1,x\n2,0");
    expect(result.problems[0].row).toBe(4);
  });

  it("lists every bad row, not just the first", () => {
    const result = failed("t [s],d [m]\n0,0\nq,1\n2,\n3,0");
    expect(result.problems.map((p) => p.message)).toEqual(["row 3: time 'q' is not a number", "row 4: separation is missing"]);
  });

  it("says so for an empty file and for a header alone", () => {
    expect(failed("").problems).toEqual([{ row: null, message: "the file is empty" }]);
    expect(failed("  \n\n").problems[0].message).toBe("the file is empty");
    expect(failed("t [ms],separation [um]\n").problems).toEqual([{ row: null, message: "the file has a header but no rows of samples" }]);
    expect(failed("t [ms],separation [um]\n0,0\n").problems[0].message).toMatch(/at least 2 rows/);
  });

  it("refuses time that does not increase strictly, naming both rows", () => {
    const result = failed("t [ms],separation [um]\n0,0\n5,1\n3,2\n3,0");
    expect(result.problems.map((p) => p.row)).toEqual([4, 5]);
    expect(result.problems[0].message).toBe("row 4: time 3 ms is not after row 3's; times must increase strictly");
  });

  it("refuses a negative separation", () => {
    const result = failed("t [ms],separation [um]\n0,0\n1,-2\n2,0");
    expect(result.problems).toEqual([{ row: 3, message: "row 3: separation -2 um is negative; a separation is 0 or more" }]);
  });

  it("flags a profile that starts or ends apart, and still answers it", () => {
    const profile = ok("t [ms],separation [um]\n0,1\n1,2\n2,1");
    expect(profile.flags.map((f) => f.code)).toEqual(["starts-apart", "ends-apart"]);
    expect(profile.flags[0].message).toMatch(/1\.00 µm/);
  });

  it("refuses more rows than the limit", () => {
    const rows = Array.from({ length: SEQUENCER_CSV_LIMITS.maxRows + 1 }, (_, i) => `${i},0`);
    const result = failed(`t [us],separation [nm]\n${rows.join("\n")}`);
    expect(result.problems).toEqual([{ row: null, message: "the file has 200,001 rows of samples; the limit is 200,000" }]);
  });

  it("ignores a byte-order mark and reads semicolons with decimal commas", () => {
    const profile = ok("\uFEFFt [ms];separation [um]\r\n0;0\r\n1,5;2,25\r\n3;0\r\n");
    expect(profile.delimiter).toBe(";");
    expect(profile.time.header).toBe("t [ms]");
    expect(profile.samples[1].timeSeconds).toBeCloseTo(1.5e-3, 15);
    expect(profile.samples[1].separationMetres).toBeCloseTo(2.25e-6, 18);
  });

  it("finds the columns by name when there are more than two", () => {
    const profile = ok("step,separation [um],t [s],note\n1,0,0,start\n2,2,1,hold\n3,0,2,end");
    expect(profile.samples.map((s) => s.timeSeconds)).toEqual([0, 1, 2]);
    expect(profile.samples[1].separationMetres).toBeCloseTo(2e-6, 18);
  });

  it("refuses a unit of the wrong dimension in the header", () => {
    const result = failed("t [kg],separation [um]\n0,0\n1,0");
    expect(result.problems[0].message).toBe("the time column 't [kg]': 'kg' is not a unit of time");
    expect(result.missingUnits).toEqual(["time"]);
  });

  it("becomes a sampled protocol that the document schema and the physics read", () => {
    const protocol = toSampledProtocol(ok(ramp).samples);
    const document = withSampledProtocol(defaultScenarioDocument(), protocol);
    const parsed = parseScenarioDocument(JSON.parse(JSON.stringify(document)));
    expect(parsed.ok).toBe(true);
    expect(document.separation.distanceMetres).toBeCloseTo(3e-6, 18);
    const history = separationHistory(document);
    expect(history.totalDurationSeconds).toBeCloseTo(40e-3, 15);
    expect(history.peakSeparationMetres).toBeCloseTo(3e-6, 18);
  });

  it("is one undo step when the editor applies it", () => {
    const store = createEditorStore({ document: defaultScenarioDocument(), version: 1, readOnly: false });
    const before = store.getState().document;
    const protocol = toSampledProtocol(ok(ramp).samples);
    const result = store.getState().edit("Use a sequencer profile", (document) => withSampledProtocol(document, protocol));
    expect(result.ok).toBe(true);
    expect(store.getState().document.protocol).toEqual(protocol);
    store.getState().undo();
    expect(store.getState().document).toEqual(before);
  });
});
