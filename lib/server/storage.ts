import "server-only";
import { DeleteObjectCommand, GetObjectCommand, NoSuchKey, PutObjectCommand, S3Client, S3ServiceException } from "@aws-sdk/client-s3";
import { z } from "zod";

// Object storage for commissioning photos, through the S3 API: a real bucket in production, the local fake
// S3 server (scripts/s3-sink.sh) in development and tests. Settings come only from the environment.

const storageEnvSchema = z.object({
  S3_ENDPOINT: z.url().optional(),
  S3_BUCKET: z.string().regex(/^[a-z0-9][a-z0-9.-]{1,61}[a-z0-9]$/, "S3_BUCKET must be a valid bucket name"),
  S3_ACCESS_KEY: z.string().min(1, "S3_ACCESS_KEY is needed"),
  S3_SECRET_KEY: z.string().min(1, "S3_SECRET_KEY is needed"),
  S3_REGION: z.string().min(1).default("us-east-1"),
  /** Path-style addressing (http://host/bucket/key): what a local fake S3 server needs. */
  S3_FORCE_PATH_STYLE: z.enum(["0", "1"]).default("1"),
});

export interface StorageConfig {
  endpoint?: string;
  bucket: string;
  accessKeyId: string;
  secretAccessKey: string;
  region: string;
  forcePathStyle: boolean;
}

export function storageConfigFromEnv(env: Record<string, string | undefined> = process.env): StorageConfig {
  const parsed = storageEnvSchema.safeParse(env);
  if (!parsed.success) throw new Error(`Photo storage is not configured:\n${parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`).join("\n")}`);
  const e = parsed.data;
  return { endpoint: e.S3_ENDPOINT, bucket: e.S3_BUCKET, accessKeyId: e.S3_ACCESS_KEY, secretAccessKey: e.S3_SECRET_KEY, region: e.S3_REGION, forcePathStyle: e.S3_FORCE_PATH_STYLE === "1" };
}

export interface StoredObject {
  body: Buffer;
  contentType: string | null;
  size: number;
}

export interface Storage {
  readonly bucket: string;
  putObject(key: string, body: Uint8Array, contentType: string): Promise<void>;
  /** null when there is no such object. */
  getObject(key: string): Promise<StoredObject | null>;
  deleteObject(key: string): Promise<void>;
}

/** Keys are made by the server (never from a user's file name): letters, digits, dashes, dots and slashes. */
const KEY = /^[A-Za-z0-9][A-Za-z0-9._-]*(\/[A-Za-z0-9][A-Za-z0-9._-]*)*$/;
function assertKey(key: string) {
  if (key.length > 512 || !KEY.test(key) || key.includes("..")) throw new Error(`not a storage key: ${JSON.stringify(key)}`);
}

export function createStorage(config: StorageConfig): Storage {
  const client = new S3Client({
    endpoint: config.endpoint,
    region: config.region,
    forcePathStyle: config.forcePathStyle,
    credentials: { accessKeyId: config.accessKeyId, secretAccessKey: config.secretAccessKey },
    // Checksums only where the API requires them: local fake S3 servers do not speak the newer trailing-checksum uploads.
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
    maxAttempts: 3,
  });
  const Bucket = config.bucket;
  return {
    bucket: Bucket,
    async putObject(key, body, contentType) {
      assertKey(key);
      await client.send(new PutObjectCommand({ Bucket, Key: key, Body: body, ContentType: contentType, ContentLength: body.length }));
    },
    async getObject(key) {
      assertKey(key);
      try {
        const out = await client.send(new GetObjectCommand({ Bucket, Key: key }));
        const bytes = out.Body ? await out.Body.transformToByteArray() : new Uint8Array();
        return { body: Buffer.from(bytes), contentType: out.ContentType ?? null, size: bytes.length };
      } catch (e) {
        if (e instanceof NoSuchKey || (e instanceof S3ServiceException && e.$metadata.httpStatusCode === 404)) return null;
        throw e;
      }
    },
    async deleteObject(key) {
      assertKey(key);
      await client.send(new DeleteObjectCommand({ Bucket, Key: key }));
    },
  };
}

const globalForStorage = globalThis as unknown as { loopwrightStorage?: Storage };

/** The process's storage, configured from the environment on first use. */
export function storage(): Storage {
  return (globalForStorage.loopwrightStorage ??= createStorage(storageConfigFromEnv()));
}
