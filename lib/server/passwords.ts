import "server-only";
import { db } from "./db";
import { audit } from "./audit";
import { ApiError } from "./errors";
import { sendMail } from "./mail";
import { env } from "./env";
import { hashPassword, verifyPassword } from "./password-hash";
import { endSessions } from "./session-version";
import { consumeAccountToken, issueAccountToken, RESET_PASSWORD_HOURS } from "./account-tokens";
import { Membership, User } from "@/models";
import { passwordStrengthProblem } from "@/lib/auth/password";
import type { ChangePasswordInput, EmailOnlyInput, ResetPasswordInput } from "@/lib/auth/sign-up-schema";
import type { Actor } from "./session";

// Forgotten and changed passwords. Setting a password ends every other session of the user (session version).

export const FORGOT_ANSWER = { sent: true, message: "If that address has an account, a link to choose a new password is on its way. It works once, for one hour." } as const;

const weakness = async (password: string, person: { name: string; email: string }, path: string) => {
  const weak = await passwordStrengthProblem(password, person);
  if (weak) throw new ApiError(422, "Some fields are not valid.", [{ path, message: weak }]);
};

async function organisationOf(userId: number) {
  return (await Membership.findOne({ where: { userId }, order: [["id", "ASC"]], attributes: ["organisationId"] }))?.organisationId ?? null;
}

/**
 * The same answer, and about the same work, whether or not the address has an account: one message is sent
 * either way (to an address without an account it says so, which tells only the mailbox's owner).
 */
export async function forgotPassword(input: EmailOnlyInput) {
  const email = input.email.toLowerCase();
  const user = await User.findOne({ where: { email } });
  const base = env().NEXTAUTH_URL;
  if (!user) {
    await sendMail({ to: email, subject: "Loopwright password request", text: `Someone asked to reset the Loopwright password of ${email}, but no account uses this address.\n\nIf it was you, you may have signed up with another address. To start a new organisation: ${base}/sign-up\n` });
    return FORGOT_ANSWER;
  }
  const token = await db().transaction((transaction) => issueAccountToken(user.id, "reset-password", RESET_PASSWORD_HOURS, transaction));
  await sendMail({
    to: email,
    subject: "Choose a new Loopwright password",
    text: `Hello ${user.name},\n\nChoose a new password here (the link works once, for ${RESET_PASSWORD_HOURS} hour):\n${base}/reset-password/${token}\n\nIf you did not ask for this, ignore this message; your password stays as it is.\n`,
  });
  return FORGOT_ANSWER;
}

export async function resetPassword(input: ResetPasswordInput) {
  return db().transaction(async (transaction) => {
    const row = await consumeAccountToken(input.token, "reset-password", transaction);
    const user = await User.findByPk(row.userId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!user) throw new ApiError(404, "This link is not valid any more.");
    await weakness(input.password, user, "password");
    // The link proves the mailbox, so an unconfirmed sign-up is confirmed too.
    await user.update({ passwordHash: await hashPassword(input.password), emailConfirmed: true }, { transaction });
    await endSessions(user.id, { transaction });
    await audit({ organisationId: await organisationOf(user.id), userId: user.id, action: "user.password-reset", entityType: "user", entityId: user.id }, transaction);
    return { email: user.email };
  });
}

/** Changes the signed-in user's password; returns the new session version for the caller's own cookie. */
export async function changePassword(actor: Actor, input: ChangePasswordInput): Promise<{ sessionVersion: number }> {
  return db().transaction(async (transaction) => {
    const user = await User.findByPk(actor.userId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!user) throw new ApiError(401, "Sign in to continue.");
    if (!(await verifyPassword(input.currentPassword, user.passwordHash)))
      throw new ApiError(422, "Some fields are not valid.", [{ path: "currentPassword", message: "That is not your current password" }]);
    await weakness(input.newPassword, user, "newPassword");
    await user.update({ passwordHash: await hashPassword(input.newPassword) }, { transaction });
    await endSessions(user.id, { transaction });
    await audit({ organisationId: actor.organisationId, userId: actor.userId, action: "user.password-change", entityType: "user", entityId: user.id }, transaction);
    await user.reload({ transaction, attributes: ["sessionVersion"] });
    return { sessionVersion: user.sessionVersion };
  });
}
