import { getDb } from "@/db";
import { createUser } from "@/db/users";
import { signUpSchema } from "@/lib/contracts";
import { json, readJson, route } from "@/lib/http";

/** Sign-up with e-mail and password. */
export const POST = route(async (req) => {
  const input = await readJson(req, signUpSchema);
  const user = await createUser(getDb(), input);
  return json({ user }, 201);
});
