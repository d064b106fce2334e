import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { addRoom } from "@/lib/server/site-structure";
import { addRoomSchema } from "@/lib/sites/site-schema";

const params = z.object({ siteId: idParam });

// POST /api/sites/:siteId/rooms — add one room to an area (the detector form's "add a new room")
export const POST = route({ permission: "site:write", params, body: addRoomSchema }, async ({ actor, params, body }) => addRoom(actor, params.siteId, body));
