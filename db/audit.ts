import "server-only";
import type { Kysely } from "kysely";
import { type Actor, requireProjectAction } from "./access";
import type { AuditAction, Database, NewProjectAuditEntry, ProjectRole } from "./schema";
import { person } from "./people";
import type { AuditEntryDto } from "../contracts/dto";

/** How many entries the members page shows, newest first. */
export const AUDIT_PAGE_SIZE = 100;

/** Records a change; call it inside the transaction that makes the change, so both or neither stay. */
export async function recordAudit(db: Kysely<Database>, entry: Omit<NewProjectAuditEntry, "id" | "createdAt">): Promise<void> {
  await db.insertInto("projectAudit").values(entry).execute();
}

export async function listAudit(db: Kysely<Database>, actor: Actor, projectId: string): Promise<AuditEntryDto[]> {
  await requireProjectAction(db, actor, projectId, "members:audit");
  const rows = await db
    .selectFrom("projectAudit as a")
    .leftJoin("users as actor", "actor.id", "a.actorId")
    .leftJoin("users as target", "target.id", "a.targetUserId")
    .leftJoin("scenarios as s", "s.id", "a.scenarioId")
    .select([
      "a.id",
      "a.createdAt",
      "a.action",
      "a.actorId",
      "actor.name as actorName",
      "a.targetUserId",
      "target.name as targetName",
      "a.targetEmail",
      "a.role",
      "a.previousRole",
      "a.scenarioId",
      "s.title as scenarioTitle",
      "a.subject",
    ])
    .where("a.projectId", "=", projectId)
    .orderBy("a.createdAt", "desc")
    .orderBy("a.id", "desc")
    .limit(AUDIT_PAGE_SIZE)
    .execute();
  return rows.map((r) => ({
    id: r.id,
    at: r.createdAt.toISOString(),
    action: r.action,
    actor: person(r.actorId, r.actorName),
    target: r.targetEmail === null ? null : { userId: r.targetUserId, name: r.targetName, email: r.targetEmail },
    role: r.role,
    previousRole: r.previousRole,
    scenario: r.scenarioId && r.scenarioTitle ? { id: r.scenarioId, title: r.scenarioTitle } : null,
    subject: r.subject,
  }));
}
