import { NextResponse } from "next/server";
import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { placeItem } from "@/lib/server/plans";
import { placeItemSchema } from "@/lib/plan/plan-schema";

const params = z.object({ siteId: idParam, planId: idParam });

// POST /api/sites/:siteId/plans/:planId/items — place a scheduled detector (once per site; 409 when already placed) or another device on the plan; 201
export const POST = route({ permission: "schedule:write", params, body: placeItemSchema }, async ({ actor, params, body }) => NextResponse.json(await placeItem(actor, params.siteId, params.planId, body), { status: 201 }));
