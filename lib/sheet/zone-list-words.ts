import type { ZoneList, ZoneListRow } from "@/lib/sheet/zone-list";
import { plural, pluralWord } from "@/lib/vocabulary/plural";

// The zone list's sentences and cells, the same on the page, in the PDFs and in the CSV.

/** What the keypad shows, with the part it cuts off in brackets: "Upstairs hall wi [cut off: reless motion]". */
export const keypadLabelCell = (r: Pick<ZoneListRow, "keypadLabel" | "cutOff">) => (r.cutOff ? `${r.keypadLabel} [cut off: ${r.cutOff}]` : r.keypadLabel);

/** `cutShown`: how the cut-off part appears, "shown in brackets" on paper, "struck through" on screen. */
export function zoneListLengthNote(list: ZoneList, cutShown = "shown in brackets"): string {
  if (list.zoneLabelLength === null) return "The control panel's zone label length is not in the catalog: labels are shown whole.";
  const cut = list.cutLabels ? ` The keypad cuts off ${plural(list.cutLabels, "label")}; ${pluralWord(list.cutLabels, "its", "their")} cut-off part is ${cutShown}: give ${pluralWord(list.cutLabels, "that zone", "those zones")} a shorter keypad label.` : "";
  return `Keypad labels are cut to the control panel's zone label length of ${list.zoneLabelLength} characters.${cut}`;
}
