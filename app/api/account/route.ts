import { getDb } from "@/db";
import { AppError } from "@/db/errors";
import { findUserById, toUserDto, updateAccount } from "@/db/users";
import { accountUpdateSchema } from "@/contracts/requests";
import { json, readJson, requireActor, route } from "@/lib/http";

export const GET = route(async (req) => {
  const actor = await requireActor(req);
  const user = await findUserById(getDb(), actor.userId);
  if (!user) throw new AppError("unauthenticated", "sign in first");
  return json({ user: toUserDto(user) });
});

export const PATCH = route(async (req) => {
  const actor = await requireActor(req);
  const input = await readJson(req, accountUpdateSchema);
  return json({ user: await updateAccount(getDb(), actor, input) });
});
