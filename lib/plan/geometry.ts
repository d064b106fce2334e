// Points on a floor plan, in the plan image's pixels (x to the right, y down, origin at the top-left corner).

export interface PlanPoint {
  x: number;
  y: number;
}

export const distancePx = (a: PlanPoint, b: PlanPoint): number => Math.hypot(b.x - a.x, b.y - a.y);

/** Along the plan's axes only: how a cable runs when it follows walls and ceiling grids. */
export const manhattanPx = (a: PlanPoint, b: PlanPoint): number => Math.abs(b.x - a.x) + Math.abs(b.y - a.y);

/** The point of segment ab nearest p (a itself when the segment has no length). */
export function nearestOnSegment(p: PlanPoint, a: PlanPoint, b: PlanPoint): PlanPoint {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const len2 = dx * dx + dy * dy;
  if (len2 === 0) return { x: a.x, y: a.y };
  const t = Math.min(1, Math.max(0, ((p.x - a.x) * dx + (p.y - a.y) * dy) / len2));
  return { x: a.x + t * dx, y: a.y + t * dy };
}
