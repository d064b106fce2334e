import { describe, expect, it } from "vitest";
import fc from "fast-check";
import Papa from "papaparse";
import { shippedCatalog } from "@/lib/catalog/shipped";
import { bomCsv, zoneListCsv } from "@/lib/bom/csv";
import { billOfMaterials } from "@/lib/bom/bill-of-materials";
import { readCsv, unescapeCell, writeCsv, type CsvCell } from "@/lib/csv/csv";
import { serializeScheduleCsv } from "@/lib/schedule/csv";
import { buildTerminalSheet } from "@/lib/sheet/build-sheet";
import { midLayout, midSchedule } from "@/lib/sheet/testing/sample-layouts";

const { catalog } = shippedCatalog();

describe("readCsv (RFC 4180)", () => {
  it("reads quoted fields with commas, doubled quotes and line breaks", () => {
    // RFC 4180 §2: fields with commas, quotes or line breaks are enclosed in double quotes; a quote inside is doubled
    const { records, error } = readCsv('a,"b,c","say ""hi""","two\r\nlines"\r\nx,y,z,w\r\n');
    expect(error).toBeNull();
    expect(records).toEqual([
      ["a", "b,c", 'say "hi"', "two\r\nlines"],
      ["x", "y", "z", "w"],
    ]);
  });
  it("accepts LF line ends, a byte order mark and a last record without a line break", () => {
    const { records } = readCsv("\ufeffa,b\nc,d");
    expect(records).toEqual([["a", "b"], ["c", "d"]]);
  });
  it("accepts line ends mixed in one file (CRLF, LF, CR)", () => {
    expect(readCsv("a,b\r\nc,d\ne,f\rg,h\r\n").records).toEqual([["a", "b"], ["c", "d"], ["e", "f"], ["g", "h"]]);
  });
  it("reports an unclosed quote", () => {
    expect(readCsv('a,b\r\n"open,c\r\n').error).toEqual({ record: 2, message: expect.stringMatching(/never closed/) });
  });
  it("reports text after a closing quote", () => {
    expect(readCsv('"a"b,c').error?.message).toMatch(/after a closing quote/);
  });
});

describe("writeCsv (RFC 4180)", () => {
  // RFC 4180 §2: fields containing line breaks, double quotes or commas are enclosed in double quotes; a quote inside is doubled
  const one = (cell: CsvCell) => writeCsv(["h"], [[cell]]).slice("h\r\n".length, -2);
  it("quotes fields with commas, quotes and line breaks, doubling quotes, CRLF between records", () => {
    expect(one('Door, "main"')).toBe('"Door, ""main"""');
    expect(one("two\nlines")).toBe('"two\nlines"');
    expect(one("plain")).toBe("plain");
    expect(writeCsv(["a", "b"], [["1", null]])).toBe("a,b\r\n1,\r\n");
  });
  it("writes a cell a spreadsheet would run as a formula with a single quote in front, so it shows as text", () => {
    // OWASP "CSV Injection": cells starting with =, +, -, @, tab or carriage return are run as formulas
    expect(one("=1+1")).toBe(`"'=1+1"`);
    expect(one("+x")).toBe(`"'+x"`);
    expect(one("-x")).toBe(`"'-x"`);
    expect(one("@x")).toBe(`"'@x"`);
    expect(one("\tx")).toBe(`"'\tx"`);
    expect(one("\rx")).toBe(`"'\rx"`);
    // papaparse's own default pattern lets a formula followed by a line break through; ours does not
    expect(one("=1+1\nnext")).toBe(`"'=1+1\nnext"`);
    expect(one("a=b")).toBe("a=b");
  });
  it("keeps numbers as numbers: a negative figure is not prefixed", () => {
    expect(writeCsv(["n"], [[-3.5], [0], [12]])).toBe("n\r\n-3.5\r\n0\r\n12\r\n");
  });
  it("reading back drops only the quote the writer added", () => {
    for (const s of ["=1+1", "'=1+1", "''-x", "'plain", "'", "-"]) expect(readCsv(writeCsv(["h"], [[s]])).records[1]).toEqual([s]);
    expect(unescapeCell("'abc")).toBe("'abc");
  });
});

describe("exports through the CSV module", () => {
  const labels = ["=1+1", "+x", "-x", "@x", "\tLobby door", "\rLobby door"];
  const relabel = (label: string) => midSchedule.map((d) => (d.id === "d-door" ? { ...d, label } : d));
  // a plain RFC 4180 read, without our reader's unescaping: what a spreadsheet is handed
  const rawCells = (csv: string) => Papa.parse<string[]>(csv, { delimiter: ",", skipEmptyLines: true }).data;

  it("writes a detector label that starts like a formula as text in the zone list", () => {
    for (const label of labels) {
      const cells = rawCells(zoneListCsv(buildTerminalSheet(midLayout, relabel(label), catalog)));
      expect(cells[1][1], JSON.stringify(label)).toBe(`'${label}`);
      expect(readCsv(zoneListCsv(buildTerminalSheet(midLayout, relabel(label), catalog))).records[1][1]).toBe(label);
    }
  });
  it("writes it as text in the device schedule export too", () => {
    const rows = relabel("=1+1").map(({ id: _id, ...r }) => r);
    const cells = rawCells(serializeScheduleCsv(rows));
    expect(cells.map((c) => c[0])).toContain("'=1+1");
    expect(cells.map((c) => c[0])).not.toContain("=1+1");
  });
  it("leaves the bill of materials' figures as they are", () => {
    const cells = rawCells(bomCsv(billOfMaterials(midLayout, midSchedule, catalog)));
    for (const c of cells.slice(1)) for (const figure of [c[3], c[4], c[5]]) expect(figure).toMatch(/^(\d+(\.\d\d)?)?$/);
  });
});

describe("write then read", () => {
  const text = fc.string({ unit: fc.constantFrom("a", "Z", "é", "Ω", "漢", "😀", ",", '"', "'", "\r\n", "\n", "\r", " ", "\t", "=", "+", "-", "@", "1"), maxLength: 16 });
  it("gives back the same rows for any text (quotes, commas, line breaks, formula starts)", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 5 }), fc.array(fc.array(text, { minLength: 5, maxLength: 5 }), { maxLength: 8 }), (width, rows) => {
        const header = Array.from({ length: width }, (_, i) => `c${i}`);
        const cut = rows.map((r) => r.slice(0, width));
        const back = readCsv(writeCsv(header, cut));
        expect(back.error).toBeNull();
        expect(back.records).toEqual([header, ...cut]);
      }),
      { numRuns: 500 },
    );
  });
});
