import { randomUUID } from "node:crypto";
import { beforeAll, describe, expect, it } from "vitest";
import { testDb } from "./support";
import { documentFor, reviewFixture } from "./review-fixtures";
import { recordReadingSchema } from "@/lib/commissioning/commissioning-schema";
import { getCommissioning, recordReading } from "@/lib/server/commissioning";
import { createLayout, deleteLayout, getLayout, listLayouts, redraftFromSchedule, saveLayout, setLayoutArchived } from "@/lib/server/layouts";
import { compareSiteLayouts, getReview, reviewAction } from "@/lib/server/review";
import { approvedScheduleDrift } from "@/lib/server/schedule-drift";
import { createDetector, deleteDetectors, listSchedule, updateDetector } from "@/lib/server/schedules";
import { getTerminalSheet, getZoneList, terminalSheetPdfFor, zoneProgrammingCsvFor } from "@/lib/server/sheets";
import { loopJsonReplacer } from "@/lib/loop/loop-json";
import type { SheetInput } from "@/lib/sheet/sheet-types";
import { AuditEntry, Layout, LayoutDecision, LayoutRevision, Organisation } from "@/models";
import { readPdf } from "@/tests/support/pdf-text";

// A second pair of eyes on every approval, an approved design frozen against later schedule edits, approved
// layouts never deleted, and unapproved sheets marked on every PDF page.

beforeAll(() => {
  testDb();
});

const json = (v: unknown) => JSON.stringify(v, loopJsonReplacer);
const MARKING = "NOT APPROVED — FOR REVIEW ONLY";

async function submittedByDesigner(label: string) {
  const f = await reviewFixture(label);
  await reviewAction(f.actors.designer, f.layout.id, { action: "submit" });
  return f;
}

describe("a second pair of eyes", () => {
  it("refuses the engineer who sent the layout for review (403 with the reason), and changes nothing", async () => {
    const f = await reviewFixture("Solo refused");
    await reviewAction(f.actors.engineer, f.layout.id, { action: "submit" });
    const err = await reviewAction(f.actors.engineer, f.layout.id, { action: "approve" }).catch((e) => e);
    expect(err).toMatchObject({ status: 403, extra: { code: "same-person" } });
    expect(err.message).toMatch(/^You sent this layout for review, so someone else must approve it/);
    expect((await getReview(f.actors.engineer, f.layout.id)).review.state).toBe("in-review");
    expect((await getReview(f.actors.engineer, f.layout.id)).actions.find((a) => a.action === "approve")).toMatchObject({ allowed: false, reason: err.message });
    expect(await LayoutDecision.count({ where: { layoutId: f.layout.id, kind: "approve" } })).toBe(0);
  });

  it("refuses the engineer who made the revision under review, even when someone else sent it", async () => {
    const f = await reviewFixture("Last change");
    await saveLayout(f.actors.engineer, f.layout.id, { version: 1, document: documentFor(f.schedule, 2) });
    await reviewAction(f.actors.designer, f.layout.id, { action: "submit" });
    await expect(reviewAction(f.actors.engineer, f.layout.id, { action: "approve" })).rejects.toMatchObject({ status: 403, message: expect.stringMatching(/^You made the last change to this layout/) });
  });

  it("lets another person approve, with no solo label", async () => {
    const f = await submittedByDesigner("Second review");
    const r = await reviewAction(f.actors.engineer, f.layout.id, { action: "approve" });
    expect(r.review).toMatchObject({ state: "approved", approvedSolo: false });
    expect(r.decisions.at(-1)).toMatchObject({ kind: "approve", reason: "" });
    const audit = await AuditEntry.findOne({ where: { action: "layout.review.approve", entityId: String(f.layout.id) } });
    expect(audit?.detail).toMatchObject({ secondReview: true });
    expect((await getTerminalSheet(f.actors.installer, f.layout.id)).meta.approvedSolo).toBe(false);
  });

  it("with solo approval allowed, approves and says so in the approval, the audit log, the sheet and its PDF", async () => {
    const f = await reviewFixture("Solo allowed");
    await Organisation.update({ soloApproval: true }, { where: { id: f.org.id } });
    await reviewAction(f.actors.engineer, f.layout.id, { action: "submit" });
    const r = await reviewAction(f.actors.engineer, f.layout.id, { action: "approve" });
    expect(r.review).toMatchObject({ state: "approved", approvedSolo: true });
    expect(r.decisions.at(-1)).toMatchObject({ kind: "approve", reason: "Approved without a second review." });
    const audit = await AuditEntry.findOne({ where: { action: "layout.review.approve", entityId: String(f.layout.id) } });
    expect(audit?.detail).toMatchObject({ secondReview: false, note: "approved without a second review" });
    const sheet = await getTerminalSheet(f.actors.installer, f.layout.id);
    expect(sheet.meta).toMatchObject({ approved: true, approvedSolo: true });
    const pdf = await readPdf((await terminalSheetPdfFor(f.actors.installer, f.layout.id)).pdf);
    expect(pdf.pages[0].text).toContain("Approved revision 1 — approved without a second review.");
    expect(pdf.text).not.toContain(MARKING);
  });
});

describe("the approved design is frozen", () => {
  it("keeps the sheet, its PDF, the zone list, commissioning and comparison of approved revisions byte-identical after schedule edits", async () => {
    const f = await submittedByDesigner("Frozen");
    await reviewAction(f.actors.engineer, f.layout.id, { action: "approve" });
    const { layout: second } = await createLayout(f.actors.designer, f.site.id, { name: "Option B", document: documentFor(f.schedule, 2) });
    await reviewAction(f.actors.designer, second.id, { action: "submit" });
    await reviewAction(f.actors.engineer, second.id, { action: "approve" });
    const rows = (await getTerminalSheet(f.actors.installer, f.layout.id)).sheet.boards.flatMap((b) => b.rows).filter((r): r is SheetInput => !r.spare);
    const rest = rows[0].expected.find((e) => e.test === "rest")!;
    await recordReading(f.actors.installer, f.layout.id, recordReadingSchema.parse({ clientId: randomUUID(), boardKey: rows[0].boardKey, input: rows[0].input, test: "rest", reading: String(rest.nominalOhms) }));

    const snapshot = async () => ({
      sheet: json(await getTerminalSheet(f.actors.installer, f.layout.id)),
      pdf: (await readPdf((await terminalSheetPdfFor(f.actors.installer, f.layout.id)).pdf)).pages.map((p) => p.text),
      commissioning: json(await getCommissioning(f.actors.installer, f.layout.id)),
      comparison: json(await compareSiteLayouts(f.actors.engineer, f.site.id, [f.layout.id, second.id])),
      zones: json(await getZoneList(f.actors.installer, f.layout.id)),
      zonesCsv: (await zoneProgrammingCsvFor(f.actors.installer, f.layout.id)).csv,
    });
    const before = await snapshot();

    // the edits that changed an approved sheet before: a cable run, a detector's type, a deleted detector, a new one
    const [front, back, motion] = f.schedule;
    await updateDetector(f.actors.designer, f.site.id, Number(front.id), { cableM: 1999 });
    await updateDetector(f.actors.designer, f.site.id, Number(back.id), { catalogId: "motion-wall" });
    const refused = await deleteDetectors(f.actors.designer, f.site.id, [motion.id]).catch((e) => e);
    expect(refused).toMatchObject({ status: 409, extra: { code: "used-by-approved" } });
    expect(refused.message).toContain("Hall motion is on the approved layout “Option A” (revision 1)");
    expect(await listSchedule(f.actors.designer, f.site.id)).toHaveLength(3); // the refusal deleted nothing
    expect((await deleteDetectors(f.actors.designer, f.site.id, [motion.id], { confirmApproved: true })).approvedLayouts.map((u) => u.name)).toEqual(["Option A"]);
    await createDetector(f.actors.designer, f.site.id, { label: "Hall cupboard door", catalogId: "contact-door-surface", area: "Ground", room: "Hall", cableM: 8, gauge: { awg: 22 }, supervision: "single-eol" });

    const after = await snapshot();
    expect(after.sheet).toBe(before.sheet);
    expect(after.pdf).toEqual(before.pdf);
    expect(after.commissioning).toBe(before.commissioning);
    expect(after.comparison).toBe(before.comparison);
    expect(after.zones).toBe(before.zones);
    expect(after.zonesCsv).toBe(before.zonesCsv);
    expect(before.zonesCsv).toContain("Hall motion"); // deleted from the schedule since, still a zone of the approved revision
    expect(before.sheet).toContain('"cableM":12');

    // the layout says what changed, and a new draft takes it in
    const drift = (await approvedScheduleDrift(f.actors.designer, f.layout.id))!;
    expect(drift.headline).toBe("The schedule has changed since approval: 4 detectors differ.");
    expect(drift.differences.map((d) => [d.label, d.kind])).toEqual([
      ["Front door", "changed"],
      ["Back door", "changed"],
      ["Hall motion", "removed"],
      ["Hall cupboard door", "added"],
    ]);
    expect(drift.differences[0].changes).toEqual([{ field: "cable run", was: "12 m", now: "1999 m" }]);
    const redraft = await redraftFromSchedule(f.actors.designer, f.layout.id);
    expect(redraft.dropped).toEqual([motion.id]);
    expect(redraft.layout.currentRevision).toBe(2);
    expect((await getReview(f.actors.designer, f.layout.id)).review).toMatchObject({ state: "draft", approvedRevision: 1 });
    const stillApproved = await getTerminalSheet(f.actors.installer, f.layout.id); // the sheet stays on approved revision 1
    expect(stillApproved.meta.revision).toBe(1);
    expect(json(stillApproved.sheet)).toBe(JSON.stringify(JSON.parse(before.sheet).sheet));
  });

  it("reads the live schedule for a draft", async () => {
    const f = await reviewFixture("Draft live");
    await updateDetector(f.actors.designer, f.site.id, Number(f.schedule[0].id), { cableM: 40 });
    const sheet = await getTerminalSheet(f.actors.installer, f.layout.id);
    expect(sheet.frozen).toBeNull();
    expect(sheet.sheet.boards.flatMap((b) => b.rows).find((r): r is SheetInput => !r.spare && r.input === 1)!.cable.lengthM).toBe(40);
  });
});

describe("nothing recorded is lost", () => {
  it("refuses to delete an approved layout (409 with the reason); it is archived, stays readable and is not changed", async () => {
    const f = await submittedByDesigner("Keep approved");
    await reviewAction(f.actors.engineer, f.layout.id, { action: "approve" });
    const err = await deleteLayout(f.actors.designer, f.layout.id).catch((e) => e);
    expect(err).toMatchObject({ status: 409, extra: { code: "approved-layout" } });
    expect(err.message).toBe("“Option A” is approved (revision 1): an approved or commissioned layout is never deleted, so its terminal sheet and commissioning record stay. Archive it instead.");
    expect(await Layout.count({ where: { id: f.layout.id } })).toBe(1);
    expect(await LayoutRevision.count({ where: { layoutId: f.layout.id } })).toBe(1);

    const { layout } = await setLayoutArchived(f.actors.designer, f.layout.id, true);
    expect(layout.archivedAt).not.toBeNull();
    expect((await listLayouts(f.actors.installer, f.site.id)).find((l) => l.id === f.layout.id)).toMatchObject({ hasApproval: true });
    expect((await getTerminalSheet(f.actors.installer, f.layout.id)).approved).toBe(true);
    await expect(saveLayout(f.actors.designer, f.layout.id, { version: 1, document: documentFor(f.schedule, 1) })).rejects.toMatchObject({ status: 409, extra: { code: "archived" } });
    await setLayoutArchived(f.actors.designer, f.layout.id, false);
    expect((await getLayout(f.actors.designer, f.layout.id)).layout.archivedAt).toBeNull();
  });

  it("deletes a draft that was never approved", async () => {
    const f = await reviewFixture("Delete draft");
    await deleteLayout(f.actors.designer, f.layout.id);
    expect(await Layout.count({ where: { id: f.layout.id } })).toBe(0);
  });
});

describe("unapproved sheets say so", () => {
  it("marks every page of a draft's sheet PDF, and no page of the approved one", async () => {
    const f = await reviewFixture("Marking");
    const draft = await readPdf((await terminalSheetPdfFor(f.actors.installer, f.layout.id)).pdf);
    expect(draft.pageCount).toBeGreaterThan(1);
    for (const [i, page] of draft.pages.entries()) expect(page.text, `page ${i + 1}`).toContain(MARKING);
    expect(draft.pages[0].text).toContain("Revision 1 is not approved: for review only, not for wiring.");
    await reviewAction(f.actors.designer, f.layout.id, { action: "submit" });
    await reviewAction(f.actors.engineer, f.layout.id, { action: "approve" });
    const approved = await readPdf((await terminalSheetPdfFor(f.actors.installer, f.layout.id)).pdf);
    expect(approved.text).not.toContain(MARKING);
    expect(approved.pages[0].text).toContain("Approved revision 1.");
  });
});
