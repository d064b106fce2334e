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
          margin: 12mm 12mm 14mm;
          @bottom-left { content: ${cssString(footer)}; font-size: 8pt; color: #444; }
          @bottom-right { content: "page " counter(page) " of " counter(pages); font-size: 8pt; color: #444; white-space: nowrap; }
        }
        .terminal-sheet { font-size: 7pt; line-height: 1.25; }
        .sheet-board + .sheet-board { break-before: page; }
        .sheet-print-input { break-inside: avoid; }
        .sheet-print-table thead { display: table-header-group; }
        .sheet-print-table td { overflow-wrap: anywhere; }
        .sheet-head { margin-bottom: 4px !important; }
        .sheet-head p, .sheet-head li { font-size: 7pt !important; line-height: 1.25 !important; margin-top: 2px !important; padding-top: 1px !important; padding-bottom: 1px !important; }
        .sheet-head h2 { font-size: 11pt !important; }
        main { max-width: none !important; padding: 0 !important; }
      }
      .terminal-sheet { -webkit-print-color-adjust: exact; print-color-adjust: exact; }
    `}</style>
  );
}
