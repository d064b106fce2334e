import { route } from "@/lib/server/route";
import { forgotPassword } from "@/lib/server/passwords";
import { emailOnlySchema } from "@/lib/auth/sign-up-schema";

// POST /api/password/forgot — public: mails a single-use link valid for one hour (the same answer for any address)
export const POST = route({ permission: null, body: emailOnlySchema }, async ({ body }) => forgotPassword(body));
