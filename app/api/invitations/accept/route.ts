import { route } from "@/lib/server/route";
import { acceptInvitation, acceptSchema } from "@/lib/server/members";

// POST /api/invitations/accept — public: the invitee sets a name and password with the e-mailed token
export const POST = route({ permission: null, body: acceptSchema }, async ({ body }) => acceptInvitation(body));
