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

  it("places each piece of text from the page's top edge, so a test can tell how much of a page is used", async () => {
    const { doc, toBuffer } = createPdf({ size: "A4", title: "Position check" });
    doc.fontSize(12).text("Near the top", 72, 72);
    doc.text("Half way down", 72, paper.A4.height / 2);
    const [page] = (await readPdf(await toBuffer())).pages;
    const top = page.items.find((i) => i.str.includes("Near the top"))!;
    const middle = page.items.find((i) => i.str.includes("Half way down"))!;
    // the baseline sits one ascent below where the text box starts: within a font size of it
    expect(top.y).toBeGreaterThan(72);
    expect(top.y).toBeLessThan(72 + 12 + 1);
    expect(middle.y).toBeGreaterThan(paper.A4.height / 2);
    expect(middle.y).toBeLessThan(paper.A4.height / 2 + 13);
    expect(top.x).toBeCloseTo(72, 0);
    expect(top.size).toBeCloseTo(12, 0);
  });

  it("refuses bytes that are not a PDF", async () => {
    await expect(readPdf(Buffer.from("hello, not a PDF"))).rejects.toThrow(/not a PDF/);
  });
});
