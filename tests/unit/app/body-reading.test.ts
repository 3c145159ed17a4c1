/**
 * Every request body is read through lib/request-body.ts, which counts bytes as they arrive and stops at the limit.
 * A route (or helper) that calls request.json(), .text(), .formData(), .arrayBuffer(), .blob() or touches .body
 * itself would read a chunked body whole before any limit applies; this test names the file that does.
 */
import { readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";

const root = path.resolve(__dirname, "../../..");
const THE_READER = path.join("lib", "request-body.ts");

function sourcesUnder(dir: string): string[] {
  return readdirSync(path.join(root, dir)).flatMap((name) => {
    const rel = path.join(dir, name);
    if (statSync(path.join(root, rel)).isDirectory()) return sourcesUnder(rel);
    return /\.(ts|tsx)$/.test(name) ? [rel] : [];
  });
}

const directRead = /\b(?:req|request)\s*\.\s*(?:json|text|formData|arrayBuffer|blob|bytes)\s*\(|\b(?:req|request)\s*\.\s*body\b/;

describe("request bodies", () => {
  const files = [...sourcesUnder("app"), ...sourcesUnder("lib"), "proxy.ts"].filter((f) => f !== THE_READER);

  it("finds the route handlers it checks", () => {
    expect(files.filter((f) => f.startsWith(path.join("app", "api")) && f.endsWith("route.ts")).length).toBeGreaterThan(20);
  });

  it("are read only through lib/request-body.ts", () => {
    const offenders = files.filter((f) => directRead.test(readFileSync(path.join(root, f), "utf8")));
    expect(offenders).toEqual([]);
  });

  it("would catch a route that reads its body itself", () => {
    expect(directRead.test("const body = await request.json();")).toBe(true);
    expect(directRead.test("const form = await req.formData()")).toBe(true);
    expect(directRead.test("const reader = req.body.getReader()")).toBe(true);
  });
});
