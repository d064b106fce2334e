import "server-only";
import { createHash, randomBytes } from "node:crypto";
import bcrypt from "bcryptjs";
import { Op } from "sequelize";
import { bindModels, db } from "./db";
import { audit } from "./audit";
import { ApiError } from "./errors";
import { sendMail } from "./mail";
import { env } from "./env";
import { Invitation, Membership, Organisation, User } from "@/models";
import { roleLabels, type Role } from "@/lib/auth/permissions";
import type { AcceptInput, InviteInput } from "@/lib/members/member-schema";
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
  if (existing) throw new ApiError(409, `${email} is already a member of this organisation.`);
  const token = randomBytes(24).toString("base64url");
  const org = await Organisation.findByPk(actor.organisationId);
  await sequelize.transaction(async (transaction) => {
    const inv = await Invitation.create(
      { organisationId: actor.organisationId, email, role: input.role, tokenHash: hashToken(token), invitedByUserId: actor.userId, expiresAt: new Date(Date.now() + INVITE_DAYS * 864e5), acceptedAt: null },
      { transaction },
    );
    await audit({ organisationId: actor.organisationId, userId: actor.userId, action: "member.invite", entityType: "invitation", entityId: inv.id, detail: { email, role: input.role } }, transaction);
  });
  const link = `${env().NEXTAUTH_URL}/invite/${token}`;
  await sendMail({
    to: email,
    subject: `You are invited to ${org?.name ?? "an organisation"} on Loopwright`,
    text: `${actor.name} invited you to join ${org?.name} on Loopwright as ${roleLabels[input.role].toLowerCase()}.\n\nSet your password here (the link works for ${INVITE_DAYS} days):\n${link}\n`,
  });
  return { email, role: input.role };
}

export async function findInvitation(token: string) {
  bindModels();
  const inv = await Invitation.findOne({ where: { tokenHash: hashToken(token) } });
  if (!inv || inv.acceptedAt || inv.expiresAt < new Date()) return null;
  const org = await Organisation.findByPk(inv.organisationId);
  return { email: inv.email, role: inv.role as Role, organisationName: org?.name ?? "" };
}

export async function acceptInvitation(input: AcceptInput) {
  const sequelize = db();
  return sequelize.transaction(async (transaction) => {
    const inv = await Invitation.findOne({ where: { tokenHash: hashToken(input.token) }, transaction, lock: transaction.LOCK.UPDATE });
    if (!inv || inv.acceptedAt || inv.expiresAt < new Date()) throw new ApiError(404, "This invitation link is not valid any more. Ask an admin for a new one.");
    const passwordHash = await bcrypt.hash(input.password, 12);
    let user = await User.findOne({ where: { email: inv.email }, transaction });
    if (user) await user.update({ passwordHash, name: input.name }, { transaction });
    else user = await User.create({ email: inv.email, name: input.name, passwordHash }, { transaction });
    await Membership.findOrCreate({ where: { organisationId: inv.organisationId, userId: user.id }, defaults: { organisationId: inv.organisationId, userId: user.id, role: inv.role }, transaction });
    await inv.update({ acceptedAt: new Date() }, { transaction });
    await audit({ organisationId: inv.organisationId, userId: user.id, action: "member.join", entityType: "membership", entityId: user.id, detail: { role: inv.role } }, transaction);
    return { email: inv.email };
  });
}

export async function changeRole(actor: Actor, membershipId: number, role: Role) {
  const sequelize = db();
  return sequelize.transaction(async (transaction) => {
    const m = await Membership.findOne({ where: { id: membershipId, organisationId: actor.organisationId }, transaction, lock: transaction.LOCK.UPDATE });
    if (!m) throw new ApiError(404, "That member was not found.");
    if (m.userId === actor.userId && role !== "admin") throw new ApiError(409, "You cannot remove your own admin role; ask another admin.");
    const before = m.role;
    await m.update({ role }, { transaction });
    await audit({ organisationId: actor.organisationId, userId: actor.userId, action: "member.role", entityType: "membership", entityId: m.id, detail: { from: before, to: role } }, transaction);
    return { membershipId: m.id, role };
  });
}
