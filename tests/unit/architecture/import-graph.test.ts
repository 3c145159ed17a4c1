/**
 * The arrows between our folders, read from the source itself (docs: ../../../DEVELOPERS.md, "Which way the
 * arrows point"): every import of every module is resolved to the file it names, and a forbidden arrow or a cycle
 * fails with the files that make it. Type-only imports count: a type is a dependency as much as a function is.
 */
import { readFileSync, readdirSync, statSync, existsSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";

const root = path.resolve(__dirname, "../../..");
const folders = ["app", "components", "canvas", "contracts", "physics", "db", "lib", "migrations"] as const;
type Folder = (typeof folders)[number];
const extensions = [".ts", ".tsx", ".mts", ".mjs"];

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    if (statSync(full).isDirectory()) return sourceFiles(full);
    return extensions.some((e) => name.endsWith(e)) && !name.endsWith(".d.ts") ? [full] : [];
  });
}

const importPattern = /(?:^|\n)\s*(?:import|export)\s[^;]*?\sfrom\s+["']([^"']+)["']|(?:^|\n)\s*import\s+["']([^"']+)["']|\bimport\(\s*["']([^"']+)["']\s*\)/g;

function specifiers(text: string): string[] {
  const withoutComments = text.replace(/\/\*[\s\S]*?\*\//g, "").replace(/^\s*\/\/.*$/gm, "");
  return [...withoutComments.matchAll(importPattern)].map((m) => m[1] ?? m[2] ?? m[3]);
}

function resolve(from: string, specifier: string): string | null {
  const base = specifier.startsWith("@/") ? path.join(root, specifier.slice(2)) : specifier.startsWith(".") ? path.resolve(path.dirname(from), specifier) : null;
  if (!base) return null; // a package
  const candidates = [base, ...extensions.map((e) => base + e), ...extensions.map((e) => path.join(base, "index" + e))];
  const found = candidates.find((c) => existsSync(c) && statSync(c).isFile());
  return found ?? null;
}

const folderOf = (file: string): string => path.relative(root, file).split(path.sep)[0];

const graph = new Map<string, string[]>();
for (const folder of folders) {
  for (const file of sourceFiles(path.join(root, folder))) {
    graph.set(
      file,
      specifiers(readFileSync(file, "utf8"))
        .map((s) => resolve(file, s))
        .filter((f): f is string => f !== null),
    );
  }
}

const rel = (file: string) => path.relative(root, file);

/** The folders a folder's modules may import (besides itself and npm packages). */
const allowed: Record<Folder, readonly string[]> = {
  physics: [],
  contracts: ["physics"],
  canvas: ["physics", "contracts"],
  components: ["canvas", "physics", "contracts", "components"],
  db: ["physics", "contracts"],
  lib: ["db", "physics", "contracts", "canvas"],
  app: ["components", "canvas", "physics", "contracts", "db", "lib"],
  migrations: [],
};

describe("the import graph", () => {
  it("finds the modules it checks (the walk itself works)", () => {
    expect(graph.size).toBeGreaterThan(200);
    const editor = graph.get(path.join(root, "canvas/editor.ts"));
    expect(editor?.some((f) => rel(f).startsWith("canvas/store/"))).toBe(true);
  });

  it.each(folders)("%s/ imports only from the folders it may", (folder) => {
    const wrong: string[] = [];
    for (const [file, targets] of graph) {
      if (folderOf(file) !== folder) continue;
      for (const target of targets) {
        const to = folderOf(target);
        if (to !== folder && !allowed[folder].includes(to)) wrong.push(`${rel(file)} -> ${rel(target)}`);
      }
    }
    expect(wrong).toEqual([]);
  });

  it("route handlers (app/api/) take nothing from components/: what they share with the UI lives in contracts/ or canvas/", () => {
    const wrong = [...graph].flatMap(([file, targets]) =>
      rel(file).startsWith(`app${path.sep}api${path.sep}`) ? targets.filter((t) => folderOf(t) === "components").map((t) => `${rel(file)} -> ${rel(t)}`) : [],
    );
    expect(wrong).toEqual([]);
  });

  it("has no cycles between modules", () => {
    // Tarjan's strongly connected components; any component of more than one module is a cycle.
    let index = 0;
    const indices = new Map<string, number>();
    const low = new Map<string, number>();
    const stack: string[] = [];
    const onStack = new Set<string>();
    const cycles: string[][] = [];
    const visit = (v: string) => {
      indices.set(v, index);
      low.set(v, index++);
      stack.push(v);
      onStack.add(v);
      for (const w of graph.get(v) ?? []) {
        if (!graph.has(w)) continue;
        if (!indices.has(w)) {
          visit(w);
          low.set(v, Math.min(low.get(v)!, low.get(w)!));
        } else if (onStack.has(w)) low.set(v, Math.min(low.get(v)!, indices.get(w)!));
      }
      if (low.get(v) === indices.get(v)) {
        const component: string[] = [];
        let w: string;
        do {
          w = stack.pop()!;
          onStack.delete(w);
          component.push(rel(w));
        } while (w !== v);
        if (component.length > 1) cycles.push(component.sort());
      }
    };
    for (const v of graph.keys()) if (!indices.has(v)) visit(v);
    expect(cycles).toEqual([]);
  });
});
