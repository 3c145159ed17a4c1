import "server-only";
import { type InferResult, type Kysely, sql } from "kysely";
import { type Actor, type ProjectAction, allowedProjectActions, requireProjectAction } from "./access";
import type { Database, ProjectRole } from "./schema";
import type { ProjectDto } from "../contracts/dto";

function projectQuery(db: Kysely<Database>, userId: string) {
  return db
    .selectFrom("projects as p")
    .innerJoin("projectMembers as m", (j) => j.onRef("m.projectId", "=", "p.id").on("m.userId", "=", userId))
    .select([
      "p.id",
      "p.name",
      "p.description",
      "p.createdAt",
      "m.role",
      sql<string>`(select count(*) from scenarios s where s.project_id = p.id)`.as("scenarioCount"),
      sql<Date>`greatest(p.updated_at, coalesce((select max(s.updated_at) from scenarios s where s.project_id = p.id), p.updated_at))`.as(
        "lastChangedAt",
      ),
    ]);
}

type ProjectRow = InferResult<ReturnType<typeof projectQuery>>[number];

function toDto(row: ProjectRow): ProjectDto {
  return {
    id: row.id,
    name: row.name,
    description: row.description,
    role: row.role,
    can: allowedProjectActions(row.role),
    scenarioCount: Number(row.scenarioCount),
    lastChangedAt: new Date(row.lastChangedAt).toISOString(),
    createdAt: row.createdAt.toISOString(),
  };
}

export async function listProjects(db: Kysely<Database>, actor: Actor): Promise<ProjectDto[]> {
  const rows = await projectQuery(db, actor.userId).orderBy("lastChangedAt", "desc").execute();
  return rows.map(toDto);
}

export async function getProject(db: Kysely<Database>, actor: Actor, projectId: string): Promise<ProjectDto> {
  await requireProjectAction(db, actor, projectId, "project:read");
  return toDto(await projectQuery(db, actor.userId).where("p.id", "=", projectId).executeTakeFirstOrThrow());
}

export async function createProject(
  db: Kysely<Database>,
  actor: Actor,
  input: { name: string; description?: string },
): Promise<ProjectDto> {
  const id = await db.transaction().execute(async (trx) => {
    const project = await trx
      .insertInto("projects")
      .values({ name: input.name, description: input.description ?? "", createdBy: actor.userId })
      .returning("id")
      .executeTakeFirstOrThrow();
    await trx.insertInto("projectMembers").values({ projectId: project.id, userId: actor.userId, role: "owner" }).execute();
    return project.id;
  });
  return getProject(db, actor, id);
}

export async function updateProject(
  db: Kysely<Database>,
  actor: Actor,
  projectId: string,
  input: { name?: string; description?: string },
): Promise<ProjectDto> {
  await requireProjectAction(db, actor, projectId, "project:rename");
  await db
    .updateTable("projects")
    .set({ ...input, updatedAt: new Date() })
    .where("id", "=", projectId)
    .execute();
  return getProject(db, actor, projectId);
}

export async function deleteProject(db: Kysely<Database>, actor: Actor, projectId: string): Promise<void> {
  await requireProjectAction(db, actor, projectId, "project:delete");
  await db.deleteFrom("projects").where("id", "=", projectId).execute();
}
