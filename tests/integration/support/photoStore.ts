import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { ListObjectsV2Command } from "@aws-sdk/client-s3";
import { makeS3Client, s3PhotoStore, setPhotoStore, type PhotoStore } from "@/lib/garage/photos/s3";
import { startFakeS3 } from "@/scripts/services/fake-s3";

export interface TestPhotoStore {
  /** The store the app now uses (a test may wrap it to make it fail, then set it back). */
  store: PhotoStore;
  /** The fake server's folder: an object of `bucket` lives below `join(dir, bucket)`. */
  dir: string;
  bucket: string;
  /** Every object key in the bucket, sorted. */
  objectKeys(): Promise<string[]>;
  /** Unsets the app's store, stops the server and removes its folder. */
  close(): Promise<void>;
}

/**
 * A fake S3 bucket (scripts/services/fake-s3) in a fresh temporary folder, set as the app's photo
 * store for one test file: what the routes write can be listed and checked as in production.
 */
export async function startTestPhotoStore(bucket: string): Promise<TestPhotoStore> {
  const dir = mkdtempSync(join(tmpdir(), `hubface-${bucket}-`));
  const s3 = await startFakeS3({ port: 0, bucket, directory: dir, reset: true });
  const settings = { endpoint: s3.endpoint, bucket, accessKeyId: "S3RVER", secretAccessKey: "S3RVER", region: "us-east-1" };
  const store = s3PhotoStore(settings);
  setPhotoStore(store);
  return {
    store,
    dir,
    bucket,
    objectKeys: async () => {
      const r = await makeS3Client(settings).send(new ListObjectsV2Command({ Bucket: bucket }));
      return (r.Contents ?? []).map((o) => o.Key!).sort();
    },
    close: async () => {
      setPhotoStore(undefined);
      await s3.close();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}
