import { NextResponse } from "next/server";
import { route } from "@/lib/server/route";
import { openApiDocument } from "@/lib/openapi/document";

// GET /api/openapi.json — public: the OpenAPI 3.1 description of this API
export const GET = route({ permission: null }, async () => NextResponse.json(openApiDocument(), { headers: { "cache-control": "public, max-age=300" } }));
