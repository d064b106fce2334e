import type { Catalog } from "@/lib/catalog/schema";
import { billOfMaterials, batterySize, type BillOfMaterials } from "@/lib/bom/bill-of-materials";
import { boardNames } from "@/lib/layout/names";
import type { LayoutDocument } from "@/lib/layout/schema";
import { FAULT_WORDS } from "@/lib/loop/row-labels";
import type { Schedule } from "@/lib/schedule/schema";
import { severityRank, type Severity } from "@/lib/findings";
import { createSolver } from "@/lib/solver";
import { isLifeSafety } from "@/lib/solver/resolve";
import { plural } from "@/lib/vocabulary/plural";

// Side by side: what each candidate layout costs, how many inputs it uses and leaves, what each supply carries,
// how much of it is supervised, what the solver found, and what each shared input trades away.

export interface CompareCandidate {
  id?: number | string;
  name: string;
  layout: LayoutDocument;
  /** An approved revision is compared against the schedule and catalog frozen with it, not the shared ones. */
  frozen?: { schedule: Schedule; catalog: Catalog };
}

export interface SupplyColumn {
  key: string;
  name: string;
  restMa: number;
  alarmMa: number;
  ratingMa: number;
  /** Alarm load as a share of the rating, 0–1+. */
  alarmLoad: number;
  batteryNeededAh: number;
  /** Common size it rounds up to; null when none fits. */
  batteryAh: number | null;
}

export interface SharedTradeoff {
  boardKey: string;
  input: number;
  detectors: string[];
  inputsSaved: number;
  lost: string[];
  /** Plain words: the input saved against the supervision lost. */
  text: string;
}

export interface ComparisonColumn {
  id: number | string | null;
  name: string;
  cost: number;
  unpricedLines: number;
  inputs: { used: number; total: number; spare: number };
  zones: number;
  unplaced: number;
  supplies: SupplyColumn[];
  coverage: { used: number; covered: number; share: number | null };
  findings: { error: number; warning: number; note: number };
  /** Every finding of the one solve, errors first. */
  findingList: { severity: Severity; message: string }[];
  shared: SharedTradeoff[];
  bom: BillOfMaterials;
  /** Why the layout is left out of "best" on every measure (detectors not placed, errors); null when it is ranked. */
  notRanked: string | null;
}

export interface LayoutComparison {
  columns: ComparisonColumn[];
  /** Column indices that are best on each measure (ties give several). */
  best: { cost: number[]; coverage: number[]; errors: number[]; spare: number[] };
  /** Short plain sentences on how the candidates differ. */
  summary: string[];
  /** The schedule holds smoke, heat or other life-safety devices: the comparison carries the fire caution. */
  lifeSafety: boolean;
}

/** A layout that leaves detectors off its inputs or has errors is incomplete: it is never "best" on any measure. */
export function notRankedReason(c: { unplaced: number; findings: { error: number } }): string | null {
  const why: string[] = [];
  if (c.unplaced > 0) why.push(`${c.unplaced} ${c.unplaced === 1 ? "detector is" : "detectors are"} not placed`);
  if (c.findings.error > 0) why.push(`${c.findings.error} ${c.findings.error === 1 ? "error" : "errors"}`);
  return why.length ? `not ranked: ${why.join(" and ")}` : null;
}

/** Column indices best on each measure, among the ranked columns only (ties give several). */
export function bestOf(columns: readonly Pick<ComparisonColumn, "cost" | "coverage" | "findings" | "inputs" | "notRanked">[]): LayoutComparison["best"] {
  const ranked = <T,>(f: (c: (typeof columns)[number]) => T | null) => columns.map((c) => (c.notRanked === null ? f(c) : null));
  return {
    cost: argBest(ranked((c) => c.cost), (a, b) => a < b),
    coverage: argBest(ranked((c) => c.coverage.share), (a, b) => a > b),
    errors: argBest(ranked((c) => c.findings.error), (a, b) => a < b),
    spare: argBest(ranked((c) => c.inputs.spare), (a, b) => a > b),
  };
}

function argBest(values: (number | null)[], better: (a: number, b: number) => boolean): number[] {
  let best: number | null = null;
  values.forEach((v) => {
    if (v !== null && (best === null || better(v, best))) best = v;
  });
  return best === null ? [] : values.flatMap((v, i) => (v === best ? [i] : []));
}

const pct = (x: number | null) => (x === null ? "no inputs used" : `${Math.round(x * 100)} %`);

function tradeoffText(where: string, detectors: string[], lost: string[]): string {
  const who = detectors.join(" and ");
  const kept = lost.length === 0;
  const lostWords = lost.map((f) => FAULT_WORDS[f as keyof typeof FAULT_WORDS] ?? f);
  return kept
    ? `${where} carries ${who}: saves 1 input, and shorts and cuts are still reported; but one cable fault takes out both detectors, and the panel cannot say which of them the fault is on.`
    : `${where} carries ${who}: saves 1 input, but ${lostWords.join(", ")} ${lostWords.length === 1 ? "is" : "are"} no longer reported as such, and one cable fault takes out both detectors.`;
}

/** `money` writes an amount as the organisation does (lib/format); plain two decimals when none is given. */
export function compareLayouts(candidates: readonly CompareCandidate[], schedule: Schedule, catalog: Catalog, money: (amount: number) => string = (x) => x.toFixed(2)): LayoutComparison {
  const shared = createSolver(schedule, catalog);
  const columns: ComparisonColumn[] = candidates.map((c) => {
    const own = c.frozen ?? { schedule, catalog };
    const r = (c.frozen ? createSolver(own.schedule, own.catalog) : shared).solve(c.layout);
    const bom = billOfMaterials(c.layout, own.schedule, own.catalog, r);
    const names = boardNames(c.layout);
    return {
      id: c.id ?? null,
      name: c.name,
      cost: bom.total,
      unpricedLines: bom.unpricedLines,
      inputs: { used: r.totals.inputsUsed, total: r.totals.inputsTotal, spare: r.totals.inputsFree },
      zones: r.totals.zonesUsed,
      unplaced: r.totals.unplacedIds.length,
      supplies: r.supplies.map((s) => {
        const restMa = s.loadRestMa + s.ownRestMa;
        const alarmMa = s.loadAlarmMa + s.ownAlarmMa;
        return { key: s.supplyKey, name: s.name, restMa, alarmMa, ratingMa: s.ratingMa, alarmLoad: s.ratingMa > 0 ? s.loadAlarmMa / s.ratingMa : 0, batteryNeededAh: s.batteryNeededAh, batteryAh: s.batteryNeededAh > 0 ? batterySize(s.batteryNeededAh, s.maxBatteryAh) : null };
      }),
      coverage: r.coverage,
      findings: r.counts,
      findingList: r.findings.map((f) => ({ severity: f.severity, message: f.message })).sort((a, b) => severityRank[a.severity] - severityRank[b.severity]),
      shared: r.shared.entries.map((e) => {
        const where = `${names.get(e.boardKey) ?? e.boardKey}, input ${e.input}`;
        const labels = e.detectorIds.map((id) => own.schedule.find((d) => d.id === id)?.label ?? id);
        return { boardKey: e.boardKey, input: e.input, detectors: labels, inputsSaved: 1, lost: [...e.lost], text: tradeoffText(where, labels, e.lost) };
      }),
      bom,
      notRanked: notRankedReason({ unplaced: r.totals.unplacedIds.length, findings: r.counts }),
    };
  });

  const best = bestOf(columns);

  const summary: string[] = [];
  // the price difference is a fact about every layout, ranked or not
  const lowest = argBest(columns.map((c) => c.cost), (a, b) => a < b);
  if (columns.length > 1 && lowest.length) {
    const cheapest = columns[lowest[0]];
    for (const c of columns) if (c !== cheapest && c.cost !== cheapest.cost) summary.push(`${c.name} costs ${money(c.cost - cheapest.cost)} more than ${cheapest.name} (${money(c.cost)} against ${money(cheapest.cost)}).`);
  }
  for (const c of columns) {
    summary.push(`${c.name}: ${c.inputs.used} of ${c.inputs.total} inputs used, ${c.inputs.spare} spare; supervision coverage ${pct(c.coverage.share)}; ${plural(c.findings.error, "error")}, ${plural(c.findings.warning, "warning")}.`);
    if (c.notRanked) summary.push(`${c.name} is ${c.notRanked}, so it is not marked best on any measure until that is put right.`);
    if (c.shared.length) summary.push(`${c.name} saves ${plural(c.shared.length, "input")} by sharing: ${c.shared.map((s) => s.text).join(" ")}`);
  }
  const inputs = [{ schedule, catalog }, ...candidates.flatMap((c) => (c.frozen ? [c.frozen] : []))];
  const lifeSafety = inputs.some((x) =>
    x.schedule.some((d) => {
      const c = x.catalog.detectors.find((e) => e.id === d.catalogId);
      return !!c && isLifeSafety(c);
    }),
  );
  return { columns, best, summary, lifeSafety };
}
