import { randomUUID } from "node:crypto";
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import S3rver from "s3rver";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { testDb } from "./support";
import { reviewFixture } from "./review-fixtures";
import { recordReadingSchema } from "@/lib/commissioning/commissioning-schema";
import { commissioningReportPdfFor, getCommissioning, getPhoto, recordReading, uploadPhoto } from "@/lib/server/commissioning";
import { reviewAction } from "@/lib/server/review";
import { getTerminalSheet } from "@/lib/server/sheets";
import { createStorage, type Storage } from "@/lib/server/storage";
import type { Actor } from "@/lib/server/session";
import type { SheetInput } from "@/lib/sheet/sheet-types";
import { AuditEntry, CommissioningPhoto, CommissioningReading } from "@/models";
import { readPdf, squash } from "@/tests/support/pdf-text";

let server: S3rver;
let store: Storage;
let dir: string;

beforeAll(async () => {
  testDb();
  dir = mkdtempSync(join(tmpdir(), "lw-s3-comm-"));
  server = new S3rver({ port: 0, address: "127.0.0.1", directory: dir, silent: true, configureBuckets: [{ name: "lw-commissioning" }] });
  const { port } = await server.run();
  store = createStorage({ endpoint: `http://127.0.0.1:${port}`, bucket: "lw-commissioning", accessKeyId: "S3RVER", secretAccessKey: "S3RVER", region: "us-east-1", forcePathStyle: true });
});

afterAll(async () => {
  await server?.close();
  rmSync(dir, { recursive: true, force: true });
});

const reading = (boardKey: string, input: number, test: string, value: string, clientId = randomUUID()) => recordReadingSchema.parse({ clientId, boardKey, input, test, reading: value });

async function approved() {
  const f = await reviewFixture("Commissioning");
  await reviewAction(f.actors.designer, f.layout.id, { action: "submit" });
  await reviewAction(f.actors.engineer, f.layout.id, { action: "approve" });
  const { sheet } = await getTerminalSheet(f.actors.installer, f.layout.id);
  const rows = sheet.boards.flatMap((b) => b.rows).filter((r): r is SheetInput => !r.spare);
  return { ...f, rows };
}

/** A passing reading for every test of every loop: the nominal value, or OL where the loop reads open. */
async function passEverything(actor: Actor, layoutId: number, rows: SheetInput[]) {
  for (const r of rows) for (const e of r.expected) await recordReading(actor, layoutId, reading(r.boardKey, r.input, e.test, e.minOhms === Infinity ? "OL" : String(e.nominalOhms)));
}

const jpeg = () => {
  const b = new Uint8Array(20_000);
  b.set([0xff, 0xd8, 0xff, 0xe0]);
  for (let i = 4; i < b.length; i++) b[i] = (i * 31) % 251;
  return b;
};

describe("commissioning readings in MariaDB", () => {
  it("takes readings only on an approved layout", async () => {
    const f = await reviewFixture("Not approved");
    await expect(recordReading(f.actors.installer, f.layout.id, reading("panel", 1, "rest", "5.6k"))).rejects.toMatchObject({ status: 409 });
  });

  it("judges a reading against the terminal sheet and stores it once per client id, retried or raced", async () => {
    const { actors, layout, rows } = await approved();
    const rest = rows[0].expected.find((e) => e.test === "rest")!;
    await expect(recordReading(actors.designer, layout.id, reading("panel", 1, "rest", "5.6k"))).rejects.toMatchObject({ status: 403 });
    const id = randomUUID();
    const first = await recordReading(actors.installer, layout.id, reading("panel", 1, "rest", String(rest.nominalOhms), id));
    expect(first).toMatchObject({ created: true, reading: { verdict: "pass", recordedBy: "Test installer", revision: 1 }, verdict: { verdict: "pass" } });
    const again = await recordReading(actors.installer, layout.id, reading("panel", 1, "rest", String(rest.nominalOhms), id));
    expect(again).toMatchObject({ created: false, reading: { id: first.reading.id } });
    const raced = randomUUID();
    const both = await Promise.all([recordReading(actors.installer, layout.id, reading("panel", 2, "rest", "5.61k", raced)), recordReading(actors.installer, layout.id, reading("panel", 2, "rest", "5.61k", raced))]);
    expect(both.map((b) => b.created).sort()).toEqual([false, true]);
    expect(await CommissioningReading.count({ where: { clientId: [id, raced] } })).toBe(2);
    expect(await AuditEntry.count({ where: { action: "commissioning.reading", entityId: String(layout.id) } })).toBe(2);
  });

  it("stores a failed reading with its diagnosis", async () => {
    const { actors, layout } = await approved();
    // The short test reads like the loop at rest: the resistor sits at the panel (common practice, no published source).
    const r = await recordReading(actors.installer, layout.id, reading("panel", 2, "short", "5.6k"));
    expect(r.reading).toMatchObject({ verdict: "fail", diagnosisCodes: ["resistor-not-at-end"] });
    expect(r.reading.diagnosis).toMatch(/not at the end of the line/);
  });

  it("refuses inputs and tests that are not on the sheet", async () => {
    const { actors, layout } = await approved();
    await expect(recordReading(actors.installer, layout.id, reading("panel", 9, "rest", "5.6k"))).rejects.toMatchObject({ status: 422 });
    // the recessed back door contact has no tamper contact
    await expect(recordReading(actors.installer, layout.id, reading("panel", 2, "tamper", "OL"))).rejects.toMatchObject({ status: 422 });
    expect(() => reading("panel", 1, "rest", "lots")).toThrow(/not a reading/);
  });

  it("marks the layout commissioned once every loop has passed, and closes the record", async () => {
    const { actors, layout, rows } = await approved();
    await recordReading(actors.installer, layout.id, reading("panel", 1, "short", "5.6k"));
    await expect(reviewAction(actors.installer, layout.id, { action: "commission" })).rejects.toMatchObject({ status: 409, extra: { code: "commissioning-incomplete" } });
    await passEverything(actors.installer, layout.id, rows);
    const view = await getCommissioning(actors.designer, layout.id);
    expect(view.progress.totals).toMatchObject({ loops: 3, passed: 3 });
    // the failed short test was retested: the latest reading counts, the earlier one is kept
    expect(view.progress.loops[0].tests.find((t) => t.test === "short")!.earlier).toHaveLength(1);
    const done = await reviewAction(actors.installer, layout.id, { action: "commission" });
    expect(done.review).toMatchObject({ state: "commissioned", commissionedRevision: 1 });
    await expect(recordReading(actors.installer, layout.id, reading("panel", 1, "rest", "5.6k"))).rejects.toMatchObject({ status: 409 });
  });

  it("makes the commissioning record as a PDF with the readings", async () => {
    const { actors, layout, rows } = await approved();
    await passEverything(actors.installer, layout.id, rows.slice(0, 1));
    const { pdf, fileName } = await commissioningReportPdfFor(actors.installer, layout.id, "LETTER");
    expect(fileName).toMatch(/^commissioning-commissioning-site-option-a-rev-1\.pdf$/);
    const text = squash((await readPdf(pdf)).text);
    expect(text).toContain("1 of 3 loops passed");
    expect(text).toContain("Front door — passed");
    expect(text).toContain("Test installer");
  });

  it("refuses a reading that is both open and a value, in the database itself", async () => {
    const { layout } = await approved();
    await expect(CommissioningReading.create({ layoutId: layout.id, revision: 1, boardKey: "panel", input: 1, testState: "rest", measuredOhms: 5, isOpen: true, verdict: "pass", diagnosis: null, diagnosisCodes: [], recordedBy: null, clientId: randomUUID() })).rejects.toThrow(/constraint/i);
  });
});

describe("commissioning photos on the fake S3 server", () => {
  it("stores a checked photo and reads the same bytes back, once per client id", async () => {
    const { actors, layout } = await approved();
    const bytes = jpeg();
    const clientId = randomUUID();
    const up = await uploadPhoto(actors.installer, layout.id, { fileName: "../../front door EOL.JPEG", bytes }, { boardKey: "panel", input: 1, clientId }, store);
    expect(up).toMatchObject({ created: true, photo: { fileName: "front door EOL.jpg", contentType: "image/jpeg", sizeBytes: 20_000, boardKey: "panel", input: 1, uploadedBy: "Test installer" } });
    const again = await uploadPhoto(actors.installer, layout.id, { fileName: "x.jpg", bytes }, { clientId }, store);
    expect(again).toMatchObject({ created: false, photo: { id: up.photo.id } });
    const back = await getPhoto(actors.designer, layout.id, up.photo.id, store);
    expect(back.contentType).toBe("image/jpeg");
    expect(Buffer.compare(back.body, Buffer.from(bytes))).toBe(0);
    const row = await CommissioningPhoto.findByPk(up.photo.id);
    expect(row!.s3Key).toMatch(new RegExp(`^org-${actors.installer.organisationId}/layout-${layout.id}/rev-1/[0-9a-f-]{36}\\.jpg$`));
    expect((await getCommissioning(actors.installer, layout.id)).photos).toHaveLength(1);
  });

  it("refuses other file types and oversized files before storing anything", async () => {
    const { actors, layout } = await approved();
    const before = await CommissioningPhoto.count();
    await expect(uploadPhoto(actors.installer, layout.id, { fileName: "a.jpg", bytes: new TextEncoder().encode("GIF89a......") }, {}, store)).rejects.toMatchObject({ status: 415 });
    const big = new Uint8Array(8 * 1024 * 1024 + 1);
    big.set([0xff, 0xd8, 0xff]);
    await expect(uploadPhoto(actors.installer, layout.id, { fileName: "a.jpg", bytes: big }, {}, store)).rejects.toMatchObject({ status: 413 });
    await expect(uploadPhoto(actors.designer, layout.id, { fileName: "a.jpg", bytes: jpeg() }, {}, store)).rejects.toMatchObject({ status: 403 });
    expect(await CommissioningPhoto.count()).toBe(before);
  });

  it("never gives another organisation's photo: 404", async () => {
    const a = await approved();
    const b = await reviewFixture("Other");
    const up = await uploadPhoto(a.actors.installer, a.layout.id, { fileName: "p.png", bytes: Uint8Array.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 1, 2]) }, {}, store);
    expect(up.photo.fileName).toBe("p.png");
    await expect(getPhoto(b.actors.admin, a.layout.id, up.photo.id, store)).rejects.toMatchObject({ status: 404 });
    await expect(getPhoto(b.actors.admin, b.layout.id, up.photo.id, store)).rejects.toMatchObject({ status: 404 });
  });
});
