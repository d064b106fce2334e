import { describe, expect, it } from "vitest";
import { execFileSync } from "node:child_process";
import { mkdtempSync, rmSync, statSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { S3Client, PutObjectCommand, GetObjectCommand } from "@aws-sdk/client-s3";

const ROOT = path.resolve(__dirname, "../..");
const run = (cmd: string, args: string[], env: Record<string, string> = {}) =>
  execFileSync(cmd, args, { cwd: ROOT, env: { ...process.env, ...env }, encoding: "utf8", stdio: ["ignore", "pipe", "pipe"] });
const url = (db: string) => process.env.DATABASE_URL!.replace(/\/[^/]+$/, `/${db}`);
const sql = (db: string, query: string) => run("bash", ["-c", `source scripts/env.sh; mariadb --no-defaults --socket="$DB_SOCKET" -uroot -N -e "$1" ${db}`, "sql", query]);

// Per table: row count and CHECKSUM TABLE, the server's own content checksum.
function fingerprint(db: string) {
  const tables = sql(db, "SHOW TABLES").trim().split("\n").filter(Boolean).sort();
  return Object.fromEntries(tables.map((t) => [t, { rows: Number(sql(db, "SELECT COUNT(*) FROM `" + t + "`").trim()), checksum: sql(db, "CHECKSUM TABLE `" + t + "`").trim().split(/\s+/).pop() }]));
}

const s3Env = (port: number) => ({ S3_ENDPOINT: `http://127.0.0.1:${port}`, S3_BUCKET: "loopwright-photos", S3_ACCESS_KEY: "S3RVER", S3_SECRET_KEY: "S3RVER" });
const s3 = (port: number) =>
  new S3Client({ endpoint: `http://127.0.0.1:${port}`, region: "us-east-1", forcePathStyle: true, credentials: { accessKeyId: "S3RVER", secretAccessKey: "S3RVER" }, requestChecksumCalculation: "WHEN_REQUIRED", responseChecksumValidation: "WHEN_REQUIRED" });

describe("backup and restore", () => {
  it("round-trips the demo data into an empty instance, table by table", () => {
    const src = "loopwright_test_backup_src";
    const dst = "loopwright_test_backup_dst";
    run("bash", ["scripts/db.sh", "create", src]);
    run("bash", ["scripts/db.sh", "create", dst]);
    run("npx", ["tsx", "scripts/migrate.ts"], { DATABASE_URL: url(src) });
    run("npx", ["tsx", "scripts/seed.ts"], { DATABASE_URL: url(src) });
    const dir = mkdtempSync(path.join(tmpdir(), "lw-backup-"));
    try {
      const archive = path.join(dir, "backup.tar.gz");
      run("bash", ["scripts/backup.sh", archive, src], { S3_ENDPOINT: "" });
      expect(statSync(archive).size).toBeGreaterThan(1000);
      run("bash", ["scripts/restore.sh", archive, dst], { S3_ENDPOINT: "" });
      const before = fingerprint(src);
      expect(before.users.rows).toBeGreaterThanOrEqual(4);
      expect(fingerprint(dst)).toEqual(before);
      // A second restore into the now non-empty database is refused and changes nothing.
      expect(() => run("bash", ["scripts/restore.sh", archive, dst], { S3_ENDPOINT: "" })).toThrow(/not empty/);
      expect(fingerprint(dst)).toEqual(before);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  }, 120_000);

  it("carries the uploaded files: an object in the store before the backup is in a fresh store after the restore", async () => {
    const [srcPort, dstPort] = [4591, 4592];
    const src = "loopwright_test_backup_obj_src";
    const dst = "loopwright_test_backup_obj_dst";
    const dir = mkdtempSync(path.join(tmpdir(), "lw-backup-obj-"));
    try {
      run("bash", ["scripts/db.sh", "create", src]);
      run("bash", ["scripts/db.sh", "create", dst]);
      run("npx", ["tsx", "scripts/migrate.ts"], { DATABASE_URL: url(src) });
      run("bash", ["scripts/s3-sink.sh", "start", String(srcPort), path.join(dir, "s3-src")], s3Env(srcPort));
      const body = Buffer.from([0xff, 0xd8, 0xff, 0xe0, 1, 2, 3, 4]); // a JPEG's first bytes
      await s3(srcPort).send(new PutObjectCommand({ Bucket: "loopwright-photos", Key: "photos/1/terminal.jpg", Body: body, ContentType: "image/jpeg" }));
      const archive = path.join(dir, "backup.tar.gz");
      run("bash", ["scripts/backup.sh", archive, src], s3Env(srcPort));
      run("bash", ["scripts/s3-sink.sh", "start", String(dstPort), path.join(dir, "s3-dst")], s3Env(dstPort));
      run("bash", ["scripts/restore.sh", archive, dst], s3Env(dstPort));
      const back = await s3(dstPort).send(new GetObjectCommand({ Bucket: "loopwright-photos", Key: "photos/1/terminal.jpg" }));
      expect(Buffer.from(await back.Body!.transformToByteArray())).toEqual(body);
      expect(back.ContentType).toBe("image/jpeg");
    } finally {
      run("bash", ["scripts/s3-sink.sh", "stop", String(srcPort)]);
      run("bash", ["scripts/s3-sink.sh", "stop", String(dstPort)]);
      rmSync(dir, { recursive: true, force: true });
    }
  }, 120_000);
});
