import "server-only";
import { db } from "./db";
import { audit } from "./audit";
import { ApiError } from "./errors";
import { sendMail } from "./mail";
import { env } from "./env";
import { hashPassword } from "./password-hash";
import { CONFIRM_EMAIL_HOURS, consumeAccountToken, issueAccountToken, sentRecently } from "./account-tokens";
import { Membership, Organisation, User } from "@/models";
import { passwordStrengthProblem } from "@/lib/auth/password";
import type { ConfirmEmailInput, EmailOnlyInput, SignUpInput } from "@/lib/auth/sign-up-schema";

// Sign-up makes an organisation and its first admin, whose address is confirmed through a mailed link before
// the account can sign in. The answer is the same whether or not the address already has an account (the
// address's owner is told by mail instead), so the form does not reveal who has one.

export const SIGN_UP_ANSWER = { sent: true, message: "Check your inbox: we sent a link to confirm your e-mail address." } as const;

const confirmLink = (token: string) => `${env().NEXTAUTH_URL}/confirm-email/${token}`;

async function mailConfirmation(email: string, name: string, organisationName: string, token: string) {
  await sendMail({
    to: email,
    subject: "Confirm your e-mail address for Loopwright",
    text: `Hello ${name},\n\nConfirm your e-mail address to start using ${organisationName} on Loopwright (the link works for ${CONFIRM_EMAIL_HOURS} hours, once):\n${confirmLink(token)}\n\nIf you did not sign up, ignore this message.\n`,
  });
}

export async function signUp(input: SignUpInput) {
  const email = input.email.toLowerCase();
  const weak = await passwordStrengthProblem(input.password, { name: input.name, email });
  if (weak) throw new ApiError(422, "Some fields are not valid.", [{ path: "password", message: weak }]);
  // Hashed before the lookup so that both answers cost the same bcrypt work.
  const passwordHash = await hashPassword(input.password);
  const existing = await User.findOne({ where: { email } });
  if (existing) {
    if (!existing.emailConfirmed) await resendConfirmation({ email });
    else
      await sendMail({
        to: email,
        subject: "Someone tried to sign up to Loopwright with your address",
        text: `Someone, perhaps you, tried to sign up a new organisation with ${email}, which already has an account.\n\nSign in at ${env().NEXTAUTH_URL}/sign-in, or choose a new password at ${env().NEXTAUTH_URL}/forgot-password.\nAn admin of an organisation can invite your account to it.\n`,
      });
    return SIGN_UP_ANSWER;
  }
  const { token, org } = await db().transaction(async (transaction) => {
    const org = await Organisation.create({ name: input.organisationName }, { transaction });
    const user = await User.create({ email, name: input.name, passwordHash, emailConfirmed: false }, { transaction });
    await Membership.create({ organisationId: org.id, userId: user.id, role: "admin" }, { transaction });
    const token = await issueAccountToken(user.id, "confirm-email", CONFIRM_EMAIL_HOURS, transaction);
    await audit({ organisationId: org.id, userId: user.id, action: "organisation.sign-up", entityType: "organisation", entityId: org.id, detail: { name: org.name, email } }, transaction);
    return { token, org };
  });
  await mailConfirmation(email, input.name, org.name, token);
  return SIGN_UP_ANSWER;
}

export async function confirmEmail(input: ConfirmEmailInput) {
  return db().transaction(async (transaction) => {
    const row = await consumeAccountToken(input.token, "confirm-email", transaction);
    const user = await User.findByPk(row.userId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!user) throw new ApiError(404, "This link is not valid any more.");
    await user.update({ emailConfirmed: true }, { transaction });
    const membership = await Membership.findOne({ where: { userId: user.id }, order: [["id", "ASC"]], transaction });
    await audit({ organisationId: membership?.organisationId ?? null, userId: user.id, action: "user.email-confirmed", entityType: "user", entityId: user.id, detail: { email: user.email } }, transaction);
    return { email: user.email, confirmed: true };
  });
}

/** A new confirmation link for an unconfirmed account; the same answer for any other address. */
export async function resendConfirmation(input: EmailOnlyInput) {
  const email = input.email.toLowerCase();
  const user = await User.findOne({ where: { email } });
  if (user && !user.emailConfirmed && !(await sentRecently(user.id, "confirm-email", 30))) {
    const membership = await Membership.findOne({ where: { userId: user.id }, include: [{ model: Organisation, attributes: ["name"] }], order: [["id", "ASC"]] });
    const token = await db().transaction((transaction) => issueAccountToken(user.id, "confirm-email", CONFIRM_EMAIL_HOURS, transaction));
    await mailConfirmation(email, user.name, (membership as (Membership & { Organisation?: Organisation }) | null)?.Organisation?.name ?? "your organisation", token);
  }
  return { sent: true, message: "If that address has an account waiting for confirmation, a new link is on its way." };
}
