import { describe, expect, it } from "vitest";
import { parseScenarioFile, parseScenarioFileText, scenarioFileName, scenarioFileText, toScenarioFile } from "@/physics/scenario/exchange";
import { defaultScenarioDocument } from "@/physics/scenario/schema";

describe("scenario file", () => {
  it("round-trips a scenario through its text exactly", () => {
    const document = defaultScenarioDocument();
    const file = toScenarioFile({ title: "Drop-tower pair", document }, new Date("2026-12-02T10:00:00Z"));
    const back = parseScenarioFileText(scenarioFileText(file));
    expect(back).toEqual({ ok: true, title: "Drop-tower pair", description: undefined, document });
    expect(file.exportedAt).toBe("2026-12-02T10:00:00.000Z");
  });

  it("lists every problem with its path in the file", () => {
    const document = { ...defaultScenarioDocument(), protocol: { kind: "segments" } };
    const parsed = parseScenarioFile({ format: "something-else", formatVersion: 1, title: "", document });
    expect(parsed.ok).toBe(false);
    if (parsed.ok) return;
    const paths = parsed.issues.map((i) => i.path);
    expect(paths).toContain("format");
    expect(paths).toContain("title");
    expect(paths.some((p) => p.startsWith("document.protocol"))).toBe(true);
  });

  it("says what is wrong with text that is not a scenario file", () => {
    expect(parseScenarioFileText("")).toEqual({ ok: false, issues: [{ path: "", message: "the file is empty" }] });
    const broken = parseScenarioFileText("{ \"format\": ");
    expect(broken.ok).toBe(false);
    if (!broken.ok) expect(broken.issues[0].message).toMatch(/not valid JSON/);
    expect(parseScenarioFile([])).toMatchObject({ ok: false, issues: [{ message: "a scenario file must be a JSON object" }] });
    const noDocument = parseScenarioFile({ format: "branchline-scenario", formatVersion: 1, title: "x" });
    expect(noDocument).toMatchObject({ ok: false, issues: [{ path: "document" }] });
    const newer = parseScenarioFile({ format: "branchline-scenario", formatVersion: 99, title: "x", document: defaultScenarioDocument() });
    expect(newer).toMatchObject({ ok: false, issues: [{ path: "formatVersion", message: expect.stringMatching(/newer/) }] });
  });

  it("names files by title", () => {
    expect(scenarioFileName("Rindler lab, 9.81 m/s² — slow", "json")).toBe("rindler-lab-9-81-m-s2-slow.json");
    expect(scenarioFileName("∅", "svg")).toBe("scenario.svg");
  });
});
