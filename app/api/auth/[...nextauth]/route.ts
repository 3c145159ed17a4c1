import NextAuth from "next-auth";
import { NextRequest } from "next/server";
import { authOptions } from "@/lib/auth";
import { errorResponse } from "@/lib/http";
import { AppError } from "@/db/errors";
import { readBodyBytes } from "@/lib/request-body";

const handler = NextAuth(authOptions);

/** Sign-in forms are a few hundred bytes; anything much larger is not one. */
const AUTH_BODY_MAX_BYTES = 64 * 1024;

type Context = { params: Promise<{ nextauth: string[] }> };

/** next-auth reads the body itself: hand it a copy read through the one limited reader. */
async function POST(req: NextRequest, ctx: Context) {
  let bytes: Uint8Array;
  try {
    bytes = await readBodyBytes(req, { limit: AUTH_BODY_MAX_BYTES, what: "the sign-in request" });
  } catch (error) {
    if (error instanceof AppError) return errorResponse(error);
    throw error;
  }
  const headers = new Headers(req.headers);
  headers.delete("content-length");
  const copy = new NextRequest(req.url, { method: req.method, headers, body: bytes.byteLength > 0 ? (bytes as BodyInit) : undefined });
  return handler(copy, ctx);
}

export { handler as GET, POST };
