import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { getReview, reviewAction } from "@/lib/server/review";
import { reviewActionSchema } from "@/lib/review/review-schema";

const params = z.object({ layoutId: idParam });

// GET /api/layouts/:layoutId/review — the review state, the steps the caller may take (with reasons for the others), comments and decisions
export const GET = route({ permission: "layout:read", params }, async ({ actor, params }) => getReview(actor, params.layoutId));

// POST /api/layouts/:layoutId/review — one review step: submit, withdraw, approve or reject (approve and reject are the engineer's; 409 from the wrong state or a newer revision)
export const POST = route({ permission: "layout:submit", params, body: reviewActionSchema }, async ({ actor, params, body }) => reviewAction(actor, params.layoutId, body));
