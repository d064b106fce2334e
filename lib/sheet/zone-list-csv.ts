import { writeCsv } from "@/lib/csv/csv";
import type { ZoneList } from "@/lib/sheet/zone-list";

// The zone list for programming as CSV, written through lib/csv (quoting and the formula guard live there).

export const ZONE_PROGRAMMING_COLUMNS = ["zone", "keypad_label", "label_cut_off", "full_label", "zone_type", "area", "part_set", "options", "wireless", "input", "resistors"] as const;

export function zoneProgrammingCsv(list: ZoneList): string {
  return writeCsv(
    ZONE_PROGRAMMING_COLUMNS,
    list.rows.map((r) => [r.number, r.keypadLabel, r.cutOff || null, r.label, r.typeText, r.area, r.partSet ? "yes" : "no", r.options || null, r.wireless ? "yes" : "no", r.input, r.resistors]),
  );
}
