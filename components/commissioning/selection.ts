import type { SheetInput, TerminalSheet } from "@/lib/sheet/sheet-types";

// Which loop the installer has open: a board, then one of its inputs, with the previous and next input of that board.

export interface Selection {
  boardKey: string;
  /** null while the board's list of loops is shown. */
  input: number | null;
}

export interface SelectionView {
  current: SheetInput | null;
  previous: number | null;
  next: number | null;
}

/** The first board with a used input, open on its list of loops. */
export function firstSelection(sheet: TerminalSheet | null): Selection {
  return { boardKey: sheet?.boards.find((b) => b.rows.some((r) => !r.spare))?.boardKey ?? "", input: null };
}

export function selectionView(rows: readonly SheetInput[], { boardKey, input }: Selection): SelectionView {
  const boardRows = rows.filter((r) => r.boardKey === boardKey);
  const idx = input === null ? -1 : boardRows.findIndex((r) => r.input === input);
  if (idx < 0) return { current: null, previous: null, next: null };
  return { current: boardRows[idx], previous: idx > 0 ? boardRows[idx - 1].input : null, next: idx < boardRows.length - 1 ? boardRows[idx + 1].input : null };
}

export const loopKey = (boardKey: string, input: number) => `${boardKey}#${input}`;
