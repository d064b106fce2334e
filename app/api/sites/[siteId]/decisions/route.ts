import { NextResponse } from "next/server";
import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { chooseLayout, listSiteDecisions } from "@/lib/server/review";
import { chooseLayoutSchema } from "@/lib/review/review-schema";

const params = z.object({ siteId: idParam });

// GET /api/sites/:siteId/decisions — the decision log of the site's layouts (review steps and choices with reasons), newest first
export const GET = route({ permission: "layout:read", params }, async ({ actor, params }) => ({ decisions: await listSiteDecisions(actor, params.siteId) }));

// POST /api/sites/:siteId/decisions — record which of the compared layouts was chosen, and why (201)
export const POST = route({ permission: "layout:write", params, body: chooseLayoutSchema }, async ({ actor, params, body }) =>
  NextResponse.json({ decision: await chooseLayout(actor, params.siteId, body) }, { status: 201 }),
);
