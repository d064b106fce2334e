import "server-only";
import { heading, paragraph, table, type Pdf } from "@/lib/server/pdf/pdf-kit";
import { mA, supplyLines } from "@/lib/solver/supply-lines";
import type { SupplyFigures } from "@/lib/solver/types";

// Each supply's figures on paper, with the same labels and numbers as the editor's figures panel.

export function powerSection(pdf: Pdf, supplies: readonly SupplyFigures[]): void {
  if (!supplies.length) return;
  heading(pdf, "Power", 11);
  for (const s of supplies) {
    heading(pdf, s.name, 10);
    for (const l of supplyLines(s)) paragraph(pdf, `${l.label}: ${l.value}`, { size: 9 });
    table(
      pdf,
      [
        { header: "Draws on it", share: 4 },
        { header: "At rest", share: 1.4 },
        { header: "In alarm", share: 1.4 },
      ],
      s.breakdown.map((l) => [l.name, mA(l.restMa), mA(l.alarmMa)]),
      { size: 8 },
    );
  }
}
