import "server-only";
import { createHash, randomBytes } from "node:crypto";
import { Op, type Transaction } from "sequelize";
import { bindModels, db } from "./db";
import { audit } from "./audit";
import { ApiError } from "./errors";
import { sendMail } from "./mail";
import { env } from "./env";
import { Invitation, Membership, Organisation, User } from "@/models";
import { can, roleLabels, type Role } from "@/lib/auth/permissions";
import { passwordStrengthProblem } from "@/lib/auth/password";
import type { AcceptInput, InviteInput, JoinInput } from "@/lib/members/member-schema";
import { hashPassword } from "./password-hash";
import { endSessions } from "./session-version";
import type { Actor } from "./session";

const INVITE_DAYS = 7;
const hashToken = (token: string) => createHash("sha256").update(token).digest("hex");

export async function listMembers(organisationId: number) {
  bindModels();
  const rows = await Membership.findAll({ where: { organisationId }, include: [{ model: User, attributes: ["id", "name", "email"] }], order: [["id", "ASC"]] });
  const invitations = await Invitation.findAll({ where: { organisationId, acceptedAt: null, expiresAt: { [Op.gt]: new Date() } }, order: [["id", "DESC"]] });
  return {
    members: rows.map((m) => {
      const u = (m as Membership & { User: User }).User;
      return { membershipId: m.id, userId: u.id, name: u.name, email: u.email, role: m.role };
    }),
    invitations: invitations.map((i) => ({ id: i.id, email: i.email, role: i.role, expiresAt: i.expiresAt.toISOString() })),
  };
}

export async function inviteMember(actor: Actor, input: InviteInput) {
  const sequelize = db();
  const email = input.email.toLowerCase();
  const existing = await User.findOne({ where: { email }, include: [{ model: Membership, where: { organisationId: actor.organisationId }, required: true }] });
  const current = (existing as (User & { Memberships?: Membership[] }) | null)?.Memberships?.[0];
  // A member is re-invited only to change their role, which changes when they accept.
  if (current && current.role === input.role) throw new ApiError(409, `${email} is already a member of this organisation as ${roleLabels[input.role].toLowerCase()}.`);
  const token = randomBytes(24).toString("base64url");
  const org = await Organisation.findByPk(actor.organisationId);
  await sequelize.transaction(async (transaction) => {
    // The newest invitation to an address is the one that counts: earlier open ones stop working.
    await Invitation.update({ expiresAt: new Date() }, { where: { organisationId: actor.organisationId, email, acceptedAt: null, expiresAt: { [Op.gt]: new Date() } }, transaction });
    const inv = await Invitation.create(
      { organisationId: actor.organisationId, email, role: input.role, tokenHash: hashToken(token), invitedByUserId: actor.userId, expiresAt: new Date(Date.now() + INVITE_DAYS * 864e5), acceptedAt: null },
      { transaction },
    );
    await audit({ organisationId: actor.organisationId, userId: actor.userId, action: "member.invite", entityType: "invitation", entityId: inv.id, detail: { email, role: input.role, ...(current ? { currentRole: current.role } : {}) } }, transaction);
  });
  const link = `${env().NEXTAUTH_URL}/invite/${token}`;
  const role = roleLabels[input.role].toLowerCase();
  const alreadyAccount = !!(await User.findOne({ where: { email }, attributes: ["id"] }));
  await sendMail({
    to: email,
    subject: `You are invited to ${org?.name ?? "an organisation"} on Loopwright`,
    text: current
      ? `${actor.name} invited you to work in ${org?.name} on Loopwright as ${role} (now ${roleLabels[current.role].toLowerCase()}). Your role changes when you accept, signed in with your account (the link works for ${INVITE_DAYS} days):\n${link}\n`
      : alreadyAccount
        ? `${actor.name} invited you to join ${org?.name} on Loopwright as ${role}.\n\nYou already have an account: sign in with it and accept here (the link works for ${INVITE_DAYS} days):\n${link}\n`
        : `${actor.name} invited you to join ${org?.name} on Loopwright as ${role}.\n\nSet your password here (the link works for ${INVITE_DAYS} days):\n${link}\n`,
  });
  return { email, role: input.role };
}

export async function findInvitation(token: string) {
  bindModels();
  const inv = await Invitation.findOne({ where: { tokenHash: hashToken(token) } });
  if (!inv || inv.acceptedAt || inv.expiresAt < new Date()) return null;
  const org = await Organisation.findByPk(inv.organisationId);
  const hasAccount = !!(await User.findOne({ where: { email: inv.email }, attributes: ["id"] }));
  return { email: inv.email, role: inv.role as Role, organisationName: org?.name ?? "", hasAccount };
}

const INVALID_INVITATION = "This invitation link is not valid any more. Ask an admin for a new one.";

async function openInvitation(token: string, transaction: Transaction) {
  const inv = await Invitation.findOne({ where: { tokenHash: hashToken(token) }, transaction, lock: transaction.LOCK.UPDATE });
  if (!inv || inv.acceptedAt || inv.expiresAt < new Date()) throw new ApiError(404, INVALID_INVITATION);
  return inv;
}

/** A new account joins with the name and password it chooses. An address that has an account must sign in and join instead. */
export async function acceptInvitation(input: AcceptInput) {
  const sequelize = db();
  return sequelize.transaction(async (transaction) => {
    const inv = await openInvitation(input.token, transaction);
    if (await User.findOne({ where: { email: inv.email }, attributes: ["id"], transaction }))
      throw new ApiError(409, `${inv.email} already has an account. Sign in with it, then open the invitation link again to accept; your password stays as it is.`);
    const weak = await passwordStrengthProblem(input.password, { name: input.name, email: inv.email });
    if (weak) throw new ApiError(422, "Some fields are not valid.", [{ path: "password", message: weak }]);
    const user = await User.create({ email: inv.email, name: input.name, passwordHash: await hashPassword(input.password) }, { transaction });
    await Membership.create({ organisationId: inv.organisationId, userId: user.id, role: inv.role }, { transaction });
    await inv.update({ acceptedAt: new Date() }, { transaction });
    await audit({ organisationId: inv.organisationId, userId: user.id, action: "member.join", entityType: "membership", entityId: user.id, detail: { role: inv.role } }, transaction);
    return { email: inv.email };
  });
}

/**
 * The signed-in account accepts an invitation to its own address: it joins the organisation, or its role there
 * becomes the invited one. Its password never changes. Returns where the caller's session goes next.
 */
export async function joinInvitation(actor: Actor, input: JoinInput) {
  return db().transaction(async (transaction) => {
    const inv = await openInvitation(input.token, transaction);
    if (inv.email !== actor.email.toLowerCase())
      throw new ApiError(403, `This invitation is for ${inv.email}, and you are signed in as ${actor.email}. Sign out and sign in as ${inv.email} to accept it.`);
    await lockOrganisation(inv.organisationId, transaction);
    const existing = await Membership.findOne({ where: { organisationId: inv.organisationId, userId: actor.userId }, transaction, lock: transaction.LOCK.UPDATE });
    let sessionVersion: number | null = null;
    if (!existing) await Membership.create({ organisationId: inv.organisationId, userId: actor.userId, role: inv.role }, { transaction });
    else if (existing.role !== inv.role) {
      if (inv.role !== "admin") await assertAdminRemains(inv.organisationId, existing, transaction);
      const from = existing.role;
      await existing.update({ role: inv.role }, { transaction });
      // A role change ends the member's other sessions, as when an admin changes it.
      await endSessions(actor.userId, { transaction });
      sessionVersion = (await User.findByPk(actor.userId, { attributes: ["sessionVersion"], transaction }))!.sessionVersion;
      await audit({ organisationId: inv.organisationId, userId: actor.userId, action: "member.role", entityType: "membership", entityId: existing.id, detail: { from, to: inv.role, byInvitation: inv.id } }, transaction);
    }
    await User.update({ emailConfirmed: true }, { where: { id: actor.userId }, transaction });
    await inv.update({ acceptedAt: new Date() }, { transaction });
    await audit({ organisationId: inv.organisationId, userId: actor.userId, action: "member.join", entityType: "membership", entityId: actor.userId, detail: { role: inv.role, existingAccount: true } }, transaction);
    return { organisationId: inv.organisationId, role: inv.role as Role, sessionVersion };
  });
}

/**
 * Refuses (409) a change that would leave the organisation without an admin: `leaving` is the
 * membership about to lose its admin role or be removed. Call it inside the transaction after
 * lockOrganisation, so two admins demoting each other at once are serialised and the second sees the first.
 */
export async function assertAdminRemains(organisationId: number, leaving: Membership, transaction: Transaction) {
  if (leaving.role !== "admin") return;
  // A locking read sees the latest committed rows, whatever the transaction's snapshot.
  const others = await Membership.findAll({ where: { organisationId, role: "admin", id: { [Op.ne]: leaving.id } }, attributes: ["id"], transaction, lock: transaction.LOCK.UPDATE });
  if (others.length === 0) throw new ApiError(409, "This would leave the organisation without an admin. Make another member admin first.");
}

/** Serialises membership changes of one organisation (SELECT ... FOR UPDATE on its row). */
export async function lockOrganisation(organisationId: number, transaction: Transaction) {
  await Organisation.findByPk(organisationId, { attributes: ["id"], transaction, lock: transaction.LOCK.UPDATE });
}

export async function changeRole(actor: Actor, membershipId: number, role: Role) {
  const sequelize = db();
  return sequelize.transaction(async (transaction) => {
    await lockOrganisation(actor.organisationId, transaction);
    const m = await Membership.findOne({ where: { id: membershipId, organisationId: actor.organisationId }, transaction, lock: transaction.LOCK.UPDATE });
    if (!m) throw new ApiError(404, "That member was not found.");
    if (m.userId === actor.userId && role !== "admin") throw new ApiError(409, "You cannot remove your own admin role; ask another admin.");
    if (role !== "admin") await assertAdminRemains(actor.organisationId, m, transaction);
    // The actor's own role is read again under the lock: a change made meanwhile may have taken it away.
    const mine = await Membership.findOne({ where: { userId: actor.userId, organisationId: actor.organisationId }, attributes: ["id", "role"], transaction, lock: transaction.LOCK.UPDATE });
    if (!mine || !can(mine.role, "members:manage")) throw new ApiError(403, "Your own role was changed meanwhile; you may not change roles any more.");
    const before = m.role;
    await m.update({ role }, { transaction });
    // The member's sessions end: they sign in again under the new role.
    if (before !== role) await endSessions(m.userId, { transaction });
    await audit({ organisationId: actor.organisationId, userId: actor.userId, action: "member.role", entityType: "membership", entityId: m.id, detail: { from: before, to: role } }, transaction);
    return { membershipId: m.id, role };
  });
}
