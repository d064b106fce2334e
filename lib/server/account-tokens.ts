import "server-only";
import { createHash, randomBytes } from "node:crypto";
import { Op, type Transaction } from "sequelize";
import { AccountToken } from "@/models";
import type { AccountTokenPurpose } from "@/models/account";
import { ApiError } from "./errors";

// Single-use links mailed to an account: the token travels only in the e-mail, the database keeps its SHA-256.

export const CONFIRM_EMAIL_HOURS = 48;
export const RESET_PASSWORD_HOURS = 1;

export const hashLinkToken = (token: string) => createHash("sha256").update(token).digest("hex");

/** A new link for the user; earlier unused links of the same purpose stop working. */
export async function issueAccountToken(userId: number, purpose: AccountTokenPurpose, hours: number, transaction: Transaction): Promise<string> {
  const token = randomBytes(32).toString("base64url");
  const now = new Date();
  await AccountToken.update({ usedAt: now }, { where: { userId, purpose, usedAt: null }, transaction });
  await AccountToken.create({ userId, purpose, tokenHash: hashLinkToken(token), expiresAt: new Date(now.getTime() + hours * 3600_000), usedAt: null }, { transaction });
  return token;
}

/** Marks the link used, under a row lock so two clicks at once use it once; refuses an unknown, used or expired link. */
export async function consumeAccountToken(token: string, purpose: AccountTokenPurpose, transaction: Transaction): Promise<AccountToken> {
  const row = await AccountToken.findOne({ where: { tokenHash: hashLinkToken(token), purpose }, transaction, lock: transaction.LOCK.UPDATE });
  if (!row) throw new ApiError(404, "This link is not valid. Open it again from the e-mail, or ask for a new one.");
  if (row.usedAt) throw new ApiError(404, "This link has already been used. Ask for a new one if you still need it.");
  if (row.expiresAt.getTime() <= Date.now()) throw new ApiError(404, "This link has expired. Ask for a new one.");
  await row.update({ usedAt: new Date() }, { transaction });
  return row;
}

/** True when the user was sent a link of this purpose in the last `seconds` (resend requests wait that long). */
export async function sentRecently(userId: number, purpose: AccountTokenPurpose, seconds: number): Promise<boolean> {
  return (await AccountToken.count({ where: { userId, purpose, createdAt: { [Op.gt]: new Date(Date.now() - seconds * 1000) } } })) > 0;
}
