import { beforeAll, describe, expect, it } from "vitest";
import fc from "fast-check";
import type { Highs } from "highs";
import type { Catalog } from "@/lib/catalog/schema";
import { shippedCatalog } from "@/lib/catalog/shipped";
import type { Schedule } from "@/lib/schedule/schema";
import { solveLayout } from "@/lib/solver";
import { highsSolver } from "@/lib/solver/highs-loader";
import { suggestHardware } from "@/lib/solver/suggest";
import { suggestExact } from "@/lib/solver/suggest-exact";
import { cheapestByBruteForce } from "@/lib/solver/testing/brute-force";
import { det } from "@/lib/solver/testing/fixture-schedule";
import { tinyCatalog, tinyOutputsCatalog } from "@/lib/solver/testing/tiny-catalog";
import type { OutputDevice } from "@/lib/layout/schema";
import { areaPlan } from "@/lib/solver/suggest-areas";

let highs: Highs;
let shipped: Catalog;
beforeAll(async () => {
  highs = await highsSolver();
  shipped = shippedCatalog().catalog;
});

const supervisions = ["double-eol", "single-eol", "shared-ok", "none"] as const;

/** The model's answer is a valid layout whose list price is its cost, and brute force finds nothing cheaper. */
function agreesWithBruteForce(schedule: Schedule, catalog: Catalog, allowShared: boolean, perItem: number, outputDevices: OutputDevice[] = []) {
  const s = suggestExact(highs, schedule, catalog, { allowShared, outputDevices });
  fc.pre(s.found); // proving that nothing exists would need the unbounded brute force (hours); refusals have their own tests
  if (!s.found) return;
  expect(s.proof.method).toBe("exact-model");
  expect(s.proof.optimal).toBe(true);
  const again = solveLayout(s.layout, schedule, catalog);
  expect(again.counts.error).toBe(0);
  expect(again.totals.unplacedIds).toEqual([]);
  const share = (id: string) => allowShared && schedule.find((d) => d.id === id)!.supervision === "shared-ok";
  const brute = cheapestByBruteForce(schedule, catalog, s.layout.power, s.cost + 0.001, share, perItem, { outputDevices, plan: areaPlan(schedule, catalog) });
  expect(brute?.cost).toBe(s.cost);
}

describe("suggestExact against exhaustive search", () => {
  it("costs what the cheapest valid layout costs, on the shipped catalog's families with every scheme and pairs", () => {
    const kinds = ["contact-door-surface", "contact-window-recessed", "panic-button-no", "water-probe-no", "motion-wall", "smoke-4wire-no"];
    const detector = fc.record({ kind: fc.constantFrom(...kinds), supervision: fc.constantFrom(...supervisions), cableM: fc.integer({ min: 5, max: 80 }), area: fc.constantFrom("A", "B") });
    fc.assert(
      fc.property(fc.array(detector, { minLength: 1, maxLength: 3 }), fc.boolean(), (ds, allowShared) => {
        const schedule = ds.map((d, i) => det(`x${i}`, d.kind, { cableM: d.cableM, area: d.area, supervision: d.supervision }));
        agreesWithBruteForce(schedule, shipped, allowShared, 1);
      }),
      { numRuns: 12 },
    );
  }, 120_000);

  it("costs what the cheapest valid layout costs on a catalog where inputs, pairs and supplies bind with a few detectors", () => {
    const detector = fc.record({ kind: fc.constantFrom("fx-door", "fx-pir", "fx-pir-hungry", "fx-smoke"), supervision: fc.constantFrom(...supervisions), cableM: fc.integer({ min: 5, max: 60 }), area: fc.constantFrom("A", "B") });
    fc.assert(
      fc.property(fc.array(detector, { minLength: 1, maxLength: 3 }), fc.boolean(), (ds, allowShared) => {
        const schedule = ds.map((d, i) => det(`x${i}`, d.kind, { cableM: d.cableM, area: d.area, supervision: d.supervision }));
        agreesWithBruteForce(schedule, tinyCatalog, allowShared, 3);
      }),
      { numRuns: 15 },
    );
  }, 120_000);
});

describe("suggestExact with sounders, strobes, areas and wireless detectors", () => {
  const device = (id: string, kind: "sounder" | "strobe", catalogId: string, cableM: number): OutputDevice => ({ id, kind, catalogId, label: `Device ${id}`, cableM, gauge: { awg: 22 } });
  const deviceArb = fc.record({
    what: fc.constantFrom(["sounder", "fx-sounder-in"], ["sounder", "fx-sounder-out"], ["sounder", "fx-sounder-out-bat"], ["strobe", "fx-strobe"]),
    cableM: fc.integer({ min: 5, max: 60 }),
  });

  it("costs what the cheapest valid layout costs, found by trying every output, receiver and area plan", () => {
    const detector = fc.record({ kind: fc.constantFrom("fx-door", "fx-pir", "fx-w-pir", "fx-w-door"), supervision: fc.constantFrom(...supervisions), cableM: fc.integer({ min: 5, max: 60 }), area: fc.constantFrom("A", "B", "C") });
    fc.assert(
      fc.property(fc.array(detector, { minLength: 1, maxLength: 3 }), fc.array(deviceArb, { minLength: 0, maxLength: 2 }), fc.boolean(), (ds, devs, allowShared) => {
        const schedule = ds.map((d, i) => det(`x${i}`, d.kind, { cableM: d.cableM, area: d.area, supervision: d.supervision }));
        const outputDevices = devs.map((d, i) => device(`o${i}`, d.what[0] as "sounder" | "strobe", d.what[1], d.cableM));
        agreesWithBruteForce(schedule, tinyOutputsCatalog, allowShared, 2, outputDevices);
      }),
      { numRuns: 25 },
    );
  }, 240_000);

  it("puts every sounder and strobe on an output rated for it, learns every wireless detector and keeps the schedule's areas", () => {
    const schedule = [det("d1", "fx-door", { area: "Shop" }), det("w1", "fx-w-pir", { area: "Store" }), det("w2", "fx-w-door", { area: "Shop" })];
    const outputDevices = [device("s1", "sounder", "fx-sounder-out", 20), device("s2", "sounder", "fx-sounder-out-bat", 20), device("b1", "strobe", "fx-strobe", 20)];
    const s = suggestExact(highs, schedule, tinyOutputsCatalog, { allowShared: false, outputDevices });
    expect(s.found).toBe(true);
    if (!s.found) return;
    // two areas: only panel A sets more than one (maxAreas 2 in the test catalog)
    expect(s.layout.panelId).toBe("tiny-a");
    expect(s.layout.areas?.map((a) => a.name)).toEqual(["Shop", "Store"]);
    // two wireless detectors, two per receiver: one receiver
    expect(s.layout.wireless?.flatMap((w) => w.detectorIds).sort()).toEqual(["w1", "w2"]);
    expect(s.layout.boards.filter((b) => b.kind === "receiver")).toHaveLength(1);
    // 300 + 80 + 100 mA in alarm exceed the panel's 200 mA siren output: a relay module carries them
    expect(s.layout.boards.some((b) => b.kind === "outputs")).toBe(true);
    expect(s.result.outputs.flatMap((o) => o.deviceIds).sort()).toEqual(["b1", "s1", "s2"]);
    expect(s.result.outputs.every((o) => o.ok)).toBe(true);
    expect(solveLayout(s.layout, schedule, tinyOutputsCatalog).counts.error).toBe(0);
  });

  it("counts a sounder's alarm current and its own battery's charging current in the battery it draws on", () => {
    const schedule = [det("d1", "fx-door")];
    const without = suggestExact(highs, schedule, tinyOutputsCatalog, { allowShared: false });
    const withSounder = suggestExact(highs, schedule, tinyOutputsCatalog, { allowShared: false, outputDevices: [device("s1", "sounder", "fx-sounder-out-bat", 10)] });
    expect(without.found && withSounder.found).toBe(true);
    if (!without.found || !withSounder.found) return;
    const panelBattery = (r: typeof without.result) => r.supplies.find((x) => x.supplyKey === "panel")!;
    // fx-sounder-out-bat: 10 mA standby + 60 mA charging at rest, 80 mA in alarm (fixture catalog)
    expect(panelBattery(withSounder.result).batteryRestMa - panelBattery(without.result).batteryRestMa).toBeCloseTo(70, 6);
    expect(panelBattery(withSounder.result).batteryAlarmMa - panelBattery(without.result).batteryAlarmMa).toBeCloseTo(80, 6);
  });

  it("names the limit when the family has no wireless receiver", () => {
    const noReceiver: Catalog = { ...tinyOutputsCatalog, wirelessReceivers: [] };
    const s = suggestExact(highs, [det("w1", "fx-w-pir")], noReceiver, { allowShared: false });
    expect(s.found).toBe(false);
    if (s.found) return;
    expect(s.reason).toContain("1 wireless detector in the schedule; its family has no wireless receiver");
  });
});

describe("suggestExact against the older search", () => {
  it("is never dearer on random schedules of up to 120 detectors", () => {
    const kinds = ["contact-door-surface", "motion-wall", "motion-dual", "panic-button-no", "water-probe-no", "glass-break-acoustic", "smoke-4wire-no"];
    const detector = fc.record({ kind: fc.constantFrom(...kinds), supervision: fc.constantFrom(...supervisions), cableM: fc.integer({ min: 5, max: 120 }), area: fc.constantFrom("A", "B", "C") });
    fc.assert(
      fc.property(fc.array(detector, { minLength: 5, maxLength: 120, size: "max" }), fc.boolean(), (ds, allowShared) => {
        const schedule = ds.map((d, i) => det(`x${i}`, d.kind, { cableM: d.cableM, area: d.area, supervision: d.supervision }));
        const old = suggestHardware(schedule, shipped, { allowShared, maxCandidates: 20_000 });
        // like for like: the older search knows no areas, so the model is asked for a single one here
        const s = suggestExact(highs, schedule, shipped, { allowShared, areas: "none" });
        if (old.found) {
          expect(s.found).toBe(true);
          if (s.found) expect(s.cost).toBeLessThanOrEqual(old.cost + 0.001);
        }
        if (s.found) expect(s.result.counts.error).toBe(0);
      }),
      { numRuns: 4 },
    );
  }, 240_000);

  it("wires detectors that ask for no supervision single end-of-line on the compact panel instead of a double end-of-line board", () => {
    // "none" reads with an error on these inputs; single end-of-line gives more supervision than asked and no error
    const schedule = Array.from({ length: 6 }, (_, i) => det(`n${i}`, "contact-door-surface", { supervision: "none" }));
    const old = suggestHardware(schedule, shipped, { allowShared: false });
    const s = suggestExact(highs, schedule, shipped, { allowShared: false });
    expect(s.found).toBe(true);
    if (!s.found) return;
    expect(s.layout.panelId).toBe("panel-compact-8");
    // compact panel 140 + compact keypad 60 (catalog/family-compact.yaml)
    expect(s.cost).toBe(200);
    expect(new Set(s.layout.inputs.map((i) => i.scheme))).toEqual(new Set(["single-eol"]));
    expect(old.found && old.cost).toBeGreaterThan(s.cost);
  });

  it("pairs alternating normally-closed and normally-open shareable detectors wherever a pair reads without an error", () => {
    // two door contacts (NC) share a 5.6 kΩ input, a door contact and a panic button (NO) do not; only the
    // large family has shared inputs, so the catalog is cut to it: 40 detectors, 32 on-board inputs
    const large: Catalog = { ...shipped, panels: shipped.panels.filter((p) => p.family === "large") };
    const schedule = Array.from({ length: 40 }, (_, i) => det(`p${i}`, i % 2 ? "panic-button-no" : "contact-door-surface", { supervision: "shared-ok", area: "Hall" }));
    const old = suggestHardware(schedule, large, { allowShared: true });
    const s = suggestExact(highs, schedule, large, { allowShared: true });
    expect(s.found && old.found).toBe(true);
    if (!s.found || !old.found) return;
    expect(s.sharedInputs).toBeGreaterThan(old.sharedInputs);
    expect(s.cost).toBeLessThan(old.cost);
    expect(s.result.counts.error).toBe(0);
  });

  it("within a price margin, buys more supervision than the cheapest answer", () => {
    const schedule = Array.from({ length: 6 }, (_, i) => det(`n${i}`, "contact-door-surface", { supervision: "none" }));
    const cheapest = suggestExact(highs, schedule, shipped, { allowShared: false });
    const supervised = suggestExact(highs, schedule, shipped, { allowShared: false, choice: { kind: "most-supervised", withinPct: 300 } });
    expect(cheapest.found && supervised.found).toBe(true);
    if (!cheapest.found || !supervised.found) return;
    const score = (l: typeof cheapest.layout) => l.inputs.filter((i) => i.scheme === "double-eol").length;
    expect(score(supervised.layout)).toBeGreaterThan(score(cheapest.layout));
    expect(supervised.cost).toBeLessThanOrEqual(cheapest.cost * 4 + 0.01);
  });
});

describe("suggestExact when nothing fits", () => {
  it("names the binding limit of each panel", () => {
    const schedule = Array.from({ length: 120 }, (_, i) => det(`s${i}`, "smoke-4wire-no", { supervision: "double-eol" }));
    const s = suggestExact(highs, schedule, shipped, { allowShared: false });
    expect(s.found).toBe(false);
    if (s.found) return;
    // large family: 30 bus devices, one a keypad, 29 fire boards × 4 inputs (catalog/family-large.yaml, family-mid.yaml)
    expect(s.reason).toContain("120 inputs of the Fire zone input, 1 kΩ + 4.7 kΩ kind needed; its family reaches 116 with its data bus full");
    expect(s.reason).toMatch(/Mid 16 control panel: 120 zones needed; it reports at most 64/);
  });
});
