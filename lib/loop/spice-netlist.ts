// An independent description of the loop as a SPICE netlist: every conductor, contact, resistor and fault
// is its own component on named nodes, wired as an installer would. A DC operating point with 1 A driven
// into the input terminals gives the reading as the terminal voltage (read directly, so no cancellation
// when tiny conductors sit next to an open). Pure string building; the simulator is run elsewhere.
// The conductor resistance is worked out here from the published figures, not taken from ./cable, so a wrong
// coefficient in the engine shows up as a disagreement instead of being copied into both sides.
import type { InputType } from "@/lib/catalog/schema";
import { fittedValues } from "./loop-problems";
import type { CableGauge, DetectorState, Fault, LoopSpec } from "./types";

/** An open contact or cut conductor; large enough to vanish beside any loop, small enough to keep the matrix sane. */
export const SPICE_OPEN_OHMS = 1e12;

export interface SpiceCase {
  states: readonly DetectorState[];
  fault: Fault;
  /** Cable temperature, °C. */
  tempC: number;
  /** Multiplier on every resistor's marked value (1 − tol for the low end, 1 + tol for the high end). */
  partFactor: number;
}

/** IEC 60028 annealed copper at 20 °C: 1/58 Ω·mm²/m, i.e. 1.7241e-8 Ω·m. */
const ANNEALED_COPPER_OHM_M = 1e-6 / 58;
/** IEC 60028: temperature coefficient of annealed copper's resistance at 20 °C, per kelvin. */
const ANNEALED_COPPER_ALPHA_PER_K = 0.00393;

/** Cross-section in m²: ASTM B258 gives the AWG diameter d = 0.127 mm × 92^((36 − n)/39). */
function crossSectionM2(gauge: CableGauge): number {
  if ("mm2" in gauge) return gauge.mm2 * 1e-6;
  const dM = 0.127e-3 * Math.pow(92, (36 - gauge.awg) / 39);
  return (Math.PI * dM * dM) / 4;
}

/** One conductor: R = ρ L / A at 20 °C, scaled by 1 + α (T − 20 °C). */
export function refereeConductorOhms(gauge: CableGauge, lengthM: number, tempC: number): number {
  return ((ANNEALED_COPPER_OHM_M * lengthM) / crossSectionM2(gauge)) * (1 + ANNEALED_COPPER_ALPHA_PER_K * (tempC - 20));
}

class Net {
  lines: string[] = [];
  private k = 0;
  private nodes = 0;
  constructor(private readonly p: string) {}
  node(): string {
    return `${this.p}n${this.nodes++}`;
  }
  r(a: string, b: string, ohms: number): void {
    // SPICE takes no 0 Ω resistor (ngspice floors at 1 pΩ); a 0 V source is its exact short.
    if (ohms < 1e-9) this.lines.push(`V${this.p}z${this.k++} ${a} ${b} DC 0`);
    else this.lines.push(`R${this.p}${this.k++} ${a} ${b} ${ohms === Infinity ? SPICE_OPEN_OHMS : ohms}`);
  }
}

/** Appends one case's network, driven by its own 1 A source into `<prefix>pp` (returned) from ground. */
function addCase(net: Net, p: string, loop: LoopSpec, inputType: InputType | undefined, c: SpiceCase): string {
  const f = fittedValues(loop, inputType);
  const rc = refereeConductorOhms(loop.cable.gauge, loop.cable.lengthM, c.tempC);
  const rk = loop.contactOhms;
  const rsh = loop.shortOhms ?? 0;
  const R = (f.eolOhms ?? 0) * c.partFactor;
  const Ra = (f.alarmOhms ?? 0) * c.partFactor;
  const RA = (f.sharedOhms?.[0] ?? 0) * c.partFactor;
  const RB = (f.sharedOhms?.[1] ?? 0) * c.partFactor;
  const dets = loop.detectors;
  const closed = (i: number) => (dets[i].contact === "NO" ? c.states[i] === "active" : c.states[i] !== "active");
  const contact = (a: string, b: string, i: number) => net.r(a, b, closed(i) ? rk : Infinity);
  const pp = `${p}pp`;
  const gnd = "0";
  net.lines.push(`I${p} ${gnd} ${pp} DC 1`);

  // Tamper contacts in series from `a`; returns the far node.
  const tampers = (a: string): string => {
    let n = a;
    dets.forEach((d, i) => {
      if (!d.tamper) return;
      const m = net.node();
      net.r(n, m, c.states[i] === "tamper" ? Infinity : rk);
      n = m;
    });
    return n;
  };
  // Alarm contacts from a to b: NC in series, NO each straight across a–b.
  const group = (a: string, b: string) => {
    if (dets[0].contact === "NO") dets.forEach((_, i) => contact(a, b, i));
    else {
      let n = a;
      dets.forEach((_, i) => {
        const m = i === dets.length - 1 ? b : net.node();
        contact(n, m, i);
        n = m;
      });
    }
  };
  const sharedPair = (a: string, b: string) => {
    const mid = net.node();
    contact(a, mid, 0);
    net.r(a, mid, RA);
    contact(mid, b, 1);
    net.r(mid, b, RB);
  };

  const scheme = loop.scheme;
  const placement = scheme === "none" ? "at-detector" : loop.placement;
  const cut = c.fault === "cut";
  let panelEndA = pp; // where a short "at the panel end" lands: the cable's first conductor at the panel
  const y = net.node(); // far end of the return conductor
  const x = net.node(); // far end of the feeding conductor

  if (placement === "at-detector") {
    net.r(pp, x, cut ? Infinity : rc);
    net.r(y, gnd, rc);
    const t = tampers(x);
    if (scheme === "none") group(t, y);
    else if (scheme === "single-eol") {
      if (dets[0].contact === "NO") {
        group(t, y);
        net.r(t, y, R);
      } else {
        const m = net.node();
        group(t, m);
        net.r(m, y, R);
      }
    } else if (scheme === "double-eol") {
      const m = net.node();
      net.r(t, m, R);
      group(m, y);
      net.r(m, y, Ra);
    } else {
      const m = net.node();
      net.r(t, m, R);
      sharedPair(m, y);
    }
  } else if (placement === "at-panel") {
    if (scheme === "single-eol" && dets[0].contact === "NO") {
      net.r(pp, gnd, R);
    } else {
      const q = net.node();
      net.r(pp, q, R);
      if (scheme === "double-eol") net.r(q, gnd, Ra);
      panelEndA = q;
    }
    net.r(panelEndA, x, cut ? Infinity : rc);
    net.r(y, gnd, rc);
    const t = tampers(x);
    if (scheme === "shared") sharedPair(t, y);
    else group(t, y);
  } else {
    // loop-back: c1 out to x, c4 back from y; the resistor through c2 (out→panel) and c3 (panel→out).
    net.r(pp, x, cut ? Infinity : rc);
    net.r(y, gnd, rc);
    const t = tampers(x);
    const q1 = net.node();
    const q2 = net.node();
    const viaPanel = (from: string, to: string) => {
      net.r(from, q1, rc); // c2
      net.r(q1, q2, R);
      net.r(q2, to, rc); // c3
    };
    if (scheme === "single-eol" && dets[0].contact === "NO") {
      group(t, y);
      viaPanel(t, y);
    } else {
      const z = net.node();
      if (scheme === "single-eol") group(t, z);
      else if (scheme === "double-eol") {
        group(t, z);
        net.r(t, z, Ra);
      } else sharedPair(t, z);
      viaPanel(z, y);
    }
  }
  if (c.fault === "short-panel") net.r(panelEndA, gnd, rsh);
  if (c.fault === "short-detector") net.r(x, y, rsh);
  return pp;
}

/** One netlist holding every case as its own network; `probes[i]` is the node whose voltage is case i's reading. */
export function buildLoopNetlist(loop: LoopSpec, cases: readonly SpiceCase[], inputType?: InputType): { netlist: string; probes: string[] } {
  const lines = [`* loop reading referee`];
  const probes: string[] = [];
  cases.forEach((c, i) => {
    const p = `k${i}_`;
    const net = new Net(p);
    probes.push(addCase(net, p, loop, inputType, c));
    lines.push(...net.lines);
  });
  lines.push(".op", ".end");
  return { netlist: lines.join("\n"), probes };
}

/** Reading in ohms for one probe node from an operating-point result (1 A driven in, so R = V). */
export function ohmsFromResult(result: { data: { name: string; values: unknown[] }[] }, probe: string): number {
  const name = `v(${probe.toLowerCase()})`;
  const col = result.data.find((d) => d.name.toLowerCase() === name);
  if (!col) throw new Error(`no voltage for ${probe} in the simulation result`);
  return Number(col.values[0]);
}
