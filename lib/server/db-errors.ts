// What a database error means for the caller, read from the server's error number (the mariadb connector's
// `errno`, which Sequelize keeps on `original` / `parent`). No "server-only": the migration runner uses it too.

type Cause = { errno?: number; code?: string };

export function sqlErrno(e: unknown): number | undefined {
  const x = e as { errno?: number; original?: Cause; parent?: Cause } | null;
  return x?.original?.errno ?? x?.parent?.errno ?? x?.errno;
}

/**
 * 1213 (ER_LOCK_DEADLOCK): an InnoDB deadlock, and also what a Galera node answers when its transaction lost
 * certification against a write made on another node. The transaction was rolled back whole: safe to run again.
 */
export const isWriteConflict = (e: unknown) => sqlErrno(e) === 1213;

/** 1062 (ER_DUP_ENTRY): the key is taken. */
export const isDuplicateKey = (e: unknown) => sqlErrno(e) === 1062 || (e as { name?: string })?.name === "SequelizeUniqueConstraintError";

/**
 * 1047 (ER_UNKNOWN_COM_ERROR) is what a Galera node answers while it is not part of the primary component or not
 * yet synced ("WSREP has not yet prepared node for application use"): the database is not available, not a bug.
 */
export const isNodeNotReady = (e: unknown) => sqlErrno(e) === 1047;
