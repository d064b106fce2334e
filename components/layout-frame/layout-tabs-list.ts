// The pages of one layout, in the order the frame shows them.

export type LayoutTab = "editor" | "review" | "sheet" | "zones" | "commissioning";

export const LAYOUT_TABS: { tab: LayoutTab; label: string; path: string }[] = [
  { tab: "editor", label: "Editor", path: "" },
  { tab: "review", label: "Review", path: "/review" },
  { tab: "sheet", label: "Terminal sheet", path: "/sheet" },
  { tab: "zones", label: "Zone list", path: "/zones" },
  { tab: "commissioning", label: "Commissioning", path: "/commissioning" },
];

/** The tab of the child segment under /layouts/[layoutId]: none is the editor. */
export function tabOfSegment(segment: string | null): LayoutTab {
  return LAYOUT_TABS.find((t) => t.path === (segment === null ? "" : `/${segment}`))?.tab ?? "editor";
}
