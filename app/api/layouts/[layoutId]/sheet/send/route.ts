import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { sendSheetToInstaller } from "@/lib/server/send-sheet";
import { sendSheetSchema } from "@/lib/sheet/sheet-request-schema";

const params = z.object({ layoutId: idParam });

// POST /api/layouts/:layoutId/sheet/send — e-mail the terminal sheet PDF to the site's assigned installer (409 when the site has none, or when the revision is not approved and confirmUnapproved is not set)
export const POST = route({ permission: "sheet:send", params, body: sendSheetSchema }, async ({ actor, params, body }) => ({ sent: await sendSheetToInstaller(actor, params.layoutId, { size: body.size, confirmUnapproved: body.confirmUnapproved }) }));
