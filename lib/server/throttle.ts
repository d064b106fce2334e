import "server-only";
import { QueryTypes } from "sequelize";
import { SignInThrottle } from "@/models";

// Sign-in slow-down, kept in the database so it holds across app instances. Each attempt is counted
// under two keys: the account (guessing one account's password from many places) and the client
// address (one place trying many accounts). Never a hard lock: the wait doubles and is capped, so a
// third party cannot keep the real user out for longer than MAX_DELAY_S at a time.
const FREE_FAILURES = 3;
// An office behind one address holds many people who mistype: more free failures per address.
const FREE_FAILURES_PER_CLIENT = 10;
const BASE_DELAY_S = 2;
export const MAX_DELAY_S = 60;
// Failures older than this are forgotten: the next one counts from 1 again.
const FORGET_AFTER_S = 15 * 60;

const freeFailures = (key: string) => (key.startsWith("client:") ? FREE_FAILURES_PER_CLIENT : FREE_FAILURES);

export function delayAfter(failures: number, free = FREE_FAILURES): number {
  if (failures < free) return 0;
  return Math.min(MAX_DELAY_S, BASE_DELAY_S * 2 ** Math.min(failures - free, 30));
}

/** The keys one sign-in attempt is counted under. */
export function signInKeys(email: string, clientAddress: string | null): string[] {
  return [`account:${email.toLowerCase()}`, ...(clientAddress ? [`client:${clientAddress}`] : [])];
}

/**
 * The client's address for the slow-down. Behind `trustedProxies` proxies that each append to
 * x-forwarded-for, the entry that many places from the right is the address the outermost proxy saw;
 * entries left of it were written by the client and are ignored. With no trusted proxy the app is
 * reached directly: Next fills x-forwarded-for with the socket address when the request has none,
 * so the rightmost entry is taken (a client that forges the header escapes the per-client key, never the per-account one).
 */
export function clientAddress(headers: Record<string, string | string[] | undefined> | undefined, trustedProxies: number): string | null {
  const raw = headers?.["x-forwarded-for"];
  const hops = (Array.isArray(raw) ? raw.join(",") : (raw ?? ""))
    .split(",")
    .map((h) => h.trim())
    .filter(Boolean);
  if (!hops.length) return null;
  const at = Math.max(0, hops.length - Math.max(1, trustedProxies));
  return hops[at].slice(0, 100).toLowerCase();
}

/** Seconds the caller must still wait before another attempt under these keys (0 when free). */
export async function waitSeconds(keys: string | string[]): Promise<number> {
  const list = typeof keys === "string" ? [keys] : keys;
  if (!list.length) return 0;
  // Elapsed time by the database's clock, so app instances with skewed clocks agree.
  const rows = await SignInThrottle.sequelize!.query<{ key: string; failures: number; ago_ms: number | string }>(
    "SELECT `key`, failures, TIMESTAMPDIFF(MICROSECOND, last_failure_at, UTC_TIMESTAMP(3)) DIV 1000 AS ago_ms FROM sign_in_throttle WHERE `key` IN (?)",
    { replacements: [list], type: QueryTypes.SELECT },
  );
  let wait = 0;
  for (const row of rows) {
    const left = delayAfter(row.failures, freeFailures(row.key)) * 1000 - Number(row.ago_ms);
    wait = Math.max(wait, Math.ceil(left / 1000));
  }
  return wait;
}

/** Counts one failure under each key: one atomic upsert per key, correct under concurrent attempts. */
export async function recordFailure(keys: string | string[]): Promise<void> {
  const seq = SignInThrottle.sequelize!;
  for (const key of typeof keys === "string" ? [keys] : keys)
    await seq.query(
      // `failures` is assigned first, so it sees the previous last_failure_at (left to right, or all at once in SIMULTANEOUS_ASSIGNMENT mode).
      "INSERT INTO sign_in_throttle (`key`, failures, last_failure_at) VALUES (?, 1, UTC_TIMESTAMP(3)) ON DUPLICATE KEY UPDATE failures = IF(last_failure_at < UTC_TIMESTAMP(3) - INTERVAL ? SECOND, 1, failures + 1), last_failure_at = UTC_TIMESTAMP(3)",
      { replacements: [key, FORGET_AFTER_S] },
    );
  // Keys of e-mails that have no account would otherwise stay for ever; trim old rows now and then.
  if (Math.random() < 0.02) await seq.query("DELETE FROM sign_in_throttle WHERE last_failure_at < UTC_TIMESTAMP(3) - INTERVAL ? SECOND LIMIT 500", { replacements: [FORGET_AFTER_S] });
}

export async function clearFailures(key: string): Promise<void> {
  await SignInThrottle.destroy({ where: { key } });
}
