import "server-only";
import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { bindModels } from "./db";
import { env } from "./env";
import { Membership, User } from "@/models";
import { clearFailures, clientAddress, recordFailure, signInKeys, waitSeconds } from "./throttle";
import { verifyPassword } from "./password-hash";
import { endSessions } from "./session-version";
import type { Role } from "@/lib/auth/permissions";
import { signInSchema } from "@/lib/auth/sign-in-schema";
import { UNCONFIRMED_EMAIL } from "@/lib/auth/sign-up-schema";
import { safeCallbackUrl } from "@/lib/http/same-origin";
import { decodeSessionToken, encodeSessionToken } from "./session-token";

// Shown to the user as is (next-auth passes a thrown message through as the error).
export const WRONG_CREDENTIALS = "That e-mail and password do not match an account.";

export function authOptions(): NextAuthOptions {
  return {
    secret: env().NEXTAUTH_SECRET,
    session: { strategy: "jwt", maxAge: 12 * 60 * 60 },
    // next-auth's own token format, with the derived key kept rather than derived for every request
    jwt: { encode: encodeSessionToken, decode: decodeSessionToken as NonNullable<NextAuthOptions["jwt"]>["decode"] },
    pages: { signIn: "/sign-in" },
    providers: [
      CredentialsProvider({
        name: "E-mail and password",
        credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
        async authorize(raw, req) {
          bindModels();
          const parsed = signInSchema.safeParse(raw);
          if (!parsed.success) throw new Error("Enter your e-mail address and password.");
          const email = parsed.data.email.toLowerCase();
          const keys = signInKeys(email, clientAddress(req?.headers, env().LOOPWRIGHT_TRUSTED_PROXIES));
          const wait = await waitSeconds(keys);
          if (wait > 0) throw new Error(`Too many failed attempts. Try again in ${wait} s.`);
          const user = await User.findOne({ where: { email } });
          // The same bcrypt work whether or not the e-mail has an account (see password-hash.ts).
          const ok = await verifyPassword(parsed.data.password, user?.passwordHash);
          if (!user || !ok) {
            await recordFailure(keys);
            throw new Error(WRONG_CREDENTIALS);
          }
          // Said only after the right password, so it reveals nothing to someone guessing addresses.
          if (!user.emailConfirmed) throw new Error(UNCONFIRMED_EMAIL);
          const membership = await Membership.findOne({ where: { userId: user.id }, order: [["id", "ASC"]] });
          if (!membership) throw new Error("This account is not a member of any organisation.");
          // The account's count starts again; the address's count does not, or one own account would reset it between guesses.
          await clearFailures(keys[0]);
          return { id: String(user.id), email: user.email, name: user.name, organisationId: membership.organisationId, role: membership.role, sessionVersion: user.sessionVersion };
        },
      }),
    ],
    callbacks: {
      // Only the app's own origin after sign-in or sign-out ("/\host" and "//host" name another host).
      async redirect({ url, baseUrl }) {
        const origin = new URL(baseUrl).origin;
        return `${origin}${safeCallbackUrl(url, origin)}`;
      },
      async jwt({ token, user }) {
        if (user) {
          const u = user as unknown as { id: string; organisationId: number; role: Role; sessionVersion: number };
          token.userId = Number(u.id);
          token.organisationId = u.organisationId;
          token.role = u.role;
          token.sessionVersion = u.sessionVersion;
        }
        return token;
      },
      async session({ session, token }) {
        return { ...session, userId: token.userId, organisationId: token.organisationId, role: token.role, sessionVersion: token.sessionVersion } as typeof session;
      },
    },
    events: {
      // Sign-out reaches the server (POST /api/auth/signout): raising the version ends this session
      // everywhere, including copies of its cookie. Only a still-current token may do so.
      async signOut({ token }) {
        const t = token as { userId?: unknown; sessionVersion?: unknown } | null;
        if (typeof t?.userId !== "number" || typeof t.sessionVersion !== "number") return;
        bindModels();
        await endSessions(t.userId, { ifVersion: t.sessionVersion });
      },
    },
    cookies: {
      sessionToken: {
        name: "loopwright.session",
        options: { httpOnly: true, sameSite: "lax", path: "/", secure: env().NEXTAUTH_URL.startsWith("https://") },
      },
    },
  };
}
