"use client";

import { useState } from "react";
import type { SheetInput, TerminalSheet } from "@/lib/sheet/sheet-types";
import { firstSelection, selectionView, type Selection } from "@/components/commissioning/selection";

/** The board and loop the installer has open. */
export function useSelection(sheet: TerminalSheet | null, rows: readonly SheetInput[]) {
  const [selection, setSelection] = useState<Selection>(() => firstSelection(sheet));
  const view = selectionView(rows, selection);
  return {
    boardKey: selection.boardKey,
    ...view,
    chooseBoard: (boardKey: string) => setSelection({ boardKey, input: null }),
    chooseLoop: (input: number) => setSelection((s) => ({ ...s, input })),
    back: () => setSelection((s) => ({ ...s, input: null })),
  };
}
