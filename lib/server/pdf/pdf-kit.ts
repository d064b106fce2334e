import "server-only";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import PDFDocument from "pdfkit";

// Shared PDF plumbing: pdfkit with the Inter font embedded (its Greek subset supplies Ω), page sizes, running text that switches font for glyphs the Latin subset lacks, and tables.

export type PageSize = "A4" | "LETTER";
export const PAGE_SIZES: readonly PageSize[] = ["A4", "LETTER"];

type Doc = PDFKit.PDFDocument;

interface FontSet {
  regular: Buffer;
  bold: Buffer;
  greekRegular: Buffer;
  greekBold: Buffer;
}

let fonts: FontSet | null = null;
// The same Inter as the pages' fonts/*.woff2, as plain TrueType: pdfkit's font subsetter cannot cut glyphs out
// of WOFF2's transformed glyph table, and a TrueType file is read in place without inflating tables.
function loadFonts(): FontSet {
  if (fonts) return fonts;
  const here = join(process.cwd(), "fonts");
  const read = (name: string) => readFileSync(join(here, `inter-${name}-normal.ttf`));
  fonts = { regular: read("latin-400"), bold: read("latin-700"), greekRegular: read("greek-400"), greekBold: read("greek-700") };
  return fonts;
}

/** Characters the Latin subset of Inter lacks and the Greek subset has (U+0370–U+03FF). */
const GREEK = /[\u0370-\u03ff]/;
const GREEK_RUNS = /([\u0370-\u03ff]+)/;

/** What no embedded font has: written in words instead. */
export function pdfSafe(text: string): string {
  return text.replace(/∞ ?Ω/g, "open").replace(/∞/g, "open").replace(/\u2126/g, "Ω");
}

export interface Pdf {
  doc: Doc;
  margin: number;
  /** Usable width between the margins. */
  width: number;
  /** Finish the document and collect its bytes. */
  toBuffer(): Promise<Buffer>;
}

/** Printed at the top of every page of a terminal sheet whose revision is not approved. */
export const NOT_APPROVED_MARKING = "NOT APPROVED — FOR REVIEW ONLY";

export function createPdf(opts: { size: PageSize; title: string; subject?: string; marking?: string }): Pdf {
  const f = loadFonts();
  const margin = 42;
  // An empty `font` loads no default font: pdfkit's Helvetica would read its bundled AFM files, and a default given
  // as a buffer would be the same face as "regular" under another key, which pdfkit then re-opens and compares on
  // every font("regular") call (fontkit parses the file each time: most of a large sheet's time went there).
  const doc = new PDFDocument({ size: opts.size, margin, bufferPages: true, font: "", info: { Title: opts.title, Subject: opts.subject ?? opts.title, Creator: "Loopwright", Producer: "Loopwright" } });
  doc.registerFont("regular", f.regular);
  doc.registerFont("bold", f.bold);
  doc.registerFont("greek", f.greekRegular);
  doc.registerFont("greek-bold", f.greekBold);
  doc.font("regular").fontSize(9);
  const chunks: Buffer[] = [];
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on("data", (c: Buffer) => chunks.push(c));
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
  });
  return {
    doc,
    margin,
    width: doc.page.width - 2 * margin,
    toBuffer: () => {
      footers(doc, margin, opts.title, opts.marking);
      doc.end();
      return done;
    },
  };
}

function footers(doc: Doc, margin: number, title: string, marking?: string) {
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    const bottom = doc.page.margins.bottom;
    doc.page.margins.bottom = 0; // writing inside the bottom margin must not start a new page
    if (marking) {
      // In the top margin of every page, so no page of an unapproved sheet can be taken for the approved one.
      doc.save().rect(margin, 8, doc.page.width - 2 * margin, 22).fillAndStroke("#fde8e8", "#b91c1c").restore();
      writeText(doc, marking, { x: margin, y: 13, width: doc.page.width - 2 * margin, size: 11, bold: true, color: "#991b1b", align: "center" });
      writeText(doc, marking, { x: margin, y: doc.page.height - margin + 24, width: doc.page.width - 2 * margin, size: 7, bold: true, color: "#991b1b" });
    }
    writeText(doc, `${title} · page ${i + 1} of ${range.count}`, { x: margin, y: doc.page.height - margin + 14, width: doc.page.width - 2 * margin, size: 7, color: "#666666" });
    doc.page.margins.bottom = bottom;
  }
}

export interface TextOpts {
  x?: number;
  y?: number;
  width: number;
  size?: number;
  bold?: boolean;
  color?: string;
  align?: "left" | "right" | "center";
}

/** Write text at (x, y) or at the cursor, taking glyphs the Latin font lacks from the Greek subset. */
export function writeText(doc: Doc, raw: string, o: TextOpts): void {
  const text = pdfSafe(raw);
  doc.fontSize(o.size ?? 9).fillColor(o.color ?? "#111111");
  const base = o.bold ? "bold" : "regular";
  const greek = o.bold ? "greek-bold" : "greek";
  const common = { width: o.width, align: o.align ?? "left" } as const;
  if (!GREEK.test(text)) {
    doc.font(base);
    if (o.x !== undefined && o.y !== undefined) doc.text(text, o.x, o.y, common);
    else doc.text(text, common);
    return;
  }
  const runs = text.split(GREEK_RUNS).filter((r) => r.length > 0);
  runs.forEach((run, i) => {
    doc.font(GREEK.test(run) ? greek : base);
    const last = i === runs.length - 1;
    if (i === 0 && o.x !== undefined && o.y !== undefined) doc.text(run, o.x, o.y, { ...common, continued: !last });
    else doc.text(run, { ...common, continued: !last });
  });
}

export function heightOf(doc: Doc, text: string, width: number, size = 9, bold = false): number {
  doc.font(bold ? "bold" : "regular").fontSize(size);
  return doc.heightOfString(pdfSafe(text), { width });
}

/** Start a new page when fewer than `h` points are left above the bottom margin. */
export function ensureSpace(doc: Doc, h: number): void {
  if (doc.y + h > doc.page.height - doc.page.margins.bottom) doc.addPage();
}

export function heading(pdf: Pdf, text: string, size = 13): void {
  ensureSpace(pdf.doc, size * 3);
  pdf.doc.moveDown(0.4);
  writeText(pdf.doc, text, { x: pdf.margin, y: pdf.doc.y, width: pdf.width, size, bold: true });
  pdf.doc.moveDown(0.2);
}

export function paragraph(pdf: Pdf, text: string, o: Partial<TextOpts> = {}): void {
  const size = o.size ?? 9;
  ensureSpace(pdf.doc, heightOf(pdf.doc, text, pdf.width, size, o.bold) + 4);
  writeText(pdf.doc, text, { x: pdf.margin, y: pdf.doc.y, width: pdf.width, ...o, size });
}

/** A boxed paragraph for cautions. */
export function noticeBox(pdf: Pdf, text: string): void {
  const { doc } = pdf;
  const pad = 6;
  const h = heightOf(doc, text, pdf.width - 2 * pad, 9, true) + 2 * pad;
  ensureSpace(doc, h + 6);
  const y = doc.y;
  doc.save().rect(pdf.margin, y, pdf.width, h).fillAndStroke("#fff4e5", "#b45309").restore();
  writeText(doc, text, { x: pdf.margin + pad, y: y + pad, width: pdf.width - 2 * pad, bold: true, color: "#7c2d12" });
  doc.y = y + h + 6;
}

export interface Column {
  header: string;
  /** Share of the usable width. */
  share: number;
}

/** A table with a header row, repeated after every page break. Cells wrap; rows never split across pages. */
export function table(pdf: Pdf, columns: Column[], rows: string[][], o: { size?: number } = {}): void {
  const { doc } = pdf;
  const size = o.size ?? 8;
  const pad = 3;
  const total = columns.reduce((s, c) => s + c.share, 0);
  const widths = columns.map((c) => (c.share / total) * pdf.width);
  const rowHeight = (cells: string[], bold: boolean) => Math.max(...cells.map((c, i) => heightOf(doc, c, widths[i] - 2 * pad, size, bold))) + 2 * pad;
  const drawRow = (cells: string[], bold: boolean, fill: string | null, h: number) => {
    const y = doc.y;
    let x = pdf.margin;
    cells.forEach((c, i) => {
      doc.save();
      if (fill) doc.rect(x, y, widths[i], h).fill(fill);
      doc.restore();
      doc.save().lineWidth(0.5).rect(x, y, widths[i], h).stroke("#999999").restore();
      writeText(doc, c, { x: x + pad, y: y + pad, width: widths[i] - 2 * pad, size, bold });
      x += widths[i];
    });
    doc.x = pdf.margin;
    doc.y = y + h;
  };
  const header = columns.map((c) => c.header);
  const headerH = rowHeight(header, true);
  const heights = rows.map((r) => rowHeight(r, false));
  ensureSpace(doc, headerH + (heights[0] ?? 0));
  drawRow(header, true, "#eeeeee", headerH);
  rows.forEach((r, i) => {
    if (doc.y + heights[i] > doc.page.height - doc.page.margins.bottom) {
      doc.addPage();
      drawRow(header, true, "#eeeeee", headerH);
    }
    drawRow(r, false, null, heights[i]);
  });
  doc.moveDown(0.5);
}
