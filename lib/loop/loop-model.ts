// The loop as an electrical network, and its reading for one combination of detector states and fault.
//
// Circuit (all cable lumped between the panel and the detectors, which sit together at the far end;
// Rc = one conductor, T = the tamper contacts in series, G = the alarm contacts: NC in series, NO in parallel):
//   none        D = T + G
//   single-eol  NC: D = T + G + R          NO: D = T + (G ∥ R)
//   double-eol  D = T + R + (G ∥ Ra)       (one alarm resistor across the whole contact group)
//   shared      D = R + T + (CA ∥ RA) + (CB ∥ RB)
// at the detector the reading is 2Rc + D. A short at the detector end gives 2Rc + (Rs ∥ D), a short at the
// panel end Rs ∥ (2Rc + D), a cut conductor ∞.
// Resistor at the panel: the resistor(s) sit at the input terminals and the cable carries only the contacts
// (shared: only the line resistor R moves, RA/RB stay across their contacts):
//   single-eol NC: R + W   NO: R ∥ W   double-eol: R + (Ra ∥ W)   shared: R + W, with W the cable side.
// Loop-back: the series resistor (single-eol NO: the resistor across the contacts) is reached through a
// second pair out and back, so it carries 2Rc more: R becomes R + 2Rc; the input pair is shorted as usual.
import type { InputType } from "@/lib/catalog/schema";
import { fittedValues } from "./loop-problems";
import { conductorOhmsPerM, copperTempFactor } from "./cable";
import type { DetectorState, Fault, LoopSpec } from "./types";

export const SCHEME_NONE = 0;
export const SCHEME_SINGLE = 1;
export const SCHEME_DOUBLE = 2;
export const SCHEME_SHARED = 3;
export const PLACE_DETECTOR = 0;
export const PLACE_PANEL = 1;
export const PLACE_LOOPBACK = 2;
export const FAULT_NONE = 0;
export const FAULT_SHORT_PANEL = 1;
export const FAULT_SHORT_DETECTOR = 2;
export const FAULT_CUT = 3;
export const STATE_REST = 0;
export const STATE_ACTIVE = 1;
export const STATE_TAMPER = 2;

export const FAULTS: readonly Fault[] = ["none", "short-panel", "short-detector", "cut"];
export const STATE_NAMES: readonly DetectorState[] = ["rest", "active", "tamper"];

const SCHEME_CODE = { none: SCHEME_NONE, "single-eol": SCHEME_SINGLE, "double-eol": SCHEME_DOUBLE, shared: SCHEME_SHARED } as const;
const PLACE_CODE = { "at-detector": PLACE_DETECTOR, "at-panel": PLACE_PANEL, "loop-back": PLACE_LOOPBACK } as const;

export interface LoopModel {
  scheme: number;
  placement: number;
  /** Non-shared loops: the contact group is NO (parallel) rather than NC (series). */
  groupNO: boolean;
  n: number;
  /** Per detector: 1 if its alarm contact is NO. */
  no: number[];
  /** Per detector: 1 if it has a tamper contact. */
  tamper: number[];
  /** One conductor at 20 °C, Ω/m. */
  rPerM20: number;
  lengthM: number;
  tMin: number;
  tMax: number;
  /** Closed contact, Ω. */
  rk: number;
  /** The short fault, Ω. */
  rsh: number;
  /** Nominal fitted values, 0 when the scheme has none. */
  eol: number;
  alarm: number;
  sa: number;
  sb: number;
  /** Part tolerance as a fraction. */
  tol: number;
  /** Conductors in the loop path: 2, or 4 with a loop-back resistor. */
  conductors: number;
}

export function compileLoop(loop: LoopSpec, inputType?: InputType): LoopModel {
  const f = fittedValues(loop, inputType);
  const scheme = SCHEME_CODE[loop.scheme];
  const n = loop.detectors.length;
  // plain arrays: a typed array per loop costs more to allocate than it saves on a handful of detectors
  const no: number[] = [];
  const tamper: number[] = [];
  for (let i = 0; i < n; i++) {
    no.push(loop.detectors[i].contact === "NO" ? 1 : 0);
    tamper.push(loop.detectors[i].tamper ? 1 : 0);
  }
  const placement = PLACE_CODE[loop.placement];
  const usesLoopBack = placement === PLACE_LOOPBACK && scheme !== SCHEME_NONE;
  return {
    scheme,
    placement,
    groupNO: n > 0 && no[0] === 1,
    n,
    no,
    tamper,
    rPerM20: conductorOhmsPerM(loop.cable.gauge, 20),
    lengthM: loop.cable.lengthM,
    tMin: loop.cable.tempMinC,
    tMax: loop.cable.tempMaxC,
    rk: loop.contactOhms,
    rsh: loop.shortOhms ?? 0,
    eol: scheme === SCHEME_NONE ? 0 : (f.eolOhms ?? 0),
    alarm: scheme === SCHEME_DOUBLE ? (f.alarmOhms ?? 0) : 0,
    sa: scheme === SCHEME_SHARED ? (f.sharedOhms?.[0] ?? 0) : 0,
    sb: scheme === SCHEME_SHARED ? (f.sharedOhms?.[1] ?? 0) : 0,
    tol: loop.tolerancePct / 100,
    conductors: usesLoopBack ? 4 : 2,
  };
}

/** One conductor's resistance at `tempC` for the model's length. */
export function conductorAt(m: LoopModel, tempC: number, lengthM = m.lengthM): number {
  return m.rPerM20 * copperTempFactor(tempC) * lengthM;
}

function par(a: number, b: number): number {
  if (a === 0 || b === 0) return 0;
  if (a === Infinity) return b;
  if (b === Infinity) return a;
  return (a * b) / (a + b);
}

/**
 * The contacts' share of the detector-end network for one combination of states, which no cable length or
 * resistor value changes: `k[0]` the tamper contacts in series, `k[1]` the alarm contact group (shared inputs:
 * detector A's contact) and `k[2]` detector B's contact. `st[i]` is 0 rest, 1 active, 2 tamper.
 */
export function contactSums(m: LoopModel, st: ArrayLike<number>, k: Float64Array): void {
  const rk = m.rk;
  const n = m.n;
  let t = 0;
  for (let i = 0; i < n; i++) if (m.tamper[i] === 1) t += st[i] === STATE_TAMPER ? Infinity : rk;
  k[0] = t;
  if (m.scheme === SCHEME_SHARED) {
    k[1] = (m.no[0] === 1 ? st[0] === STATE_ACTIVE : st[0] !== STATE_ACTIVE) ? rk : Infinity;
    k[2] = (m.no[1] === 1 ? st[1] === STATE_ACTIVE : st[1] !== STATE_ACTIVE) ? rk : Infinity;
    return;
  }
  let g: number;
  if (m.groupNO) {
    g = Infinity;
    for (let i = 0; i < n; i++) if (st[i] === STATE_ACTIVE) g = par(g, rk);
  } else {
    g = 0;
    for (let i = 0; i < n; i++) g += st[i] === STATE_ACTIVE ? Infinity : rk;
  }
  k[1] = g;
  k[2] = 0;
}

/**
 * The readings for all four faults at once (none, short at the panel end, short at the detector end, cut),
 * written to `out[0..3]`, from the contacts' share `k` (see contactSums); `rc` is one conductor; resistor values
 * as given. Allocation-free: this is the hot path.
 */
export function evalFaultsFrom(m: LoopModel, k: Float64Array, rc: number, eol: number, alarm: number, sa: number, sb: number, out: Float64Array): void {
  const t = k[0];
  let d: number; // detector-end network
  let panel = 0; // 0 none, 1 R + w, 2 R ∥ w, 3 R + (Ra ∥ w)
  const lb = m.placement === PLACE_LOOPBACK ? 2 * rc : 0;
  const atPanel = m.placement === PLACE_PANEL;
  if (m.scheme === SCHEME_SHARED) {
    d = t + par(k[1], sa) + par(k[2], sb);
    if (atPanel) panel = 1;
    else d += eol + lb;
  } else {
    const g = k[1];
    if (m.scheme === SCHEME_NONE) d = t + g;
    else if (atPanel) {
      d = t + g;
      panel = m.scheme === SCHEME_DOUBLE ? 3 : m.groupNO ? 2 : 1;
    } else if (m.scheme === SCHEME_SINGLE) d = m.groupNO ? t + par(g, eol + lb) : t + g + eol + lb;
    else d = t + eol + lb + par(g, alarm);
  }

  const rsh = m.rsh;
  const w0 = 2 * rc + d;
  const w1 = par(rsh, w0);
  const w2 = 2 * rc + par(rsh, d);
  if (panel === 0) {
    out[0] = w0;
    out[1] = w1;
    out[2] = w2;
    out[3] = Infinity;
  } else if (panel === 1) {
    out[0] = eol + w0;
    out[1] = eol + w1;
    out[2] = eol + w2;
    out[3] = Infinity;
  } else if (panel === 2) {
    out[0] = par(eol, w0);
    out[1] = par(eol, w1);
    out[2] = par(eol, w2);
    out[3] = eol;
  } else {
    out[0] = eol + par(alarm, w0);
    out[1] = eol + par(alarm, w1);
    out[2] = eol + par(alarm, w2);
    out[3] = eol + alarm;
  }
}

const contactScratch = new Float64Array(3);

/** The readings for all four faults at once for states `st` (see contactSums and evalFaultsFrom). */
export function evalFaults(m: LoopModel, st: ArrayLike<number>, rc: number, eol: number, alarm: number, sa: number, sb: number, out: Float64Array): void {
  contactSums(m, st, contactScratch);
  evalFaultsFrom(m, contactScratch, rc, eol, alarm, sa, sb, out);
}

const scratch = new Float64Array(4);

/** The reading in ohms for one fault (see evalFaults). */
export function evalReading(m: LoopModel, st: ArrayLike<number>, fault: number, rc: number, eol: number, alarm: number, sa: number, sb: number): number {
  evalFaults(m, st, rc, eol, alarm, sa, sb, scratch);
  return scratch[fault];
}

export interface ReadingParams {
  tempC: number;
  eolOhms?: number;
  alarmOhms?: number;
  sharedOhms?: [number, number];
  /** Override the one-way length, metres. */
  lengthM?: number;
}

const STATE_CODE: Record<DetectorState, number> = { rest: STATE_REST, active: STATE_ACTIVE, tamper: STATE_TAMPER };

/** States as codes (a plain array: allocating a typed array per state combination costs more than it saves). */
export function encodeStates(states: readonly DetectorState[]): number[] {
  const out: number[] = [];
  for (let i = 0; i < states.length; i++) out.push(STATE_CODE[states[i]]);
  return out;
}

/**
 * The reading for given states and fault with every part at a chosen value and the cable at one temperature.
 * Values not given are the fitted nominal ones. For the loop bench and for checking the intervals.
 */
export function readingAt(loop: LoopSpec, states: readonly DetectorState[], fault: Fault, params: ReadingParams, inputType?: InputType): number {
  const m = compileLoop(loop, inputType);
  if (states.length !== m.n) throw new RangeError(`expected ${m.n} detector states, got ${states.length}`);
  const rc = conductorAt(m, params.tempC, params.lengthM ?? m.lengthM);
  return evalReading(
    m,
    encodeStates(states),
    FAULTS.indexOf(fault),
    rc,
    m.scheme === SCHEME_NONE ? 0 : (params.eolOhms ?? m.eol),
    m.scheme === SCHEME_DOUBLE ? (params.alarmOhms ?? m.alarm) : 0,
    m.scheme === SCHEME_SHARED ? (params.sharedOhms?.[0] ?? m.sa) : 0,
    m.scheme === SCHEME_SHARED ? (params.sharedOhms?.[1] ?? m.sb) : 0,
  );
}

/**
 * The detector-state combinations to enumerate. Up to two detectors: every combination (3ⁿ with tampers).
 * More: all at rest, each one active alone, all active together, each tamper alone — bounded, not 3ⁿ.
 */
export function enumerateStates(detectors: readonly { tamper: boolean }[]): DetectorState[][] {
  const n = detectors.length;
  if (n <= 2) {
    let combos: DetectorState[][] = [[]];
    for (const d of detectors) {
      const opts: DetectorState[] = d.tamper ? ["rest", "active", "tamper"] : ["rest", "active"];
      const next: DetectorState[][] = [];
      for (const c of combos) for (const o of opts) next.push([...c, o]);
      combos = next;
    }
    return combos;
  }
  const rest = (): DetectorState[] => new Array<DetectorState>(n).fill("rest");
  const out: DetectorState[][] = [rest()];
  for (let i = 0; i < n; i++) {
    const s = rest();
    s[i] = "active";
    out.push(s);
  }
  out.push(new Array<DetectorState>(n).fill("active"));
  for (let i = 0; i < n; i++)
    if (detectors[i].tamper) {
      const s = rest();
      s[i] = "tamper";
      out.push(s);
    }
  return out;
}

export interface StateCombos {
  /** As enumerateStates gives them; frozen, as they are shared by every loop of the same shape. */
  combos: readonly DetectorState[][];
  /** Each combination as codes (encodeStates). */
  codes: readonly number[][];
}

const combosByShape = new Map<number, StateCombos>();

/**
 * The state combinations of a loop and their codes, made once per shape (detector count and which detectors have
 * a tamper contact): enumerating them per loop showed in the profile of a cold layout.
 */
export function stateCombos(detectors: readonly { tamper: boolean }[]): StateCombos {
  const n = detectors.length;
  let key = n;
  for (let i = 0; i < n && i < 24; i++) if (detectors[i].tamper) key += 32 * 2 ** i;
  const hit = n <= 24 ? combosByShape.get(key) : undefined;
  if (hit) return hit;
  const combos = enumerateStates(detectors).map((s) => Object.freeze(s) as DetectorState[]);
  const made: StateCombos = { combos: Object.freeze(combos), codes: Object.freeze(combos.map((s) => Object.freeze(encodeStates(s)) as number[])) };
  if (n <= 24) {
    if (combosByShape.size >= 1000) combosByShape.clear();
    combosByShape.set(key, made);
  }
  return made;
}
