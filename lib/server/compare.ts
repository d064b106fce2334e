import "server-only";
import { ApiError } from "./errors";
import { listLayouts } from "./layouts";
import { compareSiteLayouts, listSiteDecisions, type ComparisonView, type DecisionView } from "./review";
import { findSite } from "./sites";
import type { Actor } from "./session";
import { can } from "@/lib/auth/permissions";
import { compareRequestSchema } from "@/lib/review/review-schema";

// Everything the compare page shows, loaded once: the site's layouts to pick from, the comparison of the picked
// ones (each solved once, its findings included) and the choices already recorded.

export interface PickerLayout {
  id: number;
  name: string;
  status: string;
  currentRevision: number;
  inputsUsed: number;
  inputsTotal: number;
  errors: number;
}

export interface ComparePage {
  site: { id: number; name: string };
  layouts: PickerLayout[];
  /** The compared layouts' ids, in the order asked; empty when nothing is compared. */
  selected: number[];
  comparison: ComparisonView | null;
  /** Why the asked layouts cannot be compared (a user's mistake, shown beside the picker). */
  error: string | null;
  /** Earlier choices among compared layouts, newest first (only with a comparison). */
  choices: DecisionView[];
  canChoose: boolean;
}

/** The `ids` query ("3,7,9") as layout ids; an empty list when none are asked. */
function askedIds(ids: string | string[] | undefined): { ids: number[] } | { error: string } {
  const raw = (typeof ids === "string" ? ids : "").split(",").map((s) => s.trim()).filter(Boolean).map(Number);
  if (!raw.length) return { ids: [] };
  const parsed = compareRequestSchema.safeParse({ layoutIds: raw });
  return parsed.success ? { ids: parsed.data.layoutIds } : { error: `Cannot compare these: ${parsed.error.issues.map((i) => i.message).join("; ")}.` };
}

/** The compare page of a site (404 for a site of another organisation). */
export async function loadComparePage(actor: Actor, siteId: number, ids: string | string[] | undefined): Promise<ComparePage> {
  const site = await findSite(actor, siteId);
  const layouts = await listLayouts(actor, site.id);
  const asked = askedIds(ids);
  let comparison: ComparisonView | null = null;
  let error = "error" in asked ? asked.error : null;
  if ("ids" in asked && asked.ids.length) {
    try {
      comparison = await compareSiteLayouts(actor, site.id, asked.ids);
    } catch (e) {
      if (!(e instanceof ApiError && e.status === 404)) throw e;
      error = "One of those layouts is not a layout of this site.";
    }
  }
  const choices = comparison ? (await listSiteDecisions(actor, site.id)).filter((d) => d.kind === "choose") : [];
  return {
    site: { id: site.id, name: site.name },
    layouts: layouts.map((l) => ({ id: l.id, name: l.name, status: l.status, currentRevision: l.currentRevision, inputsUsed: l.summary.inputsUsed, inputsTotal: l.summary.inputsTotal, errors: l.summary.counts.error })),
    selected: comparison ? comparison.layouts.map((l) => l.id) : [],
    comparison,
    error,
    choices,
    canChoose: can(actor.role, "layout:write"),
  };
}
