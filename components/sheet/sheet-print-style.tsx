import type { PaperSize } from "@/lib/sheet/sheet-request-schema";

const PAGE_CSS: Record<PaperSize, string> = { A4: "A4 portrait", LETTER: "letter portrait" };

/** A CSS string literal from any text: quotes and backslashes escaped, "<" written as a CSS escape so the style element cannot be closed early. */
export function cssString(text: string): string {
  return `"${text.replace(/[\\"]/g, "\\$&").replace(/[\n\r\f]/g, " ").replace(/</g, "\\3c ")}"`;
}

/**
 * Printing the terminal sheet from the browser: the chosen paper, a new page for each board, the compact board
 * table instead of the screen's cards, and the sheet's name with "page N of M" in the footer (@page margin boxes).
 */
export function SheetPrintStyle({ size, footer }: { size: PaperSize; footer: string }) {
  return (
    <style>{`
      @media print {
        @page {
          size: ${PAGE_CSS[size]};
          margin: 10mm 10mm 12mm;
          @bottom-left { content: ${cssString(footer)}; font-size: 8pt; color: #444; }
          @bottom-right { content: "page " counter(page) " of " counter(pages); font-size: 8pt; color: #444; white-space: nowrap; }
        }
        .terminal-sheet { font-size: 6.5pt; line-height: 1.2; }
        .sheet-board + .sheet-board { break-before: page; }
        .sheet-board { margin: 0 !important; }
        .sheet-print-input { break-inside: avoid; }
        .sheet-print-table { font-size: 6.5pt; line-height: 1.15; }
        [data-dense] .sheet-print-table, [data-dense] .sheet-print-findings, [data-dense] .sheet-print-input { font-size: 5.2pt !important; line-height: 1.1 !important; }
        .sheet-print-table thead { display: table-header-group; }
        .sheet-print-table th { border: 0.5pt solid #64748b; background: #f1f5f9; padding: 0.5pt 2pt; text-align: left; font-weight: 600; }
        .sheet-print-table th.sheet-print-board-head { border: 0; border-bottom: 1.5pt solid #111; background: none; padding: 0 0 1pt; font-weight: 400; }
        .sheet-print-board-head strong { font-size: 1.5em; }
        .sheet-print-table td { border: 0.5pt solid #94a3b8; padding: 0.5pt 2pt; vertical-align: top; overflow-wrap: anywhere; }
        .sheet-print-reading { display: block; }
        .sheet-col-input { width: 6%; }
        .sheet-col-detectors { width: 47%; }
        .sheet-col-test { width: 9%; }
        .sheet-col-test.sheet-col-wide { width: 10%; }
        [data-dense] .sheet-col-detectors { width: 55%; }
        [data-dense] .sheet-col-test { width: 7%; }
        [data-dense] .sheet-col-test.sheet-col-wide { width: 9%; }
        .sheet-print-findings { margin: 2pt 0 0; padding: 0; list-style: none; font-size: 6.5pt; line-height: 1.2; }
        .sheet-print-findings li { margin: 0; padding: 0; break-inside: avoid; }
        .sheet-head { margin-bottom: 3pt !important; }
        .sheet-head p, .sheet-head li { font-size: 6pt !important; line-height: 1.15 !important; margin-top: 1pt !important; padding-top: 0.5pt !important; padding-bottom: 0.5pt !important; }
        .sheet-head h2 { font-size: 9pt !important; line-height: 1.15 !important; }
        main { max-width: none !important; padding: 0 !important; }
      }
      .terminal-sheet { -webkit-print-color-adjust: exact; print-color-adjust: exact; }
    `}</style>
  );
}
