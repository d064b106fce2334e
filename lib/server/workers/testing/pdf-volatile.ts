// What pdfkit writes differently on every run of the same document: the creation date in the info dictionary
// and the file identifier in the trailer, which it derives from that date. Both keep their length, so masking
// them leaves every other byte (and every cross-reference offset) comparable.

// pdfkit writes the date as its own object: `23 0 obj (D:20261201101500Z) endobj`.
const VOLATILE = [/\(D:\d{14}Z\)/g, /\/ID \[<[0-9a-f]+> <[0-9a-f]+>\]/g];

/** The PDF's bytes as latin1 text with the creation date and file identifier blanked; throws unless each occurs once. */
export function pdfWithoutVolatile(pdf: Uint8Array): string {
  let text = Buffer.from(pdf.buffer, pdf.byteOffset, pdf.byteLength).toString("latin1");
  for (const re of VOLATILE) {
    const hits = text.match(re)?.length ?? 0;
    if (hits !== 1) throw new Error(`expected one ${re.source} in the PDF, found ${hits}`);
    text = text.replace(re, (m) => "#".repeat(m.length));
  }
  return text;
}
