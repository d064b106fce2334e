import type { ZoneType } from "@/lib/catalog/schema";
import type { SheetBoard, SheetInput } from "@/lib/sheet/sheet-types";
import type { ZoneFigures } from "@/lib/solver/types";
import { ZONE_TYPE_WORDS } from "@/lib/vocabulary/words";

// The zone list: every zone as the installer keys it into the panel, with the keypad label as the keypad shows it,
// its type, area, part-set and options, and where it comes in (an input with its resistors, or a wireless receiver).

export interface ZoneListRow {
  number: number;
  detectorId: string;
  /** The name chosen for the zone (its programmed keypad label, else the detector's label). */
  label: string;
  /** What the keypad shows: the label cut to the panel's zone label length. */
  keypadLabel: string;
  /** The part of the label the keypad cuts off; empty when it shows whole. */
  cutOff: string;
  type: ZoneType;
  typeText: string;
  /** The area's name, or null when the layout has no areas. */
  area: string | null;
  partSet: boolean;
  /** "entry 30 s, exit 45 s; chime", or "" when none. */
  options: string;
  /** "Control panel, input 3", or "Wireless receiver 1 (wireless)". */
  input: string;
  wireless: boolean;
  /** "end-of-line resistor 4.7 kΩ; alarm resistor 2.2 kΩ", "none (wireless)", or "none fitted". */
  resistors: string;
}

export interface ZoneList {
  /** The panel's zone label length, null when the catalog does not give one (labels are then shown whole). */
  zoneLabelLength: number | null;
  rows: ZoneListRow[];
  /** Zones whose label the keypad cuts off. */
  cutLabels: number;
}

/** "entry 30 s, exit 45 s; entry route; chime": the options the zone's type allows, as set. */
export function zoneOptionsText(z: Pick<ZoneFigures, "entryS" | "exitS" | "entryRoute" | "chime">): string {
  const parts: string[] = [];
  const times = [z.entryS !== null ? `entry ${z.entryS} s` : null, z.exitS !== null ? `exit ${z.exitS} s` : null].filter(Boolean);
  if (times.length) parts.push(times.join(", "));
  if (z.entryRoute) parts.push("entry route");
  if (z.chime) parts.push("chime");
  return parts.join("; ");
}

function resistorsText(input: SheetInput | undefined): string {
  if (!input) return "not on the terminal sheet";
  if (!input.resistors.length) return "none fitted";
  return input.resistors.map((r) => `${r.name} ${r.valueText}`).join("; ");
}

/** The zone list from the solver's zones and the terminal sheet's boards (for each input's name and resistors). */
export function buildZoneList(zones: readonly ZoneFigures[], boards: readonly SheetBoard[], zoneLabelLength: number | undefined): ZoneList {
  const inputOf = new Map<string, { board: SheetBoard; input: SheetInput }>();
  for (const board of boards)
    for (const row of board.rows)
      if (!row.spare) for (const d of row.detectors) inputOf.set(d.id, { board, input: row });
  const rows = zones.map((z): ZoneListRow => {
    const at = z.wireless ? undefined : inputOf.get(z.detectorId);
    const cutOff = z.labelCut ? [...z.label].slice([...z.keypadLabel].length).join("") : "";
    return {
      number: z.number,
      detectorId: z.detectorId,
      label: z.label,
      keypadLabel: z.keypadLabel,
      cutOff,
      type: z.type,
      typeText: ZONE_TYPE_WORDS[z.type],
      area: z.areaName,
      partSet: z.partSet,
      options: zoneOptionsText(z),
      input: z.wireless ? `${z.where} (wireless)` : at ? `${at.board.name}, input ${at.input.input} (${at.input.terminals})` : z.where,
      wireless: z.wireless,
      resistors: z.wireless ? "none (wireless)" : resistorsText(at?.input),
    };
  });
  return { zoneLabelLength: zoneLabelLength ?? null, rows, cutLabels: rows.filter((r) => r.cutOff !== "").length };
}
