import { METRES_PER_FOOT } from "@/lib/loop/cable";
import type { UnitSystem } from "@/lib/organisation/settings-schema";

// The scale bar drawn on a calibrated plan: a round length (1, 2 or 5 × a power of ten, in the organisation's
// unit) whose drawn width is as near as it can be to the wanted width without passing it.

export interface ScaleBar {
  /** Width on the plan, in plan pixels. */
  px: number;
  /** The length it stands for, in the organisation's unit. */
  length: number;
  unit: "m" | "ft";
}

export function scaleBar(metresPerPixel: number, units: UnitSystem, wantedPx = 200): ScaleBar | null {
  if (!(metresPerPixel > 0) || !Number.isFinite(metresPerPixel)) return null;
  const unitM = units === "imperial" ? METRES_PER_FOOT : 1;
  const most = (wantedPx * metresPerPixel) / unitM;
  const decade = 10 ** Math.floor(Math.log10(most));
  const length = [5, 2, 1].map((k) => k * decade).find((l) => l <= most) ?? decade;
  return { px: (length * unitM) / metresPerPixel, length, unit: units === "imperial" ? "ft" : "m" };
}
