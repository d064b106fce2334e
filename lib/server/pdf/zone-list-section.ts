import "server-only";
import { heading, paragraph, table, type Pdf } from "@/lib/server/pdf/pdf-kit";
import type { ZoneList } from "@/lib/sheet/zone-list";
import { zoneListLengthNote, keypadLabelCell } from "@/lib/sheet/zone-list-words";

// The zone list on paper: one row per zone, as it is keyed into the panel; in the terminal sheet PDF and in its own.

export function zoneListSection(pdf: Pdf, list: ZoneList): void {
  heading(pdf, "Zone list for programming", 11);
  paragraph(pdf, zoneListLengthNote(list), { size: 8, color: "#444444" });
  if (!list.rows.length) {
    paragraph(pdf, "No zone yet: no detector is on an input or a wireless receiver.");
    return;
  }
  table(
    pdf,
    [
      { header: "Zone", share: 0.6 },
      { header: "Keypad label", share: 2.6 },
      { header: "Type", share: 1.1 },
      { header: "Area", share: 1.4 },
      { header: "Part-set", share: 0.8 },
      { header: "Options", share: 1.5 },
      { header: "Input", share: 2.2 },
      { header: "Resistors", share: 2.4 },
    ],
    list.rows.map((r) => [String(r.number), keypadLabelCell(r), r.typeText, r.area ?? "", r.partSet ? "yes" : "no", r.options, r.input, r.resistors]),
    { size: 7.5 },
  );
}
