/**
 * A fake S3-compatible object store for the demo and the tests, on loopback only (S3_FAKE_PORT, default 4566).
 * Path-style addressing (http://127.0.0.1:4566/<bucket>/<key>); objects are kept as files under S3_FAKE_DIR
 * (default .data/s3), each beside a small JSON file with its media type, so they survive a restart.
 *
 * What the SDK needs and no more: CreateBucket (PUT /b), HeadBucket (HEAD /b), ListObjectsV2 (GET /b?list-type=2),
 * PutObject, GetObject, HeadObject and DeleteObject. Errors are S3's XML error documents.
 *
 * Every request must be signed, as a real store wants: in the Authorization header or in the query (a presigned
 * link), with AWS Signature Version 4 and the key S3_FAKE_ACCESS_KEY_ID / S3_FAKE_SECRET_ACCESS_KEY. The check is the
 * AWS SDK's own signer (@smithy/signature-v4) run again over the request as received and compared; an unsigned
 * request (a presigned link with its query removed) is 403, a presigned one is 403 once X-Amz-Date plus
 * X-Amz-Expires has passed, a header-signed one when its date is more than 15 minutes off, and a PUT whose body
 * does not match its signed x-amz-content-sha256 is 400. Objects are served with Content-Security-Policy: sandbox
 * and their Content-Disposition. (Signature Version 4 as AWS documents it: "Authenticating Requests", Amazon S3 API
 * Reference.)
 */
import { createHash, createHmac, timingSafeEqual } from "node:crypto";
import { mkdirSync, existsSync, readFileSync, readdirSync, rmSync, statSync, writeFileSync } from "node:fs";
import http from "node:http";
import path from "node:path";
import { SignatureV4 } from "@smithy/signature-v4";

const port = Number(process.env.S3_FAKE_PORT ?? 4566);
const root = path.resolve(process.env.S3_FAKE_DIR ?? ".data/s3");
const accessKeyId = process.env.S3_FAKE_ACCESS_KEY_ID ?? "branchline-local";
const secretAccessKey = process.env.S3_FAKE_SECRET_ACCESS_KEY ?? "branchline-local-secret";
/** The largest object accepted, as a guard for the fake itself; the app sets its own, smaller limits. */
const MAX_OBJECT_BYTES = 64 * 1024 * 1024;

interface ObjectMeta {
  contentType: string;
  contentDisposition?: string;
  size: number;
  etag: string;
  lastModified: string;
}

const escapeXml = (text: string) => text.replace(/[<>&'"]/g, (ch) => `&#${ch.charCodeAt(0)};`);

function sendError(res: http.ServerResponse, status: number, code: string, message: string, resource: string): void {
  const body = `<?xml version="1.0" encoding="UTF-8"?>\n<Error><Code>${code}</Code><Message>${escapeXml(message)}</Message><Resource>${escapeXml(resource)}</Resource><RequestId>fake</RequestId></Error>`;
  res.writeHead(status, { "content-type": "application/xml", "content-length": Buffer.byteLength(body) });
  res.end(body);
}

function sendXml(res: http.ServerResponse, body: string): void {
  const text = `<?xml version="1.0" encoding="UTF-8"?>\n${body}`;
  res.writeHead(200, { "content-type": "application/xml", "content-length": Buffer.byteLength(text) });
  res.end(text);
}

const validBucket = (name: string) => /^[a-z0-9][a-z0-9.-]{1,61}[a-z0-9]$/.test(name);
const bucketDir = (bucket: string) => path.join(root, bucket);
/** Keys become file names one-to-one: URI-encoded, so "/" and ".." never reach the file system as such. */
const objectFile = (bucket: string, key: string) => path.join(bucketDir(bucket), `${encodeURIComponent(key).replace(/\./g, "%2E")}.bin`);
const metaFile = (bucket: string, key: string) => objectFile(bucket, key).replace(/\.bin$/, ".json");

function readMeta(bucket: string, key: string): ObjectMeta | null {
  const file = metaFile(bucket, key);
  if (!existsSync(file) || !existsSync(objectFile(bucket, key))) return null;
  return JSON.parse(readFileSync(file, "utf8")) as ObjectMeta;
}

function listKeys(bucket: string): string[] {
  return readdirSync(bucketDir(bucket))
    .filter((name) => name.endsWith(".bin"))
    .map((name) => decodeURIComponent(name.slice(0, -4)))
    .sort();
}

async function readBody(req: http.IncomingMessage): Promise<Buffer | "too large"> {
  const chunks: Buffer[] = [];
  let size = 0;
  for await (const chunk of req) {
    size += (chunk as Buffer).length;
    if (size > MAX_OBJECT_BYTES) return "too large";
    chunks.push(chunk as Buffer);
  }
  return Buffer.concat(chunks);
}

/** SHA-256 and HMAC-SHA-256 from node:crypto, in the shape the SDK's signer takes (its ChecksumConstructor). */
class NodeSha256 {
  private readonly hash;
  constructor(secret?: SourceData) {
    this.hash = secret === undefined ? createHash("sha256") : createHmac("sha256", toBuffer(secret));
  }
  update(data: SourceData): void {
    this.hash.update(toBuffer(data));
  }
  async digest(): Promise<Uint8Array> {
    return new Uint8Array(this.hash.digest());
  }
  reset(): void {
    throw new Error("not used by the signer");
  }
}
type SourceData = string | ArrayBuffer | ArrayBufferView;
const toBuffer = (data: SourceData) =>
  typeof data === "string" ? Buffer.from(data, "utf8") : ArrayBuffer.isView(data) ? Buffer.from(data.buffer, data.byteOffset, data.byteLength) : Buffer.from(data);

/** X-Amz-Date is yyyymmddThhmmssZ. */
function parseAmzDate(text: string): Date | null {
  const m = /^(\d{4})(\d{2})(\d{2})T(\d{2})(\d{2})(\d{2})Z$/.exec(text);
  return m ? new Date(Date.UTC(+m[1], +m[2] - 1, +m[3], +m[4], +m[5], +m[6])) : null;
}

/** The signer as S3 uses it: paths are signed as sent (S3 does not encode them twice). */
const signerFor = (region: string, service: string) =>
  new SignatureV4({ credentials: { accessKeyId, secretAccessKey }, region, service, sha256: NodeSha256, uriEscapePath: false, applyChecksum: false });

type Refusal = [number, string, string];
const mismatch: Refusal = [403, "SignatureDoesNotMatch", "The request signature we calculated does not match the signature you provided"];

function sameSignature(given: string, expected: string): boolean {
  const a = Buffer.from(given);
  const b = Buffer.from(expected);
  return a.length === b.length && timingSafeEqual(a, b);
}

/** The incoming request as the signer sees one: only the headers the client signed, the query without `omit`. */
function asHttpRequest(req: http.IncomingMessage, url: URL, signedHeaders: string[], omit: (key: string) => boolean) {
  const headers: Record<string, string> = {};
  for (const name of signedHeaders) headers[name] = String(req.headers[name] ?? "");
  const query: Record<string, string | string[]> = {};
  for (const [k, v] of url.searchParams) {
    if (omit(k)) continue;
    const had = query[k];
    query[k] = had === undefined ? v : Array.isArray(had) ? [...had, v] : [had, v];
  }
  return { method: req.method ?? "GET", protocol: "http:", hostname: url.hostname, port: Number(url.port) || undefined, path: url.pathname, query, headers };
}

function parseCredential(text: string): { day: string; region: string; service: string } | Refusal {
  const credential = text.split("/");
  if (credential.length !== 5 || credential[4] !== "aws4_request") return [400, "AuthorizationHeaderMalformed", "The credential is malformed"];
  if (credential[0] !== accessKeyId) return [403, "InvalidAccessKeyId", "The access key in the request is not known to this store"];
  return { day: credential[1], region: credential[2], service: credential[3] };
}

/**
 * Checks a presigned request (Signature Version 4 in the query) by presigning the same request again with the
 * SDK's own signer and comparing; answers null when it may go ahead.
 */
async function checkPresigned(req: http.IncomingMessage, url: URL): Promise<Refusal | null> {
  const q = url.searchParams;
  if (q.get("X-Amz-Algorithm") !== "AWS4-HMAC-SHA256") return [400, "AuthorizationQueryParametersError", "X-Amz-Algorithm must be AWS4-HMAC-SHA256"];
  const signedAt = parseAmzDate(q.get("X-Amz-Date") ?? "");
  const expires = Number(q.get("X-Amz-Expires"));
  if (!signedAt || !Number.isInteger(expires) || expires < 1 || expires > 604800) {
    return [400, "AuthorizationQueryParametersError", "X-Amz-Date and X-Amz-Expires (1 to 604800 seconds) are required"];
  }
  if (Date.now() > signedAt.getTime() + expires * 1000) return [403, "AccessDenied", "Request has expired"];
  const credential = parseCredential(q.get("X-Amz-Credential") ?? "");
  if (Array.isArray(credential)) return credential;
  const signedHeaders = (q.get("X-Amz-SignedHeaders") ?? "").split(";").filter(Boolean);
  const authParams = new Set(["X-Amz-Algorithm", "X-Amz-Credential", "X-Amz-Date", "X-Amz-Expires", "X-Amz-SignedHeaders", "X-Amz-Signature"]);
  // The presigner hoists its X-Amz-Content-Sha256 header (UNSIGNED-PAYLOAD) into the query, and the signer reads the
  // payload hash from a header: hand it back as the header it was (same spelling, so it is hoisted to the same key).
  const payloadHash = q.get("X-Amz-Content-Sha256");
  const request = asHttpRequest(req, url, signedHeaders, (k) => authParams.has(k) || k === "X-Amz-Content-Sha256");
  if (payloadHash !== null) request.headers["X-Amz-Content-Sha256"] = payloadHash;
  const presigned = await signerFor(credential.region, credential.service).presign(request, {
    signingDate: signedAt,
    expiresIn: expires,
    signableHeaders: new Set(signedHeaders),
    unsignableHeaders: new Set(Object.keys(request.headers).filter((h) => !signedHeaders.includes(h))),
  });
  return sameSignature(q.get("X-Amz-Signature") ?? "", String(presigned.query?.["X-Amz-Signature"] ?? "")) ? null : mismatch;
}

/**
 * Checks a request signed in the Authorization header by signing the same request again with the SDK's signer and
 * comparing; the payload hash the client declared (x-amz-content-sha256) is what is signed, and a PUT's body is
 * checked against it when it arrives.
 */
async function checkHeaderSigned(req: http.IncomingMessage, url: URL): Promise<Refusal | null> {
  const m = /^AWS4-HMAC-SHA256 Credential=([^,\s]+),\s*SignedHeaders=([^,\s]+),\s*Signature=([0-9a-f]{64})$/.exec(String(req.headers.authorization ?? ""));
  if (!m) return [400, "AuthorizationHeaderMalformed", "The authorization header is malformed"];
  const credential = parseCredential(m[1]);
  if (Array.isArray(credential)) return credential;
  const signedAt = parseAmzDate(String(req.headers["x-amz-date"] ?? ""));
  if (!signedAt) return [403, "AccessDenied", "X-Amz-Date is required"];
  if (Math.abs(Date.now() - signedAt.getTime()) > 15 * 60 * 1000) return [403, "RequestTimeTooSkewed", "The difference between the request time and the current time is too large"];
  const signedHeaders = m[2].split(";");
  if (!signedHeaders.includes("host") || !signedHeaders.includes("x-amz-date")) return mismatch;
  const request = asHttpRequest(req, url, signedHeaders, () => false);
  const signed = await signerFor(credential.region, credential.service).sign(request, { signingDate: signedAt });
  const expected = /Signature=([0-9a-f]{64})/.exec(String(signed.headers.authorization ?? signed.headers.Authorization ?? ""))?.[1] ?? "";
  return sameSignature(m[3], expected) ? null : mismatch;
}

/** Every request is signed, in the Authorization header or in the query; anything else is refused with 403. */
function checkSigned(req: http.IncomingMessage, url: URL): Promise<Refusal | null> {
  if (url.searchParams.has("X-Amz-Signature")) return checkPresigned(req, url);
  if (req.headers.authorization) return checkHeaderSigned(req, url);
  return Promise.resolve([403, "AccessDenied", "Anonymous access is forbidden: sign the request or use a presigned link"]);
}

function listObjects(res: http.ServerResponse, bucket: string, url: URL): void {
  const prefix = url.searchParams.get("prefix") ?? "";
  const maxKeys = Math.min(Number(url.searchParams.get("max-keys") ?? 1000) || 1000, 1000);
  const after = url.searchParams.get("continuation-token") ?? url.searchParams.get("start-after") ?? "";
  const matching = listKeys(bucket).filter((k) => k.startsWith(prefix) && k > after);
  const page = matching.slice(0, maxKeys);
  const truncated = matching.length > page.length;
  const contents = page
    .map((key) => {
      const meta = readMeta(bucket, key);
      return meta
        ? `<Contents><Key>${escapeXml(key)}</Key><LastModified>${meta.lastModified}</LastModified><ETag>&quot;${meta.etag}&quot;</ETag><Size>${meta.size}</Size><StorageClass>STANDARD</StorageClass></Contents>`
        : "";
    })
    .join("");
  const next = truncated ? `<NextContinuationToken>${escapeXml(page[page.length - 1])}</NextContinuationToken>` : "";
  sendXml(
    res,
    `<ListBucketResult xmlns="http://s3.amazonaws.com/doc/2006-03-01/"><Name>${escapeXml(bucket)}</Name><Prefix>${escapeXml(prefix)}</Prefix><KeyCount>${page.length}</KeyCount><MaxKeys>${maxKeys}</MaxKeys><IsTruncated>${truncated}</IsTruncated>${contents}${next}</ListBucketResult>`,
  );
}

async function handleBucket(req: http.IncomingMessage, res: http.ServerResponse, bucket: string, url: URL): Promise<void> {
  const exists = existsSync(bucketDir(bucket));
  if (req.method === "PUT") {
    if (!validBucket(bucket)) return sendError(res, 400, "InvalidBucketName", "The specified bucket is not valid", `/${bucket}`);
    if (exists) return sendError(res, 409, "BucketAlreadyOwnedByYou", "Your previous request to create the named bucket succeeded", `/${bucket}`);
    mkdirSync(bucketDir(bucket), { recursive: true });
    res.writeHead(200, { location: `/${bucket}` }).end();
    return;
  }
  if (!exists) {
    if (req.method === "HEAD") return void res.writeHead(404).end();
    return sendError(res, 404, "NoSuchBucket", "The specified bucket does not exist", `/${bucket}`);
  }
  if (req.method === "HEAD") return void res.writeHead(200).end();
  if (req.method === "GET" && url.searchParams.get("list-type") === "2") return listObjects(res, bucket, url);
  if (req.method === "DELETE") {
    if (listKeys(bucket).length > 0) return sendError(res, 409, "BucketNotEmpty", "The bucket you tried to delete is not empty", `/${bucket}`);
    rmSync(bucketDir(bucket), { recursive: true, force: true });
    return void res.writeHead(204).end();
  }
  sendError(res, 501, "NotImplemented", "This fake store does not implement that bucket operation", `/${bucket}`);
}

async function handleObject(req: http.IncomingMessage, res: http.ServerResponse, bucket: string, key: string, url: URL): Promise<void> {
  const resource = `/${bucket}/${key}`;
  if (!existsSync(bucketDir(bucket))) return sendError(res, 404, "NoSuchBucket", "The specified bucket does not exist", resource);
  if (req.method === "PUT") {
    if (req.headers["content-encoding"]?.includes("aws-chunked")) {
      return sendError(res, 501, "NotImplemented", "aws-chunked uploads are not supported; send the object in one piece", resource);
    }
    const body = await readBody(req);
    if (body === "too large") return sendError(res, 400, "EntityTooLarge", "Your proposed upload exceeds the maximum allowed size", resource);
    const declaredHash = String(req.headers["x-amz-content-sha256"] ?? "");
    if (/^[0-9a-f]{64}$/.test(declaredHash) && createHash("sha256").update(body).digest("hex") !== declaredHash) {
      return sendError(res, 400, "XAmzContentSHA256Mismatch", "The provided 'x-amz-content-sha256' header does not match what was computed", resource);
    }
    const etag = createHash("md5").update(body).digest("hex");
    const meta: ObjectMeta = {
      contentType: String(req.headers["content-type"] ?? "application/octet-stream"),
      contentDisposition: req.headers["content-disposition"] ? String(req.headers["content-disposition"]) : undefined,
      size: body.length,
      etag,
      lastModified: new Date().toISOString(),
    };
    writeFileSync(objectFile(bucket, key), body);
    writeFileSync(metaFile(bucket, key), JSON.stringify(meta));
    res.writeHead(200, { etag: `"${etag}"` }).end();
    return;
  }
  if (req.method === "DELETE") {
    rmSync(objectFile(bucket, key), { force: true });
    rmSync(metaFile(bucket, key), { force: true });
    return void res.writeHead(204).end();
  }
  if (req.method === "GET" || req.method === "HEAD") {
    const meta = readMeta(bucket, key);
    if (!meta) {
      if (req.method === "HEAD") return void res.writeHead(404).end();
      return sendError(res, 404, "NoSuchKey", "The specified key does not exist.", resource);
    }
    const headers: Record<string, string | number> = {
      "content-type": url.searchParams.get("response-content-type") ?? meta.contentType,
      "content-length": meta.size,
      etag: `"${meta.etag}"`,
      "last-modified": new Date(meta.lastModified).toUTCString(),
      // What a store's bucket policy or CDN should add for user files: never run them as a page of this origin.
      "content-security-policy": "sandbox",
      "x-content-type-options": "nosniff",
    };
    const disposition = url.searchParams.get("response-content-disposition") ?? meta.contentDisposition;
    if (disposition) headers["content-disposition"] = disposition;
    res.writeHead(200, headers);
    if (req.method === "HEAD") return void res.end();
    res.end(readFileSync(objectFile(bucket, key)));
    return;
  }
  sendError(res, 405, "MethodNotAllowed", "The specified method is not allowed against this resource", resource);
}

const server = http.createServer((req, res) => {
  const url = new URL(req.url ?? "/", `http://${req.headers.host ?? "127.0.0.1"}`);
  const [bucket, ...rest] = url.pathname.slice(1).split("/");
  const key = rest.map((part) => decodeURIComponent(part)).join("/");
  const handle = async () => {
    const refusal = await checkSigned(req, url);
    if (refusal) return sendError(res, refusal[0], refusal[1], refusal[2], url.pathname);
    if (!bucket) return sendError(res, 501, "NotImplemented", "This fake store does not list buckets", "/");
    if (key) return handleObject(req, res, decodeURIComponent(bucket), key, url);
    return handleBucket(req, res, decodeURIComponent(bucket), url);
  };
  handle().catch((error: unknown) => {
    console.error("[s3-fake]", req.method, req.url, error);
    if (!res.headersSent) sendError(res, 500, "InternalError", "The fake store failed; see its log", url.pathname);
  });
});

mkdirSync(root, { recursive: true });
if (!statSync(root).isDirectory()) throw new Error(`${root} is not a directory`);
server.listen(port, "127.0.0.1", () => {
  console.log(`[s3-fake] path-style S3 on http://127.0.0.1:${port}, objects under ${root}`);
});
for (const signal of ["SIGINT", "SIGTERM"] as const) process.on(signal, () => server.close(() => process.exit(0)));
