import { describe, expect, it } from "vitest";
import { createPdf, heightOf, writeText } from "@/lib/server/pdf/pdf-kit";

// pdfkit opens a face again whenever font() is asked for one it has not cached under that name; a default font
// given as the same face under another key defeats its cache, and fontkit then parses the file on every call.
describe("PDF fonts", () => {
  it("opens each of the four faces once however much text is written", () => {
    const pdf = createPdf({ size: "A4", title: "fonts" });
    for (let i = 0; i < 40; i++) {
      heightOf(pdf.doc, `Input ${i}: 2.2 kΩ at the detector`, 200, 8, i % 2 === 0);
      writeText(pdf.doc, `Input ${i}: 4.7 kΩ, normally closed`, { width: 200, size: 8, bold: i % 3 === 0 });
    }
    // regular, bold, Greek and Greek bold: Ω comes from the Greek subset
    expect((pdf.doc as unknown as { _fontCount: number })._fontCount).toBe(4);
  });
});
