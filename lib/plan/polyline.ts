import { distancePx, type PlanPoint } from "./geometry";
import type { PlanScale } from "./scale";

/** The length of a polyline in plan pixels: the sum of its segments (0 for fewer than two points). */
export function polylineLengthPx(points: readonly PlanPoint[]): number {
  let total = 0;
  for (let i = 1; i < points.length; i++) total += distancePx(points[i - 1], points[i]);
  return total;
}

export const polylineMetres = (points: readonly PlanPoint[], scale: PlanScale): number => polylineLengthPx(points) * scale.metresPerPixel;
