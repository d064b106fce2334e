import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { conductorOhmsPerM, FAULTS, readingAt, type DetectorState, type LoopSpec, type Placement } from "@/lib/loop";
import type { WiringScheme } from "@/lib/catalog/schema";
import { resistorPlaces, schematicModel, type ContactEl, type ResistorEl, type SchematicModel, type SeriesEl } from "@/components/loop-schematic/schematic-model";

// The schematic must draw the loop as the engine computes it. Each drawing is evaluated here as a plain
// series/parallel network (closed contact = contact resistance, open = ∞) and held against readingAt for
// every fault: what is drawn is what is measured.

const par = (a: number, b: number) => (a === 0 || b === 0 ? 0 : a === Infinity ? b : b === Infinity ? a : (a * b) / (a + b));

function value(e: SeriesEl, rk: number): number {
  if (e.kind === "contact") return e.closed ? rk : Infinity;
  if (e.kind === "resistor") return e.ohms;
  return e.branches.map((b) => b.reduce((s, x) => s + value(x, rk), 0)).reduce(par, Infinity);
}

function drawnReading(m: SchematicModel, fault: (typeof FAULTS)[number], rc: number, rk: number): number {
  const rungs = m.far.rungs.map((r) => (r.kind === "wire" ? 0 : r.kind === "loop-back" ? r.resistor.ohms + 2 * rc : r.items.reduce((s, x) => s + value(x, rk), 0))).reduce(par, Infinity);
  const far = m.far.series.reduce((s, e) => s + value(e, rk), 0) + rungs;
  const cable = fault === "cut" ? Infinity : fault === "short-panel" ? 0 : fault === "short-detector" ? 2 * rc : 2 * rc + far;
  const across = m.panel.across ? par(m.panel.across.ohms, cable) : cable;
  return (m.panel.series?.ohms ?? 0) + across;
}

const loopArb = fc
  .record({
    scheme: fc.constantFrom<WiringScheme>("none", "single-eol", "double-eol", "shared"),
    placement: fc.constantFrom<Placement>("at-detector", "at-panel", "loop-back"),
    n: fc.integer({ min: 1, max: 4 }),
    contact: fc.constantFrom("NC" as const, "NO" as const),
    tamper: fc.boolean(),
    eol: fc.integer({ min: 100, max: 20_000 }),
    alarm: fc.integer({ min: 100, max: 20_000 }),
    a: fc.integer({ min: 100, max: 20_000 }),
    b: fc.integer({ min: 100, max: 20_000 }),
    lengthM: fc.integer({ min: 0, max: 1000 }),
    mm2: fc.double({ min: 0.1, max: 2.5, noNaN: true }),
    rk: fc.double({ min: 0, max: 0.5, noNaN: true }),
    picks: fc.array(fc.nat(2), { minLength: 4, maxLength: 4 }),
  })
  .map((r) => {
    const n = r.scheme === "shared" ? 2 : r.n;
    const loop: LoopSpec = {
      scheme: r.scheme,
      placement: r.placement,
      detectors: Array.from({ length: n }, (_, i) => ({ label: `D${i + 1}`, contact: r.contact, tamper: r.tamper, lifeSafety: false })),
      eolOhms: r.eol,
      alarmOhms: r.alarm,
      sharedOhms: [r.a, r.b],
      tolerancePct: 5,
      cable: { gauge: { mm2: r.mm2 }, lengthM: r.lengthM, tempMinC: 20, tempMaxC: 20 },
      contactOhms: r.rk,
    };
    const options: DetectorState[] = r.tamper ? ["rest", "active", "tamper"] : ["rest", "active"];
    const states = Array.from({ length: n }, (_, i) => options[r.picks[i] % options.length]);
    return { loop, states };
  });

describe("the schematic is wired as the engine computes", () => {
  it("every drawn network reads what readingAt gives, for every fault", () => {
    fc.assert(
      fc.property(loopArb, ({ loop, states }) => {
        const m = schematicModel(loop, states);
        const rc = conductorOhmsPerM(loop.cable.gauge, 20) * loop.cable.lengthM;
        for (const f of FAULTS) {
          const engine = readingAt(loop, states, f, { tempC: 20 });
          const drawn = drawnReading(m, f, rc, loop.contactOhms);
          if (engine === Infinity) expect(drawn, f).toBe(Infinity);
          else expect(Math.abs(drawn - engine), `${f}: drawn ${drawn}, engine ${engine}`).toBeLessThanOrEqual(1e-9 * Math.max(1, engine));
        }
      }),
      { numRuns: 600 },
    );
  });
});

describe("where the resistors are drawn", () => {
  const det = (contact: "NC" | "NO") => ({ label: "D1", contact, tamper: true, lifeSafety: false });
  const loop = (scheme: WiringScheme, placement: Placement, contact: "NC" | "NO" = "NC"): LoopSpec => ({
    scheme,
    placement,
    detectors: scheme === "shared" ? [det("NC"), { ...det("NC"), label: "D2" }] : [det(contact)],
    eolOhms: 4700,
    alarmOhms: 4700,
    sharedOhms: [2700, 5600],
    tolerancePct: 5,
    cable: { gauge: { mm2: 0.22 }, lengthM: 50, tempMinC: -10, tempMaxC: 40 },
    contactOhms: 0.05,
  });
  const places = (l: LoopSpec) => resistorPlaces(schematicModel(l, [])).sort((a, b) => a.role.localeCompare(b.role));

  it("at the detector, at the panel terminals, or at the panel through a loop-back pair", () => {
    expect(places(loop("single-eol", "at-detector"))).toEqual([{ role: "eol", place: "detector" }]);
    expect(places(loop("single-eol", "at-panel"))).toEqual([{ role: "eol", place: "panel" }]);
    expect(places(loop("single-eol", "loop-back"))).toEqual([{ role: "eol", place: "panel" }]);
    expect(schematicModel(loop("single-eol", "loop-back"), []).conductors).toBe(4);
    expect(schematicModel(loop("single-eol", "at-panel", "NO"), []).panel.across?.role).toBe("eol");
    expect(places(loop("double-eol", "at-panel"))).toEqual([
      { role: "alarm", place: "panel" },
      { role: "eol", place: "panel" },
    ]);
    expect(places(loop("double-eol", "loop-back"))).toEqual([
      { role: "alarm", place: "detector" },
      { role: "eol", place: "panel" },
    ]);
    // a shared input's resistor at the panel: only the line resistor moves
    expect(places(loop("shared", "at-panel"))).toEqual([
      { role: "eol", place: "panel" },
      { role: "shared-a", place: "detector" },
      { role: "shared-b", place: "detector" },
    ]);
    expect(places(loop("none", "loop-back"))).toEqual([]);
    expect(schematicModel(loop("none", "loop-back"), []).conductors).toBe(2);
  });

  it("draws contacts open or closed for the states", () => {
    const contacts = (l: LoopSpec, states: DetectorState[]) => {
      const out: ContactEl[] = [];
      const visit = (e: SeriesEl | ResistorEl) => (e.kind === "contact" ? out.push(e) : e.kind === "parallel" ? e.branches.flat().forEach(visit) : undefined);
      const m = schematicModel(l, states);
      m.far.series.forEach(visit);
      m.far.rungs.forEach((r) => (r.kind === "items" ? r.items.forEach(visit) : undefined));
      return Object.fromEntries(out.map((c) => [c.label, c.closed]));
    };
    expect(contacts(loop("single-eol", "at-detector"), ["rest"])).toEqual({ "D1 tamper": true, "D1 alarm": true });
    expect(contacts(loop("single-eol", "at-detector"), ["active"])).toEqual({ "D1 tamper": true, "D1 alarm": false });
    expect(contacts(loop("single-eol", "at-detector", "NO"), ["active"])).toEqual({ "D1 tamper": true, "D1 alarm": true });
    expect(contacts(loop("single-eol", "at-detector", "NO"), ["tamper"])).toEqual({ "D1 tamper": false, "D1 alarm": false });
    expect(contacts(loop("shared", "at-detector"), ["rest", "active"])).toEqual({ "A tamper": true, "A alarm": true, "B tamper": true, "B alarm": false });
  });
});
