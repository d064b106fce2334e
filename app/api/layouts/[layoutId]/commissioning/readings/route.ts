import { NextResponse } from "next/server";
import { z } from "zod";
import { loopJsonReplacer } from "@/lib/loop";
import { idParam, route } from "@/lib/server/route";
import { recordReading } from "@/lib/server/commissioning";
import { recordReadingSchema } from "@/lib/commissioning/commissioning-schema";

const params = z.object({ layoutId: idParam });

// POST /api/layouts/:layoutId/commissioning/readings — record one meter reading, judged against the approved sheet (201; 200 with the stored reading when the clientId was seen before)
export const POST = route({ permission: "commissioning:record", params, body: recordReadingSchema }, async ({ actor, params, body }) => {
  const r = await recordReading(actor, params.layoutId, body);
  return new NextResponse(JSON.stringify(r, loopJsonReplacer), { status: r.created ? 201 : 200, headers: { "content-type": "application/json" } });
});
