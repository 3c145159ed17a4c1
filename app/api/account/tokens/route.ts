import { getDb } from "@/db";
import { createApiToken, listApiTokens } from "@/db/api-tokens";
import { apiTokenCreateSchema } from "@/contracts/requests";
import { json, readJson, requireSessionActor, route } from "@/lib/http";

/** A token's request is a name and a few choices: a small body. */
const TOKEN_BODY_MAX_BYTES = 4 * 1024;

/** The account's personal API tokens, live or not (never the tokens themselves). Browser session only. */
export const GET = route(async (req) => {
  const actor = await requireSessionActor(req);
  return json({ tokens: await listApiTokens(getDb(), actor) });
});

/** Makes a token; the answer carries it once (`token`), and only its hash is kept. Browser session only. */
export const POST = route(async (req) => {
  const actor = await requireSessionActor(req);
  const input = await readJson(req, apiTokenCreateSchema, TOKEN_BODY_MAX_BYTES);
  const { token, apiToken } = await createApiToken(getDb(), actor, input);
  return json({ token, apiToken }, 201);
});
