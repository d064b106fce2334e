import { PANEL_KEY, type BoardKind, type InputRef, type LayoutDocument } from "@/lib/layout/schema";

// Human names for boards and inputs, used in announcements, findings and terminal sheets.

const kindWords: Record<BoardKind, string> = { expansion: "Expansion board", keypad: "Keypad", supply: "Power supply", outputs: "Output module", receiver: "Wireless receiver" };

/** A board's label, else "<kind> <n>" numbered among boards of the same kind in list order. */
export function boardName(doc: Pick<LayoutDocument, "boards">, boardKey: string): string {
  if (boardKey === PANEL_KEY) return "Control panel";
  let n = 0;
  for (const b of doc.boards) {
    if (b.kind === doc.boards.find((x) => x.key === boardKey)?.kind) n++;
    if (b.key === boardKey) return b.label ?? `${kindWords[b.kind]} ${n}`;
  }
  return `Board ${boardKey}`;
}

/** All board names at once (list order), for callers naming many inputs. */
export function boardNames(doc: Pick<LayoutDocument, "boards">): Map<string, string> {
  const counts: Record<BoardKind, number> = { expansion: 0, keypad: 0, supply: 0, outputs: 0, receiver: 0 };
  const names = new Map<string, string>([[PANEL_KEY, "Control panel"]]);
  for (const b of doc.boards) {
    counts[b.kind]++;
    if (!names.has(b.key)) names.set(b.key, b.label ?? `${kindWords[b.kind]} ${counts[b.kind]}`);
  }
  return names;
}

export function inputName(doc: Pick<LayoutDocument, "boards">, ref: InputRef): string {
  return `${boardName(doc, ref.boardKey)}, input ${ref.input}`;
}
