import { describe, expect, it } from "vitest";
import { createPdf } from "@/lib/server/pdf/pdf-kit";
import { paper, readPdf, squash } from "@/tests/support/pdf-text";

// The PDF reader the tests rely on, checked against a file whose pages, sizes and text are known.
describe("readPdf", { timeout: 30_000 }, () => {
  it("gives each page's text and size in points, in order", async () => {
    const { doc, toBuffer } = createPdf({ size: "A4", title: "Reader check" });
    doc.text("First line of page one");
    doc.text("Second line of page one");
    doc.addPage({ size: "LETTER" });
    doc.text("Only line of page two");
    const pdf = await readPdf(await toBuffer());

    expect(pdf.pageCount).toBe(2);
    expect(pdf.pages).toHaveLength(2);
    // ISO 216 A4, 210 × 297 mm; US Letter, 8.5 × 11 in
    expect(pdf.pages[0].width).toBeCloseTo(paper.A4.width, 1);
    expect(pdf.pages[0].height).toBeCloseTo(paper.A4.height, 1);
    expect(pdf.pages[1].width).toBe(paper.LETTER.width);
    expect(pdf.pages[1].height).toBe(paper.LETTER.height);

    const [one, two] = pdf.pages.map((p) => p.text);
    expect(one).toMatch(/First line of page one\s*\n\s*Second line of page one/);
    expect(one).not.toContain("page two");
    expect(two.trim().startsWith("Only line of page two")).toBe(true);
    expect(pdf.text.split("\f")).toEqual([one, two]);
    expect(squash(pdf.text)).toContain("First line of page one Second line of page one");
  });

  it("refuses bytes that are not a PDF", async () => {
    await expect(readPdf(Buffer.from("hello, not a PDF"))).rejects.toThrow(/not a PDF/);
  });
});
