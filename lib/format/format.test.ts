import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { makeFormat, metresToFeet, nearestAwg } from "./format";

const gb = makeFormat({ locale: "en-GB", timeZone: "Europe/London", currency: "GBP", units: "metric" });
const us = makeFormat({ locale: "en-US", timeZone: "America/New_York", currency: "USD", units: "imperial" });
const de = makeFormat({ locale: "de-DE", timeZone: "Europe/Berlin", currency: "EUR", units: "metric" });

describe("dates in the organisation's locale and time zone", () => {
  const instant = "2026-12-03T14:05:00Z";
  it("writes the same instant in each zone, naming the zone", () => {
    // London is on UTC in December (GMT); New York is UTC−5 (EST); Berlin UTC+1 (CET) — IANA tz database
    expect(gb.dateTime(instant)).toMatch(/^3 Dec 2026, 14:05 (GMT|UTC)$/);
    expect(us.dateTime(instant)).toMatch(/^Dec 3, 2026, 0?9:05\s?AM EST$/);
    expect(de.dateTime(instant)).toMatch(/^3\. Dez\. 2026, 15:05 MEZ$/);
  });
  it("takes the calendar date in the organisation's zone, not the server's", () => {
    // 03:00 UTC on 4 December is still 3 December in New York (UTC−5) — IANA tz database
    expect(us.date("2026-12-04T03:00:00Z")).toBe("Dec 3, 2026");
    expect(gb.date("2026-12-04T03:00:00Z")).toBe("4 Dec 2026");
  });
  it("gives back text it cannot read as it was", () => {
    expect(gb.dateTime("not a date")).toBe("not a date");
  });
});

describe("money in the organisation's currency", () => {
  it("carries the currency and its usual decimals", () => {
    expect(gb.money(1234.5)).toBe("£1,234.50");
    expect(us.money(455)).toBe("$455.00");
    // ISO 4217: the yen has no minor unit
    const yen = makeFormat({ locale: "en-GB", timeZone: "UTC", currency: "JPY", units: "metric" });
    expect(yen.money(725)).toBe("JP¥725");
    expect(yen.moneyPlain(725.4)).toBe("725");
    expect(de.money(1234.5)).toMatch(/^1\.234,50\s€$/);
  });
  it("writes the same decimals for every amount of one currency (CSV cells)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 1e7, noNaN: true }), (x) => {
        expect(gb.moneyPlain(x)).toMatch(/^\d+\.\d{2}$/);
      }),
    );
  });
});

describe("lengths and gauges in the organisation's unit system", () => {
  it("converts metres to feet", () => {
    // 1 ft = 0.3048 m exactly (international foot, 1959)
    expect(metresToFeet(0.3048)).toBeCloseTo(1, 12);
    expect(us.length(30)).toBe("98 ft");
    expect(gb.length(30)).toBe("30 m");
    expect(gb.length(2.25)).toBe("2.3 m");
    // a limit is never overstated: 123.7 m allowed reads 123 m, 405.8 ft reads 405 ft
    expect(gb.length(123.7, "down")).toBe("123 m");
    expect(us.length(123.7, "down")).toBe("405 ft");
  });
  it("shows a gauge in the unit system, with the gauge as entered when converted", () => {
    // ASTM B258: 22 AWG is 0.644 mm across, 0.326 mm²; 24 AWG 0.205 mm²
    expect(gb.gauge({ awg: 22 })).toBe("0.33 mm² (22 AWG)");
    expect(us.gauge({ awg: 22 })).toBe("22 AWG");
    expect(us.gauge({ mm2: 0.22 })).toBe("24 AWG (0.22 mm²)");
    expect(gb.gauge({ mm2: 0.5 })).toBe("0.5 mm²");
  });
  it("rounds a cross-section back to the AWG it came from", () => {
    fc.assert(
      fc.property(fc.integer({ min: 10, max: 30 }), (awg) => {
        const mm2 = (Math.PI / 4) * (0.127 * 92 ** ((36 - awg) / 39)) ** 2; // ASTM B258
        expect(nearestAwg(mm2)).toBe(awg);
      }),
    );
  });
});
