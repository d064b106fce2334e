import "server-only";
import bcrypt from "bcryptjs";
import { PASSWORD_HASH_COST } from "@/lib/auth/password";

export { PASSWORD_HASH_COST };

// A hash of a random password nobody knows, at the same cost: an unknown e-mail costs the same bcrypt
// work as a known one, so the response time does not tell which e-mails have accounts.
export const DUMMY_HASH = "$2b$12$OYLnk5W7cinlMv5JAHI7ne45chtUe/ozBa5HcS9prxBHJ.bEyXofW";

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, PASSWORD_HASH_COST);
}

/** True when the password matches; false, after the same work, when there is no hash to match. */
export async function verifyPassword(password: string, hash: string | null | undefined): Promise<boolean> {
  const ok = await bcrypt.compare(password, hash ?? DUMMY_HASH);
  return ok && !!hash;
}
