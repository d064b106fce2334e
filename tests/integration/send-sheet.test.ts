import type { AddressInfo } from "node:net";
import { simpleParser, type ParsedMail } from "mailparser";
import { SMTPServer } from "smtp-server";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { testDb } from "./support";
import { reviewFixture } from "./review-fixtures";
import { reviewAction } from "@/lib/server/review";
import { updateDetector } from "@/lib/server/schedules";
import { sendSheetToInstaller, terminalSheetPdfCached } from "@/lib/server/send-sheet";
import { ApiError } from "@/lib/server/errors";
import { AuditEntry, SiteInstaller } from "@/models";
import { readPdf } from "@/tests/support/pdf-text";

// The terminal sheet sent to the site's installer: through a local SMTP server started here, with the PDF attached.

const received: { to: string[]; mail: ParsedMail }[] = [];
let smtp: SMTPServer;

beforeAll(async () => {
  smtp = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS", "AUTH"],
    async onData(stream, session, cb) {
      received.push({ to: session.envelope.rcptTo.map((r) => r.address), mail: await simpleParser(stream) });
      cb();
    },
  });
  await new Promise<void>((resolve) => smtp.listen(0, "127.0.0.1", resolve));
  // lib/server/env.ts reads these once, at the first mail
  process.env.SMTP_PORT = String((smtp.server.address() as AddressInfo).port);
  process.env.NEXTAUTH_URL ??= "http://localhost:3000";
  process.env.NEXTAUTH_SECRET ??= "integration-test-secret-of-at-least-32-chars";
  testDb();
});

afterAll(async () => {
  if (smtp) await new Promise<void>((resolve) => smtp.close(() => resolve()));
});

const status = (p: Promise<unknown>) => p.then(() => 200, (e) => (e instanceof ApiError ? e.status : 500));

describe("sending the terminal sheet", () => {
  it("goes to the site's installer only, with the PDF, and is audited", async () => {
    const f = await reviewFixture("Send sheet");
    expect(await status(sendSheetToInstaller(f.actors.designer, f.layout.id))).toBe(403); // sheet:send is admin and engineer
    expect(await status(sendSheetToInstaller(f.actors.engineer, f.layout.id))).toBe(409); // no installer assigned yet
    await SiteInstaller.create({ siteId: f.site.id, userId: f.actors.installer.userId });

    // an unapproved revision goes out only once the sender confirms it is for review only
    const before = received.length;
    await expect(sendSheetToInstaller(f.actors.engineer, f.layout.id, { size: "LETTER" })).rejects.toMatchObject({ status: 409, extra: { code: "confirm-unapproved" } });
    expect(received.length).toBe(before);
    const sent = await sendSheetToInstaller(f.actors.engineer, f.layout.id, { size: "LETTER", confirmUnapproved: true });
    expect(sent).toMatchObject({ to: f.actors.installer.email, revision: 1, approved: false });
    const m = received.at(-1)!;
    expect(m.to).toEqual([f.actors.installer.email]);
    expect(m.mail.subject).toBe("NOT APPROVED — FOR REVIEW ONLY: Terminal sheet: Send sheet site — Option A, revision 1");
    expect(m.mail.text).toContain("NOT APPROVED — FOR REVIEW ONLY: this revision has not been approved. Do not wire to it");
    expect(m.mail.attachments).toHaveLength(1);
    const pdf = m.mail.attachments[0];
    expect(pdf.contentType).toBe("application/pdf");
    expect(pdf.filename).toBe(sent.fileName);
    expect(pdf.content.subarray(0, 5).toString("latin1")).toBe("%PDF-"); // ISO 32000-1, 7.5.2
    const read = await readPdf(pdf.content);
    expect(read.text).toContain("Front door");
    for (const page of read.pages) expect(page.text).toContain("NOT APPROVED — FOR REVIEW ONLY");
    expect({ width: read.pages[0].width, height: read.pages[0].height }).toEqual({ width: 612, height: 792 }); // US Letter, 8.5 × 11 in at 72 pt/in

    const audit = await AuditEntry.findOne({ where: { action: "sheet.send", entityId: String(f.layout.id) } });
    expect(audit?.detail).toMatchObject({ to: f.actors.installer.email, revision: 1, approved: false });

    // once approved, the mail says so
    await reviewAction(f.actors.designer, f.layout.id, { action: "submit" });
    await reviewAction(f.actors.engineer, f.layout.id, { action: "approve" });
    await sendSheetToInstaller(f.actors.admin, f.layout.id);
    expect(received.at(-1)!.mail.text).toContain("(approved revision 1)");
    expect(received.at(-1)!.mail.subject).not.toContain("NOT APPROVED");
    expect((await readPdf(received.at(-1)!.mail.attachments[0].content)).text).not.toContain("NOT APPROVED");
  });

  it("another organisation's member gets 404, as for a layout that does not exist", async () => {
    const a = await reviewFixture("Send sheet A");
    const b = await reviewFixture("Send sheet B");
    expect(await status(sendSheetToInstaller(b.actors.engineer, a.layout.id))).toBe(404);
  });
});

describe("the terminal sheet PDF", () => {
  it("is laid out once for the same sheet, and again when what it shows changes", async () => {
    const f = await reviewFixture("PDF cache");
    const first = await terminalSheetPdfCached(f.actors.installer, f.layout.id);
    const again = await terminalSheetPdfCached(f.actors.installer, f.layout.id);
    expect(again.pdf).toBe(first.pdf);
    expect((await terminalSheetPdfCached(f.actors.installer, f.layout.id, { size: "LETTER" })).pdf).not.toBe(first.pdf);
    // a longer cable run changes the expected readings on the sheet, so the PDF is made again
    await updateDetector(f.actors.designer, f.site.id, Number(f.schedule[0].id), { cableM: 60 });
    const changed = await terminalSheetPdfCached(f.actors.installer, f.layout.id);
    expect(changed.pdf).not.toBe(first.pdf);
    expect(changed.pdf.equals(first.pdf)).toBe(false);
  });
});
