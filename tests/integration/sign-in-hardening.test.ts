import { describe, expect, it } from "vitest";
import { randomUUID } from "node:crypto";
import { Op } from "sequelize";
import { makeOrganisation, testDb } from "./support";
import { Browser, installTestRequestScope, signIn } from "./auth-flow";
import { createHash } from "node:crypto";
import { Invitation, Membership, SignInThrottle, User } from "@/models";
import { acceptInvitation } from "@/lib/server/members";
import { clearFailures, clientAddress, MAX_DELAY_S, recordFailure, signInKeys, waitSeconds } from "@/lib/server/throttle";
import bcrypt from "bcryptjs";
import { DUMMY_HASH, hashPassword, PASSWORD_HASH_COST } from "@/lib/server/password-hash";
import * as auth from "@/app/api/auth/[...nextauth]/route";

installTestRequestScope();
// These tests stand behind one trusted proxy, which appends the client's address to x-forwarded-for.
process.env.LOOPWRIGHT_TRUSTED_PROXIES = "1";

const PASSWORD = "test-password-1";
let addressSeq = 0;
const freshAddress = () => `198.51.100.${(addressSeq++ % 250) + 1}-${randomUUID().slice(0, 6)}`;
const from = (address: string) => new Browser(undefined, { "x-forwarded-for": `203.0.113.7, ${address}` });

async function backdate(key: string, seconds: number) {
  await SignInThrottle.sequelize!.query("UPDATE sign_in_throttle SET last_failure_at = last_failure_at - INTERVAL ? SECOND WHERE `key` = ?", { replacements: [seconds, key] });
}

describe("client address for the slow-down", () => {
  it("takes the entry the trusted proxy appended, never what the client wrote before it", () => {
    expect(clientAddress({ "x-forwarded-for": "1.2.3.4, 10.0.0.9" }, 1)).toBe("10.0.0.9");
    expect(clientAddress({ "x-forwarded-for": "1.2.3.4, 10.0.0.9, 10.0.0.1" }, 2)).toBe("10.0.0.9");
    // Reached directly: Next writes the socket address when the request has none; the rightmost entry is used.
    expect(clientAddress({ "x-forwarded-for": "127.0.0.1" }, 0)).toBe("127.0.0.1");
    expect(clientAddress({}, 1)).toBeNull();
    expect(signInKeys("Ada@Example.test", "10.0.0.9")).toEqual(["account:ada@example.test", "client:10.0.0.9"]);
    expect(signInKeys("ada@example.test", null)).toEqual(["account:ada@example.test"]);
  });
});

describe("sign-in slow-down by account and by client address", () => {
  it("slows one client that tries many accounts, without slowing anyone else", { timeout: 120_000 }, async () => {
    testDb();
    const { actors } = await makeOrganisation("Hardening");
    const address = freshAddress();
    const sprayer = from(address);
    for (let i = 0; i < 12; i++) {
      const r = await signIn(sprayer, auth.POST, `nobody.${randomUUID().slice(0, 8)}@test.example`, "guess-password-1");
      expect(r.ok).toBe(false);
    }
    // Even the right password of an untouched account is refused from that address now.
    const blocked = await signIn(from(address), auth.POST, actors.designer.email, PASSWORD);
    expect(blocked.ok).toBe(false);
    expect(blocked.error).toMatch(/Too many failed attempts/);
    // The same account from another address signs in.
    expect((await signIn(from(freshAddress()), auth.POST, actors.designer.email, PASSWORD)).ok).toBe(true);
  });

  it("never locks an account for longer than a minute, however many failures a third party causes", async () => {
    testDb();
    const { actors } = await makeOrganisation("Hardening");
    const key = `account:${actors.engineer.email}`;
    for (let i = 0; i < 20; i++) await recordFailure(key);
    const wait = await waitSeconds(key);
    expect(wait).toBeGreaterThan(0);
    expect(wait).toBeLessThanOrEqual(MAX_DELAY_S);
    expect(MAX_DELAY_S).toBe(60);

    // The real user, from their own address, is refused during the wait and let in once it is over.
    const owner = from(freshAddress());
    expect((await signIn(owner, auth.POST, actors.engineer.email, PASSWORD)).error).toMatch(/Too many failed attempts/);
    await backdate(key, MAX_DELAY_S + 1);
    expect((await signIn(owner, auth.POST, actors.engineer.email, PASSWORD)).ok).toBe(true);
    // Success starts the account's count again.
    expect(await SignInThrottle.findByPk(key)).toBeNull();
  });

  it("counts concurrent failures exactly (one atomic upsert per key)", async () => {
    testDb();
    const key = `account:${randomUUID()}@test.example`;
    await Promise.all(Array.from({ length: 20 }, () => recordFailure(key)));
    expect((await SignInThrottle.findByPk(key))!.failures).toBe(20);
    await clearFailures(key);
  });

  it("forgets failures after a quiet quarter of an hour", async () => {
    testDb();
    const key = `account:${randomUUID()}@test.example`;
    for (let i = 0; i < 6; i++) await recordFailure(key);
    await backdate(key, 16 * 60);
    await recordFailure(key);
    expect((await SignInThrottle.findByPk(key))!.failures).toBe(1);
    expect(await waitSeconds(key)).toBe(0);
    await clearFailures(key);
  });
});

describe("the same work for unknown e-mails", () => {
  const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

  it("compares unknown e-mails against a dummy hash of the cost real passwords are stored with", async () => {
    expect(bcrypt.getRounds(DUMMY_HASH)).toBe(PASSWORD_HASH_COST);
    expect(bcrypt.getRounds(await hashPassword("gravel lantern otter 19"))).toBe(PASSWORD_HASH_COST);
  });

  it("answers a wrong password for a known e-mail as fast as for an unknown one", { timeout: 180_000 }, async () => {
    testDb();
    const { org } = await makeOrganisation("Hardening");
    // A password stored the way the app stores it (its bcrypt cost), not the tests' cheap hash.
    const known = await User.create({ email: `timed.${randomUUID().slice(0, 8)}@test.example`, name: "Timed", passwordHash: await hashPassword("gravel lantern otter 19") });
    await Membership.create({ organisationId: org.id, userId: known.id, role: "designer" });
    const unknown = `absent.${randomUUID().slice(0, 8)}@test.example`;

    const times = { known: [] as number[], unknown: [] as number[] };
    for (let i = 0; i < 10; i++) {
      for (const [kind, email] of [["known", known.email], ["unknown", unknown]] as const) {
        // A fresh address and a clear account count, so the slow-down never answers instead of the password check.
        await SignInThrottle.destroy({ where: { key: { [Op.like]: `%:${email}` } } });
        const browser = from(freshAddress());
        // CPU time of this process (bcryptjs runs here), in ms: wall time on a shared test machine
        // swings by hundreds of ms, while the leak guarded against is the bcrypt work itself.
        const start = process.cpuUsage();
        const r = await signIn(browser, auth.POST, email, "not-the-password-9");
        const used = process.cpuUsage(start);
        times[kind].push((used.user + used.system) / 1000);
        expect(r.error).toBe("That e-mail and password do not match an account.");
      }
    }
    // A behaviour check, not a speed target: before, unknown e-mails answered without any bcrypt work.
    expect(Math.abs(median(times.known) - median(times.unknown))).toBeLessThan(50);
  });
});

describe("the password rule where a password is set", () => {
  async function invite(email: string) {
    const { org, actors } = await makeOrganisation("Hardening");
    const token = randomUUID() + randomUUID();
    await Invitation.create({ organisationId: org.id, email, role: "designer", tokenHash: createHash("sha256").update(token).digest("hex"), invitedByUserId: actors.admin.userId, expiresAt: new Date(Date.now() + 864e5), acceptedAt: null });
    return token;
  }

  it("refuses common passwords and ones built from the invitee's name or e-mail, with the reason on the password field", async () => {
    testDb();
    const email = `orla.fenwright.${randomUUID().slice(0, 6)}@test.example`;
    const token = await invite(email);
    for (const password of ["password12", "qwerty1234", "fenwright2026", "Orla-Fenwright-1"]) {
      const e = await acceptInvitation({ token, name: "Orla Fenwright", password }).catch((x) => x);
      expect(e).toMatchObject({ status: 422, issues: [{ path: "password", message: expect.stringMatching(/too easy to guess/) }] });
    }
    expect(await User.findOne({ where: { email } })).toBeNull();
    await acceptInvitation({ token, name: "Orla Fenwright", password: "gravel lantern otter 19" });
    expect(await User.findOne({ where: { email } })).not.toBeNull();
  });

  it("existing users keep signing in with a password the rule would now refuse (the rule applies when a password is set)", async () => {
    testDb();
    const { actors } = await makeOrganisation("Hardening");
    await User.update({ passwordHash: await bcrypt.hash("password12", 4) }, { where: { id: actors.installer.userId } });
    expect((await signIn(from(freshAddress()), auth.POST, actors.installer.email, "password12")).ok).toBe(true);
  });
});
