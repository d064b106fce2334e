import { NextResponse } from "next/server";
import { route } from "@/lib/server/route";
import { joinInvitation } from "@/lib/server/members";
import { renewSessionCookie } from "@/lib/server/session-cookie";
import { joinSchema } from "@/lib/members/member-schema";

// POST /api/invitations/join — the signed-in account accepts an invitation to its own address (joins, or takes the
// invited role); its password never changes, and its session moves to that organisation
export const POST = route({ permission: "account:manage", body: joinSchema }, async ({ actor, body, req }) => {
  const joined = await joinInvitation(actor, body);
  const res = NextResponse.json({ organisationId: joined.organisationId, role: joined.role });
  await renewSessionCookie(req, res, { organisationId: joined.organisationId, role: joined.role, ...(joined.sessionVersion !== null ? { sessionVersion: joined.sessionVersion } : {}) });
  return res;
});
