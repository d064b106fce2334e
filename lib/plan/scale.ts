import { typedToMetres } from "@/lib/format/length-input";
import type { UnitSystem } from "@/lib/organisation/settings-schema";
import { distancePx, type PlanPoint } from "./geometry";

// A plan's scale: metres of building per pixel of the plan image, from two picked points and the real distance
// between them typed in the organisation's unit (stored in metres, like every length).

export interface PlanScale {
  metresPerPixel: number;
}

/** Two picked points closer than this cannot give a usable scale: a slip of one pixel would be a 25 % error. */
export const MIN_CALIBRATION_PX = 4;

export type CalibrationResult = { ok: true; scale: PlanScale; metres: number } | { ok: false; reason: string };

export function calibrateScale(a: PlanPoint, b: PlanPoint, typedDistance: number, units: UnitSystem): CalibrationResult {
  if (!Number.isFinite(typedDistance) || typedDistance <= 0) return { ok: false, reason: "Enter the real distance between the two points, more than zero" };
  const px = distancePx(a, b);
  if (!Number.isFinite(px) || px < MIN_CALIBRATION_PX) return { ok: false, reason: `Pick two points at least ${MIN_CALIBRATION_PX} pixels apart, as far apart as the drawing allows` };
  const metres = typedToMetres(typedDistance, units);
  return { ok: true, scale: { metresPerPixel: metres / px }, metres };
}

/** The straight distance between two points of the same plan, in metres. */
export const measureMetres = (a: PlanPoint, b: PlanPoint, scale: PlanScale): number => distancePx(a, b) * scale.metresPerPixel;
