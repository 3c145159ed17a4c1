import "server-only";
import { createHash, randomBytes } from "node:crypto";

/** A secret for a link: 256 random bits, base64url (43 characters, safe in a URL path). */
export const newToken = () => randomBytes(32).toString("base64url");

/** What is stored instead of a token: its SHA-256, hex. A token of any length hashes to a fixed-size key. */
export const hashToken = (token: string) => createHash("sha256").update(token).digest("hex");
