import { NextResponse } from "next/server";
import { route } from "@/lib/server/route";
import { changePassword } from "@/lib/server/passwords";
import { renewSessionCookie } from "@/lib/server/session-cookie";
import { changePasswordSchema } from "@/lib/auth/sign-up-schema";

// POST /api/account/password — the signed-in user changes their password; their other sessions end, this one goes on
export const POST = route({ permission: "account:manage", body: changePasswordSchema }, async ({ actor, body, req }) => {
  const { sessionVersion } = await changePassword(actor, body);
  const res = NextResponse.json({ changed: true });
  await renewSessionCookie(req, res, { sessionVersion });
  return res;
});
