import { describe, expect, it } from "vitest";
import { shippedCatalog } from "@/lib/catalog/shipped";
import type { RecordedReading } from "@/lib/commissioning/progress";
import { MAX_PHOTO_BYTES } from "@/lib/commissioning/photo-checks";
import type { EffectiveReview } from "@/lib/review/effective-state";
import type { CommissioningView, PhotoView, ReadingView } from "@/lib/server/commissioning";
import { buildTerminalSheet } from "@/lib/sheet/build-sheet";
import type { SheetInput, TerminalSheet } from "@/lib/sheet/sheet-types";
import { largeLayout, largeSchedule } from "@/lib/sheet/testing/sample-layouts";
import { photoProblem } from "@/components/commissioning/photo-precheck";
import { allLoopsPassed, boardsToTest, isCommissioned, loopProgressOf, loopsOfBoard, progressDetail, progressOf, rowsToTest } from "@/components/commissioning/progress-view";
import { firstSelection, selectionView } from "@/components/commissioning/selection";
import { withPhoto, withReview, withSavedReadings } from "@/components/commissioning/view-updates";

// The pure parts of the commissioning screen: which loops there are, where they stand, which one is open, and how
// the screen's copy of the server's view changes after a write.

const sheet = buildTerminalSheet(largeLayout, largeSchedule, shippedCatalog().catalog);
const used = (boardKey: string) => sheet.boards.flatMap((b) => b.rows).find((r): r is SheetInput => !r.spare && r.boardKey === boardKey)!;
const passAll = (row: SheetInput): RecordedReading[] =>
  row.expected.map((e) => ({ boardKey: row.boardKey, input: row.input, test: e.test, reading: e.minOhms === Infinity ? { kind: "open" } : { kind: "ohms", ohms: e.nominalOhms }, verdict: "pass", diagnosis: null, recordedBy: "Test installer", recordedAt: "2026-12-01T10:00:00.000Z" }));
const asViews = (rs: RecordedReading[], firstId = 1): ReadingView[] => rs.map((r, i) => ({ ...r, id: firstId + i, revision: 1, diagnosisCodes: [] }));

const review = (commissionedRevision: number | null): EffectiveReview => ({ state: "approved", currentRevision: 1, inReviewRevision: null, approvedRevision: 1, commissionedRevision, approvedSolo: false, note: null });
const view = (readings: ReadingView[] = [], photos: PhotoView[] = []): CommissioningView => ({ layoutId: 7, review: review(null), revision: 1, progress: progressOf(sheet, [], { loops: [], totals: { loops: 0, passed: 0, failed: 0, incomplete: 0, untested: 0, cannotTest: 0 }, readingsIgnored: 0 }), readings, photos });
const photo = (id: number): PhotoView => ({ id, revision: 1, boardKey: "panel", input: 1, fileName: `p${id}.jpg`, contentType: "image/jpeg", sizeBytes: 10, uploadedBy: null, createdAt: "2026-12-01T10:00:00.000Z" });

describe("the loops to test", () => {
  it("are the used inputs, board by board; spare inputs are left out", () => {
    expect(rowsToTest(sheet).map((r) => `${r.boardKey}#${r.input}`)).toEqual(["panel#1", "deol#1"]);
    expect(boardsToTest(sheet).map((b) => b.boardKey)).toEqual(["panel", "deol"]);
    expect(rowsToTest(null)).toEqual([]);
  });

  it("count the readings on screen, so a saved reading shows at once", () => {
    const none = progressOf(sheet, [], view().progress);
    expect(none.totals).toMatchObject({ loops: 2, passed: 0, untested: 2 });
    const one = progressOf(sheet, passAll(used("panel")), none);
    expect(one.totals).toMatchObject({ loops: 2, passed: 1, untested: 1 });
    expect(loopsOfBoard(one, "panel").map((l) => l.status)).toEqual(["passed"]);
    expect(loopProgressOf(one, "deol", 1)?.status).toBe("untested");
    expect(loopProgressOf(one, "deol", 2)).toBeNull();
    expect(allLoopsPassed(one)).toBe(false);
    expect(allLoopsPassed(progressOf(sheet, [...passAll(used("panel")), ...passAll(used("deol"))], none))).toBe(true);
  });

  it("keep the server's figure when there is no sheet, and never count an empty site as all passed", () => {
    const server = view().progress;
    expect(progressOf(null, passAll(used("panel")), server)).toBe(server);
    expect(allLoopsPassed({ ...server, totals: { loops: 0, passed: 0, failed: 0, incomplete: 0, untested: 0, cannotTest: 0 } })).toBe(false);
  });

  it("say what is left in words", () => {
    expect(progressDetail(3, { loops: 9, passed: 2, failed: 1, incomplete: 2, untested: 3, cannotTest: 1 })).toBe("revision 3 · 1 failed · 2 with tests left · 3 not tested · 1 cannot be tested");
    expect(progressDetail(1, { loops: 2, passed: 2, failed: 0, incomplete: 0, untested: 0, cannotTest: 0 })).toBe("revision 1");
  });

  it("are closed once the approved revision is commissioned", () => {
    expect(isCommissioned(review(1), 1)).toBe(true);
    expect(isCommissioned(review(null), 1)).toBe(false);
    expect(isCommissioned(review(1), 2)).toBe(false);
    expect(isCommissioned(review(null), null)).toBe(false);
  });
});

describe("the open loop", () => {
  const row = used("panel");
  const rows = [row, { ...row, input: 2 }, { ...row, input: 5 }];
  const three: TerminalSheet = { ...sheet, boards: [{ ...sheet.boards[0], rows }, sheet.boards[1]] };

  it("starts on the first board with a used input, showing its list", () => {
    expect(firstSelection(three)).toEqual({ boardKey: "panel", input: null });
    expect(firstSelection({ ...sheet, boards: [{ ...sheet.boards[0], rows: sheet.boards[0].rows.filter((r) => r.spare) }, sheet.boards[1]] })).toEqual({ boardKey: "deol", input: null });
    expect(firstSelection(null)).toEqual({ boardKey: "", input: null });
  });

  it("has the board's previous and next inputs, none past either end", () => {
    const list = rowsToTest(three);
    expect(selectionView(list, { boardKey: "panel", input: 2 })).toMatchObject({ current: { input: 2 }, previous: 1, next: 5 });
    expect(selectionView(list, { boardKey: "panel", input: 1 })).toMatchObject({ previous: null, next: 2 });
    expect(selectionView(list, { boardKey: "panel", input: 5 })).toMatchObject({ previous: 2, next: null });
    expect(selectionView(list, { boardKey: "deol", input: 1 })).toMatchObject({ current: { boardKey: "deol" }, previous: null, next: null });
  });

  it("is none while the list is shown or the input is not on the board", () => {
    const list = rowsToTest(three);
    expect(selectionView(list, { boardKey: "panel", input: null })).toEqual({ current: null, previous: null, next: null });
    expect(selectionView(list, { boardKey: "deol", input: 5 })).toEqual({ current: null, previous: null, next: null });
  });
});

describe("the screen's copy of the view after a write", () => {
  it("adds saved readings, replacing a copy of the same reading (a resend returns the same id)", () => {
    const [a, b] = asViews(passAll(used("panel")).slice(0, 2));
    const v = view([a]);
    expect(withSavedReadings(v, [])).toBe(v);
    const next = withSavedReadings(v, [{ ...a, recordedBy: "again" }, b]);
    expect(next.readings.map((r) => [r.id, r.recordedBy])).toEqual([
      [a.id, "again"],
      [b.id, "Test installer"],
    ]);
    expect(v.readings).toEqual([a]);
  });

  it("lists a photo once, however often it comes back", () => {
    const v = withPhoto(view(), photo(4));
    expect(v.photos.map((p) => p.id)).toEqual([4]);
    expect(withPhoto(v, photo(4))).toBe(v);
    expect(withPhoto(v, photo(5)).photos.map((p) => p.id)).toEqual([4, 5]);
  });

  it("takes the review the server answers after marking the layout commissioned", () => {
    expect(withReview(view(), review(1)).review.commissionedRevision).toBe(1);
  });
});

describe("a photo checked on the device before it is sent", () => {
  const jpeg = new Uint8Array([0xff, 0xd8, 0xff, 0xe0, 0, 0x10]); // ISO/IEC 10918-1 (JPEG): SOI marker FF D8, then a marker segment
  const png = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]); // ISO/IEC 15948 (PNG) file signature

  it("goes when it is a JPEG or PNG within the limit", () => {
    expect(photoProblem(1000, jpeg)).toBeNull();
    expect(photoProblem(MAX_PHOTO_BYTES, png)).toBeNull();
  });

  it("is refused when too large, empty or not a photo, with a sentence that says why", () => {
    expect(photoProblem(MAX_PHOTO_BYTES + 1, jpeg)).toMatch(/^The photo is 8\.0 MiB; the limit is 8 MiB\./);
    expect(photoProblem(0, new Uint8Array())).toBe("The file is empty.");
    expect(photoProblem(1000, new TextEncoder().encode("%PDF-1.7"))).toMatch(/^Only JPEG, PNG and WebP/);
  });
});
