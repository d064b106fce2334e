"use client";

import { createContext, useContext } from "react";
import type { Finding } from "@/lib/findings";
import type { CatalogIndex } from "@/lib/layout/catalog-index";
import type { LayoutContext, LayoutEdit } from "@/lib/layout/operations";
import type { LayoutDocument, LayoutInput } from "@/lib/layout/schema";
import type { ScheduleDetector } from "@/lib/schedule/schema";
import type { DetectorVoltage, SolveResult } from "@/lib/solver";

// What every part of the editor reads: the document, its solve, and the one way to change it.

export interface EditorState {
  doc: LayoutDocument;
  ctx: LayoutContext;
  ix: CatalogIndex;
  result: SolveResult;
  zones: Map<string, number>;
  findingsAt: Map<string, Finding[]>;
  detectorsById: Map<string, ScheduleDetector>;
  /** The used input at a slot (`inputAtKey`), and each powered detector's voltage: lookups instead of searches. */
  inputAt: Map<string, LayoutInput>;
  voltsOf: Map<string, DetectorVoltage>;
  canWrite: boolean;
  /** The detector picked for the non-drag way of placing it ("place here"). */
  selected: string | null;
  select: (detectorId: string | null) => void;
  /** Apply an edit: the document changes and the sentence is announced; a refused edit announces why. */
  apply: (edit: LayoutEdit | null) => void;
  /** The DOM id briefly highlighted after a finding's "show" link. */
  highlighted: string | null;
  show: (domId: string) => void;
}

export const EditorContext = createContext<EditorState | null>(null);

export function useEditor(): EditorState {
  const s = useContext(EditorContext);
  if (!s) throw new Error("useEditor outside the layout editor");
  return s;
}
