import { route } from "@/lib/server/route";
import { resendConfirmation } from "@/lib/server/sign-up";
import { emailOnlySchema } from "@/lib/auth/sign-up-schema";

// POST /api/sign-up/resend — public: a new confirmation link for an unconfirmed account (the same answer for any address)
export const POST = route({ permission: null, body: emailOnlySchema }, async ({ body }) => resendConfirmation(body));
