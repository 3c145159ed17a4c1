/** Authorization rows for parameter maps: starting one, following it, cancelling it, a scenario's list. */
import { defaultScenarioDocument } from "@/physics/scenario/schema";
import { smallMapRequest } from "../fixtures";
import { type Case, holderToo, readers, S, signedIn, writers } from "./shared";

const mapPath = (id: string | undefined) => `/api/maps/${id}`;
/** Only its creator (the owner) sees a map of an unsaved document; to everyone else it does not exist. */
/*
 * API tokens (rule in tokens.ts): a saved scenario's map lives in the fixture's project, so a token restricted to
 * another project is a stranger to it (404) although the route's path names no project. A map of the caller's own
 * unsaved document touches no project: a read-only token may start, follow and cancel it, as it may compute or
 * sweep a document.
 */
const projectBound = { tokens: { elsewhereToken: 404 } };
const ownDocument = { tokens: { readToken: 202 } };
const creatorOnly = (status: number) => ({ anonymous: 401, stranger: 404, viewer: 404, editor: 404, owner: status });

export const mapCases: Case[] = [
  {
    file: "maps/route.ts",
    method: "POST",
    path: () => "/api/maps",
    body: (f) => ({ scenario: { projectId: f.projectId, scenarioId: f.scenarioId }, ...smallMapRequest() }),
    expected: holderToo(writers(202)),
    ...projectBound,
  },
  { file: "maps/route.ts", method: "POST", path: () => "/api/maps", body: () => ({ document: defaultScenarioDocument(), ...smallMapRequest() }), expected: signedIn(202), ...ownDocument },
  { file: "maps/[mapId]/route.ts", method: "GET", extras: true, path: (_f, x) => mapPath(x.scenarioMapId), params: (_f, x) => ({ mapId: x.scenarioMapId! }), expected: holderToo(readers(200)), ...projectBound },
  { file: "maps/[mapId]/route.ts", method: "GET", extras: true, path: (_f, x) => mapPath(x.ownMapId), params: (_f, x) => ({ mapId: x.ownMapId! }), expected: creatorOnly(200), tokens: { readToken: 200 } },
  { file: "maps/[mapId]/route.ts", method: "DELETE", extras: true, path: (_f, x) => mapPath(x.scenarioMapId), params: (_f, x) => ({ mapId: x.scenarioMapId! }), expected: holderToo(writers(200)), ...projectBound },
  { file: "maps/[mapId]/route.ts", method: "DELETE", extras: true, path: (_f, x) => mapPath(x.ownMapId), params: (_f, x) => ({ mapId: x.ownMapId! }), expected: creatorOnly(200), tokens: { readToken: 200 } },
  {
    file: "projects/[projectId]/scenarios/[scenarioId]/maps/route.ts",
    method: "GET",
    path: (f) => `/api/projects/${f.projectId}/scenarios/${f.scenarioId}/maps`,
    params: S,
    expected: holderToo(readers(200)),
  },
];
