import { describe, expect, it } from "vitest";
import { awgDiameterMm, cableOhms, conductorOhmsPer1000Ft, conductorOhmsPerM, copperTempFactor, maxRunForOhms } from "./cable";

describe("copper conductor resistance", () => {
  it("AWG diameters", () => {
    // ASTM B258: 36 AWG is 0.005 in; 0000 AWG is 0.4600 in
    expect(awgDiameterMm(36)).toBeCloseTo(0.127, 12);
    expect(awgDiameterMm(-3)).toBeCloseTo(0.46 * 25.4, 9);
    // ASTM B258: the diameter doubles about every 6 gauges (92^(6/39) ≈ 2.006)
    expect(awgDiameterMm(16) / awgDiameterMm(22)).toBeCloseTo(92 ** (6 / 39), 12);
  });
  it("ohms per 1000 ft at 20 °C", () => {
    // ASTM B258 diameter with IEC 60028 annealed copper, 1/58 Ω·mm²/m at 20 °C
    expect(conductorOhmsPer1000Ft({ awg: 16 }).toPrecision(4)).toBe("4.016");
    expect(conductorOhmsPer1000Ft({ awg: 18 }).toPrecision(4)).toBe("6.385");
    expect(conductorOhmsPer1000Ft({ awg: 20 }).toPrecision(4)).toBe("10.15");
    expect(conductorOhmsPer1000Ft({ awg: 22 }).toPrecision(4)).toBe("16.14");
    expect(conductorOhmsPer1000Ft({ awg: 24 }).toPrecision(4)).toBe("25.67");
  });
  it("temperature correction against the 75 °C table", () => {
    // NEC Chapter 9 Table 8: 18 AWG solid uncoated copper, 7.77 Ω/1000 ft at 75 °C
    const r75 = conductorOhmsPer1000Ft({ awg: 18 }, 75);
    expect(Math.abs(r75 / 7.77 - 1)).toBeLessThan(0.01);
    // copper 0.00393/°C at 20 °C
    expect(copperTempFactor(20)).toBe(1);
    expect(copperTempFactor(30)).toBeCloseTo(1.0393, 12);
  });
  it("metric cross-sections", () => {
    // IEC 60028: 1 mm² of annealed copper is 1/58 Ω per metre at 20 °C
    expect(conductorOhmsPerM({ mm2: 1 })).toBeCloseTo(1 / 58, 12);
    // IEC 60228 class 1 maximum conductor resistance at 20 °C, Ω/km, from memory: the nominal
    // cross-section's resistance sits a few percent under each maximum
    for (const [mm2, maxOhmsPerKm] of [
      [0.5, 36.0],
      [0.75, 24.5],
      [1, 18.1],
      [1.5, 12.1],
    ] as const) {
      const r = conductorOhmsPerM({ mm2 }) * 1000;
      expect(r).toBeLessThanOrEqual(maxOhmsPerKm);
      expect(r).toBeGreaterThan(0.9 * maxOhmsPerKm);
    }
  });
  it("loop conductors over a temperature range, and the run for a resistance limit", () => {
    const cable = { gauge: { mm2: 1 }, lengthM: 100, tempMinC: 20, tempMaxC: 70 };
    const two = cableOhms(cable);
    expect(two.minOhms).toBeCloseTo(200 / 58, 12);
    expect(two.maxOhms).toBeCloseTo((200 / 58) * (1 + 0.00393 * 50), 12);
    expect(cableOhms(cable, 4).maxOhms).toBeCloseTo(2 * two.maxOhms, 12);
    expect(maxRunForOhms({ mm2: 1 }, 200 / 58)).toBeCloseTo(100, 9);
  });
});
