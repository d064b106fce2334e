import { METRES_PER_FOOT } from "@/lib/loop/cable";
import type { UnitSystem } from "@/lib/organisation/settings-schema";

// Lengths people type and read in the organisation's unit system; stored and computed in metres always.
// 1 ft = 0.3048 m exactly (international foot, NIST Handbook 44 Appendix C).

export const lengthUnit = (units: UnitSystem): "m" | "ft" => (units === "imperial" ? "ft" : "m");

/** Metres from a length typed in the organisation's unit, to the micrometre (so 100 ft is 30.48 m, not 30.479999…). */
export function typedToMetres(value: number, units: UnitSystem): number {
  return units === "imperial" ? Math.round(value * METRES_PER_FOOT * 1e6) / 1e6 : value;
}

/** A stored length as a field shows it: metres as stored, feet to the hundredth. */
export function metresToTyped(metres: number, units: UnitSystem): number {
  return units === "imperial" ? Math.round((metres / METRES_PER_FOOT) * 100) / 100 : metres;
}

/**
 * What a length field's text means in metres: the stored value when the text is what the field first showed (so
 * saving a form in feet without touching the length never moves it by a rounding), "" and non-numbers as they are
 * (for the schema's message), else the typed number converted.
 */
export function fieldToMetres(text: string, units: UnitSystem, initialMetres?: number): number | string {
  const t = text.trim();
  if (initialMetres !== undefined && initialMetres > 0 && t === String(metresToTyped(initialMetres, units))) return initialMetres;
  if (t === "") return t;
  const n = Number(t);
  return Number.isFinite(n) ? typedToMetres(n, units) : t;
}

/** A stored length for a table cell: metres as stored ("18.5 m"), feet to a tenth ("60.7 ft"). */
export function lengthCell(metres: number, units: UnitSystem): string {
  return units === "imperial" ? `${Math.round((metres / METRES_PER_FOOT) * 10) / 10} ft` : `${metres} m`;
}
