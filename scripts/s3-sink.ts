// A local fake S3 server on loopback for development and tests (s3rver), with the photo bucket created.
// Run through scripts/s3-sink.sh. Environment: S3_SINK_PORT, S3_SINK_DIR, S3_BUCKET.
import { mkdirSync } from "node:fs";
import S3rver from "s3rver";

const port = Number(process.env.S3_SINK_PORT ?? 4569);
const directory = process.env.S3_SINK_DIR ?? `.data/s3-${port}`;
const bucket = process.env.S3_BUCKET ?? "loopwright-photos";
mkdirSync(directory, { recursive: true });

const server = new S3rver({ port, address: "127.0.0.1", directory, silent: true, configureBuckets: [{ name: bucket }] });
const addr = await server.run();
console.log(`fake S3 listening on http://127.0.0.1:${addr.port}, bucket ${bucket}, data in ${directory}`);
const stop = async () => {
  await server.close();
  process.exit(0);
};
process.on("SIGTERM", stop);
process.on("SIGINT", stop);
