import { distancePx, nearestOnSegment, type PlanPoint } from "./geometry";

// Snapping a point being drawn onto the routes already on the plan, so that runs sharing a path meet exactly and
// read as one trunk. A vertex within reach wins over a nearer segment: corners are where routes branch.

export type Snap = { kind: "vertex"; point: PlanPoint; route: number; index: number } | { kind: "segment"; point: PlanPoint; route: number; index: number } | { kind: "none"; point: PlanPoint };

/**
 * The point p snapped to the nearest vertex of `routes` within `tolerancePx`, else to the nearest point on one of
 * their segments within it, else p unchanged. For a segment, `index` is that of its first vertex.
 */
export function snapPoint(p: PlanPoint, routes: readonly (readonly PlanPoint[])[], tolerancePx: number): Snap {
  let vertex: Snap | null = null;
  let bestD = tolerancePx;
  for (let r = 0; r < routes.length; r++)
    for (let i = 0; i < routes[r].length; i++) {
      const v = routes[r][i];
      const d = distancePx(p, v);
      if (d <= bestD) {
        bestD = d;
        vertex = { kind: "vertex", point: { x: v.x, y: v.y }, route: r, index: i };
      }
    }
  if (vertex) return vertex;
  let segment: Snap | null = null;
  for (let r = 0; r < routes.length; r++)
    for (let i = 1; i < routes[r].length; i++) {
      const q = nearestOnSegment(p, routes[r][i - 1], routes[r][i]);
      const d = distancePx(p, q);
      if (d <= bestD) {
        bestD = d;
        segment = { kind: "segment", point: q, route: r, index: i - 1 };
      }
    }
  return segment ?? { kind: "none", point: p };
}
