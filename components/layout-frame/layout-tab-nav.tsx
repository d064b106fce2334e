"use client";

import Link from "next/link";
import { useSelectedLayoutSegment } from "next/navigation";
import { LAYOUT_TABS, tabOfSegment } from "@/components/layout-frame/layout-tabs-list";

/** The layout's pages as tabs; the current one follows the address, so the frame can stay put between them. */
export function LayoutTabNav({ base }: { base: string }) {
  const current = tabOfSegment(useSelectedLayoutSegment());
  return (
    <nav aria-label="Layout pages" className="mt-3 flex flex-wrap gap-1 border-b border-line text-sm" data-testid="layout-tabs">
      {LAYOUT_TABS.map((t) => (
        <Link
          key={t.tab}
          href={`${base}${t.path}`}
          aria-current={t.tab === current ? "page" : undefined}
          className={`-mb-px rounded-t-md border px-3 py-2 ${t.tab === current ? "border-line border-b-paper bg-paper font-semibold" : "border-transparent text-signal hover:bg-signal-soft"}`}
        >
          {t.label}
        </Link>
      ))}
    </nav>
  );
}
