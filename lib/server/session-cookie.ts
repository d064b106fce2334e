import "server-only";
import type { NextRequest, NextResponse } from "next/server";
import { encode, getToken } from "next-auth/jwt";
import type { Role } from "@/lib/auth/permissions";
import { authOptions } from "./auth-options";
import { env } from "./env";

/**
 * Re-issues the caller's own session cookie with the changes (a new session version after a password change,
 * another organisation after joining it), so the session that made the change goes on while every other
 * session of the user ends. A request without a valid session cookie is left as it is.
 */
export async function renewSessionCookie(req: NextRequest, res: NextResponse, changes: { sessionVersion?: number; organisationId?: number; role?: Role }): Promise<void> {
  const options = authOptions();
  const cookie = options.cookies!.sessionToken!;
  const secret = env().NEXTAUTH_SECRET;
  const token = await getToken({ req, secret, cookieName: cookie.name });
  if (!token) return;
  const maxAge = options.session!.maxAge!;
  const value = await encode({ token: { ...token, ...changes }, secret, maxAge });
  res.cookies.set(cookie.name, value, { ...(cookie.options as object), maxAge });
}
