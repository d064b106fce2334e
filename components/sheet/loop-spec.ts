import type { LoopSpec } from "@/lib/loop/types";
import type { SheetInput } from "@/lib/sheet/sheet-types";

// The loop of a terminal sheet row as the loop schematic draws it: the fitted values by role, the longest run.

/** Conductor temperatures the sheet's ranges are worked at, °C (the solver's, common practice, no published source). */
const TEMP_MIN_C = 10;
const TEMP_MAX_C = 40;
/** A closed contact, ohms (the solver's figure, from memory). */
const CONTACT_OHMS = 0.1;

export function sheetLoopSpec(row: SheetInput): LoopSpec {
  const v = (role: string) => row.resistors.find((r) => r.role === role)?.ohms;
  const eol = v("eol");
  const alarm = v("alarm");
  const a = v("shared-a");
  const b = v("shared-b");
  const spec: LoopSpec = {
    scheme: row.scheme,
    placement: row.placement,
    detectors: row.detectors.map((d) => ({ label: d.label, contact: d.contact, tamper: d.tamper, lifeSafety: d.lifeSafety })),
    tolerancePct: row.resistors[0]?.tolerancePct ?? 5,
    cable: { gauge: row.cable.gauge, lengthM: row.cable.lengthM, tempMinC: TEMP_MIN_C, tempMaxC: TEMP_MAX_C },
    contactOhms: CONTACT_OHMS,
  };
  if (eol !== undefined) spec.eolOhms = eol;
  if (alarm !== undefined) spec.alarmOhms = alarm;
  if (a !== undefined && b !== undefined) spec.sharedOhms = [a, b];
  return spec;
}
