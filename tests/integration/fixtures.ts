import { getDb } from "@/db";
import { addMemberByEmail } from "@/db/members";
import { createProject } from "@/db/projects";
import { createScenario } from "@/db/scenarios";
import { defaultScenarioDocument } from "@/physics/scenario/schema";
import { makeUser, type TestUser } from "./harness";

export type Role = "anonymous" | "stranger" | "viewer" | "editor" | "owner";

export interface ProjectFixture {
  projectId: string;
  scenarioId: string;
  users: Record<Exclude<Role, "anonymous">, TestUser>;
  /** A further editor, the target of member changes, so that no case changes the caller's own membership. */
  extraMember: TestUser;
  /** An account that is not a member, to be added by e-mail. */
  outsider: TestUser;
}

/** A project with a scenario and one member of each role, plus a stranger: all invented test accounts. */
export async function projectFixture(): Promise<ProjectFixture> {
  const db = getDb();
  const [owner, editor, viewer, stranger, extraMember, outsider] = await Promise.all(
    ["owner", "editor", "viewer", "stranger", "extra", "outsider"].map((label) => makeUser(label)),
  );
  const ownerActor = { userId: owner.id, siteRole: "member" as const };
  const project = await createProject(db, ownerActor, { name: "Fixture project" });
  await addMemberByEmail(db, ownerActor, project.id, editor.email, "editor");
  await addMemberByEmail(db, ownerActor, project.id, viewer.email, "viewer");
  await addMemberByEmail(db, ownerActor, project.id, extraMember.email, "editor");
  const scenario = await createScenario(db, ownerActor, project.id, { title: "Fixture scenario", document: defaultScenarioDocument() });
  return { projectId: project.id, scenarioId: scenario.id, users: { owner, editor, viewer, stranger }, extraMember, outsider };
}

export function userFor(f: ProjectFixture, role: Role): TestUser | null {
  return role === "anonymous" ? null : f.users[role];
}
