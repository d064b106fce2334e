import { randomUUID } from "node:crypto";
import { hostname } from "node:os";
import { QueryTypes, type Sequelize } from "sequelize";
import { isDuplicateKey, isWriteConflict } from "./db-errors";

// The lock that keeps two migration runs apart: one row with a fixed primary key. GET_LOCK and LOCK TABLES are
// local to one Galera node and not replicated; a row insert is, and certification lets only one of two inserts
// of the same key commit, whichever node each was sent to. A holder that died leaves its row: it is taken over
// once older than `staleAfterS`.

export const MIGRATION_LOCK_TABLE = "schema_migration_lock";

export interface MigrationLockOptions {
  waitMs?: number;
  staleAfterS?: number;
  pollMs?: number;
}

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

export async function withMigrationLock<T>(sequelize: Sequelize, fn: () => Promise<T>, opts: MigrationLockOptions = {}): Promise<T> {
  const { waitMs = 10 * 60_000, staleAfterS = 30 * 60, pollMs = 500 } = opts;
  await sequelize.query(
    `CREATE TABLE IF NOT EXISTS ${MIGRATION_LOCK_TABLE} (id TINYINT UNSIGNED NOT NULL PRIMARY KEY, holder VARCHAR(200) NOT NULL, acquired_at DATETIME(3) NOT NULL) ENGINE=InnoDB`,
  );
  const holder = `${hostname()} pid ${process.pid} ${randomUUID()}`;
  const deadline = Date.now() + waitMs;
  for (;;) {
    await sequelize.query(`DELETE FROM ${MIGRATION_LOCK_TABLE} WHERE id = 1 AND acquired_at < NOW(3) - INTERVAL ? SECOND`, { replacements: [staleAfterS] });
    try {
      await sequelize.query(`INSERT INTO ${MIGRATION_LOCK_TABLE} (id, holder, acquired_at) VALUES (1, ?, NOW(3))`, { replacements: [holder] });
      break;
    } catch (e) {
      if (!isDuplicateKey(e) && !isWriteConflict(e)) throw e;
    }
    if (Date.now() > deadline) {
      const [row] = await sequelize.query<{ holder: string; acquired_at: Date }>(`SELECT holder, acquired_at FROM ${MIGRATION_LOCK_TABLE} WHERE id = 1`, { type: QueryTypes.SELECT });
      throw new Error(`Migrations are locked by another run (${row?.holder ?? "gone meanwhile"}, since ${row?.acquired_at?.toISOString?.() ?? "?"}); try again when it has finished.`);
    }
    await sleep(pollMs);
  }
  try {
    return await fn();
  } finally {
    await sequelize.query(`DELETE FROM ${MIGRATION_LOCK_TABLE} WHERE id = 1 AND holder = ?`, { replacements: [holder] });
  }
}
