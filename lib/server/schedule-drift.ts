import "server-only";
import { findLayoutForReview } from "./sheets";
import { frozenInputs } from "./snapshots";
import { ensureCan, loadSchedule } from "./schedules";
import type { Actor } from "./session";
import { LayoutRevision } from "@/models";
import { layoutDocumentSchema } from "@/lib/layout/schema";
import { scheduleDrift, type ScheduleDrift } from "@/lib/review/schedule-drift";

// How far the live schedule has moved from the one the approved revision was frozen with.

export interface ApprovedDrift extends ScheduleDrift {
  layoutId: number;
  approvedRevision: number;
  approvedAt: string;
}

/** The drift of the latest approved revision's schedule, or null when nothing is approved or it has no frozen copy. */
export async function approvedScheduleDrift(actor: Actor, layoutId: number): Promise<ApprovedDrift | null> {
  ensureCan(actor, "layout:read");
  const ref = await findLayoutForReview(actor, layoutId);
  const rev = ref.review.approvedRevision;
  if (rev === null) return null;
  const [frozen, live, row] = await Promise.all([frozenInputs(layoutId, rev), loadSchedule(ref.layout.siteId), LayoutRevision.findOne({ where: { layoutId, revision: rev }, attributes: ["document"] })]);
  if (!frozen || !row) return null;
  const placed = new Set(layoutDocumentSchema.parse(row.document).inputs.flatMap((i) => i.detectorIds));
  return { layoutId, approvedRevision: rev, approvedAt: frozen.takenAt, ...scheduleDrift(frozen.schedule, live, placed) };
}
