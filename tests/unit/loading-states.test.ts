// Each heavy page's loading state: busy for assistive technology, one spoken status line, and the page's own
// headings and column names rather than a lone spinner.
import { createElement, type ComponentType } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import EditorLoading from "@/app/(app)/sites/[siteId]/layouts/[layoutId]/loading";
import SheetLoading from "@/app/(app)/sites/[siteId]/layouts/[layoutId]/sheet/loading";
import ZoneListLoading from "@/app/(app)/sites/[siteId]/layouts/[layoutId]/zones/loading";
import CommissioningLoading from "@/app/(app)/sites/[siteId]/layouts/[layoutId]/commissioning/loading";
import ReviewLoading from "@/app/(app)/sites/[siteId]/layouts/[layoutId]/review/loading";
import ScheduleLoading from "@/app/(app)/sites/[siteId]/schedule/loading";
import CompareLoading from "@/app/(app)/sites/[siteId]/compare/loading";
import { LayoutFrameSkeleton } from "@/components/layout-frame/layout-frame-skeleton";

const pages: [string, ComponentType, string, string[]][] = [
  ["layout editor", EditorLoading, "Loading the layout editor …", ["Unplaced detectors", "Control panel", "Findings", "Figures", "Hardware and power"]],
  ["terminal sheet", SheetLoading, "Loading the terminal sheet …", ["Paper", "Zone", "Detector", "Area / room", "Device type", "Contact", "Cable"]],
  ["zone list", ZoneListLoading, "Loading the zone list …", ["Zone", "Keypad label", "Type", "Area", "Part-set", "Options", "Input", "Resistors"]],
  ["commissioning", CommissioningLoading, "Loading the commissioning record …", []],
  ["review", ReviewLoading, "Loading the review …", ["Where this layout stands", "What you can do", "Comments", "Decisions"]],
  ["device schedule", ScheduleLoading, "Loading the device schedule …", ["Device schedule", "Label", "Type", "Area", "Room", "Cable (m)", "Gauge", "Supervision"]],
  ["compare", CompareLoading, "Loading the comparison …", ["Compare layouts", "Pick the layouts to compare", "Side by side", "Supervision coverage", "Shared inputs"]],
];

describe("loading states", () => {
  it.each(pages)("%s: busy, one status line, the page's own structure", (_, Page, status, words) => {
    const html = renderToStaticMarkup(createElement(Page));
    expect(html).toContain('aria-busy="true"');
    expect(html).toMatch(new RegExp(`<p role="status" class="sr-only">${status.replace(/[.*+?^${}()|[\]\\]/g, "\\$&")}</p>`));
    for (const w of words) expect(html).toContain(w);
    expect(html).toContain("animate-pulse");
  });
});

describe("the layout frame while it loads", () => {
  it("shows the same five tabs the loaded frame has, in the same order, hidden from assistive technology", () => {
    const html = renderToStaticMarkup(createElement(LayoutFrameSkeleton));
    expect(html).toContain('aria-hidden="true"');
    const tabs = [...html.matchAll(/>(Editor|Review|Terminal sheet|Zone list|Commissioning)</g)].map((m) => m[1]);
    expect(tabs).toEqual(["Editor", "Review", "Terminal sheet", "Zone list", "Commissioning"]);
  });
});
