// Powered detectors are checked twice: at the supply's charging voltage and at the battery's end-of-discharge voltage.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { defaultEndOfDischargeVolts } from "@/lib/catalog/schema";
import { solveLayout } from "@/lib/solver";
import { fixtureCatalog } from "@/lib/solver/testing/fixture-catalog";
import { catalogWithPanel, det, emptyLayout, inp } from "@/lib/solver/testing/fixture-schedule";

const onPanel = (cableM: number, awg: number) => {
  const schedule = [det("p1", "fx-pir", { cableM, gauge: { awg } })];
  const doc = emptyLayout("fx-panel-small", { inputs: [inp("panel", 1, ["p1"])] });
  return { schedule, doc };
};

describe("worst-case voltage at a powered detector", () => {
  it("the default end of discharge is 10.5 V for a 13.8 V lead-acid supply", () => {
    // 1.75 V per cell at the end of discharge against 2.3 V per cell float, six cells (typical practice, from memory)
    expect(defaultEndOfDischargeVolts(13.8)).toBeCloseTo(6 * 1.75, 9);
  });

  it("fine on mains, below the minimum on a discharged battery, worked by hand", () => {
    // 24 AWG copper at 40 °C: 0.09084 Ω/m (ASTM B258 wire table, 25.67 Ω per 1000 ft at 20 °C, × 1.0786).
    // 600 m out and back = 1200 m → 109.0 Ω; 20 mA × 109.0 Ω = 2.18 V.
    // mains: 13.8 − 2.18 = 11.62 V ≥ 10.5 V (panel minimum) → ok; battery: 10.5 − 2.18 = 8.32 V < 9 V (the detector's minimum).
    const { schedule, doc } = onPanel(600, 24);
    const r = solveLayout(doc, schedule, fixtureCatalog);
    const v = r.detectors[0];
    expect(v.volts).toBeCloseTo(11.62, 1);
    expect(v.endVolts).toBeCloseTo(8.32, 1);
    expect(v).toMatchObject({ ok: true, okOnBattery: false, endMinVolts: 9 });
    const f = r.findings.filter((x) => x.code === "detector-voltage-low-on-battery");
    expect(f).toHaveLength(1);
    expect(f[0].severity).toBe("error");
    expect(f[0].message).toMatch(/Detector p1 gets 8\.3\d V at the end of the standby period: the battery's 10\.5 V less 2\.18 V/);
    // 300 m: 1.09 V drop, 9.41 V on battery → ok
    const short = solveLayout(onPanel(300, 24).doc, onPanel(300, 24).schedule, fixtureCatalog);
    expect(short.detectors[0].okOnBattery).toBe(true);
    expect(short.findings.some((x) => x.code.startsWith("detector-voltage-low"))).toBe(false);
  });

  it("property: a finding exactly when either voltage falls below the minimum; the battery case is never the better one", () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 1500, noNaN: true }), fc.integer({ min: 18, max: 26 }), fc.double({ min: 8, max: 13.5, noNaN: true }), (cableM, awg, endV) => {
        const { schedule, doc } = onPanel(cableM, awg);
        const r = solveLayout(doc, schedule, catalogWithPanel("fx-panel-small", { endOfDischargeVolts: endV }));
        const v = r.detectors[0];
        expect(v.endSupplyVolts).toBe(endV);
        expect(v.endVolts).toBeCloseTo(endV - v.dropV, 9);
        expect(v.endVolts).toBeLessThan(v.volts);
        expect(v.okOnBattery).toBe(v.endVolts >= 9);
        const mains = r.findings.some((x) => x.code === "detector-voltage-low");
        const battery = r.findings.some((x) => x.code === "detector-voltage-low-on-battery");
        expect(mains).toBe(!v.ok);
        expect(mains || battery).toBe(!v.ok || !v.okOnBattery);
      }),
      { numRuns: 200 },
    );
  });
});
