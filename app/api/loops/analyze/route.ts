import { analyzeRequestSchema, loopJsonReplacer } from "@/lib/loop";
import { route } from "@/lib/server/route";
import { analyzeLoopFor } from "@/lib/server/loop-analysis";

// POST /api/loops/analyze — every state × fault reading of a loop, its report, verdicts and findings (422 for an impossible loop, 404 for an unknown input type)
export const POST = route({ permission: "loop:analyze", body: analyzeRequestSchema }, async ({ actor, body }) => {
  const analysis = await analyzeLoopFor(actor.organisationId, body);
  // an open loop reads Infinity, which JSON.stringify would turn into null
  return new Response(JSON.stringify(analysis, loopJsonReplacer), { headers: { "content-type": "application/json" } });
});
