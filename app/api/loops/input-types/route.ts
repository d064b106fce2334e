import { route } from "@/lib/server/route";
import { loopInputTypesFor } from "@/lib/server/loop-analysis";

// GET /api/loops/input-types — the input types a loop can be analysed against (shipped catalog plus the organisation's upload)
export const GET = route({ permission: "loop:analyze" }, async ({ actor }) => ({ inputTypes: await loopInputTypesFor(actor.organisationId) }));
