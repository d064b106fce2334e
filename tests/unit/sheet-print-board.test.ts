import { describe, expect, it } from "vitest";
import type { SheetBoard, SheetInput, SheetResistor } from "@/lib/sheet/sheet-types";
import { boardPrintFindings } from "@/components/sheet/sheet-print-findings";
import { bandsKey, densePrint, wiringText } from "@/components/sheet/sheet-board-print";

// What the printed board says once instead of on every row: findings grouped, colour bands in a key.

const eol = (ohms: number, valueText: string, bands: string[], name = "end-of-line resistor"): SheetResistor =>
  ({ role: "eol", name, ohms, valueText, tolerancePct: 5, bands, series: "E12", fittedAt: "at-detector", where: "at the detector" }) as SheetResistor;
const BANDS_4K7 = ["yellow", "violet", "red", "gold"]; // IEC 60062: 4.7 kΩ is yellow-violet-red (×100), gold ±5 %
const BANDS_5K6 = ["green", "blue", "red", "gold"]; // IEC 60062: 5.6 kΩ is green-blue-red (×100), gold ±5 %

function row(input: number, scheme: SheetInput["scheme"], findings: SheetInput["findings"], resistors = [eol(4700, "4.7 kΩ", BANDS_4K7)]): SheetInput {
  return {
    spare: false, boardKey: "panel", input, terminals: `${input}+ / ${input}−`, zones: [input], detectors: [], scheme, schemeText: scheme === "double-eol" ? "double end-of-line" : "single end-of-line",
    placement: "at-detector", placementText: "resistor at the detector", resistors, loopConductors: 2,
    cores: [{ core: 1, carries: "loop", panelEnd: "", farEnd: "" }, { core: 2, carries: "loop", panelEnd: "", farEnd: "" }],
    cable: { gauge: { awg: 22 }, gaugeText: "22 AWG", lengthM: 10, conductorOhms: null }, expected: [], noReadingsReason: null, findings,
  } as SheetInput;
}
const cut = (n: number) => ({ code: "cut-misread", severity: "warning" as const, message: `Control panel, input ${n}: one conductor cut reads ∞ Ω (active (alarm)), not open`, why: "A cut that reads as an alarm is not a tamper." });
const board = (rows: SheetInput[]): SheetBoard => ({ boardKey: "panel", name: "Control panel", kind: "panel", catalogId: "p", deviceName: "Panel", busAddress: null, inputType: null, rows, signOff: [] });

describe("the printed board", () => {
  it("says a scheme's own finding once for all its inputs, and an error on its own before it", () => {
    const error = { code: "short-reads-normal", severity: "error" as const, message: "Control panel, input 4: a short reads as normal", why: "A defeat." };
    const b = board([1, 2, 3].map((n) => row(n, "single-eol", [cut(n)])).concat(row(4, "double-eol", [error])));
    const { groups, schemeNotes } = boardPrintFindings(b);
    expect(schemeNotes.map((n) => n.heading)).toEqual(["Single end-of-line on Control panel, inputs 1–3"]);
    expect(schemeNotes[0].groups.map((g) => g.findings.length)).toEqual([3]);
    expect(groups.map((g) => [g.severity, g.title])).toEqual([["error", error.message]]);
  });
  it("keys each resistor value's colour bands once, and names a shared value once in a row", () => {
    const both = [eol(4700, "4.7 kΩ", BANDS_4K7), eol(4700, "4.7 kΩ", BANDS_4K7, "alarm resistor")];
    const b = board([row(1, "double-eol", [], both), row(2, "single-eol", [], [eol(5600, "5.6 kΩ", BANDS_5K6)]), row(3, "double-eol", [], both)]);
    expect(bandsKey(b)).toBe("4.7 kΩ yellow-violet-red-gold, 5.6 kΩ green-blue-red-gold");
    expect(wiringText(b.rows[0] as SheetInput)).toBe("EOL and alarm 4.7 kΩ · double EOL, resistor at the detector · cores 1–2 loop");
  });
  it("uses the smaller type only above 16 inputs used", () => {
    expect(densePrint(board(Array.from({ length: 16 }, (_, i) => row(i + 1, "single-eol", []))))).toBe(false);
    expect(densePrint(board(Array.from({ length: 17 }, (_, i) => row(i + 1, "single-eol", []))))).toBe(true);
  });
});
