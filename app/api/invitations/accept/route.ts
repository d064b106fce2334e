import { route } from "@/lib/server/route";
import { acceptInvitation } from "@/lib/server/members";
import { acceptSchema } from "@/lib/members/member-schema";

// POST /api/invitations/accept — public: the invitee sets a name and password with the e-mailed token
export const POST = route({ permission: null, body: acceptSchema }, async ({ body }) => acceptInvitation(body));
