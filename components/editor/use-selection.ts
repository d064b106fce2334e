"use client";

import { useCallback, useEffect, useState } from "react";
import type { Announce } from "@/components/editor/use-editor-messages";

// The detector picked for "place here", and the element briefly highlighted by a finding's "show" link.

const HIGHLIGHT_MS = 2500;

export function useSelection(announce: Announce, labelOf: (detectorId: string) => string) {
  const [selected, setSelected] = useState<string | null>(null);
  const [highlighted, setHighlighted] = useState<string | null>(null);

  const select = useCallback(
    (id: string | null) => {
      setSelected(id);
      if (id) announce("info", `${labelOf(id)} selected. Choose an input's Place here button to put it there.`);
    },
    [announce, labelOf],
  );

  const show = useCallback((domId: string) => {
    const el = document.getElementById(domId);
    setHighlighted(domId);
    if (el) {
      el.scrollIntoView({ behavior: "smooth", block: "center" });
      if (el.tabIndex < 0) el.setAttribute("tabindex", "-1");
      el.focus({ preventScroll: true });
    }
  }, []);
  useEffect(() => {
    if (!highlighted) return;
    const t = setTimeout(() => setHighlighted(null), HIGHLIGHT_MS);
    return () => clearTimeout(t);
  }, [highlighted]);

  return { selected, select, highlighted, show };
}
