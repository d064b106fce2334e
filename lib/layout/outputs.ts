import type { OutputBlock, Panel } from "@/lib/catalog/schema";
import { boardEntry, type CatalogIndex } from "@/lib/layout/catalog-index";
import { PANEL_KEY, type LayoutDocument } from "@/lib/layout/schema";

// A board's outputs, numbered as the panel, the editor and the sheet number them: from 1, siren outputs first.

export interface OutputSlot {
  boardKey: string;
  output: number;
  purpose: OutputBlock["purpose"];
  switching: OutputBlock["switching"];
  ratingMa: number;
}

/** A panel without its own output list has one relay siren output at its siren output rating. */
export function panelOutputBlocks(panel: Panel): OutputBlock[] {
  return panel.outputs ?? [{ purpose: "siren", count: 1, switching: "relay", ratingMa: panel.sirenOutputMa }];
}

export function outputSlots(blocks: OutputBlock[], boardKey: string): OutputSlot[] {
  const out: OutputSlot[] = [];
  for (const b of blocks) for (let i = 0; i < b.count; i++) out.push({ boardKey, output: out.length + 1, purpose: b.purpose, switching: b.switching, ratingMa: b.ratingMa });
  return out;
}

/** The outputs of the panel or of one board of the document; none for a board without outputs or not in the catalog. */
export function slotsOf(doc: LayoutDocument, ix: CatalogIndex, boardKey: string): OutputSlot[] {
  if (boardKey === PANEL_KEY) {
    const p = ix.panels.get(doc.panelId);
    return p ? outputSlots(panelOutputBlocks(p), PANEL_KEY) : [];
  }
  const b = doc.boards.find((x) => x.key === boardKey);
  const e = b && boardEntry(ix, b.kind, b.catalogId);
  if (!e) return [];
  if (e.kind === "outputs") return outputSlots(e.entry.outputs, boardKey);
  if (e.kind === "expansion") return outputSlots(e.entry.outputs ?? [], boardKey);
  return [];
}
