import { describe, expect, it } from "vitest";
import * as resistorData from "resistor-data";
import { shippedCatalog } from "@/lib/catalog/shipped";
import type { LayoutDocument } from "@/lib/layout/schema";
import { analyzeLoop, readingAt } from "@/lib/loop";
import type { Schedule } from "@/lib/schedule/schema";
import { loopSpecFor } from "@/lib/solver";
import { buildTerminalSheet, spareValue } from "@/lib/sheet/build-sheet";
import type { SheetInput, TerminalSheet } from "@/lib/sheet/sheet-types";
import { largeLayout, largeSchedule, midLayout, midSchedule } from "@/lib/sheet/testing/sample-layouts";

const { catalog } = shippedCatalog();
const used = (s: TerminalSheet) => s.boards.flatMap((b) => b.rows).filter((r): r is SheetInput => !r.spare);
const row = (s: TerminalSheet, boardKey: string, input: number) => used(s).find((r) => r.boardKey === boardKey && r.input === input)!;

/** The loop engine's own analysis of a layout input, built the way the solver builds it, without the solver's caches. */
function engineRows(layout: LayoutDocument, schedule: Schedule, boardKey: string, input: number) {
  const inp = layout.inputs.find((i) => i.boardKey === boardKey && i.input === input)!;
  const detectors = inp.detectorIds.map((id) => {
    const sched = schedule.find((d) => d.id === id)!;
    return { sched, cat: catalog.detectors.find((c) => c.id === sched.catalogId)! };
  });
  const typeId = boardKey === "panel" ? catalog.panels.find((p) => p.id === layout.panelId)!.onboardInputs.inputType : catalog.expansionBoards.find((b) => b.id === layout.boards.find((x) => x.key === boardKey)!.catalogId)!.inputs.inputType;
  const type = catalog.inputTypes.find((t) => t.id === typeId)!;
  const spec = loopSpecFor({ input: inp, detectors } as Parameters<typeof loopSpecFor>[0], type);
  return { spec, type, analysis: analyzeLoop(spec, type) };
}

describe("terminal sheet", () => {
  const mid = buildTerminalSheet(midLayout, midSchedule, catalog);
  const large = buildTerminalSheet(largeLayout, largeSchedule, catalog);

  it("gives, for every test, exactly the loop engine's row for the same loop (the check)", () => {
    let compared = 0;
    for (const [sheet, layout, schedule] of [
      [mid, midLayout, midSchedule],
      [large, largeLayout, largeSchedule],
    ] as const)
      for (const r of used(sheet)) {
        const { analysis } = engineRows(layout, schedule, r.boardKey, r.input);
        expect(r.expected.length).toBeGreaterThanOrEqual(4);
        for (const e of r.expected) {
          const match = analysis.rows.filter((x) => x.fault === e.fault && x.states.join() === e.states.join());
          expect(match).toHaveLength(1);
          expect([e.minOhms, e.maxOhms, e.nominalOhms]).toEqual([match[0].minOhms, match[0].maxOhms, match[0].nominalOhms]);
          expect(e.reports).toEqual(match[0].reports);
          compared++;
        }
      }
    expect(compared).toBeGreaterThan(25);
  });

  it("takes each range at the cold and hot ends of the cable and the part tolerance (independent point readings)", () => {
    // A point reading inside the ranges: parts at their marked value, cable at 25 °C.
    const { spec, type } = engineRows(midLayout, midSchedule, "panel", 1);
    const rest = row(mid, "panel", 1).expected.find((e) => e.test === "rest")!;
    const atMid = readingAt(spec, ["rest"], "none", { tempC: 25 }, type);
    expect(atMid).toBeGreaterThan(rest.minOhms);
    expect(atMid).toBeLessThan(rest.maxOhms);
    // low end: 4.7 kΩ − 5 % with the cable at 10 °C
    expect(readingAt(spec, ["rest"], "none", { tempC: 10, eolOhms: 4700 * 0.95 }, type)).toBeCloseTo(rest.minOhms, 6);
  });

  it("lists the tests a loop needs: rest, active, tamper (when the detector has one), short and cut", () => {
    expect(row(mid, "panel", 1).expected.map((e) => e.test)).toEqual(["rest", "active", "tamper", "short", "cut"]);
    expect(row(mid, "panel", 3).expected.map((e) => e.test)).toEqual(["rest", "active", "short", "cut"]); // the NO panic button has no tamper
    expect(row(large, "panel", 1).expected.map((e) => e.test)).toEqual(["rest", "active-a", "active-b", "active-both", "tamper-a", "short", "cut"]);
    const cut = row(mid, "panel", 1).expected.find((e) => e.test === "cut")!;
    expect(cut).toMatchObject({ minOhms: Infinity, rangeText: "open (meter shows OL)", reports: ["open"] });
  });

  it("numbers zones in board order then input order, one per detector, two on a shared input", () => {
    expect(used(mid).map((r) => [r.boardKey, r.input, r.zones])).toEqual([
      ["panel", 1, [1]],
      ["panel", 2, [2]],
      ["panel", 3, [3]],
      ["panel", 5, [4]],
      ["fire1", 1, [5]],
    ]);
    expect(row(large, "panel", 1).zones).toEqual([1, 2]);
    expect(mid.zoneCount).toBe(5);
  });

  it("gives each zone its label, area, room, device type and contact type", () => {
    expect(row(mid, "panel", 3).detectors[0]).toMatchObject({ zone: 3, label: "Desk panic button", area: "Ground floor", room: "Reception", deviceType: "Latching panic button, NO", contact: "NO", tamper: false });
    expect(row(mid, "panel", 1).detectors[0].reports).toEqual(["normal", "active", "open", "short"]);
  });

  it("colour-codes the resistors by IEC 60062, agreeing with the resistor-data package", () => {
    const door = row(mid, "panel", 1);
    // IEC 60062: 4.7 kΩ 5 % = yellow, violet, red, gold
    expect(door.resistors.map((r) => [r.role, r.valueText, r.bands])).toEqual([
      ["eol", "4.7 kΩ", ["yellow", "violet", "red", "gold"]],
      ["alarm", "4.7 kΩ", ["yellow", "violet", "red", "gold"]],
    ]);
    // second opinion: npm resistor-data's 4-band code for every resistor on the sheets
    for (const r of [...used(mid), ...used(large)].flatMap((x) => x.resistors))
      expect(r.bands).toEqual(resistorData.notationToBands([resistorData.valueToNotation(r.ohms), r.tolerancePct], 4));
    const shared = row(large, "panel", 1);
    // IEC 60062: 5.6 kΩ = green blue red; 2.7 kΩ = red violet red
    expect(shared.resistors.map((r) => [r.role, r.bands.slice(0, 3)])).toEqual([
      ["eol", ["green", "blue", "red"]],
      ["shared-a", ["red", "violet", "red"]],
      ["shared-b", ["green", "blue", "red"]],
    ]);
    expect(shared.resistors[1].where).toBe("at Side door, across its alarm contact");
    // the same bands the loop engine gives
    const { analysis } = engineRows(largeLayout, largeSchedule, "panel", 1);
    expect(shared.resistors.map((r) => r.bands)).toEqual(analysis.resistors.map((r) => r.bands));
  });

  it("maps the cores of a loop-back resistor: 1 + 2 out to the contact, 3 + 4 back to the resistor at the panel end", () => {
    const pir = row(mid, "panel", 2);
    expect(pir.loopConductors).toBe(4);
    expect(pir.resistors[0]).toMatchObject({ role: "eol", fittedAt: "loop-back" });
    expect(pir.cores.map((c) => [c.core, c.carries])).toEqual([
      [1, "loop"],
      [2, "loop"],
      [3, "loop-back"],
      [4, "loop-back"],
      [5, "power"],
      [6, "power"],
    ]);
    expect(pir.cores[0]).toMatchObject({ panelEnd: "input 2 +", farEnd: "start of the chain: tamper contact, then alarm contact" });
    expect(pir.cores[1]).toMatchObject({ panelEnd: "input 2 −", farEnd: "joined to core 4 (no contact, no resistor)" });
    expect(pir.cores[2]).toMatchObject({ panelEnd: "one leg of the end-of-line resistor (not on the input terminals)", farEnd: "end of the contact chain" });
    expect(pir.cores[3]).toMatchObject({ panelEnd: "other leg of the end-of-line resistor", farEnd: "joined to core 2" });
    expect(pir.cores[4].panelEnd).toBe("+ supply (Control panel auxiliary output)");
    // The core map is the circuit the engine computes: cores 1 to 4 in the path, so the rest reading is R + 4 Rc.
    const { spec, type } = engineRows(midLayout, midSchedule, "panel", 2);
    const twoCore = readingAt({ ...spec, placement: "at-detector" }, ["rest"], "none", { tempC: 20 }, type);
    const fourCore = readingAt(spec, ["rest"], "none", { tempC: 20 }, type);
    const rc = readingAt({ ...spec, placement: "at-detector" }, ["rest"], "short-detector", { tempC: 20 }, type) / 2; // a short at the far end leaves 2 Rc
    expect(fourCore - twoCore).toBeCloseTo(2 * rc, 6);
  });

  it("maps a NO contact across the pair, and a loop with the resistor at the panel with a warning", () => {
    const panic = row(mid, "panel", 3);
    expect(panic.cores.map((c) => c.farEnd)).toEqual(["one side of the alarm contact", "other side of the alarm contact; the end-of-line resistor across the contact"]);
    expect(panic.resistors[0].where).toBe("at Desk panic button, across the alarm contact");
    const back = row(mid, "panel", 5);
    expect(back.resistors[0]).toMatchObject({ fittedAt: "at-panel-terminals" });
    expect(back.resistors[0].where).toMatch(/supervises nothing/);
    expect(back.findings.length).toBeGreaterThan(0);
    // a short at the far end reads like the resistor alone: normal, the defeat the engine reports
    expect(back.expected.find((e) => e.test === "short")!.reports).toEqual(["normal"]);
  });

  it("marks spare inputs with the resting value that keeps them normal", () => {
    const spare = mid.boards[0].rows.find((r) => r.input === 4)!;
    expect(spare).toMatchObject({ spare: true, terminals: "4+ / 4−" });
    expect(mid.boards[0].rows).toHaveLength(16);
    const fire = catalog.inputTypes.find((t) => t.id === "input-fire-1k-4k7")!;
    // the fire zone input rests at 1 kΩ + 4.7 kΩ in series (its band table, catalog/input-types.yaml)
    expect(spareValue(fire)).toEqual({ ohms: 5700, text: "1 kΩ and 4.7 kΩ in series" });
    expect(spareValue(catalog.inputTypes.find((t) => t.id === "input-4k7")!)).toEqual({ ohms: 4700, text: "4.7 kΩ" });
  });

  it("carries the life-safety caution only when the layout has life-safety devices", () => {
    expect(mid.lifeSafety).toBe(true);
    expect(mid.caution).toMatch(/local fire code and the authority having jurisdiction/);
    expect(mid.caution).toMatch(/aid, not an approval/);
    expect(large.caution).toBeNull();
  });

  it("gives the cable gauge and run, and a sign-off per board", () => {
    expect(row(mid, "fire1", 1).cable).toMatchObject({ gaugeText: "0.5 mm2", lengthM: 60 });
    expect(mid.boards.map((b) => b.name)).toEqual(["Control panel", "Expansion board 1"]);
    expect(mid.boards[0].signOff.length).toBeGreaterThan(0);
  });
});
