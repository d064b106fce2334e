// Independent referee: ngspice (eecircuit-engine, ngspice compiled to WebAssembly) solves the same loops as
// component netlists; every finite reading must agree with the engine within 0.01 %.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import fc from "fast-check";
import { Simulation } from "eecircuit-engine";
import { analyzeLoop } from "./analyze-loop";
import { buildLoopNetlist, ohmsFromResult, refereeConductorOhms, type SpiceCase } from "./spice-netlist";
import { cableArb, loopArb } from "./test-support/loop-arbitraries";
import { testInputType } from "./test-support/input-types";
import type { ConductorReading, LoopSpec } from "./types";

let sim: Simulation;
beforeAll(async () => {
  sim = new Simulation();
  await sim.start();
}, 60_000);
afterAll(() => {
  // the simulator has no stop(); it is garbage once the worker exits
});

async function spiceReadings(loop: LoopSpec, cases: SpiceCase[]): Promise<number[]> {
  const { netlist, probes } = buildLoopNetlist(loop, cases, testInputType);
  sim.setNetList(netlist);
  const result = await sim.runSim();
  const errors = sim.getError();
  if (errors.length) throw new Error(`ngspice: ${errors.join("; ")}`);
  return probes.map((p) => ohmsFromResult(result, p));
}

function agree(engine: number, spice: number): boolean {
  if (engine === Infinity) return spice > 1e9; // an open loop: only the 1e12 Ω stand-ins carry current
  return Math.abs(engine - spice) <= 1e-4 * Math.abs(engine); // 0.01 %
}

describe("the referee's own conductor resistance", () => {
  it("matches copper wire tables, not the engine", () => {
    // from memory: copper wire tables give 18 AWG solid annealed copper as 6.385 Ω per 1000 ft at 20 °C
    expect(refereeConductorOhms({ awg: 18 }, 304.8, 20)).toBeCloseTo(6.385, 3);
    // IEC 60028: 1/58 Ω·mm²/m, so 58 m of 1 mm² is 1 Ω at 20 °C and 1 + 0.00393 × 30 at 50 °C
    expect(refereeConductorOhms({ mm2: 1 }, 58, 20)).toBeCloseTo(1, 12);
    expect(refereeConductorOhms({ mm2: 1 }, 58, 50)).toBeCloseTo(1.1179, 12);
  });
});

describe("loop readings against ngspice", () => {
  it("a 5.6 kΩ end-of-line loop: hand-built check of the netlist and reader", async () => {
    // 1 A into 5.6 kΩ + two 10 m conductors of 1 mm² at 20 °C (IEC 60028: 1/58 Ω·mm²/m)
    const loop: LoopSpec = {
      scheme: "single-eol",
      placement: "at-detector",
      detectors: [{ label: "Door", contact: "NC", tamper: false, lifeSafety: false }],
      eolOhms: 5600,
      tolerancePct: 5,
      cable: { gauge: { mm2: 1 }, lengthM: 10, tempMinC: 20, tempMaxC: 20 },
      contactOhms: 0.1,
    };
    const [r] = await spiceReadings(loop, [{ states: ["rest"], fault: "none", tempC: 20, partFactor: 1 }]);
    expect(r).toBeCloseTo(5600 + 0.1 + (2 * 10) / 58, 6);
  });

  it("random loops: every state × fault, at both ends of the interval and nominal, agree within 0.01 %", async () => {
    let compared = 0;
    await fc.assert(
      fc.asyncProperty(loopArb, async (loop) => {
        const a = analyzeLoop(loop, testInputType);
        expect(a.valid).toBe(true);
        const tol = loop.tolerancePct / 100;
        const mid = (loop.cable.tempMinC + loop.cable.tempMaxC) / 2;
        const cases: SpiceCase[] = [];
        for (const r of a.rows) {
          cases.push({ states: r.states, fault: r.fault, tempC: loop.cable.tempMinC, partFactor: 1 - tol });
          cases.push({ states: r.states, fault: r.fault, tempC: loop.cable.tempMaxC, partFactor: 1 + tol });
          cases.push({ states: r.states, fault: r.fault, tempC: mid, partFactor: 1 });
        }
        const spice = await spiceReadings(loop, cases);
        a.rows.forEach((r, i) => {
          const got = [r.minOhms, r.maxOhms, r.nominalOhms!];
          got.forEach((e, k) => {
            const s = spice[3 * i + k];
            if (!agree(e, s)) throw new Error(`${loop.scheme}/${loop.placement} ${r.label} [${["min", "max", "nominal"][k]}]: engine ${e}, ngspice ${s}`);
            if (e !== Infinity) compared++;
          });
        });
      }),
      { numRuns: 40, seed: 60063 },
    );
    expect(compared).toBeGreaterThan(1000);
  }, 300_000);

  it("random loops with every conductor fault (cores, opens, earth, part shorts) agree within 0.01 %", async () => {
    let compared = 0;
    const withCores = fc.tuple(loopArb, fc.constantFrom(undefined, "four-core-alarm-tamper", "six-core-alarm-tamper") as fc.Arbitrary<LoopSpec["cores"]>).map(([loop, cable]): LoopSpec => {
      const at = cable !== undefined && loop.placement === "at-detector" && loop.detectors.some((d) => d.tamper);
      return { ...loop, cores: at ? cable : undefined, conductorFaults: "all" };
    });
    await fc.assert(
      fc.asyncProperty(withCores, async (loop) => {
        const a = analyzeLoop(loop, testInputType);
        expect(a.valid).toBe(true);
        const tol = loop.tolerancePct / 100;
        const mid = (loop.cable.tempMinC + loop.cable.tempMaxC) / 2;
        const cases: SpiceCase[] = [];
        for (const f of a.conductors!.faults)
          for (const r of f.rows) {
            const c = { states: r.states, fault: "none" as const, conductorFault: f.fault };
            cases.push({ ...c, tempC: loop.cable.tempMinC, partFactor: 1 - tol }, { ...c, tempC: loop.cable.tempMaxC, partFactor: 1 + tol }, { ...c, tempC: mid, partFactor: 1 });
          }
        const spice = await spiceReadings(loop, cases);
        let i = 0;
        for (const f of a.conductors!.faults)
          for (const r of f.rows) {
            [r.minOhms, r.maxOhms, r.nominalOhms!].forEach((e, k) => {
              const s = spice[i + k];
              if (!agree(e, s)) throw new Error(`${loop.scheme}/${loop.placement}/${loop.cores ?? ""} ${r.label} [${k}]: engine ${e}, ngspice ${s}`);
              if (e !== Infinity) compared++;
            });
            i += 3;
          }
      }),
      { numRuns: 25, seed: 60062 },
    );
    expect(compared).toBeGreaterThan(3000);
  }, 600_000);

  it("random Class A loops: every single open, fed from the panel and from either end, agree within 0.01 %", async () => {
    const classA = fc
      .record({ n: fc.integer({ min: 1, max: 4 }), double: fc.boolean(), cable: cableArb, contactOhms: fc.double({ min: 0.01, max: 1, noNaN: true }), tol: fc.constantFrom(1, 5, 10) })
      .map(({ n, double, cable, contactOhms, tol }): LoopSpec => ({
        scheme: double ? "double-eol" : "single-eol",
        placement: "at-detector",
        pathway: "class-a",
        detectors: Array.from({ length: n }, (_, i) => ({ label: `D${i + 1}`, contact: "NO", tamper: false, lifeSafety: true })),
        tolerancePct: tol,
        cable,
        contactOhms,
      }));
    let compared = 0;
    await fc.assert(
      fc.asyncProperty(classA, async (loop) => {
        const a = analyzeLoop(loop, testInputType);
        expect(a.valid).toBe(true);
        const tol = loop.tolerancePct / 100;
        const mid = (loop.cable.tempMinC + loop.cable.tempMaxC) / 2;
        const rows: { row: ConductorReading; feed: "panel" | "out" | "return"; open: { core: "yellow" | "blue"; segment: number } }[] = [];
        a.classA!.opens.forEach((o, k) => {
          const open = { core: o.core as "yellow" | "blue", segment: k % (loop.detectors.length + 1) };
          rows.push({ row: o.rest, feed: "panel", open });
          for (const d of o.devices) rows.push({ row: d.reading, feed: d.side ?? "out", open });
        });
        const cases: SpiceCase[] = [];
        for (const r of rows) {
          const c = { states: r.row.states, fault: "none" as const, classA: { feed: r.feed, open: r.open } };
          cases.push({ ...c, tempC: loop.cable.tempMinC, partFactor: 1 - tol }, { ...c, tempC: loop.cable.tempMaxC, partFactor: 1 + tol }, { ...c, tempC: mid, partFactor: 1 });
        }
        const spice = await spiceReadings(loop, cases);
        rows.forEach((r, i) =>
          [r.row.minOhms, r.row.maxOhms, r.row.nominalOhms!].forEach((e, k) => {
            const s = spice[3 * i + k];
            if (!agree(e, s)) throw new Error(`Class A ${r.row.label} [${k}]: engine ${e}, ngspice ${s}`);
            if (e !== Infinity) compared++;
          }),
        );
      }),
      { numRuns: 30, seed: 72 },
    );
    expect(compared).toBeGreaterThan(300);
  }, 300_000);
});
