import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { conductorFaultReading, conductorOhmsPerM, type CableCores, type ConductorFault, type DetectorState, type LoopSpec } from "@/lib/loop";
import type { WiringScheme } from "@/lib/catalog/schema";
import { testInputType } from "@/lib/loop/test-support/input-types";
import { LoopSchematic } from "@/components/loop-schematic/loop-schematic";
import { schematicModel, type ContactEl, type SchematicModel, type SeriesEl } from "@/components/loop-schematic/schematic-model";

// An alarm and tamper cable as drawn: the tamper contacts on their own pair (green out from the link to blue at
// the panel, white back to the input's return), held against the engine's conductor network.

const par = (a: number, b: number) => (a === 0 || b === 0 ? 0 : a === Infinity ? b : b === Infinity ? a : (a * b) / (a + b));
function value(e: SeriesEl, rk: number): number {
  if (e.kind === "contact") return e.closed ? rk : Infinity;
  if (e.kind === "resistor") return e.ohms;
  return e.branches.map((b) => b.reduce((s, x) => s + value(x, rk), 0)).reduce(par, Infinity);
}

/** IN → yellow → the alarm network → blue → link → green → tampers → white → return: four cores in the path. */
function drawnReading(m: SchematicModel, rc: number, rk: number): number {
  const rungs = m.far.rungs.map((r) => (r.kind === "wire" ? 0 : r.kind === "loop-back" ? Infinity : r.items.reduce((s, x) => s + value(x, rk), 0))).reduce(par, Infinity);
  const alarmSide = m.far.series.reduce((s, e) => s + value(e, rk), 0) + rungs;
  const tamperSide = (m.tamperPair ?? []).reduce((s, t) => s + value(t, rk), 0);
  return 4 * rc + alarmSide + tamperSide;
}

const cableLoopArb = fc
  .record({
    scheme: fc.constantFrom<WiringScheme>("none", "single-eol", "double-eol", "shared"),
    cores: fc.constantFrom<CableCores>("four-core-alarm-tamper", "six-core-alarm-tamper"),
    n: fc.integer({ min: 1, max: 3 }),
    contact: fc.constantFrom("NC" as const, "NO" as const),
    tampers: fc.array(fc.boolean(), { minLength: 3, maxLength: 3 }),
    lengthM: fc.integer({ min: 0, max: 800 }),
    picks: fc.array(fc.nat(2), { minLength: 3, maxLength: 3 }),
  })
  .map((r) => {
    const n = r.scheme === "shared" ? 2 : r.n;
    const tampers = r.tampers.slice(0, n);
    tampers[0] = true; // the cable carries a tamper pair only for detectors with tampers
    const loop: LoopSpec = {
      scheme: r.scheme,
      placement: "at-detector",
      detectors: tampers.map((tamper, i) => ({ label: `D${i + 1}`, contact: r.scheme === "shared" ? "NC" : r.contact, tamper, lifeSafety: false })),
      tolerancePct: 5,
      cable: { gauge: { mm2: 0.22 }, lengthM: r.lengthM, tempMinC: 20, tempMaxC: 20 },
      contactOhms: 0.05,
      cores: r.cores,
    };
    const states = tampers.map((t, i): DetectorState => (["rest", "active", "tamper"] as const)[r.picks[i] % (t ? 3 : 2)]);
    return { loop, states };
  });

describe("an alarm and tamper cable on the schematic", () => {
  it("draws the tamper contacts on their own pair, and the drawing reads what the engine's conductor network reads", () => {
    fc.assert(
      fc.property(cableLoopArb, ({ loop, states }) => {
        const m = schematicModel(loop, states, testInputType);
        expect(m.tamperPair?.map((t) => t.detector)).toEqual(loop.detectors.flatMap((d, i) => (d.tamper ? [i] : [])));
        expect(m.far.series.some((e) => e.kind === "contact" && e.role === "tamper")).toBe(false);
        expect(m.supplyPair).toBe(loop.cores === "six-core-alarm-tamper");
        // blue and green are already linked at the panel: a short between them there changes nothing, so its
        // nominal reading (20 °C, parts at their marked values) is the loop's own
        const unchanged: ConductorFault = { kind: "short", cores: ["blue", "green"], atM: 0 };
        const engine = conductorFaultReading(loop, testInputType, unchanged, states).nominalOhms!;
        const drawn = drawnReading(m, conductorOhmsPerM({ mm2: 0.22 }, 20) * loop.cable.lengthM, loop.contactOhms);
        if (engine === Infinity) expect(drawn).toBe(Infinity);
        else expect(Math.abs(drawn - engine)).toBeLessThanOrEqual(1e-9 * Math.max(1, engine));
      }),
      { numRuns: 300 },
    );
  });

  const six: LoopSpec = {
    scheme: "single-eol",
    placement: "at-detector",
    detectors: [{ label: "Store", contact: "NC", tamper: true, lifeSafety: false }],
    tolerancePct: 5,
    cable: { gauge: { mm2: 0.22 }, lengthM: 40, tempMinC: 0, tempMaxC: 40 },
    contactOhms: 0.05,
    cores: "six-core-alarm-tamper",
  };
  const render = (conductorFault: ConductorFault | null | undefined, states: DetectorState[] = ["rest"]) =>
    renderToStaticMarkup(createElement(LoopSchematic, { loop: six, states, inputType: testInputType, conductorFault }));

  it("draws all six cores by colour, the tamper contact on the tamper pair and the supply pair, with the chosen fault", () => {
    const html = render({ kind: "short", cores: ["blue", "black"], atM: 40 });
    for (const c of ["yellow", "blue", "green", "white", "red", "black"]) expect(html).toContain(`data-core="${c}"`);
    expect(html).toMatch(/data-part="conductor-fault" data-kind="short" data-cores="blue black"/);
    // the tamper contact sits inside the tamper pair's drawing, and only there
    expect(html).toMatch(/data-part="tamper-pair"[\s\S]*data-part="contact-t-0"[\s\S]*data-part="supply-pair"/);
    expect(html.match(/data-part="contact-t-0"/g)).toHaveLength(1);
    expect(html).toContain("cable 40 m of 0.22 mm², six-core, alarm, tamper and supply pairs: the tamper contacts on their own pair.");
    expect(render({ kind: "open", core: "green", atM: 20 })).toMatch(/data-part="conductor-fault" data-kind="open" data-cores="green"/);
    expect(render({ kind: "earth", core: "red", atM: 0 })).toMatch(/data-part="conductor-fault" data-kind="earth" data-cores="red"/);
  });

  it("draws the tamper contact open when the detector's cover is off, and no fault until one is chosen", () => {
    const contacts = (s: DetectorState) => (schematicModel(six, [s], testInputType).tamperPair as ContactEl[]).map((t) => t.closed);
    expect(contacts("rest")).toEqual([true]);
    expect(contacts("tamper")).toEqual([false]);
    expect(render(null)).not.toContain('data-part="conductor-fault"');
    // without conductor faults (the terminal sheet) the cores are numbered rather than coloured
    const plain = render(undefined);
    expect(plain).not.toContain("data-core=");
    expect(plain).toContain(">c6<");
  });
});
