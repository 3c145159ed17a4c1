import { describe, expect, it } from "vitest";
import {
  allowedProjectActions,
  assertInvitationAcceptable,
  assertProjectAccess,
  assertShareLinkAccess,
  assertMayWrite,
  assertNotProjectBound,
  assertSiteAccess,
  roleAllows,
  type ProjectAction,
} from "@/db/access";
import { AppError } from "@/db/errors";

const actions: ProjectAction[] = [
  "project:read",
  "project:rename",
  "project:delete",
  "members:read",
  "members:manage",
  "members:invite",
  "members:audit",
  "share:manage",
  "scenario:read",
  "scenario:write",
];

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

  it("lets editors and owners manage share links, and only owners invite or read the membership history", () => {
    expect(roleAllows("viewer", "share:manage")).toBe(false);
    expect(roleAllows("editor", "share:manage")).toBe(true);
    expect(roleAllows("editor", "members:invite")).toBe(false);
    expect(roleAllows("editor", "members:audit")).toBe(false);
    expect(roleAllows("owner", "members:invite")).toBe(true);
  });
});

describe("the share link holder", () => {
  const now = new Date("2026-12-01T12:00:00Z");
  const live = { expiresAt: new Date("2026-12-02T00:00:00Z"), revokedAt: null };

  it("may read the scenario while the link is live, and nothing else", () => {
    expect(codeOf(() => assertShareLinkAccess(live, "scenario:read", now))).toBeNull();
    expect(codeOf(() => assertShareLinkAccess({ expiresAt: null, revokedAt: null }, "scenario:read", now))).toBeNull();
    for (const action of actions.filter((a) => a !== "scenario:read")) {
      expect(codeOf(() => assertShareLinkAccess(live, action, now)), action).toBe("forbidden");
    }
  });

  it("finds nothing behind an unknown, revoked or expired link", () => {
    expect(codeOf(() => assertShareLinkAccess(undefined, "scenario:read", now))).toBe("not_found");
    expect(codeOf(() => assertShareLinkAccess({ ...live, revokedAt: now }, "scenario:read", now))).toBe("not_found");
    expect(codeOf(() => assertShareLinkAccess({ ...live, expiresAt: now }, "scenario:read", now))).toBe("not_found");
  });
});

describe("an invitation", () => {
  const now = new Date("2026-12-01T12:00:00Z");
  const open = { email: "invitee@example.test", expiresAt: new Date("2026-12-08T12:00:00Z"), revokedAt: null, acceptedAt: null };

  it("may be accepted by the account with its address, in any letter case", () => {
    expect(codeOf(() => assertInvitationAcceptable(open, "Invitee@Example.TEST", now))).toBeNull();
    expect(codeOf(() => assertInvitationAcceptable(open, "someone.else@example.test", now))).toBe("forbidden");
  });

  it("is not found once used, revoked or expired, whoever asks", () => {
    for (const dead of [{ ...open, acceptedAt: now }, { ...open, revokedAt: now }, { ...open, expiresAt: now }, undefined]) {
      expect(codeOf(() => assertInvitationAcceptable(dead, open.email, now))).toBe("not_found");
    }
  });

  it("narrows an account's rights by its API token, never widening them", () => {
    const session = { userId: "u", siteRole: "admin" as const };
    const reading = { ...session, token: { tokenId: "t", scope: "read" as const, projectId: null } };
    const everything = { ...session, token: { tokenId: "t", scope: "read-write" as const, projectId: null } };
    const bound = { ...session, token: { tokenId: "t", scope: "read-write" as const, projectId: "p" } };
    for (const role of ["viewer", "editor", "owner"] as const) {
      expect(allowedProjectActions(role, everything)).toEqual(allowedProjectActions(role));
      const narrowed = allowedProjectActions(role, reading);
      expect(narrowed.every((a) => allowedProjectActions(role).includes(a))).toBe(true);
      expect(narrowed).not.toContain("scenario:write");
      expect(narrowed).toContain("scenario:read");
    }
    expect(codeOf(() => assertMayWrite(reading))).toBe("forbidden");
    expect(codeOf(() => assertMayWrite(everything))).toBeNull();
    expect(codeOf(() => assertNotProjectBound(bound))).toBe("forbidden");
    expect(codeOf(() => assertSiteAccess(session, "users:set-role"))).toBeNull();
    expect(codeOf(() => assertSiteAccess(reading, "users:list"))).toBeNull();
    expect(codeOf(() => assertSiteAccess(reading, "users:set-role"))).toBe("forbidden");
    expect(codeOf(() => assertSiteAccess(bound, "users:list"))).toBe("forbidden");
  });
});
