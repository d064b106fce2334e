import { beforeAll, describe, expect, it } from "vitest";
import { testDb } from "./support";
import { documentFor, reviewFixture } from "./review-fixtures";
import { createLayout } from "@/lib/server/layouts";
import { loadComparePage } from "@/lib/server/compare";
import { chooseLayout } from "@/lib/server/review";

// The compare page's one server call: picker, comparison (with each layout's findings), choices, and the
// sentences for ids a user typed wrong instead of an error page.

beforeAll(() => {
  testDb();
});

describe("the compare page's server call", () => {
  it("returns the picker, the comparison with every finding, and the recorded choices", async () => {
    const { actors, site, schedule, layout } = await reviewFixture("Compare");
    const { layout: b } = await createLayout(actors.designer, site.id, { name: "Option B", document: documentFor(schedule, 1) });
    await chooseLayout(actors.designer, site.id, { chosenLayoutId: b.id, comparedLayoutIds: [layout.id, b.id], reason: "Cheaper" });
    const page = await loadComparePage(actors.installer, site.id, `${layout.id}, ${b.id}`);
    expect(page.site).toEqual({ id: site.id, name: site.name });
    expect(page.layouts.map((l) => l.name).sort()).toEqual(["Option A", "Option B"]);
    expect(page.selected).toEqual([layout.id, b.id]);
    expect(page.error).toBeNull();
    expect(page.canChoose).toBe(false);
    const [a, bCol] = page.comparison!.comparison.columns;
    expect(a.findingList).toHaveLength(a.findings.error + a.findings.warning + a.findings.note);
    // B leaves two of the three detectors unplaced, which the solver reports
    expect(bCol.findingList.length).toBeGreaterThan(0);
    expect(page.comparison!.comparison.lifeSafety).toBe(false);
    expect(page.choices.map((d) => d.reason)).toEqual(["Cheaper"]);
  });

  it("answers nothing compared without ids, and a sentence for bad ids or another site's layout", async () => {
    const { actors, site, layout } = await reviewFixture("Compare bad");
    const other = await reviewFixture("Compare other");
    const none = await loadComparePage(actors.designer, site.id, undefined);
    expect(none).toMatchObject({ comparison: null, error: null, selected: [], choices: [], canChoose: true });
    expect((await loadComparePage(actors.designer, site.id, `${layout.id},${layout.id}`)).error).toMatch(/^Cannot compare these: .*twice/);
    expect((await loadComparePage(actors.designer, site.id, "abc")).error).toMatch(/^Cannot compare these/);
    const foreign = await loadComparePage(actors.designer, site.id, `${layout.id},${other.layout.id}`);
    expect(foreign).toMatchObject({ comparison: null, error: "One of those layouts is not a layout of this site.", choices: [] });
    await expect(loadComparePage(other.actors.designer, site.id, undefined)).rejects.toMatchObject({ status: 404 });
  });
});
