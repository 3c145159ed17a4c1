import { getDb } from "@/db";
import { transferOwnership } from "@/db/members";
import { ownershipTransferSchema } from "@/contracts/requests";
import { json, readJson, requireActor, route } from "@/lib/http";

type Params = { projectId: string };

/** Hands the caller's ownership to another member, who becomes owner while the caller becomes editor (owners only). */
export const POST = route<Params>(async (req, { projectId }) => {
  const actor = await requireActor(req);
  const { userId } = await readJson(req, ownershipTransferSchema);
  return json({ members: await transferOwnership(getDb(), actor, projectId, userId) });
});
