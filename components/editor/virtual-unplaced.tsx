"use client";

import { useVirtualizer } from "@tanstack/react-virtual";
import { useMemo, type RefObject } from "react";
import { DetectorChip } from "@/components/editor/detector-chip";

// The unplaced list when it is long: only the rows in view (and a few around) are in the page, so a site of
// 1,000 detectors does not put 1,000 chips in the document. Area headings are rows too, so the order is kept.

/** Above this many detectors the list is virtualised; below, every chip is in the page as before. */
export const VIRTUAL_FROM = 150;

type Row = { kind: "area"; area: string; count: number } | { kind: "detector"; id: string };

/** Estimated heights, px: a chip of two or three lines, a heading; rows are measured once drawn. */
const CHIP_PX = 58;
const HEADING_PX = 24;

export function VirtualUnplaced({ groups, scrollRef }: { groups: [string, string[]][]; scrollRef: RefObject<HTMLDivElement | null> }) {
  const rows = useMemo(() => groups.flatMap(([area, ids]): Row[] => [{ kind: "area", area, count: ids.length }, ...ids.map((id) => ({ kind: "detector" as const, id }))]), [groups]);
  // The virtualiser re-renders this list itself when it scrolls; nothing in it is memoised by hand.
  // eslint-disable-next-line react-hooks/incompatible-library
  const v = useVirtualizer({
    count: rows.length,
    getScrollElement: () => scrollRef.current,
    estimateSize: (i) => (rows[i].kind === "area" ? HEADING_PX : CHIP_PX),
    getItemKey: (i) => {
      const r = rows[i];
      return r.kind === "area" ? `area:${r.area}` : r.id;
    },
    overscan: 8,
  });
  return (
    <ul className="relative" style={{ height: v.getTotalSize() }} aria-label="Unplaced detectors by area">
      {v.getVirtualItems().map((item) => {
        const r = rows[item.index];
        return (
          <li key={item.key} data-index={item.index} ref={v.measureElement} className="absolute left-0 top-0 w-full pb-1" style={{ transform: `translateY(${item.start}px)` }}>
            {r.kind === "area" ? (
              <h3 className="mt-2 text-[11px] font-semibold uppercase tracking-wide text-slate-500">
                {r.area} ({r.count})
              </h3>
            ) : (
              <DetectorChip detectorId={r.id} onInput={false} />
            )}
          </li>
        );
      })}
    </ul>
  );
}
