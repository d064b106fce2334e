// A canonical key for a loop: two loops with the same key get the same analysis (same scheme, placement, fitted
// values, tolerance, cable, contacts, detectors, cores, conductor faults and pathway). Used to analyse each distinct
// loop once: the solver re-solves a layout on every edit, and most of its loops have not changed.
import type { InputType } from "@/lib/catalog/schema";
import type { FindingTarget } from "@/lib/findings";
import { analyzeLoop } from "./analyze-loop";
import type { ConductorFault, LoopAnalysis, LoopSpec } from "./types";

/** Text with its length in front, so joined keys can't run into each other whatever the text holds. */
const part = (s: string) => `${s.length}:${s}`;

function faultKey(f: ConductorFault): string {
  if (f.kind === "short") return `s${f.cores[0]},${f.cores[1]},${f.atM}`;
  if (f.kind === "part-short") return `p${f.part},${f.detector ?? ""}`;
  return `${f.kind === "open" ? "o" : "e"}${f.core},${f.atM}`;
}

/** Everything the analysis of `loop` depends on, as one string (the input type is keyed separately). */
export function loopSpecKey(loop: LoopSpec): string {
  const c = loop.cable;
  const g = "awg" in c.gauge ? `a${c.gauge.awg}` : `m${c.gauge.mm2}`;
  let k = `${loop.scheme}|${loop.placement}|${loop.eolOhms}|${loop.alarmOhms}|${loop.sharedOhms}|${loop.tolerancePct}|${g}|${c.lengthM}|${c.tempMinC}|${c.tempMaxC}|${loop.contactOhms}|${loop.shortOhms}|${loop.cores}|${loop.pathway}|`;
  const cf = loop.conductorFaults;
  k += cf === undefined ? "-" : cf === "all" ? "all" : cf.map(faultKey).join(";");
  for (const d of loop.detectors) k += `|${part(d.label)}${d.contact}${d.tamper ? 1 : 0}${d.lifeSafety ? 1 : 0}`;
  return k;
}

function targetKey(t: FindingTarget | undefined): string {
  if (!t || t.kind === "layout") return "";
  return JSON.stringify(t);
}

/**
 * analyzeLoop with a cache keyed by content that keeps what the last two generations used and forgets the rest,
 * so an editor's re-solve after one change analyses only the loop that changed. Analyses are shared: read only.
 */
export class LoopAnalysisMemo {
  private byType = new WeakMap<InputType, { live: Map<string, LoopAnalysis>; older: Map<string, LoopAnalysis>; next: Map<string, LoopAnalysis> }>();
  private types: InputType[] = [];
  hits = 0;
  misses = 0;

  analyze(loop: LoopSpec, inputType: InputType, target?: FindingTarget): LoopAnalysis {
    let g = this.byType.get(inputType);
    if (!g) {
      g = { live: new Map(), older: new Map(), next: new Map() };
      this.byType.set(inputType, g);
      this.types.push(inputType);
    }
    const key = target === undefined ? loopSpecKey(loop) : `${loopSpecKey(loop)}#${targetKey(target)}`;
    let a = g.next.get(key);
    if (a !== undefined) return a;
    a = g.live.get(key) ?? g.older.get(key);
    if (a !== undefined) this.hits++;
    else {
      this.misses++;
      a = analyzeLoop(loop, inputType, target);
    }
    g.next.set(key, a);
    return a;
  }

  /** Called after each pass over a layout: entries neither this pass nor the one before used are dropped. */
  endGeneration(): void {
    for (const t of this.types) {
      const g = this.byType.get(t)!;
      g.older = g.live;
      g.live = g.next;
      g.next = new Map();
    }
    this.hits = 0;
    this.misses = 0;
  }
}
