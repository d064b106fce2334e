import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { analyzeLoop } from "./analyze-loop";
import { conductorOhmsPerM } from "./cable";
import { formatOhmsRange } from "@/lib/resistors/format-ohms";
import { LoopFinding, plainFinding } from "./loop-finding";
import { loopJsonReplacer } from "./loop-json";
import { loopArb } from "./test-support/loop-arbitraries";
import { loop } from "./test-support/loop-fixtures";
import { testInputType } from "./test-support/input-types";

describe("a loop finding writes its message when first read", () => {
  it("writes it once, and as plain data carries it in the field order of a plain finding", () => {
    let written = 0;
    const f = new LoopFinding("margin-thin", "note", () => `text ${++written}`, "why", { kind: "layout" });
    expect(written).toBe(0);
    expect(f.message).toBe("text 1");
    expect(f.message).toBe("text 1");
    expect(written).toBe(1);
    expect(JSON.stringify(f)).toBe('{"code":"margin-thin","severity":"note","message":"text 1","why":"why","target":{"kind":"layout"}}');
    // a spread sees the own fields only; plainFinding is the finding as data
    expect(Object.keys({ ...f })).toEqual(["code", "severity", "why", "target"]);
    expect(plainFinding(f)).toEqual({ code: "margin-thin", severity: "note", message: "text 1", why: "why", target: { kind: "layout" } });
    f.message = "replaced";
    expect(f.message).toBe("replaced");
  });

  it("quotes the loop as analysed, even when the caller changes the loop before the message is read", () => {
    const rHot = conductorOhmsPerM({ awg: 22 }, 40);
    // rest = 2·r·L + 5.6 kΩ·1.05 + 0.05 Ω contact leaves "normal" (2.8–8.4 kΩ, test input type) at 8.4 kΩ
    const limit = (8400 - 5600 * 1.05 - 0.05) / (2 * rHot);
    const l = loop({ cable: { gauge: { awg: 22 }, lengthM: 30000, tempMinC: 0, tempMaxC: 40 } });
    const a = analyzeLoop(l, testInputType);
    l.cable.lengthM = 10;
    l.tolerancePct = 1;
    const over = a.findings.find((f) => f.code === "cable-over-limit")!;
    expect(over.message).toBe(`Readings leave their bands beyond ${Math.floor(limit)} m; this run is already 30000 m`);
    // at rest: 2·r(0 °C)·30 km + 5.6 kΩ·0.95 + 0.05 Ω up to 2·r(40 °C)·30 km + 5.6 kΩ·1.05 + 0.05 Ω, across 8.4 kΩ
    const lo = 2 * conductorOhmsPerM({ awg: 22 }, 0) * 30000 + 5600 * 0.95 + 0.05;
    const hi = 2 * rHot * 30000 + 5600 * 1.05 + 0.05;
    const rest = a.findings.find((f) => f.code === "rest-not-normal")!;
    expect(rest.message).toBe(`May not read normal at rest: all at rest reads ${formatOhmsRange(lo, hi)} (normal or active (alarm))`);
  });

  it("for any loop: the JSON of a finding is its plain data, and reading messages in any order gives the same text", () => {
    fc.assert(
      fc.property(loopArb, fc.boolean(), (l, reverse) => {
        const a = analyzeLoop(l, testInputType);
        const b = analyzeLoop(structuredClone(l), testInputType);
        const order = reverse ? [...b.findings].reverse() : b.findings;
        for (const f of order) void f.message;
        expect(b.findings.map((f) => f.message)).toEqual(a.findings.map((f) => f.message));
        expect(JSON.parse(JSON.stringify(a.findings, loopJsonReplacer))).toEqual(a.findings.map(plainFinding));
        for (const f of a.findings) expect(typeof f.message === "string" && f.message.length > 0).toBe(true);
      }),
      { numRuns: 200 },
    );
  });
});
