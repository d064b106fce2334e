import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { changeRole } from "@/lib/server/members";
import { roleChangeSchema } from "@/lib/members/member-schema";

// PATCH /api/members/:membershipId — change a member's role
export const PATCH = route({ permission: "members:manage", params: z.object({ membershipId: idParam }), body: roleChangeSchema }, async ({ actor, params, body }) =>
  changeRole(actor, params.membershipId, body.role),
);
