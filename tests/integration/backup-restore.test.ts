import { describe, expect, it } from "vitest";
import { execFileSync } from "node:child_process";
import { mkdtempSync, rmSync, statSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";

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
});
