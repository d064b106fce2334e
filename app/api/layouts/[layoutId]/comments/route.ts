import { NextResponse } from "next/server";
import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { addComment, listComments } from "@/lib/server/review";
import { commentSchema } from "@/lib/review/review-schema";

const params = z.object({ layoutId: idParam });

// GET /api/layouts/:layoutId/comments — the layout's comment thread, oldest first
export const GET = route({ permission: "layout:read", params }, async ({ actor, params }) => ({ comments: await listComments(actor, params.layoutId) }));

// POST /api/layouts/:layoutId/comments — add a comment on the layout, a board, an input or a detector (201)
export const POST = route({ permission: "layout:comment", params, body: commentSchema }, async ({ actor, params, body }) =>
  NextResponse.json({ comment: await addComment(actor, params.layoutId, body) }, { status: 201 }),
);
