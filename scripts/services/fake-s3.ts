/**
 * A local stand-in for object storage: s3rver (an S3-compatible server) on loopback with the
 * photo bucket created at start. The app talks to it through @aws-sdk/client-s3 like any S3.
 *   S3_PORT (4568)   S3_BUCKET (hubface-photos)   S3_DIR (.data/s3)   S3_RESET=1 empties it on stop
 * Credentials are s3rver's fixed pair S3RVER / S3RVER (set S3_ACCESS_KEY_ID / S3_SECRET_ACCESS_KEY
 * to match). Also used in-process by the integration tests (startFakeS3 on port 0).
 */
import { mkdirSync } from "node:fs";
import { resolve } from "node:path";
import { pathToFileURL } from "node:url";
import S3rver from "s3rver";

export async function startFakeS3(opts: { port: number; bucket: string; directory: string; reset?: boolean }) {
  mkdirSync(opts.directory, { recursive: true });
  const server = new S3rver({
    address: "127.0.0.1",
    port: opts.port,
    directory: opts.directory,
    silent: true,
    resetOnClose: opts.reset ?? false,
    vhostBuckets: false,
    configureBuckets: [{ name: opts.bucket }],
  });
  const address = await server.run();
  return { endpoint: `http://127.0.0.1:${address.port}`, port: address.port, close: () => server.close() };
}

if (process.argv[1] && import.meta.url === pathToFileURL(resolve(process.argv[1])).href) {
  const port = Number(process.env.S3_PORT ?? 4568);
  const bucket = process.env.S3_BUCKET ?? "hubface-photos";
  const directory = resolve(process.env.S3_DIR ?? ".data/s3");
  const s3 = await startFakeS3({ port, bucket, directory, reset: process.env.S3_RESET === "1" });
  console.log(`fake S3 on ${s3.endpoint}, bucket "${bucket}" in ${directory}`);
  const stop = () => {
    s3.close().finally(() => process.exit(0));
    setTimeout(() => process.exit(0), 2000).unref();
  };
  process.on("SIGINT", stop);
  process.on("SIGTERM", stop);
}
