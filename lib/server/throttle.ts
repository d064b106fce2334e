import "server-only";
import { SignInThrottle } from "@/models";

// Sign-in slow-down, kept in the database so it holds across app instances.
const FREE_FAILURES = 3;
const BASE_DELAY_S = 2;
const MAX_DELAY_S = 300;

export function delayAfter(failures: number): number {
  if (failures < FREE_FAILURES) return 0;
  return Math.min(MAX_DELAY_S, BASE_DELAY_S * 2 ** (failures - FREE_FAILURES));
}

/** Seconds the caller must still wait before another attempt for this key (0 when free). */
export async function waitSeconds(key: string, now = new Date()): Promise<number> {
  const row = await SignInThrottle.findByPk(key);
  if (!row) return 0;
  const ready = row.lastFailureAt.getTime() + delayAfter(row.failures) * 1000;
  return Math.max(0, Math.ceil((ready - now.getTime()) / 1000));
}

export async function recordFailure(key: string): Promise<void> {
  const seq = SignInThrottle.sequelize!;
  await seq.query(
    "INSERT INTO sign_in_throttle (`key`, failures, last_failure_at) VALUES (?, 1, UTC_TIMESTAMP(3)) ON DUPLICATE KEY UPDATE failures = failures + 1, last_failure_at = UTC_TIMESTAMP(3)",
    { replacements: [key] },
  );
}

export async function clearFailures(key: string): Promise<void> {
  await SignInThrottle.destroy({ where: { key } });
}
