import { route } from "@/lib/server/route";
import { inviteMember, listMembers } from "@/lib/server/members";
import { inviteSchema } from "@/lib/members/member-schema";

// GET /api/members — members and open invitations of the caller's organisation
export const GET = route({ permission: "members:read" }, async ({ actor }) => listMembers(actor.organisationId));

// POST /api/members — invite someone by e-mail with a role (409 if already a member)
export const POST = route({ permission: "members:manage", body: inviteSchema }, async ({ actor, body }) => inviteMember(actor, body));
