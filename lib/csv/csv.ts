import Papa from "papaparse";

// Every CSV Loopwright reads or writes goes through here, on papaparse (RFC 4180: a header record, CRLF between
// records, a field quoted when it holds a comma, a quote, a line break or edge spaces, a quote inside doubled).

export type CsvCell = string | number | null;

/**
 * A cell a spreadsheet would run as a formula (=, +, -, @, tab, carriage return first; OWASP "CSV injection") is
 * written with a single quote in front, so the spreadsheet shows it as text. Our own pattern rather than
 * papaparse's `escapeFormulae: true`, whose default (/^[=+\-@\t\r].*$/) misses a formula followed by a line break;
 * quotes already in front count too, so reading back can drop exactly the one quote the writer added.
 * Numbers are passed as numbers and never prefixed: a negative figure stays a number.
 */
const FORMULA_START = /^'*[=+\-@\t\r]/;

/** The records of a CSV text, header first, with one line break of our own after the last. */
export function writeCsv(header: readonly string[], rows: readonly (readonly CsvCell[])[]): string {
  // arrays rather than { fields, data }: with no data rows papaparse would end the header with a line break of its own
  const text = Papa.unparse([[...header], ...rows.map((r) => r.map((c) => (c === null ? "" : c)))], { newline: "\r\n", quotes: false, escapeFormulae: FORMULA_START });
  return `${text}\r\n`;
}

/** The cell as it was before `writeCsv` guarded it against formulas. */
export function unescapeCell(cell: string): string {
  return FORMULA_START.test(cell) && cell.startsWith("'") ? cell.slice(1) : cell;
}

export interface CsvRecords {
  /** Each record's fields, formula guards removed; record n (1-based, header included) is `records[n - 1]`. */
  records: string[][];
  /** The first malformed record, or null. */
  error: { record: number; message: string } | null;
}

/**
 * papaparse takes one line break for the whole file; files edited by hand mix CRLF, LF and CR. Line breaks
 * outside quotes become LF (quotes toggle, so a doubled quote inside a field toggles twice); those inside
 * quoted fields are kept as written.
 */
function unifyLineBreaks(text: string): string {
  if (!text.includes("\r")) return text;
  const parts: string[] = [];
  let from = 0;
  let inQuotes = false;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === 34) inQuotes = !inQuotes; // "
    else if (c === 13 && !inQuotes) {
      // \r, or \r\n, ends a record
      parts.push(text.slice(from, i), "\n");
      if (text.charCodeAt(i + 1) === 10) i++;
      from = i + 1;
    }
  }
  parts.push(text.slice(from));
  return parts.join("");
}

const QUOTE_ERRORS: Record<string, string> = {
  MissingQuotes: "a quoted field is never closed",
  InvalidQuotes: "text after a closing quote",
};

/** Read CSV text: a byte order mark is skipped, blank lines are kept as records of one empty field. */
export function readCsv(text: string): CsvRecords {
  const body = unifyLineBreaks(text.charCodeAt(0) === 0xfeff ? text.slice(1) : text);
  if (body === "") return { records: [], error: null };
  const parsed = Papa.parse<string[]>(body, { delimiter: ",", newline: "\n", quoteChar: '"', header: false, skipEmptyLines: false, dynamicTyping: false });
  const records = parsed.data.map((r) => r.map(unescapeCell));
  // papaparse hands a final line break back as one more empty record
  if (body.endsWith("\n") && records.length && records.at(-1)!.length === 1 && records.at(-1)![0] === "") records.pop();
  const first = parsed.errors[0];
  const error = first ? { record: (first.row ?? records.length - 1) + 1, message: QUOTE_ERRORS[first.code] ?? first.message } : null;
  return { records, error };
}
