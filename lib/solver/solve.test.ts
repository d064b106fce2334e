import { describe, expect, it } from "vitest";
import type { Finding } from "@/lib/findings";
import type { LayoutDocument } from "@/lib/layout/schema";
import type { Schedule } from "@/lib/schedule/schema";
import { solveLayout } from "@/lib/solver";
import { fixtureCatalog } from "@/lib/solver/testing/fixture-catalog";
import { board, catalogWithPanel, det, emptyLayout, inp } from "@/lib/solver/testing/fixture-schedule";

const codes = (fs: Finding[]) => fs.map((f) => f.code);
const find = (fs: Finding[], code: string) => fs.filter((f) => f.code === code);

describe("capacity rules", () => {
  const schedule: Schedule = [det("d1", "fx-door"), det("d2", "fx-door"), det("d3", "fx-pir"), det("d4", "fx-door"), det("d5", "fx-door", { label: "Loft hatch" })];
  it("counts inputs used and free per board and in total", () => {
    const doc = emptyLayout("fx-panel-small", { boards: [board("b1", "expansion", "fx-exp-8", 1)], inputs: [inp("panel", 1, ["d1"]), inp("panel", 2, ["d2"]), inp("b1", 5, ["d3"])] });
    const r = solveLayout(doc, schedule, fixtureCatalog);
    expect(r.boards.map((b) => [b.boardKey, b.inputsUsed, b.inputsFree])).toEqual([["panel", 2, 6], ["b1", 1, 7]]);
    expect(r.totals).toMatchObject({ inputsTotal: 16, inputsUsed: 3, inputsFree: 13, zonesUsed: 3, maxZones: 32, unplacedIds: ["d4", "d5"] });
    expect(find(r.findings, "detectors-unplaced")[0]).toMatchObject({ severity: "warning", message: "2 detectors are not on any input: Detector d4, Loft hatch" });
  });
  it("is an error to place more detectors than the panel reports zones", () => {
    const cat = catalogWithPanel("fx-panel-small", { maxZones: 3 });
    const doc = emptyLayout("fx-panel-small", { inputs: ["d1", "d2", "d3", "d4"].map((d, i) => inp("panel", i + 1, [d])) });
    const f = find(solveLayout(doc, schedule, cat).findings, "zones-over-panel");
    expect(f).toHaveLength(1);
    expect(f[0]).toMatchObject({ severity: "error", message: "4 zones placed; Fixture panel S reports at most 3" });
    doc.inputs.pop();
    expect(codes(solveLayout(doc, schedule, cat).findings)).not.toContain("zones-over-panel");
  });
  it("is an error for an input to hold more detectors than its scheme takes", () => {
    const doc = emptyLayout("fx-panel-small", {
      boards: [board("b1", "expansion", "fx-exp-8-shared", 1)],
      inputs: [inp("panel", 1, ["d1", "d2"], { scheme: "double-eol" }), inp("b1", 1, ["d3"], { scheme: "shared" }), inp("panel", 2, ["d4", "d5"], { scheme: "shared" })],
    });
    const r = solveLayout(doc, schedule, fixtureCatalog);
    expect(find(r.findings, "input-too-many-detectors")[0]).toMatchObject({ severity: "error", target: { kind: "input", boardKey: "panel", input: 1 } });
    expect(find(r.findings, "shared-needs-two")[0]).toMatchObject({ target: { kind: "input", boardKey: "b1", input: 1 } });
    expect(find(r.findings, "scheme-not-supported")[0]).toMatchObject({ target: { kind: "input", boardKey: "panel", input: 2 } }); // fx-dual takes no shared scheme
  });
  it("reports inputs past the board's count, unknown detectors and detectors placed twice", () => {
    const doc = emptyLayout("fx-panel-small", { inputs: [inp("panel", 9, ["d1"]), inp("panel", 1, ["ghost"]), inp("panel", 2, ["d2"]), inp("panel", 3, ["d2"]), inp("nope", 1, ["d3"])] });
    const c = codes(solveLayout(doc, schedule, fixtureCatalog).findings);
    for (const code of ["input-out-of-range", "detector-unknown", "detector-placed-twice", "input-board-unknown"]) expect(c).toContain(code);
  });
});

describe("bus rules", () => {
  const schedule: Schedule = [];
  it("checks device count, addresses, cable length and board family", () => {
    const doc = emptyLayout("fx-panel-small", {
      busCableM: 400,
      boards: [
        board("b1", "expansion", "fx-exp-8", 1),
        board("b2", "expansion", "fx-exp-8", 1),
        board("b3", "keypad", "fx-keypad", 9),
        board("b4", "keypad", "fx-keypad", null),
        board("b5", "expansion", "fx-exp-fire-4", 2),
      ],
    });
    const r = solveLayout(doc, schedule, fixtureCatalog);
    expect(find(r.findings, "bus-too-many-devices")[0].message).toBe("5 devices on the data bus; Fixture panel S takes at most 4");
    expect(find(r.findings, "bus-address-duplicate")[0]).toMatchObject({ message: "Expansion board 2 and Expansion board 1 are both at bus address 1", target: { kind: "board", boardKey: "b2" } });
    expect(find(r.findings, "bus-address-out-of-range")[0].message).toBe("Keypad 1 is set to bus address 9; Fixture panel S polls 1 to 8");
    expect(find(r.findings, "bus-address-missing")[0].target).toEqual({ kind: "board", boardKey: "b4" });
    expect(find(r.findings, "bus-cable-too-long")[0].message).toBe("400 m of data bus cable; Fixture panel S allows 300 m");
    expect(find(r.findings, "board-family-mismatch")[0].target).toEqual({ kind: "board", boardKey: "b5" });
    expect(r.bus).toMatchObject({ devices: 5, maxDevices: 4, duplicateAddresses: [1], outOfRange: [{ boardKey: "b3", address: 9 }], cableM: 400, maxCableM: 300 });
  });
  it("finds nothing wrong with a correct bus", () => {
    const doc = emptyLayout("fx-panel-small", { boards: [board("b1", "expansion", "fx-exp-8", 1), board("b2", "keypad", "fx-keypad", 8)], busCableM: 300 });
    const r = solveLayout(doc, schedule, fixtureCatalog);
    expect(r.findings.filter((f) => f.code.startsWith("bus-") || f.code.startsWith("board-"))).toEqual([]);
  });
});

describe("power rules", () => {
  const pirs = (n: number, catalogId = "fx-pir") => Array.from({ length: n }, (_, i) => det(`p${i + 1}`, catalogId));
  it("sizes the panel battery as worked by hand (NFPA 72 profile)", () => {
    // NFPA 72, secondary power: 24 h standby then 5 min alarm. Fixture panel S draws 80 mA at rest, 150 mA in alarm;
    // four motion detectors draw 15 mA / 20 mA each, so rest = 80 + 4 × 15 = 140 mA and alarm = 150 + 4 × 20 = 230 mA.
    // 24 h × 140 mA = 3360 mAh; 5 min × 230 mA = 19.17 mAh; 3379.17 mAh = 3.3792 Ah; × 1.25 = 4.2240 Ah.
    const schedule = pirs(4);
    const doc = emptyLayout("fx-panel-small", { power: { standbyProfileId: "nfpa72-fire", safetyFactor: 1.25 }, inputs: schedule.map((d, i) => inp("panel", i + 1, [d.id])) });
    const r = solveLayout(doc, schedule, fixtureCatalog);
    const panel = r.supplies.find((s) => s.supplyKey === "panel")!;
    expect(panel).toMatchObject({ loadRestMa: 60, loadAlarmMa: 80, ownRestMa: 80, ownAlarmMa: 150, maxBatteryAh: 18 });
    expect(panel.batteryNeededAh).toBeCloseTo(4.224, 3);
    expect(find(r.findings, "battery-needed")[0].message).toBe(
      "Control panel auxiliary output: standby battery of at least 4.23 Ah, fit one 12 V 7 Ah battery (24 h × 140 mA battery load at rest + 5 min × 230 mA battery load in alarm = 3.38 Ah, × 1.25); it can charge up to 18 Ah",
    );
    // the battery load is own draw plus output load, and the breakdown adds up to it line by line
    expect(panel).toMatchObject({ batteryRestMa: 140, batteryAlarmMa: 230, batteryPick: { sizeAh: 7, count: 1 } });
    expect(panel.breakdown.map((l) => [l.kind, l.restMa, l.alarmMa])).toEqual([["own", 80, 150], ...schedule.map(() => ["detector", 15, 20])]);
    // a fire profile always carries the fire-code caution
    expect(find(r.findings, "battery-fire-caution")[0].why).toMatch(/authority having jurisdiction/);
    expect(r.battery).toEqual({ profileId: "nfpa72-fire", source: "NFPA 72, chapter 10, secondary power supply (10.6.7 in recent editions)", standbyH: 24, alarmMin: 5, safetyFactor: 1.25 });
  });
  it("has no fire caution for an intruder profile without life-safety devices", () => {
    const schedule = pirs(2);
    const r = solveLayout(emptyLayout("fx-panel-small", { inputs: schedule.map((d, i) => inp("panel", i + 1, [d.id])) }), schedule, fixtureCatalog);
    expect(codes(r.findings)).not.toContain("battery-fire-caution");
  });
  it("is an error when the battery needed is larger than the supply can charge", () => {
    // 60 h × (80 + 8 × 40) mA = 24 Ah > 18 Ah before margin
    const schedule = pirs(8, "fx-pir-hungry");
    const doc = emptyLayout("fx-panel-small", { power: { standbyProfileId: "intruder-grade-3-60h", safetyFactor: 1.2 }, inputs: schedule.map((d, i) => inp("panel", i + 1, [d.id])) });
    const f = find(solveLayout(doc, schedule, fixtureCatalog).findings, "battery-too-large");
    expect(f).toHaveLength(1);
    expect(f[0].target).toEqual({ kind: "supply", supplyKey: "panel" });
    expect(f[0].message).toMatch(/can charge at most 18 Ah/);
  });
  it("is an error when the auxiliary output is loaded past its rating, counting keypads and boards", () => {
    // 8 × 40 mA + keypad 40 mA = 360 mA at rest; 8 × 60 mA + 80 mA = 560 mA in alarm; rated 500 mA
    const schedule = pirs(8, "fx-pir-hungry");
    const doc = emptyLayout("fx-panel-small", { boards: [board("k1", "keypad", "fx-keypad", 1)], inputs: schedule.map((d, i) => inp("panel", i + 1, [d.id])) });
    const f = find(solveLayout(doc, schedule, fixtureCatalog).findings, "supply-overloaded");
    expect(f.map((x) => x.message)).toEqual(["Control panel auxiliary output supplies 360 mA at rest and 560 mA in alarm; it is rated 500 mA"]);
  });
  it("charges a board with its own supply, and boards on a supply board, to that supply", () => {
    const schedule = [...pirs(8, "fx-pir-hungry"), det("x1", "fx-pir")];
    const doc = emptyLayout("fx-panel-small", {
      boards: [board("b1", "expansion", "fx-exp-8-psu", 1), board("b2", "expansion", "fx-exp-8", 2, { poweredBy: "s1" }), board("s1", "supply", "fx-psu-2a", 3)],
      inputs: [...schedule.slice(0, 8).map((d, i) => inp("b1", i + 1, [d.id])), inp("b2", 1, ["x1"])],
    });
    const r = solveLayout(doc, schedule, fixtureCatalog);
    const by = Object.fromEntries(r.supplies.map((s) => [s.supplyKey, s]));
    expect(by.panel).toMatchObject({ loadRestMa: 0, loadAlarmMa: 0 });
    expect(by.b1).toMatchObject({ kind: "own-supply", loadRestMa: 320, loadAlarmMa: 480, ownRestMa: 40, ownAlarmMa: 50, ratingMa: 1000 });
    expect(by.s1).toMatchObject({ kind: "supply-board", loadRestMa: 30 + 15, loadAlarmMa: 40 + 20, ownRestMa: 25, powers: ["b2"] });
    // each supply's breakdown names what draws on it and sums to its battery load
    expect(by.s1.breakdown.map((l) => [l.kind, l.key, l.restMa])).toEqual([["own", "s1", 25], ["board", "b2", 30], ["detector", "x1", 15]]);
    expect(by.b1.breakdown.filter((l) => l.kind === "detector")).toHaveLength(8);
    for (const s of r.supplies) {
      expect(s.breakdown.reduce((a, l) => a + l.restMa, 0)).toBeCloseTo(s.batteryRestMa, 9);
      expect(s.breakdown.reduce((a, l) => a + l.alarmMa, 0)).toBeCloseTo(s.batteryAlarmMa, 9);
    }
    expect(codes(r.findings)).not.toContain("supply-overloaded");
  });
  it("is an error to power a board from something that is not a supply", () => {
    const doc = emptyLayout("fx-panel-small", { boards: [board("b1", "expansion", "fx-exp-8", 1), board("b2", "expansion", "fx-exp-8", 2, { poweredBy: "b1" })] });
    expect(find(solveLayout(doc, [], fixtureCatalog).findings, "powered-by-invalid")[0].target).toEqual({ kind: "board", boardKey: "b2" });
  });
  it("works out the voltage left at a detector after its cable's drop", () => {
    // 24 AWG copper: 25.67 Ω per 1000 ft at 20 °C (ASTM B258 wire table) = 0.08422 Ω/m; at 40 °C × (1 + 0.00393 × 20) = 0.09084 Ω/m.
    // 300 m out and back = 600 m → 54.50 Ω; 60 mA × 54.50 Ω = 3.27 V; 13.8 V − 3.27 V = 10.53 V, below the detector's 11.5 V.
    const schedule = [det("h1", "fx-pir-hungry", { cableM: 300, gauge: { awg: 24 } }), det("h2", "fx-pir-hungry", { cableM: 20 })];
    const doc = emptyLayout("fx-panel-small", { inputs: [inp("panel", 1, ["h1"]), inp("panel", 2, ["h2"])] });
    const r = solveLayout(doc, schedule, fixtureCatalog);
    const v = r.detectors.find((d) => d.detectorId === "h1")!;
    expect(v.cableOhms).toBeCloseTo(54.5, 0);
    expect(v.dropV).toBeCloseTo(3.27, 1);
    expect(v.volts).toBeCloseTo(10.53, 1);
    expect(v).toMatchObject({ minVolts: 11.5, ok: false, supplyKey: "panel", supplyVolts: 13.8 });
    const f = find(r.findings, "detector-voltage-low");
    expect(f.map((x) => x.target)).toEqual([{ kind: "detector", detectorId: "h1" }]);
    expect(f[0].message).toMatch(/Detector h1 gets 10\.53 V: 13\.8 V less 3\.27 V dropped over 300 m of cable \(60 mA × 54\.5 Ω out and back\), below its minimum of 11\.5 V/);
    expect(r.detectors.find((d) => d.detectorId === "h2")!.ok).toBe(true);
  });
  it("holds detectors to the panel's minimum device voltage too", () => {
    const cat = catalogWithPanel("fx-panel-small", { minDeviceVolts: 13.78 });
    const schedule = [det("p1", "fx-pir")];
    const r = solveLayout(emptyLayout("fx-panel-small", { inputs: [inp("panel", 1, ["p1"])] }), schedule, cat);
    expect(find(r.findings, "detector-voltage-low")[0].message).toMatch(/the panel's minimum device voltage of 13\.78 V/);
  });
});

describe("loop rules through the loop engine", () => {
  it("passes the engine's findings on with the input as their target, and counts supervision coverage", () => {
    const schedule = [det("a", "fx-door", { label: "Front door" }), det("b", "fx-door", { label: "Side door" }), det("c", "fx-door", { label: "Far shed", cableM: 2000 }), det("e", "fx-door")];
    const doc = emptyLayout("fx-panel-small", {
      inputs: [
        inp("panel", 1, ["a"]),
        inp("panel", 2, ["b"], { scheme: "single-eol", placement: "at-panel" }),
        inp("panel", 3, ["c"]),
        inp("panel", 4, ["e"], { eolOhms: 10000 }),
      ],
    });
    const r = solveLayout(doc, schedule, fixtureCatalog);
    const on = (n: number) => r.findings.filter((f) => f.target.kind === "input" && f.target.input === n).map((f) => f.code);
    expect(on(1).filter((c) => r.findings.find((f) => f.code === c)?.severity === "error")).toEqual([]);
    expect(on(2)).toContain("short-reads-normal"); // a resistor at the panel supervises nothing: a short at the detector reads normal
    expect(on(3)).toContain("loop-ohms-over-limit"); // 2 km of 22 AWG out and back is over 200 Ω, the input allows 100 Ω
    expect(on(4)).toContain("resistor-value-mismatch");
    expect(find(r.findings, "short-reads-normal")[0].message).toMatch(/^Control panel, input 2: /);
    expect(r.inputs.find((i) => i.input === 1)).toMatchObject({ covered: true, longestCableM: 20, inputTypeId: "fx-dual" });
    expect(r.inputs.find((i) => i.input === 2)!.loop!.faults["short-detector"]).toBe("defeat");
    expect(r.coverage.used).toBe(4);
    expect(r.coverage.covered).toBe(r.inputs.filter((i) => i.covered).length);
    expect(r.coverage.covered).toBeLessThan(4);
  });
  it("uses the detector with the longest cable run on a shared input", () => {
    const schedule = [det("a", "fx-door", { supervision: "shared-ok", cableM: 15 }), det("b", "fx-door", { supervision: "shared-ok", cableM: 45 })];
    const doc = emptyLayout("fx-panel-large", { inputs: [inp("panel", 1, ["a", "b"])] });
    const r = solveLayout(doc, schedule, fixtureCatalog);
    expect(r.inputs[0].longestCableM).toBe(45);
    expect(r.shared).toMatchObject({ inputs: 1, inputsSaved: 1, entries: [{ boardKey: "panel", input: 1, detectorIds: ["a", "b"] }] });
    expect(find(r.findings, "shared-input-tradeoff")[0].message).toMatch(/saves 1 input/);
    expect(codes(r.findings)).not.toContain("shared-not-wanted");
  });
  it("warns when a detector shares an input its schedule did not allow", () => {
    const schedule = [det("a", "fx-door", { supervision: "shared-ok" }), det("b", "fx-door", { supervision: "double-eol" })];
    const r = solveLayout(emptyLayout("fx-panel-large", { inputs: [inp("panel", 1, ["a", "b"])] }), schedule, fixtureCatalog);
    expect(find(r.findings, "shared-not-wanted").map((f) => f.message)).toEqual(["Detector b is on Control panel, input 1, a shared input, but its schedule asks for double end-of-line"]);
  });
  it("is a hard error to share an input with a life-safety device, or to put one on an input type not rated for it", () => {
    const schedule = [det("s", "fx-smoke", { label: "Landing smoke" }), det("a", "fx-door", { supervision: "shared-ok" }), det("h", "fx-heat", { label: "Kitchen heat" })];
    const doc = emptyLayout("fx-panel-large", { inputs: [inp("panel", 1, ["s", "a"]), inp("panel", 2, ["h"], { scheme: "single-eol" })] });
    const r = solveLayout(doc, schedule, fixtureCatalog);
    const shared = find(r.findings, "life-safety-shared");
    expect(shared).toHaveLength(1);
    expect(shared[0]).toMatchObject({ severity: "error", target: { kind: "input", boardKey: "panel", input: 1 } });
    expect(shared[0].why).toMatch(/authority having jurisdiction/);
    const wrongType = find(r.findings, "life-safety-input-type");
    expect(wrongType.map((f) => f.target)).toEqual([
      { kind: "input", boardKey: "panel", input: 1 },
      { kind: "input", boardKey: "panel", input: 2 },
    ]);
    expect(find(r.findings, "life-safety-caution")).toHaveLength(1);
  });
  it("accepts a smoke detector on a fire input of a fire panel", () => {
    const schedule = [det("s", "fx-smoke")];
    const doc = emptyLayout("fx-panel-fire", { power: { standbyProfileId: "nfpa72-fire", safetyFactor: 1.25 }, inputs: [inp("panel", 1, ["s"])] });
    const r = solveLayout(doc, schedule, fixtureCatalog);
    expect(codes(r.findings).filter((c) => c.startsWith("life-safety-") && c !== "life-safety-caution")).toEqual([]);
    expect(codes(r.findings)).toContain("life-safety-caution");
    expect(codes(r.findings)).toContain("battery-fire-caution");
  });
});

describe("a layout without a known panel", () => {
  it("says so and checks nothing else", () => {
    const doc: LayoutDocument = emptyLayout("no-such-panel");
    const r = solveLayout(doc, [det("a", "fx-door")], fixtureCatalog);
    expect(codes(r.findings)).toEqual(["panel-unknown", "detectors-unplaced"]);
    expect(r.counts).toEqual({ error: 1, warning: 1, note: 0 });
  });
});
