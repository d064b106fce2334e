// Copies every object of the S3 bucket to a folder and back, for backup.sh and restore.sh:
//   tsx scripts/objects.ts export DIR | import DIR      (S3_ENDPOINT, S3_BUCKET, S3_ACCESS_KEY, S3_SECRET_KEY)
import { S3Client, ListObjectsV2Command, GetObjectCommand, PutObjectCommand, CreateBucketCommand } from "@aws-sdk/client-s3";
import { mkdirSync, readdirSync, readFileSync, statSync, writeFileSync } from "node:fs";
import path from "node:path";

const [mode, dir] = process.argv.slice(2);
if (!dir || (mode !== "export" && mode !== "import")) throw new Error("usage: tsx scripts/objects.ts export|import DIR");
const bucket = process.env.S3_BUCKET ?? "loopwright-photos";
const client = new S3Client({
  endpoint: process.env.S3_ENDPOINT,
  region: process.env.S3_REGION ?? "us-east-1",
  forcePathStyle: true,
  credentials: { accessKeyId: process.env.S3_ACCESS_KEY ?? "", secretAccessKey: process.env.S3_SECRET_KEY ?? "" },
  requestChecksumCalculation: "WHEN_REQUIRED",
  responseChecksumValidation: "WHEN_REQUIRED",
});

// Keys are made by the server (letters, digits, dots, dashes, slashes), so they map to paths one to one.
const safe = (key: string) => /^[A-Za-z0-9][A-Za-z0-9._-]*(\/[A-Za-z0-9][A-Za-z0-9._-]*)*$/.test(key) && !key.includes("..");

let count = 0;
if (mode === "export") {
  let token: string | undefined;
  do {
    const page = await client.send(new ListObjectsV2Command({ Bucket: bucket, ContinuationToken: token }));
    for (const o of page.Contents ?? []) {
      if (!o.Key || !safe(o.Key)) continue;
      const obj = await client.send(new GetObjectCommand({ Bucket: bucket, Key: o.Key }));
      const file = path.join(dir, o.Key);
      mkdirSync(path.dirname(file), { recursive: true });
      writeFileSync(file, Buffer.from(await obj.Body!.transformToByteArray()));
      writeFileSync(`${file}.content-type`, obj.ContentType ?? "application/octet-stream");
      count++;
    }
    token = page.NextContinuationToken;
  } while (token);
} else {
  await client.send(new CreateBucketCommand({ Bucket: bucket })).catch(() => undefined);
  const walk = (d: string): string[] => readdirSync(d).flatMap((n) => (statSync(path.join(d, n)).isDirectory() ? walk(path.join(d, n)) : [path.join(d, n)]));
  for (const file of walk(dir).filter((f) => !f.endsWith(".content-type"))) {
    const key = path.relative(dir, file).split(path.sep).join("/");
    if (!safe(key)) continue;
    let type = "application/octet-stream";
    try {
      type = readFileSync(`${file}.content-type`, "utf8");
    } catch {}
    await client.send(new PutObjectCommand({ Bucket: bucket, Key: key, Body: readFileSync(file), ContentType: type }));
    count++;
  }
}
console.log(`objects ${mode}ed: ${count}`);
