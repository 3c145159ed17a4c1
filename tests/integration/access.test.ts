import { beforeAll, describe, expect, it } from "vitest";
import { getDb } from "@/db";
import { requireProjectAction } from "@/db/access";
import { AppError } from "@/db/errors";
import { type ProjectFixture, projectFixture } from "./fixtures";

class RollBack extends Error {}

describe("the access check inside the caller's transaction", () => {
  let f: ProjectFixture;
  beforeAll(async () => {
    f = await projectFixture();
  });
  const editor = () => ({ userId: f.users.editor.id, siteRole: "member" as const });

  it("answers the caller's role, 403 for an action the role lacks and 404 for a stranger", async () => {
    expect(await requireProjectAction(getDb(), editor(), f.projectId, "scenario:write")).toBe("editor");
    await expect(requireProjectAction(getDb(), editor(), f.projectId, "members:manage")).rejects.toMatchObject({ code: "forbidden" });
    await expect(requireProjectAction(getDb(), { userId: f.users.stranger.id, siteRole: "member" }, f.projectId, "project:read")).rejects.toMatchObject({ code: "not_found" });
  });

  it("sees what the transaction it is given has done, and nothing of it once that is rolled back", async () => {
    await expect(
      getDb()
        .transaction()
        .execute(async (trx) => {
          await trx.updateTable("projectMembers").set({ role: "viewer" }).where("projectId", "=", f.projectId).where("userId", "=", f.users.editor.id).execute();
          await expect(requireProjectAction(trx, editor(), f.projectId, "scenario:write")).rejects.toBeInstanceOf(AppError);
          await trx.deleteFrom("projectMembers").where("projectId", "=", f.projectId).where("userId", "=", f.users.editor.id).execute();
          await expect(requireProjectAction(trx, editor(), f.projectId, "project:read")).rejects.toMatchObject({ code: "not_found" });
          throw new RollBack();
        }),
    ).rejects.toBeInstanceOf(RollBack);
    expect(await requireProjectAction(getDb(), editor(), f.projectId, "scenario:write")).toBe("editor");
  });
});
