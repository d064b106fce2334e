// Class A (NFPA 72: a pathway that returns to the panel, so a single open leaves every device reporting).
// The pair runs out from the input's out terminals past each detector in turn (evenly spaced over the cable
// length) and back, another cable length, to the return terminals. The end of the line sits at the return
// terminals: single end-of-line, R across them; double end-of-line, Ra across them and R in series at the
// feeding terminal. After an open the panel reports the fault, switches the end of the line out and feeds the
// loop from both ends (common practice, no published source), so each side reads like a line with no end.
import type { InputType } from "@/lib/catalog/schema";
import { acceptableFor, compileBands, REPORT_BIT } from "./loop-bands";
import { bandRow, type ConductorProblem } from "./conductors";
import { conductorAt, SCHEME_DOUBLE, STATE_ACTIVE, type LoopModel } from "./loop-model";
import { Circuit, resistanceBetween } from "./nodal";
import { statesLabel } from "./row-labels";
import type { ClassAAnalysis, ClassAOpen, CoreColour, DetectorState, LoopSpec } from "./types";

export function classAProblems(loop: LoopSpec): ConductorProblem[] {
  if (loop.pathway !== "class-a") return [];
  const out: ConductorProblem[] = [];
  if (loop.scheme !== "single-eol" && loop.scheme !== "double-eol") out.push({ path: ["pathway"], message: "a Class A loop needs an end-of-line scheme (single or double end-of-line)" });
  if (loop.detectors.some((d) => d.contact !== "NO")) out.push({ path: ["pathway"], message: "a Class A loop puts each detector's normally open contact across the pair; normally closed contacts in series can't be fed from both ends" });
  if (loop.detectors.some((d) => d.tamper)) out.push({ path: ["pathway"], message: "tamper contacts in series don't belong on a Class A loop; wire them to their own input" });
  if (loop.placement !== "at-detector") out.push({ path: ["placement"], message: "on a Class A loop the end of the line is the panel's return terminals: keep the resistor at the detector" });
  if (loop.cores !== undefined && loop.cores !== "two-core") out.push({ path: ["cores"], message: "a Class A loop is one pair out and back: choose a two-core cable" });
  return out;
}

type Feed = "panel" | "out" | "return";

/** The Class A network: `open` breaks core 0 (yellow) or 1 (blue) in the middle of segment `segment` (0: panel to
 * detector 1, …, n: last detector back to the return terminals). `feed` says where the input drives it from. */
export function classACircuit(m: LoopModel, st: ArrayLike<number>, rPerM: number, eol: number, alarm: number, feed: Feed, open: { core: 0 | 1; segment: number } | null): Circuit {
  const c = new Circuit();
  const n = m.n;
  const L = m.lengthM;
  const rails: number[][] = [[], []];
  for (let k = 0; k < 2; k++) {
    for (let i = 0; i <= n + 1; i++) rails[k].push(c.node());
    for (let s = 0; s <= n; s++) {
      const len = s < n ? L / n : L;
      const a = rails[k][s];
      const b = rails[k][s + 1];
      if (open && open.core === k && open.segment === s) {
        c.add(a, c.node(), (rPerM * len) / 2);
        c.add(c.node(), b, (rPerM * len) / 2);
      } else c.add(a, b, rPerM * len);
    }
  }
  for (let i = 0; i < n; i++) if (st[i] === STATE_ACTIVE) c.add(rails[0][i + 1], rails[1][i + 1], m.rk);
  const at = feed === "return" ? n + 1 : 0;
  const double = m.scheme === SCHEME_DOUBLE;
  c.add(1, rails[0][at], double ? eol : 0);
  c.add(rails[1][at], 0, 0);
  if (feed === "panel") c.add(rails[0][n + 1], rails[1][n + 1], double ? alarm : eol);
  return c;
}

function segmentWords(loop: LoopSpec, s: number): string {
  const d = loop.detectors;
  if (s === 0) return `between the panel and ${d[0].label}`;
  if (s === d.length) return `between ${d[d.length - 1].label} and the return terminals`;
  return `between ${d[s - 1].label} and ${d[s].label}`;
}

export function analyzeClassA(loop: LoopSpec, inputType: InputType, m: LoopModel): ClassAAnalysis {
  const cb = compileBands(inputType.bands[loop.scheme]!);
  const n = m.n;
  const L = m.lengthM;
  const lo = 1 - m.tol;
  const hi = 1 + m.tol;
  const mid = (m.tMin + m.tMax) / 2;
  const read = (st: Uint8Array, feed: Feed, open: { core: 0 | 1; segment: number }, states: DetectorState[], label: string, expected: "open" | "active") => {
    const at = (tempC: number, f: number) => resistanceBetween(classACircuit(m, st, conductorAt(m, tempC, 1), m.eol * f, m.alarm * f, feed, open));
    return bandRow(cb, states, at(m.tMin, lo), at(m.tMax, hi), at(mid, 1), expected, label);
  };
  const opens: ClassAOpen[] = [];
  let every = true;
  const colours: CoreColour[] = ["yellow", "blue"];
  const restStates: DetectorState[] = new Array(n).fill("rest");
  const atRest = new Uint8Array(n);
  for (const core of [0, 1] as const)
    for (let s = 0; s <= n; s++) {
      const open = { core, segment: s };
      const label = `the ${colours[core]} core open ${segmentWords(loop, s)}`;
      const rest = read(atRest, "panel", open, restStates, `${label} (all at rest)`, "open");
      // The panel must see the open as a fault (open or trouble) to switch to feeding from both ends; an open
      // that reads as an alarm (an input whose band above normal is "active") is not reported as an open.
      const openReported = (rest.mask & ~acceptableFor("open")) === 0;
      if (!openReported) every = false;
      // A side can only report an alarm when, with every detector at rest, it doesn't already read active:
      // past the open a side reads ∞, which such an input also calls active, detector or no detector.
      const quiet = (feed: "out" | "return") => (read(atRest, feed, open, restStates, label, "active").mask & REPORT_BIT.active) === 0;
      const outQuiet = quiet("out");
      const backQuiet = quiet("return");
      const devices: ClassAOpen["devices"] = [];
      for (let i = 0; i < n; i++) {
        const st = new Uint8Array(n);
        st[i] = STATE_ACTIVE;
        const states: DetectorState[] = restStates.map((_, k) => (k === i ? "active" : "rest"));
        const rowLabel = `${label} (${statesLabel(loop.detectors, states)})`;
        const out = read(st, "out", open, states, `${rowLabel}, fed from the out terminals`, "active");
        const back = read(st, "return", open, states, `${rowLabel}, fed from the return terminals`, "active");
        const side = outQuiet && out.mask === REPORT_BIT.active ? "out" : backQuiet && back.mask === REPORT_BIT.active ? "return" : null;
        if (side === null) every = false;
        devices.push({ detector: i, side, reading: side === "return" ? back.row : out.row, reported: side !== null });
      }
      const atM = s < n ? ((s + 0.5) * L) / n : 1.5 * L;
      opens.push({ core: colours[core], atM, label, rest: rest.row, openReported, devices });
    }
  return { everyDeviceReported: every, opens };
}
