import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { changeRole, roleChangeSchema } from "@/lib/server/members";

// PATCH /api/members/:membershipId — change a member's role
export const PATCH = route({ permission: "members:manage", params: z.object({ membershipId: idParam }), body: roleChangeSchema }, async ({ actor, params, body }) =>
  changeRole(actor, params.membershipId, body.role),
);
