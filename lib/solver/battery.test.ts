import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { batteryAh, batteryPickText, pickBattery } from "@/lib/solver/battery";
import { fmtUp } from "@/lib/solver/format";
import { resolveStandby, safetyFactors, standbyProfile, standbyProfiles } from "@/lib/solver/standby-profiles";

describe("batteryAh", () => {
  it("matches a hand-worked fire example", () => {
    // NFPA 72, secondary power: 24 h standby then 5 min alarm.
    // 24 h × 250 mA = 6000 mAh; 5 min × 1.2 A = 1200 mA × 5/60 h = 100 mAh;
    // 6000 + 100 = 6100 mAh = 6.1 Ah; × 1.25 = 7.625 Ah.
    expect(batteryAh({ restMa: 250, alarmMa: 1200, standbyH: 24, alarmMin: 5, safetyFactor: 1.25 })).toBeCloseTo(7.625, 9);
  });
  it("matches a hand-worked voice evacuation example", () => {
    // NFPA 72, secondary power: 24 h standby then 15 min alarm for voice evacuation.
    // 24 h × 250 mA = 6000 mAh; 15 min × 1.2 A = 300 mAh; 6.3 Ah × 1.25 = 7.875 Ah.
    expect(batteryAh({ restMa: 250, alarmMa: 1200, standbyH: 24, alarmMin: 15, safetyFactor: 1.25 })).toBeCloseTo(7.875, 9);
  });
  it("matches a hand-worked intruder example", () => {
    // 12 h × 180 mA = 2160 mAh; 15 min × 600 mA = 150 mAh; 2.31 Ah × 1.2 = 2.772 Ah.
    expect(batteryAh({ restMa: 180, alarmMa: 600, standbyH: 12, alarmMin: 15, safetyFactor: 1.2 })).toBeCloseTo(2.772, 9);
  });
  it("grows with every current and period, and scales with the safety factor", () => {
    const n = fc.double({ min: 0, max: 5000, noNaN: true });
    fc.assert(
      fc.property(n, n, fc.double({ min: 0, max: 100, noNaN: true }), fc.double({ min: 0, max: 60, noNaN: true }), fc.double({ min: 1, max: 2, noNaN: true }), fc.double({ min: 0, max: 100, noNaN: true }), (rest, alarm, h, min, sf, more) => {
        const base = batteryAh({ restMa: rest, alarmMa: alarm, standbyH: h, alarmMin: min, safetyFactor: sf });
        expect(batteryAh({ restMa: rest + more, alarmMa: alarm, standbyH: h, alarmMin: min, safetyFactor: sf })).toBeGreaterThanOrEqual(base);
        expect(batteryAh({ restMa: rest, alarmMa: alarm + more, standbyH: h, alarmMin: min, safetyFactor: sf })).toBeGreaterThanOrEqual(base);
        expect(batteryAh({ restMa: rest, alarmMa: alarm, standbyH: h + more, alarmMin: min, safetyFactor: sf })).toBeGreaterThanOrEqual(base);
        const unit = batteryAh({ restMa: rest, alarmMa: alarm, standbyH: h, alarmMin: min, safetyFactor: 1 });
        expect(base).toBeCloseTo(unit * sf, 6);
      }),
    );
  });
});

describe("standby profiles", () => {
  it("carry the NFPA 72 figures with their source", () => {
    // NFPA 72, secondary power: 24 h standby then 5 min alarm (15 min for voice evacuation)
    expect(standbyProfile("nfpa72-fire")).toMatchObject({ standbyH: 24, alarmMin: 5, source: expect.stringMatching(/^NFPA 72, chapter 10, secondary power supply/), lifeSafety: true, defaultSafetyFactor: 1.25 });
    expect(standbyProfile("nfpa72-voice")).toMatchObject({ standbyH: 24, alarmMin: 15, source: expect.stringMatching(/^NFPA 72, chapter 10/), lifeSafety: true });
  });
  it("name EN 50131-6 for the intruder hours", () => {
    // EN 50131-6: 12 h for grades 1–2, 30 h and 60 h for grades 3–4 (from memory)
    expect(["intruder-grade-2", "intruder-grade-3-30h", "intruder-grade-3-60h"].map((id) => standbyProfile(id)?.standbyH)).toEqual([12, 30, 60]);
    for (const id of ["intruder-grade-2", "intruder-grade-3-30h", "intruder-grade-3-60h"]) {
      expect(standbyProfile(id)?.label).toMatch(/EN 50131-6/);
      expect(standbyProfile(id)?.source).toMatch(/^EN 50131-6/);
      expect(standbyProfile(id)?.defaultSafetyFactor).toBe(1.2);
    }
  });
  it("send the reader to their authority's edition, and keep code-only provenance notes off the screen", () => {
    // what a profile or factor shows on screen: its label, source and note
    for (const p of standbyProfiles.filter((x) => x.id !== "custom")) expect(p.note).toContain("Check against the edition your authority uses.");
    for (const f of safetyFactors) expect(f.source).toContain("Check against the edition your authority uses.");
    const screen = [...standbyProfiles.flatMap((p) => [p.label, p.source, p.note]), ...safetyFactors.flatMap((f) => [f.label, f.source])].join("\n");
    expect(screen).not.toMatch(/from memory|no published source|style,/i);
  });
  it("say which safety factor is which, and that no clause of a standard sets either", () => {
    expect(safetyFactors.map((s) => s.value)).toEqual([1.25, 1.2]);
    expect(safetyFactors[0].label).toMatch(/fire/);
    expect(safetyFactors[1].label).toMatch(/intruder/);
    // both are common practice, no published source: the screen says "trade practice, not a clause of a standard"
    for (const s of safetyFactors) expect(s.source).toMatch(/trade practice, not a clause of a standard/);
  });
  it("use a custom profile's own figures", () => {
    expect(resolveStandby({ standbyProfileId: "custom", customStandbyH: 72, customAlarmMin: 30 })).toMatchObject({ standbyH: 72, alarmMin: 30 });
    expect(resolveStandby({ standbyProfileId: "nfpa72-fire", customStandbyH: 72 })).toMatchObject({ standbyH: 24, alarmMin: 5 });
    expect(new Set(standbyProfiles.map((p) => p.id)).size).toBe(standbyProfiles.length);
  });
});

describe("rounding up and standard batteries", () => {
  it("rounds \"at least\" figures up, never down", () => {
    expect(fmtUp(13.64)).toBe("13.7");
    expect(fmtUp(13.67)).toBe("13.7");
    expect(fmtUp(13.7)).toBe("13.7"); // no rounding up of an exact figure
    expect(fmtUp(4.224)).toBe("4.23");
    expect(fmtUp(12)).toBe("12");
    fc.assert(fc.property(fc.double({ min: 0.01, max: 1000, noNaN: true }), (x) => {
        expect(Number(fmtUp(x))).toBeGreaterThanOrEqual(x - 1e-9);
      }),
    );
  });
  it("picks the fewest standard batteries that hold the need within the charger", () => {
    // standard 12 V sizes 7, 12, 17, 18 Ah (common practice, no published source)
    expect(pickBattery(5.2, 18, 13.8)).toMatchObject({ sizeAh: 7, count: 1, totalAh: 7 });
    expect(pickBattery(13.64, 18, 13.8)).toMatchObject({ sizeAh: 17, count: 1 });
    expect(pickBattery(20, 40, 13.8)).toMatchObject({ sizeAh: 12, count: 2, parallel: 2, totalAh: 24 });
    expect(pickBattery(20, 18, 13.8)).toBeNull();
    expect(pickBattery(9, 7, 13.8)).toBeNull();
    expect(pickBattery(10, 18, 27.6)).toMatchObject({ sizeAh: 12, count: 2, series: 2, nominalVolts: 24 });
    fc.assert(
      fc.property(fc.double({ min: 0.1, max: 60, noNaN: true }), fc.constantFrom(7, 17, 18, 26, 40, 65), (need, max) => {
        const p = pickBattery(need, max, 13.8);
        if (p) {
          expect(p.totalAh).toBeGreaterThanOrEqual(need - 1e-9);
          expect(p.totalAh).toBeLessThanOrEqual(max);
        }
      }),
    );
  });
  it("says the pick in words", () => {
    expect(batteryPickText(pickBattery(13.64, 18, 13.8)!)).toBe("one 12 V 17 Ah battery");
    expect(batteryPickText(pickBattery(20, 40, 13.8)!)).toBe("two 12 V 12 Ah batteries, in parallel (24 Ah)");
    expect(batteryPickText(pickBattery(10, 18, 27.6)!)).toBe("two 12 V 12 Ah batteries, 2 in series for 24 V");
  });
});
