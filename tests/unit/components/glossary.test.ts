/**
 * docs/glossary.md lists every visible term: here, the words of the editor's value lists (components/format/words.ts)
 * and the panel names must each be a term of the glossary (the first column of its tables).
 */
import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { backgroundNames, protocolKindNames, rampShapeNames, roleNames, splitNames } from "@/components/format/words";

const glossary = readFileSync(path.resolve(__dirname, "../../../docs/glossary.md"), "utf8");

/** The glossary's terms: first cells of table rows, lower case; "a / b" rows give each of a and b, "x: a / b" gives a and b. */
function glossaryTerms(text: string): Set<string> {
  const terms = new Set<string>();
  for (const line of text.split("\n")) {
    const cell = /^\| ([^|]+?) \|/.exec(line)?.[1];
    if (!cell || cell === "term" || cell.startsWith("---")) continue;
    const term = cell.toLowerCase();
    terms.add(term);
    for (const part of term.replace(/^[^:]*: /, "").split(" / ")) terms.add(part.trim());
  }
  return terms;
}

/** A word as the glossary lists it: without a parenthesised formula ("cubic (3u² − 2u³)" → "cubic"). */
const bare = (word: string) => word.replace(/\s*\([^)]*\)$/, "").trim().toLowerCase();

const PANEL_NAMES = ["Diagram", "Offsets", "Protocol", "Parameters", "Budget", "Sweep", "Map", "Methods", "History", "Files"];

describe("the glossary", () => {
  const terms = glossaryTerms(glossary);

  it.each([
    ["backgrounds", Object.values(backgroundNames)],
    ["protocol kinds", Object.values(protocolKindNames)],
    ["ramp shapes", Object.values(rampShapeNames)],
    ["splits", Object.values(splitNames)],
    ["roles", Object.values(roleNames)],
    ["panels", PANEL_NAMES],
  ])("lists every one of the editor's words for %s", (_list, words) => {
    const missing = words.filter((word) => !terms.has(word.toLowerCase()) && !terms.has(bare(word)));
    expect(missing).toEqual([]);
  });

  it("says whose each term is: the trade's or ours", () => {
    const rows = glossary.split("\n").filter((line) => /^\| (?!term |---)/.test(line));
    expect(rows.length).toBeGreaterThan(50);
    for (const row of rows) expect(row, row).toMatch(/\| [^|]*\b(trade|ours)\b[^|]*\|\s*$/);
  });
});
