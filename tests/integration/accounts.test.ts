import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { AddressInfo } from "node:net";
import { randomUUID } from "node:crypto";
import { simpleParser, type ParsedMail } from "mailparser";
import { SMTPServer } from "smtp-server";
import { makeOrganisation, testDb } from "./support";
import { Browser, SESSION_COOKIE, installTestRequestScope, signIn } from "./auth-flow";
import { AccountToken, AuditEntry, Membership, Organisation, User } from "@/models";
import { UNCONFIRMED_EMAIL } from "@/lib/auth/sign-up-schema";
import * as auth from "@/app/api/auth/[...nextauth]/route";
import * as sites from "@/app/api/sites/route";
import * as signUpRoute from "@/app/api/sign-up/route";
import * as confirmRoute from "@/app/api/sign-up/confirm/route";
import * as resendRoute from "@/app/api/sign-up/resend/route";
import * as forgotRoute from "@/app/api/password/forgot/route";
import * as resetRoute from "@/app/api/password/reset/route";
import * as changeRoute from "@/app/api/account/password/route";
import * as membersRoute from "@/app/api/members/route";
import * as acceptRoute from "@/app/api/invitations/accept/route";
import * as joinRoute from "@/app/api/invitations/join/route";
import * as orgRoute from "@/app/api/organisation/route";

installTestRequestScope();

// Sign-up with e-mail confirmation, invitations to existing accounts, forgotten and changed passwords, and the
// organisation's settings, through the route handlers with a local SMTP server catching the mail.

const received: { to: string[]; mail: ParsedMail }[] = [];
let smtp: SMTPServer;
const PASSWORD = "test-password-1"; // tests/integration/support.ts
const STRONG = "copper lantern heron 42";

beforeAll(async () => {
  smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS", "AUTH"],
    async onData(stream, session, cb) {
      received.push({ to: session.envelope.rcptTo.map((r) => r.address), mail: await simpleParser(stream) });
      cb();
    },
  });
  await new Promise<void>((resolve) => smtp.listen(0, "127.0.0.1", resolve));
  process.env.SMTP_PORT = String((smtp.server.address() as AddressInfo).port);
  testDb();
});

afterAll(async () => {
  if (smtp) await new Promise<void>((resolve) => smtp.close(() => resolve()));
});

const uniqueEmail = (p: string) => `${p}.${randomUUID().slice(0, 8)}@test.example`;

/** The last mail to `email`, and the token of the link in it after `/path/`. */
async function linkTo(email: string, path: string): Promise<{ mail: ParsedMail; token: string | null }> {
  for (let i = 0; i < 50; i++) {
    const m = received.filter((r) => r.to.includes(email)).at(-1);
    if (m) return { mail: m.mail, token: new RegExp(`/${path}/([A-Za-z0-9_-]+)`).exec(m.mail.text ?? "")?.[1] ?? null };
    await new Promise((r) => setTimeout(r, 50));
  }
  throw new Error(`no mail to ${email}`);
}

const post = (b: Browser, mod: { POST: Parameters<Browser["call"]>[0] }, path: string, json: unknown) => b.call(mod.POST, "POST", path, { json });

describe("organisation sign-up", () => {
  it("makes an organisation and its admin, who signs in only after confirming the e-mail", async () => {
    const email = uniqueEmail("founder");
    const visitor = new Browser();
    const res = await post(visitor, signUpRoute, "/api/sign-up", { organisationName: "Brackenwell Alarms", name: "Wren Hollis", email, password: STRONG });
    expect(res.status).toBe(200);
    const user = await User.findOne({ where: { email } });
    expect(user!.emailConfirmed).toBe(false);
    const membership = await Membership.findOne({ where: { userId: user!.id } });
    expect(membership!.role).toBe("admin");
    expect((await Organisation.findByPk(membership!.organisationId))!.name).toBe("Brackenwell Alarms");

    // Unconfirmed: the right password is refused with the plain reason.
    const early = await signIn(new Browser(), auth.POST, email, STRONG);
    expect(early.ok).toBe(false);
    expect(early.error).toBe(UNCONFIRMED_EMAIL);

    // "Send the link again" makes a new link; the first one stops working.
    const first = (await linkTo(email, "confirm-email")).token!;
    await AccountToken.update({ createdAt: new Date(Date.now() - 60_000) }, { where: { userId: user!.id } }); // past the resend pause
    expect((await post(visitor, resendRoute, "/api/sign-up/resend", { email })).status).toBe(200);
    const second = (await linkTo(email, "confirm-email")).token!;
    expect(second).not.toBe(first);
    expect((await post(visitor, confirmRoute, "/api/sign-up/confirm", { token: first })).status).toBe(404);

    expect((await post(visitor, confirmRoute, "/api/sign-up/confirm", { token: second })).status).toBe(200);
    expect((await User.findByPk(user!.id))!.emailConfirmed).toBe(true);
    // single use
    const again = await post(visitor, confirmRoute, "/api/sign-up/confirm", { token: second });
    expect(again.status).toBe(404);
    expect((await again.json()).error).toMatch(/already been used/);

    const admin = new Browser();
    expect((await signIn(admin, auth.POST, email, STRONG)).ok).toBe(true);
    expect((await admin.call(sites.GET, "GET", "/api/sites")).status).toBe(200);
    expect(await AuditEntry.count({ where: { organisationId: membership!.organisationId, action: "organisation.sign-up" } })).toBe(1);
  });

  it("answers the same for an address that has an account, changes nothing, and tells its owner by mail", async () => {
    const { actors } = await makeOrganisation("Sign-up taken");
    const before = await Organisation.count();
    const res = await post(new Browser(), signUpRoute, "/api/sign-up", { organisationName: "Copycat", name: "Someone", email: actors.designer.email, password: STRONG });
    expect(res.status).toBe(200);
    expect(await Organisation.count()).toBe(before);
    expect((await linkTo(actors.designer.email, "x")).mail.subject).toMatch(/tried to sign up/);
    expect((await signIn(new Browser(), auth.POST, actors.designer.email, PASSWORD)).ok).toBe(true);
  });

  it("refuses a weak password or a bad address beside the field, making nothing", async () => {
    const before = await Organisation.count();
    const res = await post(new Browser(), signUpRoute, "/api/sign-up", { organisationName: "", name: "Ann", email: "not-an-address", password: "short" });
    expect(res.status).toBe(422);
    const paths = ((await res.json()).issues as { path: string }[]).map((i) => i.path).sort();
    expect(paths).toEqual(expect.arrayContaining(["email", "organisationName", "password"]));
    expect(await Organisation.count()).toBe(before);
  });
});

describe("invitations to an address that has an account", () => {
  it("never change its password; a re-invite with another role changes the role only on acceptance", async () => {
    const { actors } = await makeOrganisation("Re-invite");
    const other = await makeOrganisation("Re-invite other");
    const admin = new Browser();
    await signIn(admin, auth.POST, actors.admin.email, PASSWORD);
    const target = other.actors.installer; // has an account in another organisation
    const hashBefore = (await User.findByPk(target.userId))!.passwordHash;

    expect((await post(admin, membersRoute, "/api/members", { email: target.email, role: "designer" })).status).toBe(200);
    const { token } = await linkTo(target.email, "invite");
    // Setting a password through the link is refused for an existing account, and changes nothing.
    const refused = await post(new Browser(), acceptRoute, "/api/invitations/accept", { token, name: "Intruder", password: STRONG });
    expect(refused.status).toBe(409);
    expect((await User.findByPk(target.userId))!.passwordHash).toBe(hashBefore);
    // Signed in as someone else: refused.
    const wrong = new Browser();
    await signIn(wrong, auth.POST, actors.engineer.email, PASSWORD);
    expect((await post(wrong, joinRoute, "/api/invitations/join", { token })).status).toBe(403);
    // Signed in as the account: joins; the session moves to the new organisation; the password is the same.
    const device = new Browser();
    await signIn(device, auth.POST, target.email, PASSWORD);
    expect((await post(device, joinRoute, "/api/invitations/join", { token })).status).toBe(200);
    expect((await Membership.findOne({ where: { userId: target.userId, organisationId: actors.admin.organisationId } }))!.role).toBe("designer");
    expect((await User.findByPk(target.userId))!.passwordHash).toBe(hashBefore);
    const session = (await (await device.call(auth.GET, "GET", "/api/auth/session", { params: { nextauth: ["session"] } })).json()) as { organisationId: number };
    expect(session.organisationId).toBe(actors.admin.organisationId);
    expect((await signIn(new Browser(), auth.POST, target.email, PASSWORD)).ok).toBe(true);

    // Re-invited as engineer: still designer until the link is accepted.
    const m = await Membership.findOne({ where: { userId: target.userId, organisationId: actors.admin.organisationId } });
    expect((await post(admin, membersRoute, "/api/members", { email: target.email, role: "designer" })).status).toBe(409); // the same role: nothing to do
    expect((await post(admin, membersRoute, "/api/members", { email: target.email, role: "engineer" })).status).toBe(200);
    const reinvite = (await linkTo(target.email, "invite")).token!;
    expect((await Membership.findByPk(m!.id))!.role).toBe("designer");
    expect((await post(device, joinRoute, "/api/invitations/join", { token: reinvite })).status).toBe(200);
    expect((await Membership.findByPk(m!.id))!.role).toBe("engineer");
    expect((await User.findByPk(target.userId))!.passwordHash).toBe(hashBefore);
    // The link is used up.
    expect((await post(device, joinRoute, "/api/invitations/join", { token: reinvite })).status).toBe(404);
  });

  it("a new address sets its name and password through the link", async () => {
    const { actors } = await makeOrganisation("Invite new");
    const admin = new Browser();
    await signIn(admin, auth.POST, actors.admin.email, PASSWORD);
    const email = uniqueEmail("newcomer");
    await post(admin, membersRoute, "/api/members", { email, role: "installer" });
    const { token } = await linkTo(email, "invite");
    expect((await post(new Browser(), acceptRoute, "/api/invitations/accept", { token, name: "Newcomer", password: STRONG })).status).toBe(200);
    expect((await signIn(new Browser(), auth.POST, email, STRONG)).ok).toBe(true);
  });
});

describe("forgotten passwords", () => {
  it("gives the same answer for any address; the link works once, for one hour, and ends every session", async () => {
    const { actors } = await makeOrganisation("Forgot");
    const email = actors.engineer.email;
    const device = new Browser();
    await signIn(device, auth.POST, email, PASSWORD);

    const known = await post(new Browser(), forgotRoute, "/api/password/forgot", { email });
    const unknownAddress = uniqueEmail("nobody");
    const unknown = await post(new Browser(), forgotRoute, "/api/password/forgot", { email: unknownAddress });
    expect(known.status).toBe(200);
    expect(unknown.status).toBe(200);
    expect(await known.json()).toEqual(await unknown.json());
    expect((await linkTo(unknownAddress, "reset-password")).token).toBeNull();

    const { token } = await linkTo(email, "reset-password");
    const reset = await post(new Browser(), resetRoute, "/api/password/reset", { token, password: STRONG });
    expect(reset.status).toBe(200);
    expect((await device.call(sites.GET, "GET", "/api/sites")).status).toBe(401); // the other session ended
    expect((await signIn(new Browser(), auth.POST, email, PASSWORD)).ok).toBe(false);
    expect((await signIn(new Browser(), auth.POST, email, STRONG)).ok).toBe(true);
    // single use
    expect((await post(new Browser(), resetRoute, "/api/password/reset", { token, password: "another fine pass 77" })).status).toBe(404);

    // expiry: a link older than an hour is refused and changes nothing
    await post(new Browser(), forgotRoute, "/api/password/forgot", { email });
    const late = (await linkTo(email, "reset-password")).token!;
    await AccountToken.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { userId: actors.engineer.userId, usedAt: null } });
    const expired = await post(new Browser(), resetRoute, "/api/password/reset", { token: late, password: "another fine pass 77" });
    expect(expired.status).toBe(404);
    expect((await expired.json()).error).toMatch(/expired/);
    expect((await signIn(new Browser(), auth.POST, email, STRONG)).ok).toBe(true);
  });

  it("the link's expiry is one hour from the request", async () => {
    const { actors } = await makeOrganisation("Forgot hour");
    const t0 = Date.now();
    await post(new Browser(), forgotRoute, "/api/password/forgot", { email: actors.designer.email });
    const row = await AccountToken.findOne({ where: { userId: actors.designer.userId, purpose: "reset-password" } });
    expect(Math.abs(row!.expiresAt.getTime() - (t0 + 3600_000))).toBeLessThan(5000);
  });
});

describe("changing a password", () => {
  it("needs the current password, ends the other sessions and keeps this one", async () => {
    const { actors } = await makeOrganisation("Change");
    const here = new Browser();
    const elsewhere = new Browser();
    await signIn(here, auth.POST, actors.designer.email, PASSWORD);
    await signIn(elsewhere, auth.POST, actors.designer.email, PASSWORD);

    const wrong = await post(here, changeRoute, "/api/account/password", { currentPassword: "not it at all", newPassword: STRONG });
    expect(wrong.status).toBe(422);
    expect((await wrong.json()).issues[0].path).toBe("currentPassword");
    expect((await elsewhere.call(sites.GET, "GET", "/api/sites")).status).toBe(200);

    const oldCookie = here.jar.get(SESSION_COOKIE);
    const ok = await post(here, changeRoute, "/api/account/password", { currentPassword: PASSWORD, newPassword: STRONG });
    expect(ok.status).toBe(200);
    expect(here.jar.get(SESSION_COOKIE)).not.toBe(oldCookie);
    expect((await here.call(sites.GET, "GET", "/api/sites")).status).toBe(200);
    expect((await elsewhere.call(sites.GET, "GET", "/api/sites")).status).toBe(401);
    expect((await signIn(new Browser(), auth.POST, actors.designer.email, STRONG)).ok).toBe(true);
  });
});

describe("organisation settings", () => {
  it("an admin saves them, with an audit entry per change; the actor carries them; bad values are refused", async () => {
    const { actors, org } = await makeOrganisation("Settings");
    const admin = new Browser();
    await signIn(admin, auth.POST, actors.admin.email, PASSWORD);
    const current = await (await admin.call(orgRoute.GET, "GET", "/api/organisation")).json();
    expect(current).toMatchObject({ currency: "EUR", paper: "a4", units: "metric", soloApproval: false });

    const bad = await admin.call(orgRoute.PATCH, "PATCH", "/api/organisation", { json: { ...current, currency: "XYZ", timeZone: "Mars/Olympus" } });
    expect(bad.status).toBe(422);
    expect(((await bad.json()).issues as { path: string }[]).map((i) => i.path).sort()).toEqual(["currency", "timeZone"]);

    const next = { ...current, currency: "usd", locale: "en-US", timeZone: "America/Chicago", paper: "letter", units: "imperial" };
    const saved = await admin.call(orgRoute.PATCH, "PATCH", "/api/organisation", { json: next });
    expect(saved.status).toBe(200);
    expect((await saved.json()).currency).toBe("USD");
    const entries = await AuditEntry.findAll({ where: { organisationId: org.id, action: "organisation.setting" } });
    expect(entries.map((e) => (e.detail as { setting: string }).setting).sort()).toEqual(["currency", "locale", "paper", "timeZone", "units"]);

    const designer = new Browser();
    await signIn(designer, auth.POST, actors.designer.email, PASSWORD);
    expect((await designer.call(orgRoute.PATCH, "PATCH", "/api/organisation", { json: next })).status).toBe(403);
  });
});
