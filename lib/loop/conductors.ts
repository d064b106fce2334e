// Conductor faults: the cable as its separate cores, each with its own resistance, and every single fault a
// practitioner meets — a short between any two cores, one core open, a core to earth, each at the panel end,
// part-way along and at the detector end — plus a short across one part alone (a contact, a tamper contact,
// a resistor). Each fault's readings go through the input type's bands like the input-pair rows.
// The network is no longer a series/parallel ladder once two cores touch part-way, so it is solved by
// nodal analysis (./nodal). The readings rise with every resistance (Rayleigh's monotonicity law), so the
// interval is the network with every part and the cable at its low end, and at its high end.
import type { InputType, Report } from "@/lib/catalog/schema";
import type { Finding, FindingTarget } from "@/lib/findings";
import { acceptableFor, bandIndex, compileBands, marginOf, REPORT_BIT, reportsBetween, type CompiledBands } from "./loop-bands";
import { compileLoop, conductorAt, encodeStates, enumerateStates, SCHEME_DOUBLE, SCHEME_NONE, SCHEME_SHARED, SCHEME_SINGLE, PLACE_PANEL, STATE_ACTIVE, STATE_TAMPER, type LoopModel } from "./loop-model";
import { Circuit, resistanceBetween } from "./nodal";
import { statesLabel } from "./row-labels";
import type { CableCores, ConductorAnalysis, DetectorState, ConductorFault, ConductorFaultResult, ConductorReading, ConductorVerdict, CoreColour, LoopPart, LoopSpec } from "./types";

/** Core colours per cable (common practice, no published source): alarm pair yellow and blue, second pair green and white. */
export const CORE_COLOURS: Record<CableCores, CoreColour[]> = {
  "two-core": ["yellow", "blue"],
  "four-core-loop-back": ["yellow", "blue", "green", "white"],
  "four-core-alarm-tamper": ["yellow", "blue", "green", "white"],
  "six-core-alarm-tamper": ["yellow", "blue", "green", "white", "red", "black"],
};

export const CABLE_CORES_WORDS: Record<CableCores, string> = {
  "two-core": "two-core",
  "four-core-loop-back": "four-core loop-back",
  "four-core-alarm-tamper": "four-core, alarm and tamper pairs",
  "six-core-alarm-tamper": "six-core, alarm, tamper and supply pairs",
};

/** A cable carrying a detector's alarm pair and tamper pair, linked in series at the panel onto one input. */
export function carriesTamperPair(cores: CableCores): boolean {
  return cores === "four-core-alarm-tamper" || cores === "six-core-alarm-tamper";
}

/**
 * The detectors' supply fails: the red (+) or black (0 V) core open, or the two touching. A powered detector's
 * output relay then drops to its alarm position (a fail-safe output; common practice, no published source).
 */
export function cutsSupply(f: ConductorFault | null): boolean {
  if (f === null) return false;
  if (f.kind === "open") return f.core === "red" || f.core === "black";
  return f.kind === "short" && f.cores.includes("red") && f.cores.includes("black");
}

/** "all" conductor faults are enumerated up to this many detectors; past it, list the faults to check. */
export const MAX_DETECTORS_FOR_ALL_FAULTS = 8;

const Y = 0, B = 1, G = 2, W = 3, RED = 4, BLACK = 5;

export function coresOf(loop: Pick<LoopSpec, "cores" | "placement" | "scheme">): CableCores {
  return loop.cores ?? (loop.placement === "loop-back" && loop.scheme !== "none" ? "four-core-loop-back" : "two-core");
}

export interface ConductorProblem {
  path: (string | number)[];
  message: string;
}

/** The parts this loop has, for part shorts. */
function hasPart(loop: LoopSpec, part: LoopPart, detector: number | undefined): string | null {
  const n = loop.detectors.length;
  if (part === "contact" || part === "tamper") {
    if (detector === undefined) return `a short across a ${part === "contact" ? "contact" : "tamper contact"} names its detector`;
    if (!Number.isInteger(detector) || detector < 0 || detector >= n) return `there is no detector ${detector + 1} on this loop (it has ${n})`;
    if (part === "tamper" && !loop.detectors[detector].tamper) return `${loop.detectors[detector].label} has no tamper contact`;
    return null;
  }
  if (detector !== undefined) return `a short across the ${PART_WORDS[part]} names no detector`;
  if (part === "eol" && loop.scheme === "none") return "this loop has no end-of-line resistor";
  if (part === "alarm" && loop.scheme !== "double-eol") return "only a double end-of-line loop has an alarm resistor";
  if ((part === "shared-a" || part === "shared-b") && loop.scheme !== "shared") return "only a shared input has a resistor for detector A and one for detector B";
  return null;
}

/** Why the cores or the faults asked for don't fit this loop. */
function unknownCore(out: ConductorProblem[], cores: CableCores, c: string, path: (string | number)[]): void {
  if (!(CORE_COLOURS[cores] as string[]).includes(c)) out.push({ path, message: `there is no ${c} core in a ${CABLE_CORES_WORDS[cores]} cable (its cores: ${CORE_COLOURS[cores].join(", ")})` });
}

export function conductorProblems(loop: LoopSpec, out: ConductorProblem[] = []): ConductorProblem[] {
  const cores = coresOf(loop);
  if (loop.placement === "loop-back" && loop.scheme !== "none" && cores !== "four-core-loop-back")
    out.push({ path: ["cores"], message: "a loop-back resistor is reached through a four-core loop-back cable: choose that cable" });
  if (cores === "four-core-loop-back" && (loop.placement !== "loop-back" || loop.scheme === "none"))
    out.push({ path: ["cores"], message: "a four-core loop-back cable carries a loop-back resistor: choose the loop-back resistor placement on a scheme with resistors" });
  if (carriesTamperPair(cores)) {
    if (loop.placement !== "at-detector") out.push({ path: ["cores"], message: "the alarm and tamper pairs in one cable are modelled with the resistor at the detector" });
    if (!loop.detectors.some((d) => d.tamper)) out.push({ path: ["cores"], message: `a ${CABLE_CORES_WORDS[cores]} cable needs at least one detector with a tamper contact` });
  }
  if (loop.pathway === "class-a" && loop.conductorFaults !== undefined)
    out.push({ path: ["conductorFaults"], message: "conductor faults are checked on Class B loops; a Class A loop is checked for every single open on its own" });
  const faults = loop.conductorFaults;
  if (faults === "all") {
    if (loop.detectors.length > MAX_DETECTORS_FOR_ALL_FAULTS)
      out.push({ path: ["conductorFaults"], message: `every conductor fault is enumerated for loops of up to ${MAX_DETECTORS_FOR_ALL_FAULTS} detectors (this one has ${loop.detectors.length}); list the faults to check instead` });
    return out;
  }
  if (faults === undefined) return out;
  const L = loop.cable.lengthM;
  const known = (c: string, path: (string | number)[]) => unknownCore(out, cores, c, path);
  faults.forEach((f, i) => {
    if (f.kind === "part-short") {
      const why = hasPart(loop, f.part, f.detector);
      if (why) out.push({ path: ["conductorFaults", i], message: why });
      return;
    }
    if (f.kind === "short") {
      f.cores.forEach((c, k) => known(c, ["conductorFaults", i, "cores", k]));
      if (f.cores[0] === f.cores[1]) out.push({ path: ["conductorFaults", i, "cores"], message: "a short joins two different cores" });
    } else known(f.core, ["conductorFaults", i, "core"]);
    if (!Number.isFinite(f.atM) || f.atM < 0 || (Number.isFinite(L) && f.atM > L))
      out.push({ path: ["conductorFaults", i, "atM"], message: `the fault's position must be from 0 m (panel end) to ${L} m (detector end), got ${f.atM}` });
  });
  return out;
}

/** Every single conductor fault for this loop's cable: shorts, opens and earth faults at three points, and part shorts. */
export function enumerateConductorFaults(loop: LoopSpec): ConductorFault[] {
  const colours = CORE_COLOURS[coresOf(loop)];
  const L = loop.cable.lengthM;
  const at = L > 0 ? [0, L / 2, L] : [0];
  const out: ConductorFault[] = [];
  for (let i = 0; i < colours.length; i++)
    for (let j = i + 1; j < colours.length; j++) for (const atM of at) out.push({ kind: "short", cores: [colours[i], colours[j]], atM });
  for (const c of colours) for (const atM of at) out.push({ kind: "open", core: c, atM });
  for (const c of colours) for (const atM of at) out.push({ kind: "earth", core: c, atM });
  loop.detectors.forEach((d, i) => {
    if (loop.scheme !== "shared") out.push({ kind: "part-short", part: "contact", detector: i });
    if (d.tamper) out.push({ kind: "part-short", part: "tamper", detector: i });
  });
  if (loop.scheme !== "none") out.push({ kind: "part-short", part: "eol" });
  if (loop.scheme === "double-eol") out.push({ kind: "part-short", part: "alarm" });
  if (loop.scheme === "shared") out.push({ kind: "part-short", part: "shared-a" }, { kind: "part-short", part: "shared-b" });
  return out;
}

export function positionWords(atM: number, lengthM: number): string {
  if (atM === 0) return "at the panel end";
  if (atM === lengthM) return "at the detector end";
  return `${Math.round(atM * 10) / 10} m from the panel`;
}

const PART_WORDS: Record<LoopPart, string> = {
  contact: "contact",
  tamper: "tamper contact",
  eol: "end-of-line resistor",
  alarm: "alarm resistor",
  "shared-a": "resistor of detector A",
  "shared-b": "resistor of detector B",
};

export function conductorFaultLabel(f: ConductorFault, loop: LoopSpec): string {
  const where = f.kind === "part-short" ? "" : positionWords(f.atM, loop.cable.lengthM);
  const supply = cutsSupply(f) ? ", cutting the detectors' supply" : "";
  if (f.kind === "short") return `a short between the ${f.cores[0]} and ${f.cores[1]} cores ${where}${supply}`;
  if (f.kind === "open") return `the ${f.core} core open ${where}${supply}`;
  if (f.kind === "earth") return `the ${f.core} core to earth ${where}`;
  const whose = f.detector !== undefined ? `${loop.detectors[f.detector].label}'s ` : "the ";
  return `a short across ${whose}${PART_WORDS[f.part]} alone`;
}

/** The values one network is built with. */
export interface NetValues {
  /** One core, ohms per metre at the temperature in question. */
  rPerM: number;
  eol: number;
  alarm: number;
  sa: number;
  sb: number;
}

/**
 * The loop as a network of separate cores (input + is node 1, input − node 0), with one conductor fault or none.
 * Mirrors the lumped circuits of loop-model.ts with each core's own resistance.
 */
export function conductorCircuit(m: LoopModel, cores: CableCores, st: ArrayLike<number>, v: NetValues, fault: ConductorFault | null): Circuit {
  const c = new Circuit();
  const colours = CORE_COLOURS[cores];
  const P: number[] = [];
  const D: number[] = [];
  const tap: number[] = [];
  const L = m.lengthM;
  for (let i = 0; i < colours.length; i++) {
    P.push(c.node());
    D.push(c.node());
    const hit = fault !== null && fault.kind !== "part-short" && (fault.kind === "short" ? fault.cores.includes(colours[i]) : fault.core === colours[i]);
    if (!hit) {
      c.add(P[i], D[i], v.rPerM * L);
      continue;
    }
    const x = (fault as { atM: number }).atM;
    const a = c.node();
    const b = fault.kind === "open" ? c.node() : a;
    c.add(P[i], a, v.rPerM * x);
    c.add(b, D[i], v.rPerM * (L - x));
    tap[i] = a;
  }
  const rk = m.rk;
  const parts: { part: LoopPart; detector?: number; a: number; b: number }[] = [];
  const part = (p: LoopPart, a: number, b: number, ohms: number, detector?: number) => {
    parts.push({ part: p, detector, a, b });
    c.add(a, b, ohms);
  };
  const unpowered = cutsSupply(fault);
  const closed = (i: number) => {
    const alarm = unpowered || st[i] === STATE_ACTIVE;
    return m.no[i] === 1 ? alarm : !alarm;
  };
  const group = (a: number, b: number) => {
    if (m.groupNO) for (let i = 0; i < m.n; i++) part("contact", a, b, closed(i) ? rk : Infinity, i);
    else {
      let x = a;
      for (let i = 0; i < m.n; i++) {
        const y = i === m.n - 1 ? b : c.node();
        part("contact", x, y, closed(i) ? rk : Infinity, i);
        x = y;
      }
    }
  };
  const sharedPair = (a: number, b: number) => {
    const mid = c.node();
    part("contact", a, mid, closed(0) ? rk : Infinity, 0);
    part("shared-a", a, mid, v.sa);
    part("contact", mid, b, closed(1) ? rk : Infinity, 1);
    part("shared-b", mid, b, v.sb);
  };

  // Panel end; with the resistor(s) at the input terminals, the cable hangs off them (added below).
  const placementPanel = m.placement === PLACE_PANEL && m.scheme !== SCHEME_NONE;
  if (!placementPanel) c.add(1, P[Y], 0);
  if (carriesTamperPair(cores)) {
    c.add(P[B], P[G], 0); // the link at the panel that puts the tamper pair in series
    c.add(P[W], 0, 0);
  } else c.add(P[B], 0, 0);
  if (cores === "six-core-alarm-tamper") {
    // The supply's 0 V is the input's return; its + joins it through the supply, which counts as 0 Ω for the
    // resistance the input measures (the supply zeroed, as for a Thévenin resistance). The detectors' supply
    // terminals carry no current to the contacts: the far ends of red and black go nowhere else.
    c.add(P[BLACK], 0, 0);
    c.add(P[RED], 0, 0);
  }
  return finishCircuit(c, m, cores, P, D, tap, st, v, fault, parts, group, sharedPair, placementPanel);
}

function finishCircuit(
  c: Circuit,
  m: LoopModel,
  cores: CableCores,
  P: number[],
  D: number[],
  tap: number[],
  st: ArrayLike<number>,
  v: NetValues,
  fault: ConductorFault | null,
  parts: { part: LoopPart; detector?: number; a: number; b: number }[],
  group: (a: number, b: number) => void,
  sharedPair: (a: number, b: number) => void,
  placementPanel: boolean,
): Circuit {
  const addPart = (p: LoopPart, a: number, b: number, ohms: number, detector?: number) => {
    parts.push({ part: p, detector, a, b });
    c.add(a, b, ohms);
  };
  // Tamper contacts in series, on the alarm pair or, in an alarm and tamper cable, on the tamper pair.
  let s = carriesTamperPair(cores) ? D[G] : D[Y];
  for (let i = 0; i < m.n; i++)
    if (m.tamper[i] === 1) {
      const x = c.node();
      addPart("tamper", s, x, st[i] === STATE_TAMPER ? Infinity : m.rk, i);
      s = x;
    }
  let t = s;
  if (carriesTamperPair(cores)) {
    c.add(s, D[W], 0);
    t = D[Y];
  }
  const end = D[B];
  if (placementPanel) {
    if (m.scheme === SCHEME_SINGLE && m.groupNO) {
      c.add(1, P[Y], 0);
      addPart("eol", 1, 0, v.eol);
    } else {
      addPart("eol", 1, P[Y], v.eol);
      if (m.scheme === SCHEME_DOUBLE) addPart("alarm", P[Y], 0, v.alarm);
    }
    if (m.scheme === SCHEME_SHARED) sharedPair(t, end);
    else group(t, end);
  } else if (cores === "four-core-loop-back") {
    addPart("eol", P[G], P[W], v.eol);
    c.add(D[W], end, 0);
    if (m.scheme === SCHEME_SINGLE && m.groupNO) {
      group(t, end);
      c.add(t, D[G], 0);
    } else if (m.scheme === SCHEME_SINGLE) group(t, D[G]);
    else if (m.scheme === SCHEME_DOUBLE) {
      group(t, D[G]);
      addPart("alarm", t, D[G], v.alarm);
    } else sharedPair(t, D[G]);
  } else if (m.scheme === SCHEME_NONE) group(t, end);
  else if (m.scheme === SCHEME_SINGLE) {
    if (m.groupNO) {
      group(t, end);
      addPart("eol", t, end, v.eol);
    } else {
      const x = c.node();
      group(t, x);
      addPart("eol", x, end, v.eol);
    }
  } else if (m.scheme === SCHEME_DOUBLE) {
    const x = c.node();
    addPart("eol", t, x, v.eol);
    group(x, end);
    addPart("alarm", x, end, v.alarm);
  } else {
    const x = c.node();
    addPart("eol", t, x, v.eol);
    sharedPair(x, end);
  }

  if (fault === null) return c;
  const rsh = m.rsh;
  const colours = CORE_COLOURS[cores];
  if (fault.kind === "short") c.add(tap[colours.indexOf(fault.cores[0])], tap[colours.indexOf(fault.cores[1])], rsh);
  else if (fault.kind === "earth") c.add(tap[colours.indexOf(fault.core)], c.node(), rsh); // earth: no return path on its own
  else if (fault.kind === "part-short")
    for (const p of parts) if (p.part === fault.part && (fault.detector === undefined || p.detector === fault.detector)) c.add(p.a, p.b, rsh);
  return c;
}

/** The reading for one combination of states, one fault (or none), at one temperature and part factor. */
export function conductorReading(m: LoopModel, cores: CableCores, st: ArrayLike<number>, tempC: number, partFactor: number, fault: ConductorFault | null): number {
  const v: NetValues = { rPerM: conductorAt(m, tempC, 1), eol: m.eol * partFactor, alarm: m.alarm * partFactor, sa: m.sa * partFactor, sb: m.sb * partFactor };
  return resistanceBetween(conductorCircuit(m, cores, st, v, fault));
}

function expectedOf(f: ConductorFault): Report {
  if (f.kind === "open" || cutsSupply(f)) return "open";
  if (f.kind === "earth") return "trouble";
  return "short";
}

/** A reading interval through the bands, as the input-pair rows are made. */
export function bandRow(cb: CompiledBands, states: ConductorReading["states"], minOhms: number, maxOhms: number, nominalOhms: number, expected: Report, label: string): { row: ConductorReading; mask: number } {
  const iLo = bandIndex(cb, minOhms);
  const iHi = bandIndex(cb, maxOhms);
  let mask = 0;
  for (let b = iLo; b <= iHi; b++) mask |= cb.masks[b];
  return {
    row: { states, minOhms, maxOhms, reports: reportsBetween(cb, iLo, iHi), uncertain: iLo !== iHi, marginOhms: marginOf(cb, iLo, iHi, minOhms, maxOhms), expected, nominalOhms, label },
    mask,
  };
}

// an open (∞) is never the same as a finite reading: |∞ − x| ≤ 1e-9 · ∞ would say it is
const same = (a: number, b: number) => a === b || (Number.isFinite(a) && Number.isFinite(b) && Math.abs(a - b) <= 1e-9 * Math.max(1, Math.abs(a)));

export function analyzeConductors(loop: LoopSpec, inputType: InputType, m: LoopModel): ConductorAnalysis {
  const cores = coresOf(loop);
  const cb = compileBands(inputType.bands[loop.scheme]!);
  const faults = loop.conductorFaults === "all" || loop.conductorFaults === undefined ? enumerateConductorFaults(loop) : loop.conductorFaults;
  const combos = enumerateStates(loop.detectors).map((s) => ({ states: s, code: encodeStates(s), label: statesLabel(loop.detectors, s) }));
  const mid = (m.tMin + m.tMax) / 2;
  const lo = 1 - m.tol;
  const hi = 1 + m.tol;
  const base = combos.map((k) => conductorReading(m, cores, k.code, mid, 1, null));
  // A core to earth carries no current on a floating loop (no return through earth): the reading is the loop's own.
  let unfaulted: { lo: number; hi: number }[] | null = null;
  const results: ConductorFaultResult[] = faults.map((f) => {
    const label = conductorFaultLabel(f, loop);
    const expected = expectedOf(f);
    const rows: ConductorReading[] = [];
    let verdict: ConductorVerdict = "detected";
    let unchanged = true;
    if (f.kind === "earth") unfaulted ??= combos.map((k) => ({ lo: conductorReading(m, cores, k.code, m.tMin, lo, null), hi: conductorReading(m, cores, k.code, m.tMax, hi, null) }));
    combos.forEach((k, i) => {
      const earth = f.kind === "earth" ? unfaulted![i] : null;
      const nominal = earth ? base[i] : conductorReading(m, cores, k.code, mid, 1, f);
      const minOhms = earth ? earth.lo : conductorReading(m, cores, k.code, m.tMin, lo, f);
      const maxOhms = earth ? earth.hi : conductorReading(m, cores, k.code, m.tMax, hi, f);
      const { row, mask } = bandRow(cb, k.states, minOhms, maxOhms, nominal, expected, `${label} (${k.label})`);
      rows.push(row);
      if (!same(nominal, base[i])) unchanged = false;
      if (mask & REPORT_BIT.normal) verdict = "defeat";
      else if (verdict !== "defeat" && mask & ~acceptableFor(expected)) verdict = "mistaken";
    });
    if (f.kind === "earth") verdict = inputType.earthFaultMonitor ? "detected" : "not-supervised";
    else if (unchanged) verdict = "no-effect";
    return { fault: f, label, verdict, rows };
  });
  return { cores, colours: CORE_COLOURS[cores], faults: results };
}

/** One conductor fault's reading for any mix of detector states (the bench shows mixes the analysis doesn't list). */
export function conductorFaultReading(loop: LoopSpec, inputType: InputType, fault: ConductorFault, states: readonly DetectorState[]): ConductorReading {
  const m = compileLoop(loop, inputType);
  const cores = coresOf(loop);
  const code = encodeStates(states);
  const at = (tempC: number, f: number) => conductorReading(m, cores, code, tempC, f, fault);
  const label = `${conductorFaultLabel(fault, loop)} (${statesLabel(loop.detectors, states)})`;
  return bandRow(compileBands(inputType.bands[loop.scheme]!), [...states], at(m.tMin, 1 - m.tol), at(m.tMax, 1 + m.tol), at((m.tMin + m.tMax) / 2, 1), expectedOf(fault), label).row;
}

/** Findings for conductor faults: each defeat, and earth faults nobody watches. */
export function conductorFindings(c: ConductorAnalysis, lifeSafety: boolean, target: FindingTarget): Finding[] {
  const out: Finding[] = [];
  const defeats = c.faults.filter((f) => f.verdict === "defeat");
  if (defeats.length) {
    const first = defeats.find((f) => f.rows.some((r) => r.expected !== "normal" && r.states.includes("active") && r.reports.includes("normal"))) ?? defeats[0];
    const masked = first.rows.find((r) => r.states.includes("active") && r.reports.includes("normal")) ?? first.rows[0];
    out.push({
      code: "conductor-defeat",
      severity: "error",
      message: `${defeats.length === 1 ? "A conductor fault reads" : `${defeats.length} conductor faults read`} as normal, e.g. ${masked.label}${defeats.length > 1 ? `; also ${defeats.filter((d) => d !== first).slice(0, 3).map((d) => d.label).join("; ")}` : ""}`,
      why: "A fault the panel reads as normal can't be found by the panel, and one that bypasses the contact hides every alarm from that detector until someone measures the loop.",
      target,
    });
  }
  if (c.faults.some((f) => f.verdict === "not-supervised"))
    out.push({
      code: "earth-not-supervised",
      severity: lifeSafety ? "warning" : "note",
      message: "A core to earth is not supervised on this input type: the loop reads the same, and a second earth fault could short it unseen.",
      why: "The loop floats, so one core touching earth draws no current through the input; only an input that watches earth can report it.",
      target,
    });
  return out;
}
