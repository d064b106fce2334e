import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { parseScheduleCsv, serializeScheduleCsv } from "@/lib/schedule/csv";
import { scheduleRowSchema, TEXT_LIMITS, type ScheduleRow } from "@/lib/schedule/schema";
import { fixtureCatalog } from "@/lib/solver/testing/fixture-catalog";
import { isLifeSafety } from "@/lib/catalog/life-safety";

describe("parseScheduleCsv", () => {
  const header = "label,type,area,room,cable_m,gauge,supervision";
  it("parses good rows, in any column order, with gauge in AWG or mm²", () => {
    const csv = ["type,label,cable_m,gauge,area,room,supervision", "fx-door,Kitchen door,12.5,22 AWG,Ground,Kitchen,double-eol", 'fx-pir,"Hall, motion",30,"0,5 mm²",Ground,Hall,'].join("\n");
    const r = parseScheduleCsv(csv, fixtureCatalog);
    expect(r.errors).toEqual([]);
    expect(r.rows).toEqual([
      { label: "Kitchen door", catalogId: "fx-door", area: "Ground", room: "Kitchen", cableM: 12.5, gauge: { awg: 22 }, supervision: "double-eol" },
      { label: "Hall, motion", catalogId: "fx-pir", area: "Ground", room: "Hall", cableM: 30, gauge: { mm2: 0.5 }, supervision: "single-eol" },
    ]);
    expect(r.rowNumbers).toEqual([2, 3]);
  });
  it("gives each bad cell its 1-based row (header is row 1) and column, and keeps no bad row", () => {
    const csv = [
      header,
      "Front door,fx-door,Ground,Hall,10,22 AWG,single-eol",
      "Back door,no-such-detector,Ground,Back,10,22 AWG,single-eol",
      "Garage,fx-door,Ground,Garage,-3,22 AWG,single-eol",
      "Loft,fx-pir,Upper,Loft,2500,fat wire,sometimes",
      ",fx-door,Upper,Bath,5,22 AWG,none",
    ].join("\r\n");
    const r = parseScheduleCsv(csv, fixtureCatalog);
    expect(r.rows.map((x) => x.label)).toEqual(["Front door"]);
    const at = r.errors.map((e) => [e.row, e.column]);
    expect(at).toEqual([
      [3, "type"],
      [4, "cable_m"],
      [5, "gauge"],
      [5, "supervision"],
      [6, "label"],
    ]);
    expect(r.errors[0].message).toContain("no-such-detector");
  });
  it("counts rows by record, so a label with a line break does not shift later row numbers", () => {
    const csv = `${header}\r\n"Two\r\nline label",fx-door,A,R,5,22 AWG,none\r\nBad,fx-door,A,R,x,22 AWG,none\r\n`;
    const r = parseScheduleCsv(csv, fixtureCatalog);
    expect(r.errors).toEqual([{ row: 3, column: "cable_m", message: '"x" is not a number of metres' }]);
  });
  it("reports missing header columns on row 1 and an empty file", () => {
    expect(parseScheduleCsv("label,area\r\nx,y\r\n", fixtureCatalog).errors.map((e) => e.column)).toEqual(["type", "cable_m", "gauge"]);
    expect(parseScheduleCsv("", fixtureCatalog).errors[0]).toMatchObject({ row: 1, column: null });
  });
  it("skips blank lines", () => {
    const r = parseScheduleCsv(`${header}\n\nA,fx-door,,,1,24 AWG,none\n\n`, fixtureCatalog);
    expect(r.errors).toEqual([]);
    expect(r.rowNumbers).toEqual([3]);
  });
});

describe("life-safety detectors and shared inputs", () => {
  it("refuses a life-safety detector marked shared-ok, naming its row, and keeps the other rows", () => {
    const csv = ["label,type,area,room,cable_m,gauge,supervision", "Door,fx-door,G,Hall,10,22 AWG,shared-ok", "Plant smoke,fx-smoke,B,Plant,20,22 AWG,shared-ok", "Store smoke,fx-smoke,B,Store,20,22 AWG,single-eol"].join("\n");
    const r = parseScheduleCsv(csv, fixtureCatalog);
    // a fire detector shares no input with another: common practice, no published source; local fire codes decide
    expect(r.errors).toHaveLength(1);
    expect(r.errors[0]).toMatchObject({ row: 3, column: "supervision" });
    expect(r.errors[0].message).toMatch(/life-safety/);
    expect(r.rows.map((x) => x.label)).toEqual(["Door", "Store smoke"]);
  });
});

describe("serialize then parse", () => {
  const text = (max: number) =>
    fc
      .string({ unit: fc.constantFrom("a", "Z", "é", "ß", "Ω", "漢", "😀", ",", '"', "\r\n", "\n", " ", "'", "1", "-"), maxLength: max })
      .map((s) => s.trim());
  const row: fc.Arbitrary<ScheduleRow> = fc
    .record({
      label: text(20).filter((s) => s.length > 0),
      catalogId: fc.constantFrom(...fixtureCatalog.detectors.map((d) => d.id)),
      area: text(12),
      room: text(12),
      cableM: fc.double({ min: 0.001, max: 2000, noNaN: true }),
      gauge: fc.oneof(fc.integer({ min: 10, max: 30 }).map((awg) => ({ awg })), fc.double({ min: 0.05, max: 10, noNaN: true }).map((mm2) => ({ mm2 }))),
      supervision: fc.constantFrom("double-eol", "single-eol", "shared-ok", "none" as const),
    })
    .filter((r) => scheduleRowSchema.safeParse(r).success)
    // a life-safety detector that may share an input is refused on import (tested below)
    .filter((r) => !(r.supervision === "shared-ok" && isLifeSafety(fixtureCatalog.detectors.find((d) => d.id === r.catalogId)!)));

  it("gives back the same rows (unicode, commas, quotes and line breaks in text)", () => {
    fc.assert(
      fc.property(fc.array(row, { maxLength: 12 }), (rows) => {
        const back = parseScheduleCsv(serializeScheduleCsv(rows), fixtureCatalog);
        expect(back.errors).toEqual([]);
        expect(back.rows).toEqual(rows);
      }),
      { numRuns: 300 },
    );
  });
});

describe("long text in an import", () => {
  it("refuses a label over the limit with its row and column, and imports nothing of that row", () => {
    const long = "L".repeat(TEXT_LIMITS.label + 1);
    const csv = `label,type,area,room,cable_m,gauge\nShort one,contact-door-surface,Ground,Hall,10,22 AWG\n${long},contact-door-surface,Ground,Hall,10,22 AWG\n`;
    const r = parseScheduleCsv(csv, { detectors: [{ id: "contact-door-surface" }] } as never);
    expect(r.rows.map((x) => x.label)).toEqual(["Short one"]);
    expect(r.errors).toEqual([{ row: 3, column: "label", message: `the label is ${TEXT_LIMITS.label + 1} characters long; at most ${TEXT_LIMITS.label} are allowed` }]);
  });
});
