/**
 * The local S3 fake (scripts/s3-fake.ts, started by scripts/services.sh) checks requests as a real store does, with
 * the AWS SDK's own signer: header-signed SDK calls and presigned links go through; an unsigned request (a presigned
 * link with its query removed), a request signed with the wrong secret, a tampered link and a body that does not
 * match its signed hash are refused. Signature Version 4: "Authenticating Requests (AWS Signature Version 4)",
 * Amazon S3 API Reference.
 */
import { GetObjectCommand, PutObjectCommand, S3Client } from "@aws-sdk/client-s3";
import { getSignedUrl } from "@aws-sdk/s3-request-presigner";
import { beforeAll, describe, expect, it } from "vitest";
import { objectStore, storageConfig } from "@/lib/storage";

const config = storageConfig();
const client = (secretAccessKey = config.secretAccessKey) =>
  new S3Client({ endpoint: config.endpoint, region: config.region, forcePathStyle: true, credentials: { accessKeyId: config.accessKeyId, secretAccessKey } });
const key = `fake-store-check/${Date.now()}/notes (1).txt`;
const objectUrl = `${config.endpoint}/${config.bucket}/${key.split("/").map(encodeURIComponent).join("/")}`;

beforeAll(async () => {
  await objectStore().put(key, new TextEncoder().encode("invented notes"), "text/plain");
});

describe("the fake S3 store", () => {
  it("serves an SDK call signed in its Authorization header", async () => {
    const res = await client().send(new GetObjectCommand({ Bucket: config.bucket, Key: key }));
    expect(await res.Body!.transformToString()).toBe("invented notes");
  });

  it("serves a presigned link as a sandboxed download", async () => {
    const url = await getSignedUrl(client(), new GetObjectCommand({ Bucket: config.bucket, Key: key, ResponseContentDisposition: 'attachment; filename="notes.txt"' }), { expiresIn: 60 });
    const res = await fetch(url);
    expect(res.status).toBe(200);
    expect(await res.text()).toBe("invented notes");
    expect(res.headers.get("content-disposition")).toBe('attachment; filename="notes.txt"');
    expect(res.headers.get("content-security-policy")).toBe("sandbox");
  });

  it("refuses the object without its presigned query string (403)", async () => {
    const res = await fetch(objectUrl);
    expect(res.status).toBe(403);
    expect(await res.text()).toContain("<Code>AccessDenied</Code>");
    expect((await fetch(objectUrl, { method: "PUT", body: "overwritten" })).status).toBe(403);
    expect((await fetch(objectUrl, { method: "DELETE" })).status).toBe(403);
  });

  it("refuses a call signed with the wrong secret, and a presigned link whose path was changed", async () => {
    await expect(client("not-the-secret").send(new GetObjectCommand({ Bucket: config.bucket, Key: key }))).rejects.toMatchObject({ name: "SignatureDoesNotMatch" });
    const url = await getSignedUrl(client(), new GetObjectCommand({ Bucket: config.bucket, Key: key }), { expiresIn: 60 });
    const moved = await fetch(url.replace("notes%20%281%29.txt", "other.txt"));
    expect(moved.status).toBe(403);
  });

  it("refuses a PUT whose body is not the one its signature covers", async () => {
    const s3 = client();
    s3.middlewareStack.add(
      (next) => async (args) => {
        const request = args.request as { body?: unknown };
        request.body = new TextEncoder().encode("ORIGINAL BODY");
        return next(args);
      },
      { step: "finalizeRequest", priority: "low", name: "swapBodyAfterSigning" },
    );
    await expect(s3.send(new PutObjectCommand({ Bucket: config.bucket, Key: `${key}.2`, Body: new TextEncoder().encode("original body"), ContentLength: 13 }))).rejects.toMatchObject({ name: "XAmzContentSHA256Mismatch" });
  });
});
