import { beforeAll, describe, expect, it } from "vitest";
import { testDb } from "./support";
import { documentFor, reviewFixture } from "./review-fixtures";
import { createLayout, saveLayout } from "@/lib/server/layouts";
import { addComment, chooseLayout, compareSiteLayouts, getReview, listComments, listSiteDecisions, reviewAction } from "@/lib/server/review";
import { getTerminalSheet } from "@/lib/server/sheets";
import { AuditEntry, Layout, LayoutDecision, LayoutReview } from "@/models";

beforeAll(() => {
  testDb();
});

describe("layout review in MariaDB", () => {
  it("goes draft → in review → approved with the permissions of each step, writing the status, a decision and an audit entry each time", async () => {
    const { actors, layout } = await reviewFixture();
    expect((await getReview(actors.installer, layout.id)).review.state).toBe("draft");
    await expect(reviewAction(actors.installer, layout.id, { action: "submit" })).rejects.toMatchObject({ status: 403 });
    const sent = await reviewAction(actors.designer, layout.id, { action: "submit" });
    expect(sent.review).toMatchObject({ state: "in-review", inReviewRevision: 1 });
    expect((await Layout.findByPk(layout.id))!.status).toBe("in-review");
    await expect(reviewAction(actors.designer, layout.id, { action: "approve" })).rejects.toMatchObject({ status: 403 });
    await expect(reviewAction(actors.admin, layout.id, { action: "approve" })).rejects.toMatchObject({ status: 403 });
    const ok = await reviewAction(actors.engineer, layout.id, { action: "approve", revision: 1 });
    expect(ok.review).toMatchObject({ state: "approved", approvedRevision: 1 });
    expect(ok.decisions.map((d) => [d.kind, d.decidedBy])).toEqual([
      ["submit", "Test designer"],
      ["approve", "Test engineer"],
    ]);
    expect(await AuditEntry.count({ where: { entityType: "layout", entityId: String(layout.id), action: ["layout.review.submit", "layout.review.approve"] } })).toBe(2);
    expect((await Layout.findByPk(layout.id))!.status).toBe("approved");
  });

  it("refuses steps that make no sense in the state, and sending back without a reason", async () => {
    const { actors, layout } = await reviewFixture();
    await expect(reviewAction(actors.engineer, layout.id, { action: "approve" })).rejects.toMatchObject({ status: 409, extra: { code: "wrong-state" } });
    await reviewAction(actors.designer, layout.id, { action: "submit" });
    await expect(reviewAction(actors.engineer, layout.id, { action: "reject" })).rejects.toMatchObject({ status: 422, extra: { code: "reason-required" } });
    const back = await reviewAction(actors.engineer, layout.id, { action: "reject", reason: "Back door needs double end-of-line" });
    expect(back.review.state).toBe("draft");
    expect(back.decisions.at(-1)).toMatchObject({ kind: "reject", reason: "Back door needs double end-of-line" });
    await expect(reviewAction(actors.engineer, layout.id, { action: "commission" })).rejects.toMatchObject({ status: 409 });
  });

  it("keeps an approved revision frozen: a save makes a new draft revision and the sheet stays on the approved one", async () => {
    const { actors, layout, schedule } = await reviewFixture();
    await reviewAction(actors.designer, layout.id, { action: "submit" });
    await reviewAction(actors.engineer, layout.id, { action: "approve" });
    await saveLayout(actors.designer, layout.id, { version: 1, document: documentFor(schedule, 2) });
    const r = await getReview(actors.designer, layout.id);
    expect(r.review).toMatchObject({ state: "draft", currentRevision: 2, approvedRevision: 1 });
    expect(r.review.note).toBe("Revision 1 is approved and stays as it was; revision 2 is a new draft.");
    const sheet = await getTerminalSheet(actors.installer, layout.id);
    expect(sheet).toMatchObject({ approved: true, meta: { revision: 1 } });
    expect(sheet.sheet.zoneCount).toBe(3);
    expect((await getTerminalSheet(actors.installer, layout.id, { revision: 2 })).sheet.zoneCount).toBe(2);
    // the new draft goes through review again
    expect(r.actions.find((a) => a.action === "submit")?.allowed).toBe(true);
    await expect(reviewAction(actors.designer, layout.id, { action: "submit", revision: 1 })).rejects.toMatchObject({ status: 409, extra: { currentRevision: 2 } });
  });

  it("lets one of two simultaneous approvals through, and refuses the other", async () => {
    const { actors, layout } = await reviewFixture();
    await reviewAction(actors.designer, layout.id, { action: "submit" });
    const results = await Promise.allSettled([reviewAction(actors.engineer, layout.id, { action: "approve" }), reviewAction(actors.engineer, layout.id, { action: "reject", reason: "no" })]);
    expect(results.filter((r) => r.status === "fulfilled")).toHaveLength(1);
    expect(results.find((r) => r.status === "rejected")).toMatchObject({ reason: { status: 409 } });
    expect(await LayoutDecision.count({ where: { layoutId: layout.id } })).toBe(2);
  });

  it("never shows or changes another organisation's layout: 404", async () => {
    const a = await reviewFixture("A");
    const b = await reviewFixture("B");
    await expect(getReview(b.actors.engineer, a.layout.id)).rejects.toMatchObject({ status: 404 });
    await expect(reviewAction(b.actors.designer, a.layout.id, { action: "submit" })).rejects.toMatchObject({ status: 404 });
    await expect(addComment(b.actors.installer, a.layout.id, { body: "hello" })).rejects.toMatchObject({ status: 404 });
    await expect(compareSiteLayouts(b.actors.designer, b.site.id, [b.layout.id, a.layout.id])).rejects.toMatchObject({ status: 404 });
    expect(await LayoutReview.findByPk(a.layout.id)).toBeNull();
  });

  it("keeps comments with their revision and target", async () => {
    const { actors, layout } = await reviewFixture();
    await addComment(actors.installer, layout.id, { body: "Is the back door cable really 30 m?", target: { kind: "input", boardKey: "panel", input: 2 } });
    await addComment(actors.engineer, layout.id, { body: "Looks fine" });
    const list = await listComments(actors.designer, layout.id);
    expect(list.map((c) => [c.author, c.revision, c.body])).toEqual([
      ["Test installer", 1, "Is the back door cable really 30 m?"],
      ["Test engineer", 1, "Looks fine"],
    ]);
    expect(list[0].target).toEqual({ kind: "input", boardKey: "panel", input: 2 });
  });

  it("compares a site's layouts and records the choice with its reason", async () => {
    const { actors, site, schedule, layout } = await reviewFixture();
    const shared = documentFor(schedule);
    shared.inputs = [{ boardKey: "panel", input: 1, detectorIds: [schedule[0].id, schedule[1].id], scheme: "shared", placement: "at-detector" }, { ...shared.inputs[2], input: 2 }];
    const { layout: b } = await createLayout(actors.designer, site.id, { name: "Option B", document: shared });
    const view = await compareSiteLayouts(actors.installer, site.id, [layout.id, b.id]);
    expect(view.comparison.columns.map((c) => [c.name, c.inputs.used])).toEqual([
      ["Option A", 3],
      ["Option B", 2],
    ]);
    expect(view.comparison.columns[1].shared[0].text).toMatch(/^Control panel, input 1 carries Front door and Back door: saves 1 input/);
    await expect(chooseLayout(actors.installer, site.id, { chosenLayoutId: b.id, comparedLayoutIds: [layout.id, b.id], reason: "x" })).rejects.toMatchObject({ status: 403 });
    const d = await chooseLayout(actors.designer, site.id, { chosenLayoutId: b.id, comparedLayoutIds: [layout.id, b.id], reason: "One input spare for the future garage" });
    expect(d).toMatchObject({ kind: "choose", layoutId: b.id, comparedLayoutIds: [layout.id, b.id], decidedBy: "Test designer" });
    expect((await listSiteDecisions(actors.installer, site.id))[0].reason).toBe("One input spare for the future garage");
    expect(await AuditEntry.count({ where: { action: "layout.choose", entityId: String(b.id) } })).toBe(1);
  });
});
