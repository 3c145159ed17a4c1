import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import Papa from "papaparse";
import { budgetCsv, budgetCsvRows, budgetFlagRows, budgetInputLines, budgetMarginRows, csvField, csvText, csvValue } from "@/canvas/export/budget-csv";
import { embedOptions, embedPath, embedSnippet } from "@/components/export/embed-options";
import { budgetFileName, budgetPictureFileName, diagramFileName, scenarioFileNameFor, sweepFileName } from "@/canvas/export/file-names";
import { computeScenario } from "@/physics/compute";
import { defaultScenarioDocument, parseScenarioDocument, type ScenarioDocument } from "@/physics/scenario/schema";
import { schwarzschildDocument } from "../canvas/harness";

describe("CSV fields (RFC 4180 §2)", () => {
  it("leave plain text alone and quote a field holding a comma, a quote or a line break, doubling its quotes", () => {
    expect(csvField("Decoherence time")).toBe("Decoherence time");
    expect(csvField("a, b")).toBe('"a, b"');
    expect(csvField('the "exact" rate')).toBe('"the ""exact"" rate"');
    expect(csvField("two\nlines")).toBe('"two\nlines"');
  });

  it("end every record with CRLF", () => {
    expect(csvText([["a", "b"], ["1", "x,y"]])).toBe('a,b\r\n1,"x,y"\r\n');
  });

  it("write a value beyond a double from its log10, a zero as 0", () => {
    expect(csvValue({ value: null, log10: 400.5, unit: "1", sourceKey: "combined-channels" })).toBe("3.16227766016838e+400");
    expect(csvValue({ value: null, log10: null, unit: "1", sourceKey: "combined-channels" })).toBe("0");
    expect(csvValue({ value: 1.5e-20, log10: Math.log10(1.5e-20), unit: "1", sourceKey: "combined-channels" })).toBe("1.5e-20");
  });
});

describe("the Budget as CSV", () => {
  const document = schwarzschildDocument();
  const result = computeScenario(document);
  const rows = budgetCsvRows(result);
  const lines = budgetCsv(result, document).split("\r\n");

  it("starts with the scenario's inputs, one '# key: value unit' line each, then the header quantity, value, unit, source", () => {
    const header = lines.indexOf("quantity,value,unit,source");
    expect(header).toBeGreaterThan(5);
    expect(lines.slice(0, header).every((l) => /^# [\w.]+: .+$/.test(l))).toBe(true);
    const background = document.background as { kind: "schwarzschild"; massKg: number };
    expect(lines).toContain(`# background.massKg: ${background.massKg} kg`);
    expect(lines).toContain(`# separation.distanceMetres: ${document.separation.distanceMetres} m`);
    expect(lines).toContain(`# source.chargeCoulombs: ${document.source.chargeCoulombs} C`);
    expect(lines.some((l) => /^# protocol\.hold\.durationSeconds: [\d.e+-]+ s$/.test(l))).toBe(true);
  });

  it("gives back the document it was computed for: the input lines read back into the same scenario", () => {
    const readBack: Record<string, unknown> = {};
    for (const line of budgetInputLines(document)) {
      const [, path, raw] = /^# ([\w.]+): (.*)$/.exec(line)!;
      const value = raw.replace(/ (m s\^-2|s\^-1|m|s|kg|C)$/, "");
      const parsed = value === "null" ? null : value === "true" ? true : value === "false" ? false : Number.isNaN(Number(value)) ? value : Number(value);
      const keys = path.split(".");
      let at = readBack;
      for (const key of keys.slice(0, -1)) at = (at[key] ??= {}) as Record<string, unknown>;
      at[keys[keys.length - 1]] = parsed;
    }
    const parsed = parseScenarioDocument(readBack);
    expect(parsed.ok && parsed.document).toEqual(document);
  });

  it("names a sampled profile by its size instead of listing a million samples", () => {
    const sampled: ScenarioDocument = { ...document, protocol: { kind: "sampled", interpolation: "linear", samples: Array.from({ length: 1000 }, (_, i) => ({ timeSeconds: i * 1e-3, separationMetres: i === 0 || i === 999 ? 0 : 1e-6 })) } };
    const inputs = budgetInputLines(sampled);
    expect(inputs).toContain("# protocol.samples: 1000 samples (timeSeconds s, separationMetres m; listed in the scenario file)");
    expect(inputs.length).toBeLessThan(30);
  });

  it("lists every validity flag once, in its own section after the numbers, and no row repeats them", () => {
    const csv = budgetCsv(result, document);
    const [numbers, flags] = csv.slice(csv.indexOf("quantity,value")).split("\r\n\r\n");
    expect(flags.split("\r\n")[0]).toBe("flag,status,message");
    const flagRows = Papa.parse<string[]>(flags.trim()).data.slice(1);
    expect(flagRows.map((r) => r[0])).toEqual(result.flags.map((f) => f.code));
    expect(new Set(flagRows.map((r) => r[0])).size).toBe(flagRows.length);
    expect(budgetFlagRows(result).map((r) => r[1])).toEqual(result.flags.map((f) => f.status));
    for (const flag of result.flags) expect(numbers).not.toContain(flag.message);
  });

  it("has one row per number of the Budget, each with the value and unit the result carries", () => {
    const total = rows.find((r) => r[0] === "Total quanta <N> (electromagnetic)")!;
    expect(Number(total[1])).toBe(result.electromagnetic.totalQuanta.value);
    expect(total[2]).toBe("1");
    const time = rows.find((r) => r[0] === "Decoherence time (both channels)")!;
    expect(time[2]).toBe("s");
    expect(rows.find((r) => r[0] === "Quanta into the horizon (gravitational)")).toBeDefined();
    // Schwarzschild has an exact electromagnetic hold rate beside the published estimate.
    expect(rows.find((r) => r[0] === "Hold rate, published estimate (electromagnetic)")?.[2]).toBe("s^-1");
    for (const r of rows) expect(r).toHaveLength(4);
  });

  it("leaves out what the background does not have (Minkowski has no horizon)", () => {
    const flat = budgetCsvRows(computeScenario(defaultScenarioDocument()));
    expect(flat.some((r) => r[0].startsWith("Quanta into the horizon"))).toBe(false);
    expect(flat.some((r) => r[0].startsWith("Quanta to null infinity ℐ⁺"))).toBe(true);
  });

  it("names the formula of each number", () => {
    const total = rows.find((r) => r[0] === "Total quanta <N> (electromagnetic)")!;
    expect(total[3]).toContain(`[${result.electromagnetic.totalQuanta.sourceKey}]`);
  });
});

describe("file names", () => {
  it("say the scenario, what the file holds and its type", () => {
    expect(diagramFileName("Slow recombination", { kind: "svg" })).toBe("slow-recombination-diagram.svg");
    expect(diagramFileName("Slow recombination", { kind: "png", pixelRatio: 4 })).toBe("slow-recombination-diagram-4x.png");
    expect(diagramFileName("Slow recombination", { kind: "pdf" })).toBe("slow-recombination-diagram.pdf");
    expect(sweepFileName("Slow recombination", { kind: "png", pixelRatio: 2 })).toBe("slow-recombination-sweep-2x.png");
    expect(budgetPictureFileName("Slow recombination", "svg")).toBe("slow-recombination-budget.svg");
    expect(budgetFileName("Rindler wedge, hold 2 s")).toBe("rindler-wedge-hold-2-s-budget.csv");
    expect(scenarioFileNameFor("Équilibre")).toBe("equilibre.json");
  });
});

describe("embed options", () => {
  it("read theme, large type and scrubbing, ignoring what they do not know", () => {
    expect(embedOptions({ theme: "dark", type: "large", scrub: "1" })).toEqual({ theme: "dark", largeType: true, scrub: true });
    expect(embedOptions({ theme: "purple", type: ["small"], scrub: "0" })).toEqual({ theme: null, largeType: false, scrub: false });
  });

  it("write the embed path and an iframe snippet with the ampersands escaped", () => {
    expect(embedPath("tok_en", { theme: "dark", scrub: true })).toBe("/embed/tok_en?theme=dark&scrub=1");
    const snippet = embedSnippet("https://branchline.example", "tok", { largeType: true, scrub: true });
    expect(snippet).toContain('src="https://branchline.example/embed/tok?type=large&amp;scrub=1"');
    expect(snippet).toMatch(/^<iframe [^>]*><\/iframe>$/);
  });
});

describe("the Budget's CSV with an environment", () => {
  const parsed = parseScenarioDocument(JSON.parse(readFileSync("examples/environment-cryogenic-chip.json", "utf8")));
  if (!parsed.ok) throw new Error("the example does not parse");
  const document = parsed.document;
  const result = computeScenario(document);

  it("lists each environmental channel's ⟨N⟩, every channel's share (the dominant one named) and the whole budget's total", () => {
    const rows = budgetCsvRows(result);
    const gas = rows.find((r) => r[0] === "Quanta <N> (residual gas)")!;
    expect(Number(gas[1])).toBe(result.environment!.channels.find((c) => c.channel === "gas")!.totalQuanta.value);
    const shares = rows.filter((r) => r[0].startsWith("Share of the total"));
    expect(shares.reduce((sum, r) => sum + Number(r[1]), 0)).toBeCloseTo(1, 9);
    expect(shares.filter((r) => r[0].endsWith(", dominant)"))).toHaveLength(1);
    const total = rows.find((r) => r[0] === "Total quanta <N> (every channel)")!;
    expect(Number(total[1])).toBe(result.environment!.total.totalQuanta.value);
  });

  it("gives the inputs with their units and a margins part, one row per environmental channel", () => {
    const lines = budgetCsv(result, document).split("\r\n");
    expect(lines).toContain("# environment.gas.pressurePascals: 1e-10 Pa");
    expect(lines).toContain("# environment.surface.resistivityOhmMetres: 2.2e-8 ohm m");
    const header = lines.indexOf("channel,parameter,now,unit,equals the field channels at,outcome");
    expect(header).toBeGreaterThan(lines.indexOf("quantity,value,unit,source"));
    expect(lines.slice(header + 1, header + 1 + result.environment!.margins.length).map((l) => l.split(",")[0])).toEqual(budgetMarginRows(result).map((r) => r[0]));
    expect(budgetMarginRows(result).find((r) => r[0] === "thermal scattering")!.slice(0, 4)).toEqual(["thermal scattering", "surroundings temperature", "4", "K"]);
  });
});
