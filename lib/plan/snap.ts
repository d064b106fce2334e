import { distancePx, nearestOnSegment, type PlanPoint } from "./geometry";

// Snapping a point being drawn onto the routes already on the plan, so that runs sharing a path meet exactly and
// read as one trunk. A vertex within reach wins over a nearer segment: corners are where routes branch.

export type Snap = { kind: "vertex"; point: PlanPoint; route: number; index: number } | { kind: "segment"; point: PlanPoint; route: number; index: number } | { kind: "none"; point: PlanPoint };

/**
 * The point p snapped to the nearest vertex of `routes` within `tolerancePx`, else to the nearest point on one of
 * their segments within it, else p unchanged. For a segment, `index` is that of its first vertex.
 */
export function snapPoint(p: PlanPoint, routes: readonly (readonly PlanPoint[])[], tolerancePx: number): Snap {
  let best: Snap = { kind: "none", point: p };
  let bestD = tolerancePx;
  routes.forEach((route, r) =>
    route.forEach((v, i) => {
      const d = distancePx(p, v);
      if (d <= bestD) {
        bestD = d;
        best = { kind: "vertex", point: { x: v.x, y: v.y }, route: r, index: i };
      }
    }),
  );
  if (best.kind === "vertex") return best;
  routes.forEach((route, r) => {
    for (let i = 1; i < route.length; i++) {
      const q = nearestOnSegment(p, route[i - 1], route[i]);
      const d = distancePx(p, q);
      if (d <= bestD) {
        bestD = d;
        best = { kind: "segment", point: q, route: r, index: i - 1 };
      }
    }
  });
  return best;
}
