import "server-only";
/**
 * The one way a route handler reads a request body: as a stream, counting bytes as they arrive, and abandoned
 * (the stream cancelled, the rest never read) as soon as the count passes the limit. A body without a declared
 * length (chunked) therefore costs no more memory than the limit, and one that declares too much is refused before
 * a byte is read. tests/unit/app/body-reading.test.ts fails when a route reads its body any other way.
 */
import { AppError } from "../db/errors";
import { fileSize } from "../contracts/requests";

export const bodyTooLarge = (what: string, maxBytes: number, size?: number) =>
  new AppError("payload_too_large", `${what} is ${size === undefined ? "larger than the limit" : fileSize(size)}; the limit is ${fileSize(maxBytes)}`, undefined, {
    limitBytes: maxBytes,
  });

/**
 * Reads at most `limit` bytes of the body; 413 (naming `what` and `maxBytes`, the limit people are told) past it,
 * 400 when the stream breaks. `maxBytes` defaults to `limit`; a multipart reader allows some room above it.
 */
export async function readBodyBytes(req: Request, options: { limit: number; what: string; maxBytes?: number }): Promise<Uint8Array> {
  const { limit, what } = options;
  const maxBytes = options.maxBytes ?? limit;
  const declared = Number(req.headers.get("content-length") ?? NaN);
  if (Number.isFinite(declared) && declared > limit) {
    await req.body?.cancel().catch(() => undefined);
    throw bodyTooLarge(what, maxBytes, declared);
  }
  if (!req.body) return new Uint8Array();
  const reader = req.body.getReader();
  const chunks: Uint8Array[] = [];
  let size = 0;
  try {
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      size += value.byteLength;
      if (size > limit) {
        chunks.length = 0;
        await reader.cancel().catch(() => undefined);
        throw bodyTooLarge(what, maxBytes);
      }
      chunks.push(value);
    }
  } catch (error) {
    if (error instanceof AppError) throw error;
    throw new AppError("bad_request", "the request body could not be read");
  }
  const bytes = new Uint8Array(size);
  let at = 0;
  for (const chunk of chunks) {
    bytes.set(chunk, at);
    at += chunk.byteLength;
  }
  return bytes;
}

/** The body as UTF-8 text, read within the limit; 400 when the bytes are not UTF-8. */
export async function readBodyText(req: Request, options: { limit: number; what: string }): Promise<string> {
  const bytes = await readBodyBytes(req, options);
  try {
    return new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    throw new AppError("bad_request", `${options.what} is not UTF-8 text`);
  }
}
