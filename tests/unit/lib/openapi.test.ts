import { readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { openApiDocument } from "@/lib/openapi";

/** Every route handler under app/api, as "method /api/path/{param}", read from the route files themselves. */
const apiRoot = path.resolve(__dirname, "../../../app/api");
function routeOperations(dir = apiRoot): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    if (statSync(full).isDirectory()) return routeOperations(full);
    if (name !== "route.ts") return [];
    const routePath = `/api/${path.relative(apiRoot, dir).split(path.sep).join("/")}`.replace(/\[(\w+)\]/g, "{$1}");
    if (routePath.startsWith("/api/auth/")) return []; // next-auth's own handler
    const methods = [...readFileSync(full, "utf8").matchAll(/export const (GET|POST|PUT|PATCH|DELETE)\b/g)].map((m) => m[1].toLowerCase());
    return methods.map((method) => `${method} ${routePath}`);
  });
}

describe("the OpenAPI document", () => {
  const document = openApiDocument();
  const documented = Object.entries(document.paths ?? {}).flatMap(([p, item]) =>
    Object.keys(item as object).filter((k) => ["get", "post", "put", "patch", "delete"].includes(k)).map((method) => `${method} ${p}`),
  );

  it("is OpenAPI 3.1 with a title and a version", () => {
    expect(document.openapi).toBe("3.1.0");
    expect(document.info.title).toBe("Branchline API");
  });

  it("has an entry for every route handler under app/api, and none for a route that does not exist", () => {
    expect(new Set(documented)).toEqual(new Set(routeOperations()));
  });

  it("describes request bodies with the schemas the routes enforce (fields, limits, enums)", () => {
    const signUp = (document.paths!["/api/users"] as any).post.requestBody.content["application/json"].schema;
    expect(signUp.required).toEqual(["email", "name", "password"]);
    expect(signUp.properties.password.minLength).toBe(10);
    const compute = (document.paths!["/api/compute"] as any).post.requestBody.content["application/json"].schema;
    expect(compute.properties.background.oneOf.map((b: any) => b.properties.kind.enum[0])).toEqual(["minkowski", "schwarzschild", "rindler", "de-sitter"]);
  });

  it("names every path parameter and gives every operation the one error shape", () => {
    for (const [p, item] of Object.entries(document.paths ?? {})) {
      for (const op of Object.values(item as Record<string, any>)) {
        const names = (op.parameters ?? []).filter((x: any) => x.in === "path").map((x: any) => x.name).sort();
        expect(names, p).toEqual([...p.matchAll(/\{(\w+)\}/g)].map((m) => m[1]).sort());
        expect(op.responses["4XX"].content["application/json"].schema.$ref).toBe("#/components/schemas/Error");
      }
    }
  });
});
