import NextAuth from "next-auth";
import { authOptions } from "@/lib/server/auth-options";

// GET|POST /api/auth/* — next-auth's sign-in, sign-out, session and CSRF endpoints
const handler = (req: Request, ctx: unknown) => NextAuth(authOptions())(req, ctx);
export { handler as GET, handler as POST };
