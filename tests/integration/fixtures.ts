import { getDb } from "@/db";
import { createApiToken } from "@/db/api-tokens";
import { uploadAttachment } from "@/db/attachments";
import { createInvitation } from "@/db/invitations";
import { createParameterMap } from "@/db/parameter-maps";
import { enqueueMapRows } from "@/lib/map-queue";
import { addMemberByEmail } from "@/db/members";
import { createProject } from "@/db/projects";
import { createScenario } from "@/db/scenarios";
import { createShareLink, revokeShareLink } from "@/db/share-links";
import { objectStore } from "@/lib/storage";
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

export interface TeamExtras {
  /** An open invitation to the fixture's stranger, as viewer, and the token its e-mail would carry. */
  invitationId: string;
  invitationToken: string;
  /** A live share link of the fixture's scenario, and one that has been revoked. */
  linkId: string;
  linkToken: string;
  revokedLinkToken: string;
  /** A small CSV kept with the fixture's scenario, in the fake S3 store (made by teamExtras). */
  attachmentId?: string;
  /** A personal API token of the fixture's owner (made by teamExtras). */
  ownerTokenId?: string;
  /** A queued 2 × 2 parameter map of the fixture's scenario, and one of an unsaved document, both by the owner. */
  scenarioMapId?: string;
  ownMapId?: string;
}

/** An invitation and share links in a fixture project, made by its owner through the data access layer. */
export async function teamExtras(f: ProjectFixture): Promise<TeamExtras> {
  const db = getDb();
  const owner = { userId: f.users.owner.id, siteRole: "member" as const };
  let invitationToken = "";
  const invitation = await createInvitation(db, owner, f.projectId, { email: f.users.stranger.email, role: "viewer" }, async (letter) => {
    invitationToken = letter.token;
  });
  const live = await createShareLink(db, owner, f.projectId, f.scenarioId, { label: "for the referee" });
  const revoked = await createShareLink(db, owner, f.projectId, f.scenarioId, { label: "an old link" });
  await revokeShareLink(db, owner, f.projectId, f.scenarioId, revoked.link.id);
  const attachment = await uploadAttachment(db, objectStore(), owner, f.projectId, f.scenarioId, {
    fileName: "fixture-run.csv",
    mediaType: "text/csv",
    bytes: new TextEncoder().encode("t [ms],separation [um]\n0,0\n5,2\n10,0\n"),
  });
  const ownerToken = await createApiToken(db, owner, { name: "fixture notebook", scope: "read", expiresInDays: 30 });
  const maps = await fixtureMaps(f);
  return {
    ...maps,
    ownerTokenId: ownerToken.apiToken.id,
    invitationId: invitation.id,
    invitationToken,
    linkId: live.link.id,
    linkToken: live.token,
    revokedLinkToken: revoked.token,
    attachmentId: attachment.id,
  };
}

/** A small map request, cheap for a worker (2 × 2 points), that the default document can make. */
export const smallMapRequest = () => ({
  x: { parameter: "recombination-time" as const, from: 1e-3, to: 1e-2, points: 2, scale: "log" as const },
  y: { parameter: "hold-time" as const, from: 1e-2, to: 1e-1, points: 2, scale: "linear" as const },
  quantity: "total-quanta" as const,
});

async function fixtureMaps(f: ProjectFixture): Promise<{ scenarioMapId: string; ownMapId: string }> {
  const owner = { userId: f.users.owner.id, siteRole: "member" as const };
  const ofScenario = await createParameterMap(getDb(), owner, { scenario: { projectId: f.projectId, scenarioId: f.scenarioId }, request: smallMapRequest() }, enqueueMapRows);
  const own = await createParameterMap(getDb(), owner, { document: defaultScenarioDocument(), request: smallMapRequest() }, enqueueMapRows);
  return { scenarioMapId: ofScenario.id, ownMapId: own.id };
}
