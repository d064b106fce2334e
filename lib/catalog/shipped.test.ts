import { describe, expect, it } from "vitest";
import { E24_MANTISSAS, isPreferred } from "@/lib/resistors/e-series";
import { expectedReadings } from "./expected-readings";
import { catalogSummary } from "./figures";
import { validateCatalog } from "./loader";
import { catalogKinds, type InputType } from "./schema";
import { clearShippedCatalogCache, loadShippedCatalog, shippedCatalog } from "./shipped";

const { catalog, sources } = shippedCatalog();
const inputType = (id: string): InputType => {
  const it = catalog.inputTypes.find((t) => t.id === id);
  if (!it) throw new Error(`no input type ${id}`);
  return it;
};

/** Whether ohms = m × 10^k for an E24 mantissa m (two significant figures). */
function inE24Table(ohms: number): boolean {
  for (let k = -1; k <= 6; k++) {
    const m = ohms / 10 ** k;
    if (Number.isInteger(Math.round(m * 1e9) / 1e9) && E24_MANTISSAS.includes(Math.round(m))) return true;
  }
  return false;
}

describe("the shipped catalog", () => {
  it("loads from catalog/*.yaml and passes validation", () => {
    const r = loadShippedCatalog();
    expect(r.ok ? [] : r.errors).toEqual([]);
    expect(validateCatalog(catalog, sources)).toEqual([]);
    expect(sources.map((s) => s.fileName)).toEqual(["detectors.yaml", "family-compact.yaml", "family-large.yaml", "family-mid.yaml", "input-types.yaml", "sounders-outputs-wireless.yaml"]);
    clearShippedCatalogCache();
    expect(loadShippedCatalog().ok).toBe(true);
  });

  it("has at least three panel families of different sizes, each with boards, keypads and a power supply", () => {
    const families = [...new Set(catalog.panels.map((p) => p.family))];
    expect(families.length).toBeGreaterThanOrEqual(3);
    const sizes = families.map((f) => Math.max(...catalog.panels.filter((p) => p.family === f).map((p) => p.onboardInputs.count)));
    expect(new Set(sizes).size).toBe(families.length);
    expect(Math.min(...sizes)).toBeLessThanOrEqual(8);
    expect(Math.max(...sizes)).toBeGreaterThanOrEqual(32);
    const large = catalog.panels.find((p) => p.onboardInputs.count === Math.max(...sizes))!;
    expect(large.maxZones).toBeGreaterThanOrEqual(250);
    expect(large.bus.maxDevices).toBeGreaterThanOrEqual(30);
    for (const f of families) {
      expect(catalog.expansionBoards.some((b) => b.families.includes(f) && b.inputs.count === 8)).toBe(true);
      expect(catalog.keypads.some((k) => k.families.includes(f))).toBe(true);
      expect(catalog.keypads.some((k) => k.families.includes(f) && (k.inputs?.count ?? 0) > 0)).toBe(true);
      expect(catalog.powerSupplies.some((p) => p.families.includes(f))).toBe(true);
    }
    expect(catalog.expansionBoards.some((b) => b.ownSupply)).toBe(true);
  });

  it("expects different end-of-line values on each family's on-board inputs", () => {
    const eolByFamily = catalog.panels.map((p) => inputType(p.onboardInputs.inputType).eolOhms);
    expect(eolByFamily.every((v) => v !== undefined)).toBe(true);
    expect(new Set(eolByFamily).size).toBe(catalog.panels.length);
  });

  it("covers every scheme: a double end-of-line pair, a shared input with two different values, and a fire input", () => {
    const schemes = new Set(catalog.inputTypes.flatMap((t) => t.schemes));
    expect([...schemes].sort()).toEqual(["double-eol", "none", "shared", "single-eol"]);
    const shared = catalog.inputTypes.filter((t) => t.schemes.includes("shared"));
    expect(shared.length).toBeGreaterThan(0);
    for (const t of shared) expect(t.sharedOhms![0]).not.toBe(t.sharedOhms![1]);
    expect(catalog.inputTypes.some((t) => t.lifeSafety)).toBe(true);
    // a fire zone reports a short and a cut as themselves, never as an alarm: NO detectors on double end-of-line
    for (const t of catalog.inputTypes.filter((x) => x.lifeSafety)) {
      expect(t.schemes).toEqual(["double-eol"]);
      const [rest, alarm] = expectedReadings(t, "double-eol", "NO")!;
      const report = (ohms: number) => t.bands["double-eol"]!.find((b) => ohms >= b.fromOhms && (b.toOhms === null || ohms < b.toOhms))!.report;
      expect(report(0)).toBe("short");
      expect(report(1e9)).toBe("open");
      expect(report(rest.nominalOhms)).toBe("normal");
      expect(report(alarm.nominalOhms)).toBe("active");
    }
    // fire devices only through an input type that allows them
    const fireBoards = catalog.expansionBoards.filter((b) => inputType(b.inputs.inputType).lifeSafety);
    expect(fireBoards.length).toBeGreaterThan(0);
  });

  it("uses only IEC 60063 E24 resistor values", () => {
    const values = catalog.inputTypes.flatMap((t) => [t.eolOhms, t.alarmOhms, ...(t.sharedOhms ?? [])].filter((v): v is number => v !== undefined));
    expect(values.length).toBeGreaterThanOrEqual(8);
    for (const v of values) {
      expect(isPreferred(v, "E24"), `${v} Ω`).toBe(true); // IEC 60063 E24 series
      expect(inE24Table(v), `${v} Ω`).toBe(true); // IEC 60063 E24 series
    }
    expect(inE24Table(4700)).toBe(true); // IEC 60063 E24 series: 4.7 is a mantissa
    expect(inE24Table(5000)).toBe(false); // IEC 60063 E24 series: 5.0 is not
  });

  it("reads each expected value of a sound loop inside its band, with margin at both edges", () => {
    for (const t of catalog.inputTypes)
      for (const scheme of t.schemes) {
        const bands = t.bands[scheme]!;
        // fire zones carry NO detectors: their double end-of-line table reads the NO way round
        const contact = t.lifeSafety && scheme === "double-eol" ? "NO" : "NC";
        for (const e of expectedReadings(t, scheme, contact)!) {
          const band = bands.find((b) => b.fromOhms <= e.minOhms && (b.toOhms === null || e.maxOhms < b.toOhms));
          expect(band?.report, `${t.id} ${scheme} ${e.state}`).toBe(e.report);
        }
      }
    // worked example: 4.7 kΩ ±5 % with up to 100 Ω of loop reads 4465–5035 Ω
    const [rest] = expectedReadings(inputType("input-4k7"), "single-eol")!;
    expect(rest.minOhms).toBeCloseTo(4465, 6);
    expect(rest.maxOhms).toBeCloseTo(5035, 6);
  });

  it("gives plausible 12 V panel figures", () => {
    for (const p of catalog.panels) {
      expect(p.auxOutputMa).toBeGreaterThanOrEqual(500); // common practice, no published source
      expect(p.auxOutputMa).toBeLessThanOrEqual(1500);
      expect(p.supplyVolts).toBe(13.8); // common practice, no published source: 12 V lead-acid float
      expect(p.minDeviceVolts).toBeGreaterThanOrEqual(9.5);
      expect(p.maxBatteryAh).toBeGreaterThanOrEqual(7);
      expect(p.maxBatteryAh).toBeLessThanOrEqual(18);
    }
  });

  it("has every detector category, fire devices marked life-safety, powered detectors with a minimum voltage", () => {
    const cats = new Set(catalog.detectors.map((d) => d.category));
    expect(cats.size).toBe(10);
    for (const d of catalog.detectors) {
      if (d.category === "smoke" || d.category === "heat") expect(d.lifeSafety).toBe(true);
      else expect(d.lifeSafety).toBe(false);
      if (d.power) expect(d.power.minVolts).toBeLessThan(catalog.panels[0].minDeviceVolts);
    }
    const contacts = new Set(catalog.detectors.filter((d) => d.category === "panic").map((d) => d.contact));
    expect([...contacts].sort()).toEqual(["NC", "NO"]);
  });

  it("summarises every entry with figures and units for the pages", () => {
    const rows = catalogSummary(catalog);
    expect(rows.length).toBe(catalogKinds.reduce((n, k) => n + catalog[k].length, 0));
    const panel = rows.find((r) => r.id === "panel-large-32")!;
    expect(panel.figures.find((f) => f.key === "bus.maxCableM")).toEqual({ key: "bus.maxCableM", label: "Bus cable", value: 1000, unit: "m" });
    expect(panel.listPrice).toBe(520);
    const it = rows.find((r) => r.id === "input-5k6")!;
    expect(it.listPrice).toBeNull();
    expect(it.figures.find((f) => f.key === "sharedOhms")).toMatchObject({ value: "2700 / 5600", unit: "Ω" });
    const contact = rows.find((r) => r.id === "contact-door-recessed")!;
    expect(contact.figures.find((f) => f.key === "power")?.value).toBe("unpowered");
    for (const r of rows) for (const f of r.figures) expect(typeof f.value === "number" ? Number.isFinite(f.value) : f.value.length > 0).toBe(true);
  });
});
