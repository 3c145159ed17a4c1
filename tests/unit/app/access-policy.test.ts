import { describe, expect, it } from "vitest";
import { allowedProjectActions, assertProjectAccess, assertSiteAccess, roleAllows, type ProjectAction } from "@/db/access";
import { AppError } from "@/db/errors";

const actions: ProjectAction[] = ["project:read", "project:rename", "project:delete", "members:read", "members:manage", "scenario:read", "scenario:write"];

function codeOf(fn: () => void): string | null {
  try {
    fn();
    return null;
  } catch (error) {
    return error instanceof AppError ? error.code : "other";
  }
}

describe("the access policy", () => {
  it("gives each role strictly more than the one below it", () => {
    const viewer = new Set(allowedProjectActions("viewer"));
    const editor = new Set(allowedProjectActions("editor"));
    const owner = new Set(allowedProjectActions("owner"));
    expect([...viewer].every((a) => editor.has(a))).toBe(true);
    expect([...editor].every((a) => owner.has(a))).toBe(true);
    expect(editor.size).toBeGreaterThan(viewer.size);
    expect(owner.size).toBeGreaterThan(editor.size);
  });

  it("lets viewers read but not write, editors write scenarios, and only owners manage the project", () => {
    expect(roleAllows("viewer", "scenario:read")).toBe(true);
    expect(roleAllows("viewer", "scenario:write")).toBe(false);
    expect(roleAllows("editor", "scenario:write")).toBe(true);
    expect(roleAllows("editor", "members:manage")).toBe(false);
    expect(roleAllows("editor", "project:delete")).toBe(false);
    expect(actions.every((a) => roleAllows("owner", a))).toBe(true);
  });

  it("reports a project the caller is not a member of as not found, never as forbidden", () => {
    for (const action of actions) expect(codeOf(() => assertProjectAccess(null, action))).toBe("not_found");
  });

  it("reports a member lacking the permission as forbidden", () => {
    expect(codeOf(() => assertProjectAccess("viewer", "scenario:write"))).toBe("forbidden");
    expect(codeOf(() => assertProjectAccess("editor", "scenario:write"))).toBeNull();
  });

  it("keeps user administration to site administrators", () => {
    expect(codeOf(() => assertSiteAccess(null, "users:list"))).toBe("unauthenticated");
    expect(codeOf(() => assertSiteAccess({ userId: "u", siteRole: "member" }, "users:list"))).toBe("forbidden");
    expect(codeOf(() => assertSiteAccess({ userId: "u", siteRole: "admin" }, "users:set-role"))).toBeNull();
  });
});
