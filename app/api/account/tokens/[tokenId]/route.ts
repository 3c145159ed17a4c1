import { getDb } from "@/db";
import { revokeApiToken } from "@/db/api-tokens";
import { noContent, requireSessionActor, route } from "@/lib/http";

/** Revokes one of the account's tokens: it stops working at once. Reads no body. Browser session only. */
export const DELETE = route<{ tokenId: string }>(async (req, { tokenId }) => {
  const actor = await requireSessionActor(req);
  await revokeApiToken(getDb(), actor, tokenId);
  return noContent();
});
