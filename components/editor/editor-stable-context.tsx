"use client";

import { createContext, useContext } from "react";
import type { CatalogIndex } from "@/lib/layout/catalog-index";
import type { LayoutContext, LayoutEdit } from "@/lib/layout/operations";
import type { LayoutDocument } from "@/lib/layout/schema";
import type { ScheduleDetector } from "@/lib/schedule/schema";

// The part of the editor's state that an edit does not change. Input slots and detector chips read this one and
// take the rest as props, so that after a move React re-renders only the slots and chips whose props changed.

export interface EditorStable {
  ctx: LayoutContext;
  ix: CatalogIndex;
  detectorsById: Map<string, ScheduleDetector>;
  canWrite: boolean;
  select: (detectorId: string | null) => void;
  /** Apply an edit made from the document as it is when the user acts (not as it was when the slot last rendered). */
  applyTo: (make: (doc: LayoutDocument) => LayoutEdit | null) => void;
}

export const EditorStableContext = createContext<EditorStable | null>(null);

export function useEditorStable(): EditorStable {
  const s = useContext(EditorStableContext);
  if (!s) throw new Error("useEditorStable outside the layout editor");
  return s;
}
