import { route } from "@/lib/server/route";
import { signUp } from "@/lib/server/sign-up";
import { signUpSchema } from "@/lib/auth/sign-up-schema";

// POST /api/sign-up — public: a new organisation and its first admin, who confirms the e-mail through a mailed link
export const POST = route({ permission: null, body: signUpSchema }, async ({ body }) => signUp(body));
