import { sql } from "kysely";
import { describe, expect, it } from "vitest";
import { getDb } from "@/db";
import { migrations } from "@/migrations";
import { readdirSync } from "node:fs";
import path from "node:path";

describe("migrations", () => {
  it("lists every migration file in the folder, in date order", () => {
    const files = readdirSync(path.resolve(__dirname, "../../migrations"))
      .filter((f) => /^\d{4}_\d{2}_\d{2}_\d{6}_.+\.ts$/.test(f))
      .map((f) => f.replace(/\.ts$/, ""))
      .sort();
    expect(Object.keys(migrations)).toEqual(files);
  });

  it("has applied every migration to the fresh test database", async () => {
    const { rows } = await sql<{ name: string }>`select name from kysely_migration order by name`.execute(getDb());
    expect(rows.map((r) => r.name)).toEqual(Object.keys(migrations));
  });

  it("keeps e-mail addresses unique regardless of case", async () => {
    const db = getDb();
    await db.insertInto("users").values({ email: "case.test@example.test", name: "Case Test" }).execute();
    await expect(sql`insert into users (email, name) values ('Case.Test@example.test', 'Upper')`.execute(db)).rejects.toThrow();
  });
});
