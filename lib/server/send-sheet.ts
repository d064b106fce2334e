import "server-only";
import { db } from "./db";
import { audit } from "./audit";
import { ApiError } from "./errors";
import { env } from "./env";
import { sendMail } from "./mail";
import { ensureCan } from "./schedules";
import { createHash } from "node:crypto";
import { fileStem, findLayoutForReview, getTerminalSheet, loadSheetContext, sheetMetaOf, type SheetOptions } from "./sheets";
import type { Actor } from "./session";
import { siteInstallers } from "./sites";
import { NOT_APPROVED_MARKING, type PageSize } from "@/lib/server/pdf/pdf-kit";
import { SOLO_APPROVAL_WORDS } from "@/lib/review/effective-state";
import { paperOf } from "@/lib/sheet/sheet-request-schema";
import { terminalSheetPdfOffLoop } from "@/lib/server/workers/off-loop";
import { loopJsonReplacer } from "@/lib/loop/loop-json";
import { plural } from "@/lib/vocabulary/plural";

// The terminal sheet as a PDF, for download and e-mailed to the site's installer as an attachment.

// Laying out a sheet of a few dozen loops takes pdfkit over a second of CPU (on a worker thread), so the last few PDFs are kept, keyed by
// everything they are made from (the revision's document, the schedule and the catalog the sheet is built from, its
// heading, the paper): the same sheet is not laid out twice. The sheet itself is built on the worker thread too.
const PDF_CACHE_ENTRIES = 8;
const pdfCache = new Map<string, Buffer>();

/** The terminal sheet PDF of a revision (the approved one by default), from the cache when the same sheet was made before. */
export async function terminalSheetPdfCached(actor: Actor, layoutId: number, opts: SheetOptions & { size?: PageSize } = {}): Promise<{ pdf: Buffer; fileName: string }> {
  const ctx = await loadSheetContext(actor, layoutId, opts);
  const meta = sheetMetaOf(ctx, actor.settings);
  const size = opts.size ?? paperOf(actor.settings);
  const key = createHash("sha256").update(JSON.stringify({ document: ctx.document, schedule: ctx.schedule, catalog: ctx.catalog, meta, size }, loopJsonReplacer)).digest("hex");
  let pdf = pdfCache.get(key);
  if (pdf) pdfCache.delete(key);
  else pdf = await terminalSheetPdfOffLoop(ctx.document, ctx.schedule, ctx.catalog, meta, size);
  pdfCache.set(key, pdf);
  while (pdfCache.size > PDF_CACHE_ENTRIES) pdfCache.delete(pdfCache.keys().next().value!);
  return { pdf, fileName: `${fileStem("terminal-sheet", ctx.site.name, ctx.layout.name, `rev-${ctx.revision}`)}.pdf` };
}

export interface SiteInstaller {
  userId: number;
  name: string;
  email: string;
}

/** The installers assigned to the layout's site who are still installers of the organisation. */
export async function layoutInstallers(actor: Actor, layoutId: number): Promise<SiteInstaller[]> {
  const { site } = await findLayoutForReview(actor, layoutId);
  return siteInstallers(actor.organisationId, site.id);
}

/** The site's installers as one addressee line (names and addresses comma-joined), or null when none is assigned. */
export async function layoutInstaller(actor: Actor, layoutId: number): Promise<{ name: string; email: string } | null> {
  const all = await layoutInstallers(actor, layoutId);
  return all.length ? { name: all.map((i) => i.name).join(", "), email: all.map((i) => i.email).join(", ") } : null;
}

export interface SentSheet {
  to: string;
  installer: string;
  fileName: string;
  revision: number;
  approved: boolean;
  sizeBytes: number;
}

export async function sendSheetToInstaller(actor: Actor, layoutId: number, opts: { size?: PageSize; confirmUnapproved?: boolean } = {}): Promise<SentSheet> {
  ensureCan(actor, "sheet:send");
  const installer = await layoutInstaller(actor, layoutId);
  if (!installer) throw new ApiError(409, "This site has no installer assigned: assign one on the site first, then send the sheet.");
  const view = await getTerminalSheet(actor, layoutId);
  if (!view.approved && !opts.confirmUnapproved)
    throw new ApiError(409, `Revision ${view.meta.revision} is not approved: confirm that it goes out for review only (the e-mail and every page of the PDF say so), or approve it first. Nothing was sent.`, undefined, { code: "confirm-unapproved" });
  const { pdf, fileName } = await terminalSheetPdfCached(actor, layoutId, { size: opts.size ?? paperOf(actor.settings) });
  const rev = view.meta.revision;
  const status = view.approved ? `approved revision ${rev}${view.meta.approvedSolo ? `, ${SOLO_APPROVAL_WORDS}` : ""}` : `revision ${rev}, ${NOT_APPROVED_MARKING}`;
  const link = `${env().NEXTAUTH_URL}/sites/${view.siteId}/layouts/${layoutId}/sheet`;
  const lines = [
    `Hello ${installer.name},`,
    "",
    ...(view.approved ? [] : [`${NOT_APPROVED_MARKING}: this revision has not been approved. Do not wire to it; it is sent so you can review it.`, ""]),
    `${actor.name} sent you the terminal sheet of ${view.meta.siteName}, layout "${view.meta.layoutName}" (${status}).`,
    `It lists ${plural(view.sheet.zoneCount, "zone")} on ${plural(view.sheet.boards.length, "board")}, with the resistors, the core map and the meter reading expected in each test.`,
    "",
    `The PDF is attached; the sheet is also online: ${link}`,
    ...(view.sheet.caution ? ["", view.sheet.caution] : []),
  ];
  await sendMail({ to: installer.email, subject: `${view.approved ? "" : `${NOT_APPROVED_MARKING}: `}Terminal sheet: ${view.meta.siteName} — ${view.meta.layoutName}, revision ${rev}`, text: `${lines.join("\n")}\n`, attachments: [{ filename: fileName, content: pdf, contentType: "application/pdf" }] });
  await db().transaction((transaction) =>
    audit({ organisationId: actor.organisationId, userId: actor.userId, action: "sheet.send", entityType: "layout", entityId: layoutId, detail: { revision: rev, approved: view.approved, to: installer.email, fileName, sizeBytes: pdf.length } }, transaction),
  );
  return { to: installer.email, installer: installer.name, fileName, revision: rev, approved: view.approved, sizeBytes: pdf.length };
}
