import { route } from "@/lib/server/route";
import { resetPassword } from "@/lib/server/passwords";
import { resetPasswordSchema } from "@/lib/auth/sign-up-schema";

// POST /api/password/reset — public: sets a new password with the mailed token; every session of the user ends
export const POST = route({ permission: null, body: resetPasswordSchema }, async ({ body }) => resetPassword(body));
