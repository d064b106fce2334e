import { describe, expect, it } from "vitest";
import * as loop from "./index";
import { plainRow } from "./reading-row";
import { testInputType } from "./test-support/input-types";

describe("public index", () => {
  it("exposes the engine, helpers and schema", () => {
    for (const name of ["analyzeLoop", "cableOhms", "conductorOhmsPerM", "seriesValues", "colourBands", "combineFromStock", "analyzeRequestSchema", "analyzeRequest", "readingAt", "reportOf"])
      expect(typeof (loop as Record<string, unknown>)[name], name).not.toBe("undefined");
  });
  it("open readings survive JSON with the replacer and reviver", () => {
    const a = loop.analyzeLoop(
      { scheme: "single-eol", placement: "at-detector", detectors: [{ label: "Door", contact: "NC", tamper: false, lifeSafety: false }], tolerancePct: 5, cable: { gauge: { awg: 22 }, lengthM: 10, tempMinC: 10, tempMaxC: 30 }, contactOhms: 0.05 },
      testInputType,
    );
    const back = JSON.parse(JSON.stringify(a, loop.loopJsonReplacer), loop.loopJsonReviver) as typeof a;
    // rows build their label when read; as plain data they carry it like any other field
    expect(back.rows).toEqual(a.rows.map(plainRow));
    expect(back.rows[1].label).toBe("a short across the pair at the panel end (all at rest)");
    // a meter reading of 5.55 kΩ matches only the rest row
    expect(loop.rowsMatchingReading(a, 5550)).toEqual([0]);
  });
});
