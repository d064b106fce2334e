import { describe, expect, it } from "vitest";
import { effectiveReview } from "@/lib/review/effective-state";

const stored = (state: string, revision: number, approvedRevision: number | null = null, commissionedRevision: number | null = null) => ({ state, revision, approvedRevision, commissionedRevision });

describe("the review state of a layout's current revision", () => {
  it("is a draft with no review record", () => {
    expect(effectiveReview(null, 1)).toMatchObject({ state: "draft", approvedRevision: null, note: null });
  });
  it("is the stored state while the layout has not changed", () => {
    expect(effectiveReview(stored("in-review", 3), 3)).toMatchObject({ state: "in-review", inReviewRevision: 3 });
    expect(effectiveReview(stored("approved", 3, 3), 3)).toMatchObject({ state: "approved", approvedRevision: 3 });
    expect(effectiveReview(stored("commissioned", 3, 3, 3), 3)).toMatchObject({ state: "commissioned", commissionedRevision: 3 });
  });
  it("is a new draft after a change to an approved layout, which keeps its approved revision", () => {
    const e = effectiveReview(stored("approved", 3, 3), 4);
    expect(e).toMatchObject({ state: "draft", approvedRevision: 3, currentRevision: 4 });
    expect(e.note).toBe("Revision 3 is approved and stays as it was; revision 4 is a new draft.");
  });
  it("falls back to draft when a layout in review changes, asking for it to be sent again", () => {
    const e = effectiveReview(stored("in-review", 3, 2), 4);
    expect(e).toMatchObject({ state: "draft", inReviewRevision: null, approvedRevision: 2 });
    expect(e.note).toMatch(/send it again/);
  });
  it("treats an unknown stored state as draft", () => {
    expect(effectiveReview(stored("bogus", 1), 1).state).toBe("draft");
  });
});
