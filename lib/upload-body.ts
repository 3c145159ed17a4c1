import "server-only";
/**
 * Reading a file sent to a route handler: either the raw body (its name in the `name` query parameter or an
 * X-File-Name header, URI-encoded) or multipart/form-data with the file in a `file` field. The body is read as a
 * stream and abandoned as soon as it passes the limit, so an oversized upload costs no more than the limit.
 *
 * Refusals: too large 413, empty 422, a content type the route does not take 415 (in the one error shape).
 */
import type { NextRequest } from "next/server";
import { AppError } from "../db/errors";
import { bodyTooLarge, readBodyBytes } from "./request-body";

/** A request whose content type the route does not take, or a file whose content is not what it says (415). */
export const unsupportedMediaType = (message: string) => new AppError("unsupported_media_type", message);

export interface UploadedFile {
  /** The file name the client gave, or null. */
  name: string | null;
  bytes: Uint8Array;
  /** The other fields of a multipart body, or the query parameters of a raw one. */
  fields: Record<string, string>;
}

/** Room for the multipart boundaries and headers around the file itself. */
const MULTIPART_OVERHEAD = 64 * 1024;

const mediaTypeOf = (req: NextRequest) => (req.headers.get("content-type") ?? "").split(";")[0].trim().toLowerCase();

/**
 * Reads the uploaded file. `accept` lists the raw content types the route takes besides multipart/form-data
 * (a trailing "*" matches any subtype, "*" anything); anything else is 415.
 */
export async function readUpload(req: NextRequest, options: { maxBytes: number; what: string; accept: string[] }): Promise<UploadedFile> {
  const { maxBytes, what } = options;
  const type = mediaTypeOf(req);
  const query = Object.fromEntries(req.nextUrl.searchParams);
  if (type === "multipart/form-data") {
    const raw = await readBodyBytes(req, { limit: maxBytes + MULTIPART_OVERHEAD, what, maxBytes });
    let form: FormData;
    try {
      form = await new Response(raw as BodyInit, { headers: { "content-type": req.headers.get("content-type")! } }).formData();
    } catch {
      throw new AppError("bad_request", "the multipart body could not be read");
    }
    const file = form.get("file");
    if (!(file instanceof Blob)) throw new AppError("bad_request", "a multipart upload needs the file in a field named 'file'", [{ path: "file", message: "choose a file" }]);
    const bytes = new Uint8Array(await file.arrayBuffer());
    if (bytes.byteLength > maxBytes) throw bodyTooLarge(what, maxBytes, bytes.byteLength);
    if (bytes.byteLength === 0) throw new AppError("unprocessable", `${what} is empty`, [{ path: "file", message: "the file is empty" }]);
    const fields: Record<string, string> = { ...query };
    for (const [key, value] of form.entries()) if (typeof value === "string") fields[key] = value;
    return { name: "name" in file && typeof file.name === "string" && file.name ? file.name : (fields.name ?? null), bytes, fields };
  }
  const accepted = options.accept.some((a) => a === "*" || a === type || (a.endsWith("/*") && type.startsWith(a.slice(0, -1))));
  if (!accepted) {
    throw unsupportedMediaType(`${what} must be sent as ${[...options.accept, "multipart/form-data"].join(", ")}; this request is ${type || "without a content type"}`);
  }
  const bytes = await readBodyBytes(req, { limit: maxBytes, what });
  if (bytes.byteLength === 0) throw new AppError("unprocessable", `${what} is empty`, [{ path: "file", message: "the file is empty" }]);
  const header = req.headers.get("x-file-name");
  let name: string | null = query.name ?? null;
  if (header) {
    try {
      name = decodeURIComponent(header);
    } catch {
      name = header;
    }
  }
  return { name, bytes, fields: query };
}

/** The bytes as UTF-8 text (a byte-order mark kept for the parser to drop); 422 when they are not UTF-8. */
export function utf8(bytes: Uint8Array, what: string): string {
  try {
    return new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    throw new AppError("unprocessable", `${what} is not UTF-8 text`);
  }
}
