import { getDocument } from "pdfjs-dist/legacy/build/pdf.mjs";
import type { TextItem } from "pdfjs-dist/types/src/display/api";

// Reads a PDF the way a person would check it: the text of each page, the page count and each page's size
// in points. An independent reader (pdf.js, the legacy build for Node), not the library that wrote the file,
// so the tests need no system program.

export interface PdfPage {
  /** The page's text in drawing order; a new line where the text moves to another line. */
  text: string;
  /** In PDF points (1/72 in), as displayed: the crop box, turned by the page's rotation. */
  width: number;
  height: number;
  /** Each piece of text and where it sits, in points from the page's top-left corner (y grows downwards). */
  items: PdfTextItem[];
}

export interface PdfTextItem {
  str: string;
  x: number;
  /** The baseline's distance from the top edge, points. */
  y: number;
  /** The font size, points. */
  size: number;
}

export interface PdfContent {
  pages: PdfPage[];
  pageCount: number;
  /** Every page's text, a form feed between pages. */
  text: string;
}

/** Paper sizes in points. ISO 216 A4 is 210 × 297 mm; US Letter is 8.5 × 11 in; 72 pt per inch. */
export const paper = {
  A4: { width: (210 / 25.4) * 72, height: (297 / 25.4) * 72 },
  LETTER: { width: 612, height: 792 },
} as const;

export async function readPdf(bytes: Uint8Array): Promise<PdfContent> {
  if (Buffer.from(bytes.subarray(0, 5)).toString("latin1") !== "%PDF-") throw new Error("not a PDF: the file does not start with %PDF-"); // ISO 32000-1, 7.5.2
  // pdf.js takes over (detaches) the buffer it is given: hand it a copy.
  const task = getDocument({ data: new Uint8Array(bytes), isEvalSupported: false, disableFontFace: true, useSystemFonts: false, verbosity: 0 });
  const doc = await task.promise;
  try {
    const pages: PdfPage[] = [];
    for (let n = 1; n <= doc.numPages; n++) {
      const page = await doc.getPage(n);
      const viewport = page.getViewport({ scale: 1 });
      const { width, height } = viewport;
      const content = await page.getTextContent();
      const textItems = content.items.filter((i): i is TextItem => "str" in i);
      const items = textItems
        .filter((i) => i.str.trim() !== "")
        .map((i) => {
          const [x, y] = viewport.convertToViewportPoint(i.transform[4], i.transform[5]);
          return { str: i.str, x, y, size: Math.hypot(i.transform[2], i.transform[3]) || i.height };
        });
      pages.push({ text: joinItems(textItems), width, height, items });
      page.cleanup();
    }
    return { pages, pageCount: pages.length, text: pages.map((p) => p.text).join("\f") };
  } finally {
    await task.destroy();
  }
}

/** Text items joined into lines: pdf.js marks most line ends (hasEOL); a jump of the baseline also starts a line. */
function joinItems(items: TextItem[]): string {
  let out = "";
  let lastY: number | null = null;
  const atLineStart = () => out === "" || out.endsWith("\n");
  for (const item of items) {
    const y = item.transform[5];
    const size = Math.hypot(item.transform[2], item.transform[3]) || item.height || 1;
    if (!atLineStart() && lastY !== null && Math.abs(y - lastY) > size / 2) out += "\n";
    out += item.str;
    if (item.hasEOL && !atLineStart()) out += "\n";
    if (item.str !== "") lastY = y;
  }
  return out;
}

/** Whitespace runs (line breaks, table gaps) as single spaces, for looking up phrases that may wrap. */
export const squash = (s: string) => s.replace(/\s+/g, " ");
