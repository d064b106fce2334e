import "server-only";
import { Op, type Transaction } from "sequelize";
import { User } from "@/models";
import { forgetMember } from "./actor-cache";

/**
 * Ends every session of the user signed in before now: each session token carries the user's
 * session version from sign-in, and currentActor refuses a token whose version is no longer current.
 * The cached session checks of the user are forgotten (lib/server/actor-cache.ts).
 * With `ifVersion`, only a session still current may end them (a stale copied cookie cannot sign the owner out).
 */
export async function endSessions(userId: number, options: { transaction?: Transaction; ifVersion?: number } = {}): Promise<boolean> {
  const where = options.ifVersion === undefined ? { id: userId } : { id: userId, sessionVersion: { [Op.eq]: options.ifVersion } };
  const [, affected] = await User.increment("sessionVersion", { by: 1, where, transaction: options.transaction });
  forgetMember(userId, options.transaction);
  return (affected ?? 0) > 0;
}
