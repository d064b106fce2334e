import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { conductorOhms } from "@/lib/loop";
import type { LayoutDocument, OutputDevice } from "@/lib/layout/schema";
import { solveLayout } from "@/lib/solver";
import { deviceDraw } from "@/lib/solver/output-rules";
import { PANEL_AUX_NAME, panelSupplyName } from "@/lib/solver/power-rules";
import { zonedCatalog } from "@/lib/solver/testing/fixture-catalog";
import { board, emptyLayout } from "@/lib/solver/testing/fixture-schedule";

// Sounders and strobes on outputs: the battery figure by hand, output ratings, and the voltage at each device.

const dev = (id: string, catalogId: string, over: Partial<OutputDevice> = {}): OutputDevice => ({
  id,
  kind: catalogId === "fx-strobe" ? "strobe" : "sounder",
  catalogId,
  label: `Device ${id}`,
  cableM: 10,
  gauge: { awg: 22 },
  ...over,
});

const withOutputs = (outputs: LayoutDocument["outputs"], devices: OutputDevice[], over: Partial<LayoutDocument> = {}) => emptyLayout("fx-panel-small", { outputDevices: devices, outputs, ...over });
const panelSupply = (doc: LayoutDocument) => solveLayout(doc, [], zonedCatalog).supplies[0];

describe("the standby battery with two external sounders, one with its own battery, and a strobe", () => {
  it("matches the figure worked by hand", () => {
    const doc = withOutputs(
      [
        { boardKey: "panel", output: 1, deviceIds: ["front", "rear"] }, // the relay siren output, 1000 mA
        { boardKey: "panel", output: 2, deviceIds: ["gate"] }, // a 100 mA transistor output
      ],
      [dev("front", "fx-sounder-out"), dev("rear", "fx-sounder-out-bat"), dev("gate", "fx-strobe")],
    );
    const s = panelSupply(doc);
    // Fixture figures (our own, lib/solver/testing/fixture-catalog.ts): panel 80 mA at rest, 150 mA in alarm;
    // outdoor sounder 5 / 300 mA; outdoor sounder with battery 10 mA + 60 mA charging at rest, 80 mA in alarm;
    // strobe 0 / 100 mA.
    // At rest: 80 + 5 + (10 + 60) + 0 = 155 mA. In alarm: 150 + 300 + 80 + 100 = 630 mA.
    expect(s.batteryRestMa).toBe(155);
    expect(s.batteryAlarmMa).toBe(630);
    // Grade 1–2 intruder profile: 12 h standby (EN 50131-6, from memory), 15 min alarm (common practice, no
    // published source), × 1.2 margin (common practice, no published source):
    // (155 mA × 12 h + 630 mA × 15/60 h) / 1000 × 1.2 = (1860 + 157.5) / 1000 × 1.2 = 2.421 Ah
    expect(s.batteryNeededAh).toBeCloseTo(2.421, 6);
    // the same panel with nothing on its outputs: (80 × 12 + 150 × 0.25) / 1000 × 1.2 = 1.197 Ah
    expect(panelSupply(emptyLayout("fx-panel-small")).batteryNeededAh).toBeCloseTo(1.197, 6);
    // the panel's own outputs are not the auxiliary output: its load stays empty
    expect([s.loadRestMa, s.loadAlarmMa, s.outputRestMa, s.outputAlarmMa]).toEqual([0, 0, 75, 480]);
    // the breakdown lists each device and sums to the battery's load
    expect(s.breakdown.filter((l) => l.kind === "sounder").map((l) => [l.name, l.restMa, l.alarmMa])).toEqual([
      ["Device front", 5, 300],
      ["Device rear", 70, 80],
      ["Device gate", 0, 100],
    ]);
    expect(s.breakdown.reduce((a, l) => a + l.alarmMa, 0)).toBe(s.batteryAlarmMa);
    expect(s.breakdown.reduce((a, l) => a + l.restMa, 0)).toBe(s.batteryRestMa);
  });

  it("a sounder on an output module counts against the supply that feeds the module", () => {
    const doc = withOutputs([{ boardKey: "m1", output: 1, deviceIds: ["front"] }], [dev("front", "fx-sounder-out")], { boards: [board("m1", "outputs", "fx-relays-4", 1)] });
    const s = panelSupply(doc);
    // module 20 / 80 mA (fixture) plus the sounder's 5 / 300 mA on the auxiliary output
    expect([s.loadRestMa, s.loadAlarmMa]).toEqual([25, 380]);
  });
});

describe("output ratings", () => {
  const catalogIds = ["fx-sounder-in", "fx-sounder-out", "fx-sounder-out-bat", "fx-strobe"];
  it("an output is overloaded exactly when its devices draw more than its rating, at rest or in alarm", () => {
    fc.assert(
      fc.property(fc.array(fc.constantFrom(...catalogIds), { minLength: 1, maxLength: 6 }), fc.constantFrom(1, 2), (ids, output) => {
        const devices = ids.map((c, i) => dev(`d${i}`, c));
        const r = solveLayout(withOutputs([{ boardKey: "panel", output, deviceIds: devices.map((d) => d.id) }], devices), [], zonedCatalog);
        const draws = ids.map((c) => deviceDraw(c === "fx-strobe" ? zonedCatalog.strobes[0] : zonedCatalog.sounders.find((s) => s.id === c)!));
        const rating = output === 1 ? 1000 : 100; // fixture: relay siren output 1000 mA, transistor outputs 100 mA
        const over = draws.reduce((a, d) => a + d.alarmMa, 0) > rating || draws.reduce((a, d) => a + d.restMa, 0) > rating;
        expect(r.findings.some((f) => f.code === "output-overloaded")).toBe(over);
        expect(r.outputs[0].ok).toBe(!over);
      }),
      { numRuns: 60 },
    );
  });

  it("adding a device raises the battery's load by its draw, at rest with its charging current", () => {
    fc.assert(
      fc.property(fc.array(fc.constantFrom(...catalogIds), { maxLength: 5 }), fc.constantFrom(...catalogIds), (ids, extra) => {
        const devices = ids.map((c, i) => dev(`d${i}`, c));
        const before = panelSupply(withOutputs([{ boardKey: "panel", output: 1, deviceIds: devices.map((d) => d.id) }], devices));
        const more = [...devices, dev("x", extra)];
        const after = panelSupply(withOutputs([{ boardKey: "panel", output: 1, deviceIds: more.map((d) => d.id) }], more));
        const cat = extra === "fx-strobe" ? zonedCatalog.strobes[0] : zonedCatalog.sounders.find((s) => s.id === extra)!;
        const charging = zonedCatalog.sounders.find((x) => x.id === extra)?.ownBattery?.chargingMa ?? 0;
        expect(after.batteryAlarmMa - before.batteryAlarmMa).toBeCloseTo(cat.alarmMa, 9);
        expect(after.batteryRestMa - before.batteryRestMa).toBeCloseTo(cat.standbyMa + charging, 9);
        expect(after.batteryNeededAh).toBeGreaterThanOrEqual(before.batteryNeededAh);
      }),
      { numRuns: 60 },
    );
  });
});

describe("the voltage at a sounder", () => {
  it("drops as at a powered detector: alarm current × the pair's resistance out and back at 40 °C", () => {
    const doc = withOutputs([{ boardKey: "panel", output: 1, deviceIds: ["far"] }], [dev("far", "fx-sounder-out", { cableM: 60, gauge: { awg: 22 } })]);
    const r = solveLayout(doc, [], zonedCatalog);
    const v = r.outputDevices[0];
    const ohms = 2 * conductorOhms({ awg: 22 }, 60, 40);
    expect(v.cableOhms).toBeCloseTo(ohms, 9);
    expect(v.dropV).toBeCloseTo(0.3 * ohms, 9); // 300 mA (fixture)
    expect(v.volts).toBeCloseTo(13.8 - 0.3 * ohms, 9);
    // 22 AWG is about 53 mΩ/m at 20 °C (ASTM B258 / copper resistivity, from memory): 120 m out and back ≈ 6.9 Ω,
    // so about 2 V dropped: fine on mains (11.7 V ≥ 10 V) but below 10 V from a battery at 10.5 V at the end
    expect(v.ok).toBe(true);
    expect(v.okOnBattery).toBe(false);
    expect(r.findings.map((f) => f.code)).toContain("output-device-voltage-low-on-battery");
  });
});

describe("the panel supply's name says what its figures carry", () => {
  it("names the siren and programmable outputs beside the auxiliary output once sounders are on them", () => {
    expect(panelSupply(emptyLayout("fx-panel-small")).name).toBe("Control panel auxiliary output");
    const siren = withOutputs([{ boardKey: "panel", output: 1, deviceIds: ["front"] }], [dev("front", "fx-sounder-out")]);
    expect(panelSupply(siren).name).toBe("Control panel auxiliary output and siren outputs");
    const both = withOutputs(
      [
        { boardKey: "panel", output: 1, deviceIds: ["front"] },
        { boardKey: "panel", output: 3, deviceIds: ["gate"] }, // a transistor programmable output (fixture)
      ],
      [dev("front", "fx-sounder-out"), dev("gate", "fx-strobe")],
    );
    const s = panelSupply(both);
    expect(s.name).toBe("Control panel auxiliary output and siren and programmable outputs");
    // the battery note names the same heading; a sounder on an output module leaves the panel's name alone
    const note = solveLayout(both, [], zonedCatalog).findings.find((f) => f.code === "battery-needed" && f.target.kind === "supply" && f.target.supplyKey === "panel");
    expect(note?.message.startsWith(`${s.name}: standby battery`)).toBe(true);
    const onModule = withOutputs([{ boardKey: "m1", output: 1, deviceIds: ["front"] }], [dev("front", "fx-sounder-out")], { boards: [board("m1", "outputs", "fx-relays-4", 1)] });
    expect(panelSupply(onModule).name).toBe("Control panel auxiliary output");
  });

  it("keeps the auxiliary output's own name where its rating is meant", () => {
    expect(panelSupplyName(new Set())).toBe(PANEL_AUX_NAME);
    expect(panelSupplyName(new Set(["programmable"]))).toBe("Control panel auxiliary output and programmable outputs");
  });
});
