import { describe, expect, it } from "vitest";
import { LAYOUT_TABS, tabOfSegment } from "@/components/layout-frame/layout-tabs-list";

describe("tabOfSegment", () => {
  it("maps the child segment under a layout to its tab", () => {
    expect(tabOfSegment(null)).toBe("editor");
    expect(tabOfSegment("review")).toBe("review");
    expect(tabOfSegment("sheet")).toBe("sheet");
    expect(tabOfSegment("zones")).toBe("zones");
    expect(tabOfSegment("commissioning")).toBe("commissioning");
  });
  it("every tab's path leads back to the tab", () => {
    for (const t of LAYOUT_TABS) expect(tabOfSegment(t.path === "" ? null : t.path.slice(1))).toBe(t.tab);
  });
});
