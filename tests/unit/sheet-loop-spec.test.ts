import { describe, expect, it } from "vitest";
import { shippedCatalog } from "@/lib/catalog/shipped";
import { analyzeLoop } from "@/lib/loop";
import { buildTerminalSheet } from "@/lib/sheet/build-sheet";
import type { SheetInput } from "@/lib/sheet/sheet-types";
import { largeLayout, largeSchedule, midLayout, midSchedule } from "@/lib/sheet/testing/sample-layouts";
import { resistorPlaces, schematicModel } from "@/components/loop-schematic/schematic-model";
import { sheetLoopSpec } from "@/components/sheet/loop-spec";

// The loop the terminal sheet draws for each input is the loop its expected readings came from: analysed again by
// the loop engine, it gives the same nominal reading in every test, and the schematic puts each resistor where the
// sheet says it is fitted.

const { catalog } = shippedCatalog();
const sheets = [buildTerminalSheet(midLayout, midSchedule, catalog), buildTerminalSheet(largeLayout, largeSchedule, catalog)];

describe("the schematic's loop of a terminal sheet row", () => {
  it("reproduces every expected reading of the sheet through the loop engine", () => {
    let compared = 0;
    for (const sheet of sheets)
      for (const b of sheet.boards) {
        const type = catalog.inputTypes.find((t) => t.id === b.inputType?.id)!;
        for (const r of b.rows.filter((x): x is SheetInput => !x.spare && x.expected.length > 0)) {
          const a = analyzeLoop(sheetLoopSpec(r), type);
          for (const e of r.expected) {
            const row = a.rows.find((x) => x.fault === e.fault && x.states.every((s, i) => s === e.states[i]))!;
            expect(row, `${b.boardKey} ${r.input} ${e.test}`).toBeDefined();
            if (e.nominalOhms === Infinity) expect(row.nominalOhms).toBe(Infinity);
            else expect(row.nominalOhms!, `${b.boardKey} ${r.input} ${e.test}`).toBeCloseTo(e.nominalOhms, 6);
            expect(row.minOhms).toBeCloseTo(e.minOhms === Infinity ? Infinity : e.minOhms, 6);
            compared++;
          }
        }
      }
    expect(compared).toBeGreaterThan(20);
  });

  it("draws each resistor at the end the sheet says it is fitted", () => {
    const where = { "at-detector": "detector", "at-panel-terminals": "panel", "loop-back": "panel" } as const;
    const seen = new Set<string>();
    for (const sheet of sheets)
      for (const b of sheet.boards) {
        const type = catalog.inputTypes.find((t) => t.id === b.inputType?.id)!;
        for (const r of b.rows.filter((x): x is SheetInput => !x.spare)) {
          const spec = sheetLoopSpec(r);
          const places = resistorPlaces(schematicModel(spec, spec.detectors.map(() => "rest"), type));
          for (const res of r.resistors) {
            expect(places.find((p) => p.role === res.role)?.place, `${b.boardKey} ${r.input} ${res.role}`).toBe(where[res.fittedAt]);
            seen.add(res.fittedAt);
          }
        }
      }
    expect(seen.has("at-detector")).toBe(true);
  });
});
