// Galera replicates rows, not locks: GET_LOCK / RELEASE_LOCK and LOCK TABLES hold on one node only, so a lock
// taken through one node does not keep out a writer on another. The code uses none of them (row locks inside
// transactions, SELECT ... FOR UPDATE, are certified at commit and stay correct).
import { readdirSync, readFileSync, statSync } from "node:fs";
import { join, relative } from "node:path";
import { describe, expect, it } from "vitest";

const root = join(import.meta.dirname, "..", "..");
const SCANNED = ["app", "lib", "models", "migrations", "scripts", "bench"];

function sourceFiles(dir: string): string[] {
  const out: string[] = [];
  for (const name of readdirSync(dir)) {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) out.push(...sourceFiles(path));
    else if (/\.(ts|tsx|sh|sql)$/.test(name)) out.push(path);
  }
  return out;
}

// SQL use, not prose: a function call, or LOCK TABLE(S) followed by a table and a lock kind.
const lockUse = [/\b(GET_LOCK|RELEASE_LOCK|RELEASE_ALL_LOCKS|IS_USED_LOCK|IS_FREE_LOCK)\s*\(/i, /\bLOCK\s+TABLES?\s+`?\w+`?(\s+(AS\s+)?\w+)?\s+(READ|WRITE)\b/i, /\bFLUSH\s+TABLES\s+WITH\s+READ\s+LOCK\b/i];
const usesLock = (text: string) => lockUse.some((re) => re.test(text));

describe("no lock that Galera does not replicate", () => {
  const files = SCANNED.flatMap((d) => sourceFiles(join(root, d)));

  it("finds the files it scans", () => {
    expect(files.length).toBeGreaterThan(100);
  });

  it("recognises each kind of lock in SQL and leaves prose about them alone", () => {
    expect(usesLock("SELECT GET_LOCK('migrate', 10)")).toBe(true);
    expect(usesLock("do release_lock ('x')")).toBe(true);
    expect(usesLock("LOCK TABLES layouts WRITE")).toBe(true);
    expect(usesLock("lock table `layouts` as l read")).toBe(true);
    expect(usesLock("FLUSH TABLES WITH READ LOCK")).toBe(true);
    expect(usesLock("// GET_LOCK and LOCK TABLES are local to one Galera node")).toBe(false);
  });

  it("uses none of them in app, lib, models, migrations, scripts or bench", () => {
    expect(files.filter((f) => usesLock(readFileSync(f, "utf8"))).map((f) => relative(root, f))).toEqual([]);
  });
});
