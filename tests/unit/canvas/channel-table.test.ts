import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { channelTable, shareText } from "@/canvas/kernels/budget/channel-table";
import { computeScenario } from "@/physics/compute";
import { defaultScenarioDocument, parseScenarioDocument, type ScenarioDocument } from "@/physics/scenario/schema";
import { schwarzschildDocument } from "./harness";

function exampleDocument(name: string): ScenarioDocument {
  const parsed = parseScenarioDocument(JSON.parse(readFileSync(`examples/${name}`, "utf8")));
  if (!parsed.ok) throw new Error(parsed.issues.map((i) => i.message).join("; "));
  return parsed.document;
}

const log10Of = (q: { log10: number | null }) => q.log10 ?? -Infinity;

// Independent environments: the overlaps multiply, so the counts ⟨N⟩ add (linearity of the expectation value on a
// product state; from memory, the rule physics/environment/from-document.ts states for the total).
describe("the Budget's channel table", () => {
  it("lists the field rows and every environmental channel, whose counts add up to the whole budget's total", () => {
    const result = computeScenario(exampleDocument("environment-cryogenic-chip.json"));
    const table = channelTable(result);
    expect(table.rows.map((r) => r.key)).toEqual(["far-field", "gas", "thermal-scattering", "thermal-absorption", "thermal-emission", "surface"]);
    const summed = table.rows.reduce((sum, r) => sum + 10 ** log10Of(r.quanta), 0);
    expect(Math.abs(summed / 10 ** log10Of(table.total) - 1)).toBeLessThan(1e-9);
    expect(table.rows.reduce((sum, r) => sum + (r.share ?? 0), 0)).toBeCloseTo(1, 9);
    expect(table.hasEnvironment).toBe(true);
  });

  it("marks exactly one dominant row, the largest ⟨N⟩, and names it in words as the physics does", () => {
    const result = computeScenario(exampleDocument("environment-cryogenic-chip.json"));
    const table = channelTable(result);
    const dominant = table.rows.filter((r) => r.dominant);
    expect(dominant).toHaveLength(1);
    expect(Math.max(...table.rows.map((r) => log10Of(r.quanta)))).toBe(log10Of(dominant[0].quanta));
    expect(dominant[0].key).toBe(result.environment!.dominantChannel);
    expect(table.dominantWords).toBe(dominant[0].words);
  });

  it("gives one margin per environmental channel, with the parameter in words and its unit", () => {
    const table = channelTable(computeScenario(exampleDocument("environment-cryogenic-chip.json")));
    expect(table.margins.map((m) => [m.channel, m.parameterWords, m.current.unit])).toEqual([
      ["gas", "gas pressure", "Pa"],
      ["thermal-scattering", "surroundings temperature", "K"],
      ["thermal-absorption", "surroundings temperature", "K"],
      ["thermal-emission", "internal temperature", "K"],
      ["surface", "surface distance", "m"],
    ]);
    for (const m of table.margins) if (m.outcome.kind === "crossing") expect(m.outcome.value.unit).toBe(m.current.unit);
  });

  it("splits a black hole's field count into the ramps (to ℐ⁺) and the horizon, adding up to the fields' total", () => {
    const result = computeScenario(schwarzschildDocument());
    const table = channelTable(result);
    expect(table.rows.map((r) => r.key)).toEqual(["far-field", "horizon"]);
    expect(table.rows.map((r) => r.words)).toContain("Into the horizon");
    const summed = table.rows.reduce((sum, r) => sum + 10 ** log10Of(r.quanta), 0);
    expect(Math.abs(summed / 10 ** log10Of(result.combined.totalQuanta) - 1)).toBeLessThan(1e-9);
    expect(table.hasEnvironment).toBe(false);
    expect(table.margins).toEqual([]);
  });

  it("counts the Rindler wedge's quanta once, split into ramp- and hold-driven", () => {
    const table = channelTable(computeScenario(exampleDocument("rindler.json")));
    expect(table.rows.map((r) => r.key)).toEqual(["fields-ramps", "fields-hold"]);
  });

  it("marks nothing dominant when every count is exactly zero", () => {
    const document = defaultScenarioDocument();
    const table = channelTable(computeScenario({ ...document, source: { ...document.source, chargeCoulombs: 0, massKg: 0 } }));
    expect(table.dominantWords).toBeNull();
    expect(table.rows.every((r) => !r.dominant && r.share === null)).toBe(true);
  });
});

describe("a share as the table prints it", () => {
  it.each([
    [0.63, "63 %"],
    [0.0512, "5.1 %"],
    [1, "100 %"],
    [0.99995, "> 99.9 %"],
    [1e-7, "< 0.1 %"],
    [0, "0 %"],
    [null, "0 %"],
  ] as const)("prints %s as %s", (share, text) => {
    expect(shareText(share)).toBe(text);
  });
});
