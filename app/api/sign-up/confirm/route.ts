import { route } from "@/lib/server/route";
import { confirmEmail } from "@/lib/server/sign-up";
import { confirmEmailSchema } from "@/lib/auth/sign-up-schema";

// POST /api/sign-up/confirm — public: confirms the e-mail address with the mailed single-use token
export const POST = route({ permission: null, body: confirmEmailSchema }, async ({ body }) => confirmEmail(body));
