import { getDb } from "@/db";
import { completePasswordReset } from "@/db/password-reset";
import { passwordResetConfirmSchema } from "@/contracts/requests";
import { json, readJson, route } from "@/lib/http";

export const POST = route(async (req) => {
  const { token, password } = await readJson(req, passwordResetConfirmSchema);
  await completePasswordReset(getDb(), token, password);
  return json({ message: "password changed; sign in with the new one" });
});
