"use client";

import { useMemo } from "react";
import type { LayoutDocument, LayoutInput } from "@/lib/layout/schema";
import type { DetectorVoltage, SolveResult } from "@/lib/solver";

/** Key of an input in `inputAt`. */
export const inputAtKey = (boardKey: string, n: number) => `${boardKey}#${n}`;

/** Lookups by key instead of a search per slot and per chip: with 1,000 detectors a search each is a million steps a render. */
export function useEditorLookups(doc: LayoutDocument, result: SolveResult) {
  const inputAt = useMemo(() => {
    const m = new Map<string, LayoutInput>();
    for (const i of doc.inputs) if (i.detectorIds.length > 0 && !m.has(inputAtKey(i.boardKey, i.input))) m.set(inputAtKey(i.boardKey, i.input), i);
    return m;
  }, [doc.inputs]);
  const voltsOf = useMemo(() => {
    const m = new Map<string, DetectorVoltage>();
    for (const v of result.detectors) if (!m.has(v.detectorId)) m.set(v.detectorId, v);
    return m;
  }, [result.detectors]);
  return { inputAt, voltsOf };
}
