import "server-only";
import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import bcrypt from "bcryptjs";
import { z } from "zod";
import { db } from "./db";
import { env } from "./env";
import { Membership, User } from "@/models";
import { clearFailures, recordFailure, waitSeconds } from "./throttle";
import type { Role } from "@/lib/auth/permissions";
import { safeCallbackUrl } from "@/lib/http/same-origin";

const credentialsSchema = z.object({ email: z.email().max(254), password: z.string().min(1).max(200) });

// Shown to the user as is (next-auth passes a thrown message through as the error).
export const WRONG_CREDENTIALS = "That e-mail and password do not match an account.";

export function authOptions(): NextAuthOptions {
  return {
    secret: env().NEXTAUTH_SECRET,
    session: { strategy: "jwt", maxAge: 12 * 60 * 60 },
    pages: { signIn: "/sign-in" },
    providers: [
      CredentialsProvider({
        name: "E-mail and password",
        credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
        async authorize(raw) {
          db();
          const parsed = credentialsSchema.safeParse(raw);
          if (!parsed.success) throw new Error("Enter your e-mail address and password.");
          const email = parsed.data.email.toLowerCase();
          const key = `email:${email}`;
          const wait = await waitSeconds(key);
          if (wait > 0) throw new Error(`Too many failed attempts. Try again in ${wait} s.`);
          const user = await User.findOne({ where: { email } });
          const ok = !!user?.passwordHash && (await bcrypt.compare(parsed.data.password, user.passwordHash));
          if (!user || !ok) {
            await recordFailure(key);
            throw new Error(WRONG_CREDENTIALS);
          }
          const membership = await Membership.findOne({ where: { userId: user.id }, order: [["id", "ASC"]] });
          if (!membership) throw new Error("This account is not a member of any organisation.");
          await clearFailures(key);
          return { id: String(user.id), email: user.email, name: user.name, organisationId: membership.organisationId, role: membership.role };
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
          const u = user as unknown as { id: string; organisationId: number; role: Role };
          token.userId = Number(u.id);
          token.organisationId = u.organisationId;
          token.role = u.role;
        }
        return token;
      },
      async session({ session, token }) {
        return { ...session, userId: token.userId, organisationId: token.organisationId, role: token.role } as typeof session;
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
