import type { Highs } from "highs";
import type { Catalog } from "@/lib/catalog/schema";
import { indexCatalog } from "@/lib/layout/catalog-index";
import type { LayoutDocument, LayoutPower, OutputDevice } from "@/lib/layout/schema";
import type { Schedule } from "@/lib/schedule/schema";
import { analyzeLoop } from "@/lib/loop";
import { createSolverWith } from "@/lib/solver/create-solver";
import { withCapacityCheck } from "@/lib/solver/inputs-short-rule";
import { isLifeSafety, type PlacedDetector } from "@/lib/solver/resolve";
import { resolveStandby } from "@/lib/solver/standby-profiles";
import { suggestHardware, type SuggestOptions, type Suggestion, type SuggestionPart } from "@/lib/solver/suggest";
import { buildFromSolution } from "@/lib/solver/suggest-build";
import { buildPanelModel, type PanelModel } from "@/lib/solver/suggest-model";
import { areaPlan } from "@/lib/solver/suggest-areas";
import { deviceClasses } from "@/lib/solver/suggest-outputs";
import { noFitReason } from "@/lib/solver/suggest-reasons";
import { unitTables } from "@/lib/solver/suggest-units";

// The cheapest hardware that carries a schedule, proven by a mixed-integer program (HiGHS) rather than searched:
// one model per panel, solved twice: first the lowest list price, then, within the price allowed, the most
// supervision and then the most spare inputs. Every layout is checked by the solver before it is returned.

export type { SuggestChoiceInput as SuggestChoice } from "@/lib/layout/suggest-choice-schema";
import type { SuggestChoiceInput as SuggestChoice } from "@/lib/layout/suggest-choice-schema";

export interface ExactOptions extends SuggestOptions {
  choice?: SuggestChoice;
  /** Seconds per solve before the best layout so far is taken (default 2). */
  timeLimitS?: number;
  /** Sounders and strobes the system drives: each goes on an output rated for its draw, output modules bought where needed. */
  outputDevices?: OutputDevice[];
  /** "from-schedule" (default): one area per area the schedule names, against each panel's maximum; "none": a single area. */
  areas?: "from-schedule" | "none";
  /** Filled with where the time went, for the bench. */
  profile?: ExactProfile;
}

/** Milliseconds per step: the loop tables, writing the models, HiGHS, and building and checking the layout. */
export interface ExactProfile {
  tablesMs: number;
  modelMs: number;
  solveMs: number;
  checkMs: number;
}

export interface ExactProof {
  /** True when every panel's price solve finished optimal. */
  optimal: boolean;
  /** Relative gap left by a time limit (0 when proven). */
  gap: number;
  method: "exact-model" | "search-fallback";
  /** Why the exact model's answer was not used, in plain words. */
  fallbackReason?: string;
  cheapestCost?: number;
}

export type ExactSuggestion = Suggestion & { proof: ExactProof };

interface Solved {
  status: "optimal" | "time-limit" | "infeasible" | "other";
  objective: number;
  gap: number;
  value: (name: string) => number;
  values: Map<string, number>;
}

/**
 * `absGap`: a gap that proves the optimum because every objective value is a multiple of a step just above it (a
 * cent of price, one point of supervision); the solver stops there instead of closing the gap to 1e-9 of the value.
 */
function solveLp(highs: Highs, lp: string, timeLimitS: number, absGap: number, start?: Solved): Solved {
  return highs.withModel<Solved>({ format: "lp", data: lp }, (m) => {
    m.options.set({ output_flag: false, time_limit: timeLimitS, mip_rel_gap: 1e-9, mip_abs_gap: absGap });
    if (start) {
      // the first pass's answer is feasible in the second: a start, so a time limit still leaves a layout
      const colValue = new Float64Array(m.getLp().numCols);
      for (const [name, v] of start.values) {
        try {
          colValue[m.getColByName(name) as number] = v;
        } catch {
          // not in this model
        }
      }
      m.setSolution({ colValue });
    }
    m.run();
    const st = m.getModelStatus();
    const c = highs.constants.modelStatus;
    const status: Solved["status"] = st === c.optimal ? "optimal" : st === c.timeLimit ? "time-limit" : st === c.infeasible ? "infeasible" : "other";
    const sol = m.getSolution();
    const values = new Map<string, number>();
    const value = (name: string) => {
      let v = values.get(name);
      if (v === undefined) {
        try {
          v = sol.colValue[m.getColByName(name) as number] ?? 0;
        } catch {
          v = 0; // a variable the model never needed (e.g. a class no input of that host takes)
        }
        values.set(name, v);
      }
      return v;
    };
    // read every value now: the model is disposed when this returns
    const names = lp.match(/\b[xqynz]_[A-Za-z0-9_]+/g) ?? [];
    for (const n of new Set(names)) value(n);
    const hasSolution = status === "optimal" || (status === "time-limit" && sol.colValue.length > 0 && Number.isFinite(m.getObjectiveValue()));
    return { values, status: hasSolution ? status : status === "time-limit" ? "other" : status, objective: m.getObjectiveValue(), gap: status === "optimal" ? 0 : Number(m.info.get("mip_gap") ?? Infinity), value: (n: string) => values.get(n) ?? 0 };
  });
}

/** Just under a cent when every price is in whole cents, so a gap below it is proof; else the solver's usual 1e-6. */
function priceStep(m: PanelModel): number {
  const cents = m.items.every((it) => Math.abs(it.price * 100 - Math.round(it.price * 100)) < 1e-6);
  return cents ? 0.0099 : 1e-6;
}

export function suggestExact(highs: Highs, schedule: Schedule, catalog: Catalog, opts: ExactOptions): ExactSuggestion {
  const ix = indexCatalog(catalog);
  const devices = opts.outputDevices ?? [];
  const wirelessSched = schedule.filter((d) => ix.wirelessDetectors.has(d.catalogId));
  const fallback = (why: string, cheapestCost?: number): ExactSuggestion => {
    // the older search knows nothing of sounders, wireless detectors or areas: no fallback to it when any is asked for
    if (devices.length || wirelessSched.length || ((opts.areas ?? "from-schedule") === "from-schedule" && areaPlan(schedule, catalog)))
      return { found: false, reason: `No layout could be proven: ${why}`, candidatesTried: 0, proof: { optimal: false, gap: Infinity, method: "exact-model", fallbackReason: why, cheapestCost } };
    const s = suggestHardware(schedule, catalog, opts);
    return { ...s, proof: { optimal: false, gap: Infinity, method: "search-fallback", fallbackReason: why, cheapestCost } };
  };
  const placed: PlacedDetector[] = [];
  for (const sched of schedule) {
    if (ix.wirelessDetectors.has(sched.catalogId)) continue;
    const cat = ix.detectors.get(sched.catalogId);
    if (!cat) return { found: false, reason: `${sched.label}: its detector type is not in the catalog`, candidatesTried: 0, proof: { optimal: true, gap: 0, method: "exact-model" } };
    placed.push({ sched, cat });
  }
  const anyLife = placed.some((d) => isLifeSafety(d.cat));
  const power: LayoutPower = opts.power ?? (anyLife ? { standbyProfileId: "nfpa72-fire", safetyFactor: 1.25 } : { standbyProfileId: "intruder-grade-2", safetyFactor: 1.2 });
  const busCableM = opts.busCableM ?? 0;
  const classA = opts.pathway === "class-a";
  const timeLimitS = opts.timeLimitS ?? 2;
  const prof = opts.profile;
  let t0 = performance.now();
  const lap = (k: keyof ExactProfile) => {
    const t = performance.now();
    if (prof) prof[k] += t - t0;
    t0 = t;
  };
  const units = unitTables(placed, catalog, opts.allowShared, classA);
  const { standbyH, alarmMin } = resolveStandby(power);
  const pw = { standbyH, alarmMin, safetyFactor: power.safetyFactor };
  const plan = (opts.areas ?? "from-schedule") === "from-schedule" ? areaPlan(schedule, catalog) : null;
  const dc = deviceClasses(devices, catalog);
  if (dc.unknown.length) return { found: false, reason: `${dc.unknown[0].label}: its sounder or strobe type is not in the catalog`, candidatesTried: 0, proof: { optimal: true, gap: 0, method: "exact-model" } };
  const extras = { devices: dc.classes, wireless: wirelessSched.length };

  lap("tablesMs");
  // Panels the schedule can never fit are ruled out with their reason; the rest get a model.
  const models: { m: PanelModel; minKeypads: number }[] = [];
  const reasons: string[] = [];
  for (const panel of catalog.panels) {
    const minKeypads = opts.minKeypads ?? (catalog.keypads.some((k) => k.families.includes(panel.family)) ? 1 : 0);
    const why = noFitReason(catalog, panel, units, placed, minKeypads, busCableM, { wireless: extras.wireless, plan });
    if (why) reasons.push(why);
    else models.push({ m: buildPanelModel(catalog, panel, units, minKeypads, pw, extras), minKeypads });
  }
  lap("modelMs");

  const lpOf = (m: PanelModel, phase: Parameters<PanelModel["lp"]>[0]) => {
    lap("solveMs");
    const text = m.lp(phase);
    lap("modelMs");
    return text;
  };
  let optimal = true;
  let gap = 0;
  const priced: { m: PanelModel; cost: number; r: Solved }[] = [];
  const choice = opts.choice ?? { kind: "cheapest" };
  const margin = 1 + (choice.kind === "cheapest" ? 0 : choice.withinPct / 100);
  // cheapest panels first: a panel dearer on its own than the margin above a layout already priced cannot be chosen,
  // so its models are never solved
  models.sort((a, b) => a.m.panel.listPrice - b.m.panel.listPrice);
  let lowest = Infinity;
  for (const { m } of models) {
    if (m.panel.listPrice > lowest * margin + 0.005) continue;
    const r = solveLp(highs, lpOf(m, { minimise: "price" }), timeLimitS, priceStep(m));
    if (r.status === "infeasible") reasons.push(`${m.panel.name}: no set of its family's boards, outputs and supplies carries and powers this schedule within their ratings, its data bus and the battery limits`);
    else if (r.status === "other") return fallback(`the optimiser gave no answer for ${m.panel.name}`);
    else {
      if (r.status !== "optimal" || !m.patternsComplete) {
        optimal = false;
        gap = Math.max(gap, r.gap);
      }
      priced.push({ m, cost: m.panel.listPrice + r.objective, r });
      lowest = Math.min(lowest, m.panel.listPrice + r.objective);
    }
  }
  if (!priced.length) return { found: false, reason: `No hardware in the catalog carries this schedule. ${reasons.join("; ")}`, candidatesTried: 0, proof: { optimal: true, gap: 0, method: "exact-model" } };

  const cheapest = Math.min(...priced.map((p) => p.cost));
  // a cent above the bound absorbs the solver's rounding; prices are whole or in cents
  const bound = cheapest * margin + 0.005;
  let best: { m: PanelModel; score: number; r: Solved } | null = null;
  for (const p of priced.sort((a, b) => a.cost - b.cost)) {
    if (p.cost > bound) continue;
    // every term of the supervision objective has a whole coefficient (suggest-model.ts)
    const r = solveLp(highs, lpOf(p.m, { maximise: "supervision", maxPrice: bound }), timeLimitS, 0.99, p.r);
    if (r.status !== "optimal" && r.status !== "time-limit") continue;
    if (!best || r.objective > best.score + 1e-6) best = { m: p.m, score: r.objective, r };
  }
  if (!best) return fallback("the optimiser found no layout in its second pass", cheapest);

  lap("solveMs");
  const { m, r } = best;
  const { boards, inputs, counts, outputs, wireless } = buildFromSolution(m, units, r.value, classA, { devices: dc.classes, wireless: wirelessSched });
  const layout: LayoutDocument = {
    panelId: m.panel.id,
    boards,
    inputs,
    power,
    busCableM,
    ...(plan ? { areas: plan.areas, zones: plan.zones } : {}),
    ...(devices.length ? { outputDevices: devices, outputs } : {}),
    ...(wireless.length ? { wireless } : {}),
  };
  // as solveLayout does (lib/solver/index.ts re-exports this module, so it is composed here)
  const result = withCapacityCheck(createSolverWith(analyzeLoop, schedule, catalog).solve(layout));
  if (result.counts.error > 0 || result.totals.unplacedIds.length > 0)
    return fallback(`the optimiser's layout did not pass the solver's check (${result.findings.find((f) => f.severity === "error")?.message ?? "detectors left unplaced"})`, cheapest);
  lap("checkMs");
  const parts: SuggestionPart[] = [{ kind: "panel", catalogId: m.panel.id, name: m.panel.name, count: 1, unitPrice: m.panel.listPrice }];
  m.items.forEach((it, j) => counts[j] && parts.push({ kind: it.kind, catalogId: it.id, name: it.name, count: counts[j], unitPrice: it.price }));
  const cost = Math.round(parts.reduce((n, p) => n + p.count * p.unitPrice, 0) * 100) / 100;
  if (!optimal && !devices.length && !wirelessSched.length && !plan) {
    // a time limit stopped the model: the older search may still know a cheaper layout; never return a dearer one
    const old = suggestHardware(schedule, catalog, opts);
    if (old.found && old.cost < cost - 0.001)
      return { ...old, proof: { optimal: false, gap, method: "search-fallback", fallbackReason: `the exact model stopped at its time limit with a dearer layout (${cost}) than the older search found`, cheapestCost: old.cost } };
  }
  return { found: true, layout, cost, parts, result, sharedInputs: inputs.filter((i) => i.scheme === "shared").length, candidatesTried: 0, proof: { optimal, gap, method: "exact-model", cheapestCost: Math.min(cheapest, cost) } };
}
