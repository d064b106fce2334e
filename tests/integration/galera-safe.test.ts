import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import { DatabaseError, QueryTypes, Transaction } from "sequelize";
import { testDb, makeOrganisation } from "./support";
import { createSite } from "@/lib/server/sites";
import { confirmImport, listSchedule } from "@/lib/server/schedules";
import { createLayout, saveLayout } from "@/lib/server/layouts";
import { errorResponse } from "@/lib/server/route";
import { withMigrationLock, MIGRATION_LOCK_TABLE } from "@/lib/server/migration-lock";
import { Layout, LayoutRevision } from "@/models";
import type { LayoutDocument } from "@/lib/layout/schema";

// What a Galera cluster asks of the application, proved on the ordinary single MariaDB: every table has a
// primary key and is InnoDB; a write conflict (error 1213) on a layout save is retried once, then a 409;
// the migration lock is a row, so it holds across nodes.

const sequelize = () => testDb();
const rows = <T extends object>(sql: string, replacements: unknown[] = []) => sequelize().query<T>(sql, { type: QueryTypes.SELECT, replacements });

beforeAll(() => {
  testDb();
});

describe("the schema suits Galera", () => {
  it("every table has a primary key and uses InnoDB", async () => {
    // Galera replicates only InnoDB, and rows of a table without a primary key cannot be certified or applied
    // reliably on the other nodes (MariaDB Galera cluster documentation, known limitations; from memory).
    const tables = await rows<{ name: string; engine: string; pk: number }>(
      `SELECT t.TABLE_NAME AS name, t.ENGINE AS engine,
              (SELECT COUNT(*) FROM information_schema.TABLE_CONSTRAINTS c
                WHERE c.TABLE_SCHEMA = t.TABLE_SCHEMA AND c.TABLE_NAME = t.TABLE_NAME AND c.CONSTRAINT_TYPE = 'PRIMARY KEY') AS pk
         FROM information_schema.TABLES t WHERE t.TABLE_SCHEMA = DATABASE() AND t.TABLE_TYPE = 'BASE TABLE' ORDER BY t.TABLE_NAME`,
    );
    expect(tables.length, "the migrated schema has tables").toBeGreaterThan(10);
    expect(tables.map((t) => t.name)).toContain("schema_migration_lock");
    expect(tables.filter((t) => Number(t.pk) !== 1).map((t) => t.name), "tables without a primary key").toEqual([]);
    expect(tables.filter((t) => t.engine !== "InnoDB").map((t) => `${t.name} (${t.engine})`), "tables not on InnoDB").toEqual([]);
  });
});

const csv = [
  "label,type,area,room,cable_m,gauge,supervision",
  "Front door,contact-door-surface,Ground,Hall,12,22 AWG,shared-ok",
  "Hall motion,motion-wall,Ground,Hall,18,22 AWG,single-eol",
].join("\n");

async function layoutFixture() {
  const o = await makeOrganisation("Galera");
  const site = await createSite(o.actors.designer, { name: "Conflict site", address: "", description: "", areas: [] });
  await confirmImport(o.actors.designer, site.id, csv, undefined, true);
  const schedule = await listSchedule(o.actors.designer, site.id);
  const doc = (busCableM: number): LayoutDocument => ({
    panelId: "panel-large-32",
    boards: [],
    inputs: schedule.map((d, i) => ({ boardKey: "panel", input: i + 1, detectorIds: [d.id], scheme: "single-eol", placement: "at-detector" })),
    power: { standbyProfileId: "intruder-grade-2", safetyFactor: 1.2 },
    busCableM,
  });
  const { layout } = await createLayout(o.actors.designer, site.id, { name: "Contended", document: doc(10) });
  return { designer: o.actors.designer, layoutId: layout.id, doc };
}

describe("a write conflict (1213) on a layout save", () => {
  // The server itself raises the error, from a trigger on the revision insert: a counter in a non-transactional
  // (Aria) table says how many more inserts fail, and survives the rollback the error causes.
  beforeAll(async () => {
    await sequelize().query("CREATE TABLE IF NOT EXISTS test_fault_injection (id INT PRIMARY KEY, remaining INT NOT NULL) ENGINE=Aria");
    await sequelize().query("REPLACE INTO test_fault_injection VALUES (1, 0)");
    await sequelize().query("DROP TRIGGER IF EXISTS test_inject_write_conflict");
    await sequelize().query(`CREATE TRIGGER test_inject_write_conflict BEFORE INSERT ON layout_revisions FOR EACH ROW
      BEGIN
        UPDATE test_fault_injection SET remaining = remaining - 1 WHERE id = 1 AND remaining > 0;
        IF ROW_COUNT() > 0 THEN
          SIGNAL SQLSTATE '40001' SET MESSAGE_TEXT = 'Deadlock found when trying to get lock; try restarting transaction (injected)', MYSQL_ERRNO = 1213;
        END IF;
      END`);
  });
  afterAll(async () => {
    await sequelize().query("DROP TRIGGER IF EXISTS test_inject_write_conflict");
    await sequelize().query("DROP TABLE IF EXISTS test_fault_injection");
  });
  const failNext = (n: number) => sequelize().query("UPDATE test_fault_injection SET remaining = ? WHERE id = 1", { replacements: [n] });
  const remaining = async () => (await rows<{ remaining: number }>("SELECT remaining FROM test_fault_injection WHERE id = 1"))[0].remaining;

  it("is retried once: the save is stored exactly once and answered as saved", async () => {
    const { designer, layoutId, doc } = await layoutFixture();
    await failNext(1);
    const saved = await saveLayout(designer, layoutId, { version: 1, document: doc(11), note: "after one conflict" });
    expect(await remaining(), "the injected error was raised").toBe(0);
    expect(saved.layout).toMatchObject({ version: 2, currentRevision: 2 });
    const revisions = await LayoutRevision.findAll({ where: { layoutId }, order: [["revision", "ASC"]] });
    expect(revisions.map((r) => [r.revision, r.note])).toEqual([
      [1, ""],
      [2, "after one conflict"],
    ]);
  });

  it("twice in a row is a 409 with the current version, never a 500, and stores nothing", async () => {
    const { designer, layoutId, doc } = await layoutFixture();
    await failNext(2);
    const error = await saveLayout(designer, layoutId, { version: 1, document: doc(12) }).then(
      () => null,
      (e: unknown) => e,
    );
    expect(await remaining(), "both tries met the injected error").toBe(0);
    const res = errorResponse(error);
    expect(res.status).toBe(409);
    expect(await res.json()).toMatchObject({ currentVersion: 1, code: "write-conflict", error: expect.stringMatching(/at the same moment/) });
    expect(await LayoutRevision.count({ where: { layoutId } })).toBe(1);
    expect((await Layout.findByPk(layoutId))?.version).toBe(1);
  });

  describe("at commit", () => {
    afterEach(() => vi.restoreAllMocks());
    // Galera reports a lost certification when the transaction commits; the commit is made to fail the same way.
    const commitFailsTimes = (n: number, meanwhile?: () => Promise<unknown>) => {
      const real = Transaction.prototype.commit;
      let left = n;
      vi.spyOn(Transaction.prototype, "commit").mockImplementation(async function (this: Transaction) {
        if (left-- <= 0) return real.call(this);
        await this.rollback();
        await meanwhile?.();
        const original = Object.assign(new Error("Deadlock found when trying to get lock; try restarting transaction (injected at commit)"), { errno: 1213, code: "ER_LOCK_DEADLOCK", sqlState: "40001", sql: "COMMIT", parameters: {} });
        throw new DatabaseError(original);
      });
      return () => n - Math.max(left, 0);
    };

    it("once: retried and stored once", async () => {
      const { designer, layoutId, doc } = await layoutFixture();
      const failed = commitFailsTimes(1);
      const saved = await saveLayout(designer, layoutId, { version: 1, document: doc(15), note: "commit retried" });
      expect(failed()).toBe(1);
      expect(saved.layout.version).toBe(2);
      expect((await LayoutRevision.findAll({ where: { layoutId } })).map((r) => r.note).sort()).toEqual(["", "commit retried"]);
    });

    it("twice: 409 with the current version, nothing stored", async () => {
      const { designer, layoutId, doc } = await layoutFixture();
      commitFailsTimes(2);
      const error = await saveLayout(designer, layoutId, { version: 1, document: doc(16) }).then(
        () => null,
        (e: unknown) => e,
      );
      vi.restoreAllMocks();
      const res = errorResponse(error);
      expect(res.status).toBe(409);
      expect(await res.json()).toMatchObject({ currentVersion: 1 });
      expect(await LayoutRevision.count({ where: { layoutId } })).toBe(1);
    });

    it("lost to another save: the retry finds the version moved on and refuses the save as stale", async () => {
      const { designer, layoutId, doc } = await layoutFixture();
      // the conflict's winner commits between the failed commit and the retry
      commitFailsTimes(1, () => saveLayout(designer, layoutId, { version: 1, document: doc(17), note: "winner" }));
      const error = await saveLayout(designer, layoutId, { version: 1, document: doc(18), note: "loser" }).then(
        () => null,
        (e: unknown) => e,
      );
      vi.restoreAllMocks();
      const res = errorResponse(error);
      expect(res.status).toBe(409);
      expect(await res.json()).toMatchObject({ currentVersion: 2, error: expect.stringMatching(/saved by someone else/) });
      expect((await LayoutRevision.findAll({ where: { layoutId } })).map((r) => r.note).sort()).toEqual(["", "winner"]);
    });
  });
});

describe("the migration lock", () => {
  const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

  it("lets two runs through one after the other, never at once", async () => {
    const spans: { start: number; end: number }[] = [];
    const work = async () => {
      const start = Date.now();
      await sleep(400);
      spans.push({ start, end: Date.now() });
    };
    await Promise.all([withMigrationLock(sequelize(), work, { pollMs: 50 }), withMigrationLock(sequelize(), work, { pollMs: 50 })]);
    spans.sort((a, b) => a.start - b.start);
    expect(spans).toHaveLength(2);
    expect(spans[1].start, "the second run began after the first ended").toBeGreaterThanOrEqual(spans[0].end);
    expect(await rows(`SELECT * FROM ${MIGRATION_LOCK_TABLE}`), "the lock row is gone afterwards").toEqual([]);
  });

  it("gives up with the holder's name when the lock stays held, and takes over a lock left by a run that died", async () => {
    await sequelize().query(`INSERT INTO ${MIGRATION_LOCK_TABLE} (id, holder, acquired_at) VALUES (1, 'a run that died', NOW(3) - INTERVAL 10 SECOND)`);
    await expect(withMigrationLock(sequelize(), async () => "ran", { waitMs: 300, pollMs: 50, staleAfterS: 3600 })).rejects.toThrow(/locked by another run \(a run that died/);
    expect(await withMigrationLock(sequelize(), async () => "ran", { waitMs: 300, pollMs: 50, staleAfterS: 5 })).toBe("ran");
    expect(await rows(`SELECT * FROM ${MIGRATION_LOCK_TABLE}`)).toEqual([]);
  });
});
