/**
 * The photo bucket through @aws-sdk/client-s3. Locally an S3-compatible fake (scripts/services/
 * fake-s3.ts) that the start and test commands run; in a deployment any S3-compatible store.
 *   S3_ENDPOINT  S3_BUCKET  S3_ACCESS_KEY_ID  S3_SECRET_ACCESS_KEY  S3_REGION
 * No `server-only` here: the demo seed (run by knex outside Next) uploads through it too.
 */
import {
  DeleteObjectsCommand,
  GetObjectCommand,
  HeadObjectCommand,
  ListObjectsV2Command,
  PutObjectCommand,
  S3Client,
} from "@aws-sdk/client-s3";
import { DependencyUnavailableError, isNetworkFailure } from "../../platform/http/dependency";

export interface S3Settings {
  endpoint: string;
  bucket: string;
  accessKeyId: string;
  secretAccessKey: string;
  region: string;
}

/** Settings from the environment, with the local fake's defaults. */
export function s3Settings(env: NodeJS.ProcessEnv = process.env): S3Settings {
  return {
    endpoint: env.S3_ENDPOINT ?? "http://127.0.0.1:4568",
    bucket: env.S3_BUCKET ?? "hubface-photos",
    accessKeyId: env.S3_ACCESS_KEY_ID ?? "S3RVER",
    secretAccessKey: env.S3_SECRET_ACCESS_KEY ?? "S3RVER",
    region: env.S3_REGION ?? "us-east-1",
  };
}

export function makeS3Client(s: S3Settings): S3Client {
  return new S3Client({
    endpoint: s.endpoint,
    region: s.region,
    credentials: { accessKeyId: s.accessKeyId, secretAccessKey: s.secretAccessKey },
    forcePathStyle: true,
    // The fake (and several S3-compatible stores) do not speak the newer default checksums.
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
    maxAttempts: 2,
  });
}

/** What the app needs from object storage; tests can hand in a store on another endpoint. */
export interface PhotoStore {
  put(key: string, body: Buffer, contentType: string): Promise<void>;
  get(key: string): Promise<{ body: Uint8Array; contentType: string } | null>;
  exists(key: string): Promise<boolean>;
  deleteMany(keys: readonly string[]): Promise<void>;
  /** Every object under `prefix`, a page (≤ 1000) at a time, with when it was last written. */
  list(prefix: string): AsyncIterable<StoredObject[]>;
}

export interface StoredObject {
  key: string;
  lastModified: Date;
}

export function s3PhotoStore(settings: S3Settings = s3Settings(), s3: S3Client = makeS3Client(settings)): PhotoStore {
  const Bucket = settings.bucket;
  // A store that does not answer (or answers 5xx) is reported as the photo store, not as the database.
  const client = {
    send: (async (command: Parameters<S3Client["send"]>[0]) => {
      try {
        return await s3.send(command);
      } catch (e) {
        const status = (e as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode;
        if (isNetworkFailure(e) || (status !== undefined && status >= 500)) throw new DependencyUnavailableError("photo store", e);
        throw e;
      }
    }) as S3Client["send"],
  };
  return {
    async put(key, body, contentType) {
      await client.send(new PutObjectCommand({ Bucket, Key: key, Body: body, ContentType: contentType, ContentLength: body.length }));
    },
    async get(key) {
      try {
        const r = await client.send(new GetObjectCommand({ Bucket, Key: key }));
        if (!r.Body) return null;
        return { body: await r.Body.transformToByteArray(), contentType: r.ContentType ?? "application/octet-stream" };
      } catch (e) {
        if (
          (e as { name?: string }).name === "NoSuchKey" ||
          (e as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode === 404
        )
          return null;
        throw e;
      }
    },
    async exists(key) {
      try {
        await client.send(new HeadObjectCommand({ Bucket, Key: key }));
        return true;
      } catch (e) {
        if ((e as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode === 404) return false;
        throw e;
      }
    },
    async deleteMany(keys) {
      for (let i = 0; i < keys.length; i += 1000) {
        const chunk = keys.slice(i, i + 1000);
        if (chunk.length === 0) continue;
        await client.send(new DeleteObjectsCommand({ Bucket, Delete: { Objects: chunk.map((Key) => ({ Key })), Quiet: true } }));
      }
    },
    async *list(prefix) {
      let ContinuationToken: string | undefined;
      do {
        const page = await client.send(new ListObjectsV2Command({ Bucket, Prefix: prefix, ContinuationToken, MaxKeys: 1000 }));
        const objects = (page.Contents ?? [])
          .filter((o) => o.Key && o.LastModified)
          .map((o) => ({ key: o.Key!, lastModified: o.LastModified! }));
        if (objects.length) yield objects;
        ContinuationToken = page.IsTruncated ? page.NextContinuationToken : undefined;
      } while (ContinuationToken);
    },
  };
}

let shared: PhotoStore | undefined;
/** The store of this process (settings read once). */
export function photoStore(): PhotoStore {
  return (shared ??= s3PhotoStore());
}
/** For tests: use another store (e.g. an in-process fake on a random port). */
export function setPhotoStore(store: PhotoStore | undefined): void {
  shared = store;
}
