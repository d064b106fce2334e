// Independent referee: ngspice (eecircuit-engine, ngspice compiled to WebAssembly) solves the same loops as
// component netlists; every finite reading must agree with the engine within 0.01 %.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import fc from "fast-check";
import { Simulation } from "eecircuit-engine";
import { analyzeLoop } from "./analyze-loop";
import { buildLoopNetlist, ohmsFromResult, refereeConductorOhms, type SpiceCase } from "./spice-netlist";
import { loopArb } from "./test-support/loop-arbitraries";
import { testInputType } from "./test-support/input-types";
import type { LoopSpec } from "./types";

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
});
