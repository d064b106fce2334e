import { describe, expect, it } from "vitest";
import { randomUUID } from "node:crypto";
import { testDb } from "./support";
import { clearFailures, delayAfter, recordFailure, waitSeconds } from "@/lib/server/throttle";

describe("sign-in slow-down (kept in MariaDB)", () => {
  it("lets the first failures through, then makes each attempt wait longer", async () => {
    testDb();
    const key = `email:${randomUUID()}@test.example`;
    expect(await waitSeconds(key)).toBe(0);
    for (let i = 0; i < 3; i++) await recordFailure(key);
    const wait = await waitSeconds(key);
    expect(wait).toBeGreaterThan(0);
    expect(wait).toBeLessThanOrEqual(delayAfter(3));
    await recordFailure(key);
    expect(await waitSeconds(key)).toBeGreaterThan(wait);
    await clearFailures(key);
    expect(await waitSeconds(key)).toBe(0);
  });

  it("grows the delay monotonically and caps it", () => {
    let last = 0;
    for (let n = 0; n < 40; n++) {
      const d = delayAfter(n);
      expect(d).toBeGreaterThanOrEqual(last);
      last = d;
    }
    // Capped at one minute (was five): a third party cannot keep the real user out for longer at a time.
    expect(delayAfter(1000)).toBe(60);
  });
});
