import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { batteryAh } from "@/lib/solver/battery";
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
    expect(standbyProfile("nfpa72-fire")).toMatchObject({ standbyH: 24, alarmMin: 5, source: "NFPA 72 (secondary power supply)", lifeSafety: true, defaultSafetyFactor: 1.25 });
    expect(standbyProfile("nfpa72-voice")).toMatchObject({ standbyH: 24, alarmMin: 15, source: "NFPA 72 (secondary power supply)", lifeSafety: true });
  });
  it("mark the intruder hours as from memory", () => {
    // EN 50131-6 style: 12 h for grades 1–2, 30 h and 60 h for higher grades (from memory)
    expect(["intruder-grade-2", "intruder-grade-3-30h", "intruder-grade-3-60h"].map((id) => standbyProfile(id)?.standbyH)).toEqual([12, 30, 60]);
    for (const id of ["intruder-grade-2", "intruder-grade-3-30h", "intruder-grade-3-60h"]) {
      expect(standbyProfile(id)?.label).toMatch(/from memory/);
      expect(standbyProfile(id)?.defaultSafetyFactor).toBe(1.2);
    }
  });
  it("say which safety factor is which, and that neither has a published source", () => {
    expect(safetyFactors.map((s) => s.value)).toEqual([1.25, 1.2]);
    expect(safetyFactors[0].label).toMatch(/fire/);
    expect(safetyFactors[1].label).toMatch(/intruder/);
    for (const s of safetyFactors) expect(s.source).toBe("common practice, no published source");
  });
  it("use a custom profile's own figures", () => {
    expect(resolveStandby({ standbyProfileId: "custom", customStandbyH: 72, customAlarmMin: 30 })).toMatchObject({ standbyH: 72, alarmMin: 30 });
    expect(resolveStandby({ standbyProfileId: "nfpa72-fire", customStandbyH: 72 })).toMatchObject({ standbyH: 24, alarmMin: 5 });
    expect(new Set(standbyProfiles.map((p) => p.id)).size).toBe(standbyProfiles.length);
  });
});
