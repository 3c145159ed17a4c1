import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { renderMathMarkdown } from "@/components/methods/MathMarkdown";
import { sources } from "@/physics";

describe("the environment's Methods page and entries", () => {
  it("renders every formula of docs/methods/environment.md with KaTeX, without a parse error", () => {
    const source = readFileSync(path.join(process.cwd(), "docs/methods/environment.md"), "utf8");
    const html = renderMathMarkdown(source);
    expect(html).toContain("katex");
    expect(html).not.toContain("katex-error");
  });

  it("has a Methods entry, with a formula that KaTeX parses, for every environmental source key", () => {
    const keys = Object.keys(sources).filter((k) => k.startsWith("environment-"));
    expect(keys).toHaveLength(7);
    for (const key of keys) {
      const entry = sources[key as keyof typeof sources];
      expect(renderMathMarkdown(`$$${entry.formula}$$`)).not.toContain("katex-error");
      expect(entry.citation.length).toBeGreaterThan(20);
    }
  });
});
