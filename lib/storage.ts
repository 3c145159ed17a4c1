import "server-only";
/**
 * Object storage: the one place that reads its settings. Any S3-compatible store works by configuration; without
 * any, the fake store of scripts/s3-fake.ts on loopback (started by scripts/services.sh) is used.
 *
 *   S3_ENDPOINT            http://127.0.0.1:4566 (unset for AWS itself: set S3_ENDPOINT="" and S3_REGION)
 *   S3_PUBLIC_ENDPOINT     where browsers reach the store, for signed links, when it differs from S3_ENDPOINT
 *   S3_REGION              us-east-1
 *   S3_BUCKET              branchline-attachments
 *   S3_ACCESS_KEY_ID, S3_SECRET_ACCESS_KEY    branchline-local / branchline-local-secret (the fake's)
 *   S3_FORCE_PATH_STYLE    true (path-style URLs, as most self-hosted stores want)
 */
import {
  CreateBucketCommand,
  DeleteObjectCommand,
  GetObjectCommand,
  HeadBucketCommand,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
} from "@aws-sdk/client-s3";
import { getSignedUrl } from "@aws-sdk/s3-request-presigner";
import { AppError } from "../db/errors";

export interface StorageConfig {
  endpoint: string | undefined;
  publicEndpoint: string | undefined;
  region: string;
  bucket: string;
  accessKeyId: string;
  secretAccessKey: string;
  forcePathStyle: boolean;
}

export const FAKE_S3_DEFAULT_ENDPOINT = `http://127.0.0.1:${process.env.S3_FAKE_PORT ?? "4566"}`;

export function storageConfig(env: NodeJS.ProcessEnv = process.env): StorageConfig {
  const endpoint = env.S3_ENDPOINT === undefined ? FAKE_S3_DEFAULT_ENDPOINT : env.S3_ENDPOINT || undefined;
  return {
    endpoint,
    publicEndpoint: env.S3_PUBLIC_ENDPOINT || endpoint,
    region: env.S3_REGION || "us-east-1",
    bucket: env.S3_BUCKET || "branchline-attachments",
    accessKeyId: env.S3_ACCESS_KEY_ID || "branchline-local",
    secretAccessKey: env.S3_SECRET_ACCESS_KEY || "branchline-local-secret",
    forcePathStyle: (env.S3_FORCE_PATH_STYLE ?? "true") !== "false",
  };
}

function makeClient(config: StorageConfig, endpoint: string | undefined): S3Client {
  return new S3Client({
    endpoint,
    region: config.region,
    forcePathStyle: config.forcePathStyle,
    credentials: { accessKeyId: config.accessKeyId, secretAccessKey: config.secretAccessKey },
    // Checksums only where the API requires them: some S3-compatible stores do not read the streaming trailers.
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
  });
}

/** How long a download link works. */
export const DOWNLOAD_LINK_SECONDS = 5 * 60;

export interface ObjectStore {
  bucket: string;
  put(key: string, body: Uint8Array, contentType: string): Promise<void>;
  get(key: string): Promise<Uint8Array>;
  delete(key: string): Promise<void>;
  /** A signed GET link to the object, served as a download with this file name. */
  downloadUrl(key: string, fileName: string, contentType: string, seconds?: number): Promise<{ url: string; expiresAt: Date }>;
}

const unavailable = (error: unknown) =>
  new AppError("service_unavailable", "the file store cannot be reached just now; try again in a moment", undefined, {
    reason: error instanceof Error ? error.name : "unknown",
  });

/** Whether a failure is the store saying no, rather than it being out of reach. */
const isServiceError = (error: unknown) => error instanceof S3ServiceException;

export function createObjectStore(config: StorageConfig = storageConfig()): ObjectStore {
  const client = makeClient(config, config.endpoint);
  const signer = config.publicEndpoint === config.endpoint ? client : makeClient(config, config.publicEndpoint);
  let bucketReady: Promise<void> | null = null;

  /** Creates the bucket on first use when it is missing (the fake store starts empty). */
  const ensureBucket = () => {
    bucketReady ??= (async () => {
      try {
        await client.send(new HeadBucketCommand({ Bucket: config.bucket }));
      } catch (error) {
        if (!isServiceError(error) || (error as S3ServiceException).$metadata.httpStatusCode !== 404) throw error;
        await client.send(new CreateBucketCommand({ Bucket: config.bucket }));
      }
    })().catch((error) => {
      bucketReady = null;
      throw error;
    });
    return bucketReady;
  };

  const guarded = async <T>(work: () => Promise<T>): Promise<T> => {
    try {
      await ensureBucket();
      return await work();
    } catch (error) {
      if (error instanceof AppError) throw error;
      console.error("[storage]", error);
      throw unavailable(error);
    }
  };

  return {
    bucket: config.bucket,
    put: (key, body, contentType) =>
      guarded(async () => {
        await client.send(new PutObjectCommand({ Bucket: config.bucket, Key: key, Body: body, ContentType: contentType, ContentDisposition: "attachment", ContentLength: body.byteLength }));
      }),
    get: (key) =>
      guarded(async () => {
        const res = await client.send(new GetObjectCommand({ Bucket: config.bucket, Key: key }));
        return res.Body ? await res.Body.transformToByteArray() : new Uint8Array();
      }),
    delete: (key) =>
      guarded(async () => {
        await client.send(new DeleteObjectCommand({ Bucket: config.bucket, Key: key }));
      }),
    downloadUrl: async (key, fileName, contentType, seconds = DOWNLOAD_LINK_SECONDS) => {
      const expiresAt = new Date(Date.now() + seconds * 1000);
      const asciiName = fileName.replace(/[^\x20-\x7e]|["\\]/g, "_");
      const command = new GetObjectCommand({
        Bucket: config.bucket,
        Key: key,
        ResponseContentType: contentType,
        ResponseContentDisposition: `attachment; filename="${asciiName}"; filename*=UTF-8''${encodeURIComponent(fileName)}`,
      });
      const url = await getSignedUrl(signer, command, { expiresIn: seconds });
      return { url, expiresAt };
    },
  };
}

let shared: ObjectStore | null = null;

/** The store the app uses, made from the environment on first use. */
export function objectStore(): ObjectStore {
  shared ??= createObjectStore();
  return shared;
}
