import { describe, expect, it } from "vitest";
import { meterReadingSchema, parseMeterReading } from "@/lib/commissioning/reading-schema";

describe("meter readings as typed", () => {
  it("reads plain ohms, SI prefixes and the RKM code", () => {
    expect(parseMeterReading("4710")).toEqual({ kind: "ohms", ohms: 4710 });
    expect(parseMeterReading("4.71 kΩ")).toEqual({ kind: "ohms", ohms: 4710 });
    expect(parseMeterReading("4,71k")).toEqual({ kind: "ohms", ohms: 4710 });
    // IEC 60062 RKM code: 4K7 = 4.7 kΩ, 2R2 = 2.2 Ω, 1M0 = 1 MΩ
    expect(parseMeterReading("4k7")).toEqual({ kind: "ohms", ohms: 4700 });
    expect(parseMeterReading("2R2")).toEqual({ kind: "ohms", ohms: 2.2 });
    expect(parseMeterReading("1M0")).toEqual({ kind: "ohms", ohms: 1e6 });
    expect(parseMeterReading("0.3 ohm")).toEqual({ kind: "ohms", ohms: 0.3 });
    expect(parseMeterReading("0")).toEqual({ kind: "ohms", ohms: 0 }); // a meter across a short; no resistor value is 0
    expect(parseMeterReading("470R")).toEqual({ kind: "ohms", ohms: 470 });
  });
  it("reads the meter's overload display as open", () => {
    for (const s of ["OL", "o.l.", "open", "∞"]) expect(parseMeterReading(s)).toEqual({ kind: "open" });
  });
  it("refuses anything else with a readable message", () => {
    for (const s of ["", "abc", "-5", "4.7.1k", "12 V"]) expect(parseMeterReading(s)).toBeNull();
    const r = meterReadingSchema.safeParse("twelve");
    expect(r.success).toBe(false);
    if (!r.success) expect(r.error.issues[0].message).toMatch(/not a reading/);
  });
});
