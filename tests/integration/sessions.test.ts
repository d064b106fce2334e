import { describe, expect, it } from "vitest";
import { createHash, randomBytes } from "node:crypto";
import { makeOrganisation, testDb } from "./support";
import { Browser, SESSION_COOKIE, signIn, signOut, installTestRequestScope } from "./auth-flow";
import { Invitation, Membership, User } from "@/models";
import { acceptInvitation, changeRole } from "@/lib/server/members";
import * as auth from "@/app/api/auth/[...nextauth]/route";
import * as sites from "@/app/api/sites/route";
import * as members from "@/app/api/members/[membershipId]/route";

installTestRequestScope();

// The test organisation's members all have this password (tests/integration/support.ts).
const PASSWORD = "test-password-1";

/** A second client that presents a copy of `from`'s session cookie and nothing else. */
function copyOf(from: Browser): Browser {
  const thief = new Browser();
  thief.jar.set(SESSION_COOKIE, from.jar.get(SESSION_COOKIE)!);
  return thief;
}

describe("sessions that end", () => {
  it("a copied session cookie stops working once its owner signs out", async () => {
    testDb();
    const { actors } = await makeOrganisation("Sessions");
    const owner = new Browser();
    expect((await signIn(owner, auth.POST, actors.designer.email, PASSWORD)).ok).toBe(true);
    expect((await owner.call(sites.GET, "GET", "/api/sites")).status).toBe(200);
    const thief = copyOf(owner);
    expect((await thief.call(sites.GET, "GET", "/api/sites")).status).toBe(200);

    expect((await signOut(owner, auth.POST)).status).toBe(200);
    expect(owner.jar.has(SESSION_COOKIE)).toBe(false);
    expect((await thief.call(sites.GET, "GET", "/api/sites")).status).toBe(401);

    // Signing in again works, with a new cookie; the old copy stays dead.
    expect((await signIn(owner, auth.POST, actors.designer.email, PASSWORD)).ok).toBe(true);
    expect((await owner.call(sites.GET, "GET", "/api/sites")).status).toBe(200);
    expect((await thief.call(sites.GET, "GET", "/api/sites")).status).toBe(401);
  });

  it("a sign-out with an already ended cookie does not end the newer session", async () => {
    testDb();
    const { actors } = await makeOrganisation("Sessions");
    const owner = new Browser();
    await signIn(owner, auth.POST, actors.installer.email, PASSWORD);
    const stale = copyOf(owner);
    await signOut(owner, auth.POST);
    await signIn(owner, auth.POST, actors.installer.email, PASSWORD);
    await signOut(stale, auth.POST);
    expect((await owner.call(sites.GET, "GET", "/api/sites")).status).toBe(200);
  });

  it("a role change ends the member's sessions at once", async () => {
    testDb();
    const { actors } = await makeOrganisation("Sessions");
    const engineer = new Browser();
    await signIn(engineer, auth.POST, actors.engineer.email, PASSWORD);
    expect((await engineer.call(sites.GET, "GET", "/api/sites")).status).toBe(200);

    const admin = new Browser();
    await signIn(admin, auth.POST, actors.admin.email, PASSWORD);
    const m = await Membership.findOne({ where: { userId: actors.engineer.userId, organisationId: actors.engineer.organisationId } });
    const res = await admin.call(members.PATCH, "PATCH", `/api/members/${m!.id}`, { params: { membershipId: String(m!.id) }, json: { role: "installer" } });
    expect(res.status).toBe(200);
    expect((await engineer.call(sites.GET, "GET", "/api/sites")).status).toBe(401);
    // The admin's own session is untouched.
    expect((await admin.call(sites.GET, "GET", "/api/sites")).status).toBe(200);

    // The same through the service function (what the page's action calls).
    const designer = new Browser();
    await signIn(designer, auth.POST, actors.designer.email, PASSWORD);
    const d = await Membership.findOne({ where: { userId: actors.designer.userId } });
    await changeRole(actors.admin, d!.id, "engineer");
    expect((await designer.call(sites.GET, "GET", "/api/sites")).status).toBe(401);
  });

  it("an invitation link never sets a password anew for an existing account, and its sessions go on", async () => {
    testDb();
    const { actors } = await makeOrganisation("Sessions");
    const other = await makeOrganisation("Sessions other");
    const device = new Browser();
    await signIn(device, auth.POST, actors.installer.email, PASSWORD);
    const before = await User.findByPk(actors.installer.userId);

    const token = randomBytes(24).toString("base64url");
    await Invitation.create({
      organisationId: other.org.id,
      email: actors.installer.email,
      role: "designer",
      tokenHash: createHash("sha256").update(token).digest("hex"),
      invitedByUserId: other.actors.admin.userId,
      expiresAt: new Date(Date.now() + 864e5),
      acceptedAt: null,
    });
    await expect(acceptInvitation({ token, name: "Test installer", password: "gravel lantern otter 19" })).rejects.toMatchObject({ status: 409 });
    const after = await User.findByPk(actors.installer.userId);
    expect(after!.passwordHash).toBe(before!.passwordHash);
    expect(after!.sessionVersion).toBe(before!.sessionVersion);
    expect((await device.call(sites.GET, "GET", "/api/sites")).status).toBe(200);
  });
});
