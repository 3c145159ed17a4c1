import { getDb } from "@/db";
import { createShareLink, listShareLinks } from "@/db/share-links";
import { shareLinkCreateSchema } from "@/contracts/requests";
import { json, readJson, requireActor, route } from "@/lib/http";
import { shareUrl } from "@/lib/links";

type Params = { projectId: string; scenarioId: string };

/** The scenario's share links, live or not (editors and owners). */
export const GET = route<Params>(async (req, { projectId, scenarioId }) => {
  const actor = await requireActor(req);
  return json({ links: await listShareLinks(getDb(), actor, projectId, scenarioId) });
});

/** Creates a read-only link; its URL is in this answer only, since only a hash of its token is kept (editors and owners). */
export const POST = route<Params>(async (req, { projectId, scenarioId }) => {
  const actor = await requireActor(req);
  const input = await readJson(req, shareLinkCreateSchema);
  const { link, token } = await createShareLink(getDb(), actor, projectId, scenarioId, input);
  return json({ link, url: shareUrl(token) }, 201);
});
