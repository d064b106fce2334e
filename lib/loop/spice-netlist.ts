// An independent description of the loop as a SPICE netlist: every conductor, contact, resistor and fault
// is its own component on named nodes, wired as an installer would. A DC operating point with 1 A driven
// into the input terminals gives the reading as the terminal voltage (read directly, so no cancellation
// when tiny conductors sit next to an open). Pure string building; the simulator is run elsewhere.
// The conductor resistance is worked out here from the published figures, not taken from ./cable, so a wrong
// coefficient in the engine shows up as a disagreement instead of being copied into both sides.
import type { InputType } from "@/lib/catalog/schema";
import { fittedValues } from "./loop-problems";
import type { CableGauge, ConductorFault, CoreColour, DetectorState, Fault, LoopPart, LoopSpec } from "./types";

/** An open contact or cut conductor; large enough to vanish beside any loop, small enough to keep the matrix sane. */
export const SPICE_OPEN_OHMS = 1e12;

export interface SpiceCase {
  states: readonly DetectorState[];
  fault: Fault;
  /** Cable temperature, °C. */
  tempC: number;
  /** Multiplier on every resistor's marked value (1 − tol for the low end, 1 + tol for the high end). */
  partFactor: number;
  /** A conductor fault instead of `fault` (which is then "none"). */
  conductorFault?: ConductorFault;
  /** Class A loops: where the input feeds the loop (default "panel": out terminals, end of line in place). */
  classA?: { feed: "panel" | "out" | "return"; open: { core: "yellow" | "blue"; segment: number } | null };
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
  const cf0 = c.conductorFault;
  // A six-core cable's supply pair open, or its two cores touching: each detector's relay drops to its alarm position.
  const noSupply = !!cf0 && ((cf0.kind === "open" && (cf0.core === "red" || cf0.core === "black")) || (cf0.kind === "short" && cf0.cores.includes("red") && cf0.cores.includes("black")));
  const closed = (i: number) => {
    const inAlarm = noSupply || c.states[i] === "active";
    return dets[i].contact === "NO" ? inAlarm : !inAlarm;
  };
  const contact = (a: string, b: string, i: number) => part("contact", a, b, closed(i) ? rk : Infinity, i);
  const pp = `${p}pp`;
  const gnd = "0";
  net.lines.push(`I${p} ${gnd} ${pp} DC 1`);
  const cf = c.conductorFault;
  const L = loop.cable.lengthM;
  const rPerM = L > 0 ? rc / L : 0;
  const taps: Partial<Record<CoreColour, string>> = {};
  // One core from its panel-end node to its detector-end node, split where a conductor fault sits on it.
  const wire = (core: CoreColour, panel: string, far: string) => {
    if (!cf || cf.kind === "part-short" || !(cf.kind === "short" ? cf.cores.includes(core) : cf.core === core)) return net.r(panel, far, rc);
    const a = net.node();
    const b = cf.kind === "open" ? net.node() : a;
    net.r(panel, a, rPerM * cf.atM);
    if (a !== b) net.r(a, b, Infinity); // the break, as the stand-in for an open so every node keeps a DC path
    net.r(b, far, rPerM * (L - cf.atM));
    taps[core] = a;
  };
  const parts: { part: LoopPart; detector?: number; a: string; b: string }[] = [];
  const part = (pt: LoopPart, a: string, b: string, ohms: number, detector?: number) => {
    parts.push({ part: pt, detector, a, b });
    net.r(a, b, ohms);
  };
  const alarmTamper = loop.cores === "four-core-alarm-tamper" || loop.cores === "six-core-alarm-tamper";

  // Tamper contacts in series from `a`; returns the far node.
  const tampers = (a: string): string => {
    let n = a;
    dets.forEach((d, i) => {
      if (!d.tamper) return;
      const m = net.node();
      part("tamper", n, m, c.states[i] === "tamper" ? Infinity : rk, i);
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
    part("shared-a", a, mid, RA);
    contact(mid, b, 1);
    part("shared-b", mid, b, RB);
  };

  const scheme = loop.scheme;
  const placement = scheme === "none" ? "at-detector" : loop.placement;
  const cut = c.fault === "cut";
  let panelEndA = pp; // where a short "at the panel end" lands: the cable's first conductor at the panel
  const y = net.node(); // far end of the return conductor
  const x = net.node(); // far end of the feeding conductor

  if (placement === "at-detector") {
    if (cut) net.r(pp, x, Infinity);
    else wire("yellow", pp, x);
    let t: string;
    if (alarmTamper) {
      // alarm pair out and back, linked at the panel to the tamper pair (green out, white back)
      const pb = net.node();
      const gt = net.node();
      const wt = net.node();
      wire("blue", pb, y);
      wire("green", pb, gt);
      wire("white", gnd, wt);
      net.r(tampers(gt), wt, 0);
      t = x;
      if (loop.cores === "six-core-alarm-tamper") {
        // the detectors' supply: black from the supply's 0 V (the input's return), red from its + through the
        // supply, zeroed (0 V) for the resistance the input sees; at the detector they feed electronics only
        const plus = net.node();
        net.lines.push(`V${p}supply ${plus} ${gnd} DC 0`);
        wire("red", plus, net.node());
        wire("black", gnd, net.node());
      }
    } else {
      wire("blue", gnd, y);
      t = tampers(x);
    }
    if (scheme === "none") group(t, y);
    else if (scheme === "single-eol") {
      if (dets[0].contact === "NO") {
        group(t, y);
        part("eol", t, y, R);
      } else {
        const m = net.node();
        group(t, m);
        part("eol", m, y, R);
      }
    } else if (scheme === "double-eol") {
      const m = net.node();
      part("eol", t, m, R);
      group(m, y);
      part("alarm", m, y, Ra);
    } else {
      const m = net.node();
      part("eol", t, m, R);
      sharedPair(m, y);
    }
  } else if (placement === "at-panel") {
    if (scheme === "single-eol" && dets[0].contact === "NO") {
      part("eol", pp, gnd, R);
    } else {
      const q = net.node();
      part("eol", pp, q, R);
      if (scheme === "double-eol") part("alarm", q, gnd, Ra);
      panelEndA = q;
    }
    if (cut) net.r(panelEndA, x, Infinity);
    else wire("yellow", panelEndA, x);
    wire("blue", gnd, y);
    const t = tampers(x);
    if (scheme === "shared") sharedPair(t, y);
    else group(t, y);
  } else {
    // loop-back: c1 out to x, c4 back from y; the resistor through c2 (out→panel) and c3 (panel→out).
    if (cut) net.r(pp, x, Infinity);
    else wire("yellow", pp, x);
    wire("blue", gnd, y);
    const t = tampers(x);
    const q1 = net.node();
    const q2 = net.node();
    const viaPanel = (from: string, to: string) => {
      wire("green", q1, from); // c2, panel end q1
      part("eol", q1, q2, R);
      wire("white", q2, to); // c3, panel end q2
    };
    if (scheme === "single-eol" && dets[0].contact === "NO") {
      group(t, y);
      viaPanel(t, y);
    } else {
      const z = net.node();
      if (scheme === "single-eol") group(t, z);
      else if (scheme === "double-eol") {
        group(t, z);
        part("alarm", t, z, Ra);
      } else sharedPair(t, z);
      viaPanel(z, y);
    }
  }
  if (c.fault === "short-panel") net.r(panelEndA, gnd, rsh);
  if (c.fault === "short-detector") net.r(x, y, rsh);
  if (cf?.kind === "short") net.r(taps[cf.cores[0]]!, taps[cf.cores[1]]!, rsh);
  if (cf?.kind === "earth") net.r(taps[cf.core]!, `${p}earth`, rsh); // earth is its own node: no return path
  if (cf?.kind === "part-short")
    for (const q of parts) if (q.part === cf.part && (cf.detector === undefined || q.detector === cf.detector)) net.r(q.a, q.b, rsh);
  return pp;
}

/**
 * A Class A loop: two rails from the out terminals past each detector (evenly spaced over the cable length)
 * and back one more cable length to the return terminals; NO contacts across the rails at each detector.
 */
function addClassACase(net: Net, p: string, loop: LoopSpec, inputType: InputType | undefined, c: SpiceCase): string {
  const f = fittedValues(loop, inputType);
  const { feed, open } = c.classA!;
  const n = loop.detectors.length;
  const L = loop.cable.lengthM;
  const pp = `${p}pp`;
  net.lines.push(`I${p} 0 ${pp} DC 1`);
  const rail = (core: "yellow" | "blue") => {
    const nodes = Array.from({ length: n + 2 }, () => net.node());
    for (let s = 0; s <= n; s++) {
      const r = refereeConductorOhms(loop.cable.gauge, s < n ? L / n : L, c.tempC);
      if (open && open.core === core && open.segment === s) {
        const a = net.node();
        const b = net.node();
        net.r(nodes[s], a, r / 2);
        net.r(a, b, Infinity);
        net.r(b, nodes[s + 1], r / 2);
      } else net.r(nodes[s], nodes[s + 1], r);
    }
    return nodes;
  };
  const plus = rail("yellow");
  const minus = rail("blue");
  loop.detectors.forEach((_, i) => net.r(plus[i + 1], minus[i + 1], c.states[i] === "active" ? loop.contactOhms : Infinity));
  const double = loop.scheme === "double-eol";
  const R = (f.eolOhms ?? 0) * c.partFactor;
  const Ra = (f.alarmOhms ?? 0) * c.partFactor;
  const at = feed === "return" ? n + 1 : 0;
  net.r(pp, plus[at], double ? R : 0);
  net.r(minus[at], "0", 0);
  if (feed === "panel") net.r(plus[n + 1], minus[n + 1], double ? Ra : R);
  return pp;
}

/** One netlist holding every case as its own network; `probes[i]` is the node whose voltage is case i's reading. */
export function buildLoopNetlist(loop: LoopSpec, cases: readonly SpiceCase[], inputType?: InputType): { netlist: string; probes: string[] } {
  const lines = [`* loop reading referee`];
  const probes: string[] = [];
  cases.forEach((c, i) => {
    const p = `k${i}_`;
    const net = new Net(p);
    probes.push(c.classA ? addClassACase(net, p, loop, inputType, c) : addCase(net, p, loop, inputType, c));
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
