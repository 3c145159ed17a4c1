/**
 * Hostile input on every route: no answer is a 5xx. The route list is the authorization table's (every route and
 * method it covers, so a new route is fuzzed as soon as it gets its row there), called for real on the real
 * PostgreSQL and the fake S3 store. Each run takes a row's valid request and breaks one thing: a leaf of its JSON
 * body (or the whole body, or one of its keys), one path parameter, or one query value, with NUL characters, lone
 * surrogates, 1e-300, 1e300, "NaN" and friends, huge strings, deep nesting and wrong types. fast-check (numRuns
 * kept small and a fixed seed, so the run is short and repeatable; FUZZ_RUNS raises it locally).
 */
import fc from "fast-check";
import { beforeAll, describe, expect, it } from "vitest";
import { coreCases } from "./authorization-cases/core";
import { mapCases } from "./authorization-cases/maps";
import { outputCases } from "./authorization-cases/outputs";
import type { Case } from "./authorization-cases/shared";
import { tokenCases } from "./authorization-cases/tokens";
import { uploadCases } from "./authorization-cases/uploads";
import { projectFixture, teamExtras, type ProjectFixture, type TeamExtras } from "./fixtures";
import { call, type TestUser } from "./harness";

const cases: Case[] = [...coreCases, ...outputCases, ...uploadCases, ...tokenCases, ...mapCases];
const RUNS = Number(process.env.FUZZ_RUNS ?? 6);

const evilText = fc.constantFrom(
  "\u0000",
  "a\u0000b",
  "\ud800",
  "x\udc00y",
  "\udfff\ud800",
  "%ff",
  "%00",
  "NaN",
  "-NaN",
  "Infinity",
  "1e300",
  "1e-300",
  "-0",
  "",
  " ",
  "../../etc/passwd",
  "'; drop table users; --",
  "🙂".repeat(3),
  "x".repeat(300_000),
);
const evilNumber = fc.constantFrom(1e-300, -1e-300, 1e300, -1e300, 5e-324, 0, -0, -1, 2 ** 53 + 1, 1.5, Number.MAX_VALUE);
const evilLeaf: fc.Arbitrary<unknown> = fc.oneof(
  evilText,
  evilNumber,
  fc.constantFrom(null, true, false, [], {}, [null], { "\u0000": 1 }, { __proto__: { polluted: true } }),
  fc.jsonValue({ maxDepth: 3 }),
);

/** A JSON text nested `depth` deep (arrays or objects), written directly: deeper than JSON.stringify would go. */
const deepJson = fc.record({ depth: fc.constantFrom(1_000, 100_000), kind: fc.constantFrom("array", "object") }).map(({ depth, kind }) =>
  kind === "array" ? "[".repeat(depth) + "]".repeat(depth) : '{"a":'.repeat(depth) + "1" + "}".repeat(depth),
);

type Path = (string | number)[];

/** A value as a path segment; a lone surrogate has no UTF-8, so it goes as the bytes a client would send. */
function inPath(value: string): string {
  try {
    return encodeURIComponent(value);
  } catch {
    return "%ED%A0%80";
  }
}

function leafPaths(value: unknown, at: Path = []): Path[] {
  if (Array.isArray(value)) return [at, ...value.flatMap((v, i) => leafPaths(v, [...at, i]))];
  if (value && typeof value === "object") return [at, ...Object.entries(value).flatMap(([k, v]) => leafPaths(v, [...at, k]))];
  return [at];
}

function replaced(value: unknown, path: Path, by: unknown): unknown {
  if (path.length === 0) return by;
  const copy: any = Array.isArray(value) ? [...value] : { ...(value as object) };
  copy[path[0]] = replaced(copy[path[0]], path.slice(1), by);
  return copy;
}

type Mutation =
  | { kind: "leaf"; pick: number; by: unknown }
  | { kind: "key"; pick: number; key: string }
  | { kind: "raw"; text: string }
  | { kind: "param"; pick: number; by: string }
  | { kind: "query"; pick: number; by: string };

const mutation: fc.Arbitrary<Mutation> = fc.oneof(
  { weight: 4, arbitrary: fc.record({ kind: fc.constant("leaf" as const), pick: fc.nat(), by: evilLeaf }) },
  { weight: 1, arbitrary: fc.record({ kind: fc.constant("key" as const), pick: fc.nat(), key: evilText }) },
  { weight: 1, arbitrary: fc.record({ kind: fc.constant("raw" as const), text: fc.oneof(deepJson, fc.constantFrom("{", '"\\ud800"', '{"a":"\\u0000"}', "NaN", "\u0000", "1e999")) }) },
  { weight: 3, arbitrary: fc.record({ kind: fc.constant("param" as const), pick: fc.nat(), by: evilText }) },
  { weight: 1, arbitrary: fc.record({ kind: fc.constant("query" as const), pick: fc.nat(), by: evilText }) },
);

const pickOf = (m: Mutation) => ("pick" in m ? m.pick : 0);

let f: ProjectFixture;
let x: TeamExtras;
beforeAll(async () => {
  f = await projectFixture();
  x = await teamExtras(f);
}, 60_000);

describe("fuzz: hostile input never answers 5xx", () => {
  it("covers routes with bodies and with path parameters", () => {
    expect(cases.filter((c) => c.body).length).toBeGreaterThan(10);
    expect(cases.filter((c) => c.params).length).toBeGreaterThan(20);
  });

  for (const c of cases) {
    const hasBody = c.body !== undefined;
    it(`${c.method} ${c.file}`, async () => {
      const mod = await import(/* @vite-ignore */ `../../app/api/${c.file}`);
      // The owner reaches the deepest validation; a destructive row is only ever called with a broken parameter.
      const as: TestUser = f.users.owner;
      const destructive = c.method === "DELETE" || !hasBody;
      await fc.assert(
        fc.asyncProperty(mutation, async (m) => {
          const params = c.params?.(f, x, "owner") ?? {};
          const query = c.query?.(f) ?? {};
          const paramKeys = Object.keys(params);
          const queryKeys = Object.keys(query);
          let body: unknown = c.body?.(f);
          let rawBody: string | undefined;
          let path = c.path(f, x, "owner");
          const kind = destructive && paramKeys.length > 0 && (m.kind === "leaf" || m.kind === "key" || m.kind === "raw") ? "param" : m.kind;
          if (kind === "leaf" && hasBody) {
            const paths = leafPaths(body);
            body = replaced(body, paths[pickOf(m) % paths.length], (m as { by: unknown }).by);
          } else if (kind === "key" && hasBody && body && typeof body === "object") {
            const paths = leafPaths(body).filter((p) => {
              const v = p.reduce<any>((o, k) => o?.[k], body);
              return v && typeof v === "object" && !Array.isArray(v);
            });
            const target = paths[pickOf(m) % paths.length];
            const holder = target.reduce<any>((o, k) => o?.[k], body);
            body = replaced(body, target, { ...holder, [(m as { key: string }).key]: 1 });
          } else if (kind === "raw" && hasBody) {
            rawBody = (m as { text: string }).text;
            body = undefined;
          } else if ((kind === "param" || destructive) && paramKeys.length > 0) {
            const key = paramKeys[pickOf(m) % paramKeys.length];
            const by = "by" in m && typeof m.by === "string" ? m.by : "%ff";
            path = path.replace(encodeURIComponent(params[key]), inPath(by));
            params[key] = by;
          } else if (queryKeys.length > 0) {
            query[queryKeys[pickOf(m) % queryKeys.length]] = "by" in m && typeof m.by === "string" ? m.by : "\u0000";
          } else if (hasBody) {
            rawBody = '{"a":"\\u0000"}';
            body = undefined;
          } else {
            return; // A route without body, parameters or query has nothing to break.
          }
          const res = await call(mod[c.method], c.method, path, {
            as,
            params,
            query,
            ...(rawBody !== undefined ? { rawBody, headers: { "content-type": "application/json" } } : { body }),
          });
          expect(res.status, `${c.method} ${path} ${JSON.stringify(m).slice(0, 300)} → ${JSON.stringify(res.body).slice(0, 300)}`).toBeLessThan(500);
          if (res.status >= 400) expect(res.body?.error?.message, JSON.stringify(res.body).slice(0, 300)).toEqual(expect.any(String));
        }),
        { numRuns: RUNS, seed: 13_2026, endOnFailure: true },
      );
    }, 120_000);
  }
});
