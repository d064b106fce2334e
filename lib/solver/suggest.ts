import { splitWireless, withReceivers } from "@/lib/solver/suggest-wireless";
import type { Catalog, InputType, Panel } from "@/lib/catalog/schema";
import { analyzeLoop } from "@/lib/loop";
import { indexCatalog, type CatalogIndex } from "@/lib/layout/catalog-index";
import { defaultScheme } from "@/lib/layout/operations";
import { PANEL_KEY, type BoardKind, type LayoutBoard, type LayoutDocument, type LayoutInput, type LayoutPower } from "@/lib/layout/schema";
import type { Schedule } from "@/lib/schedule/schema";
import { assignByFlow } from "@/lib/solver/assign-flow";
import { batteryAh } from "@/lib/solver/battery";
import { createSolverWith } from "@/lib/solver/create-solver";
import { loopSpecFor } from "@/lib/solver/loop-rules";
import { isLifeSafety, type PlacedDetector } from "@/lib/solver/resolve";
import { resolveStandby } from "@/lib/solver/standby-profiles";
import type { SolveResult } from "@/lib/solver/types";
import { plural } from "@/lib/vocabulary/plural";

// The cheapest hardware from the catalog that carries a schedule, with every detector placed.
// Uniform-cost search over each panel and every multiset of boards (cheapest first), so the first candidate
// that solves without errors is the cheapest one there is within the search bounds; not a greedy guess.

export interface SuggestOptions {
  /** Put two detectors on one input where both allow it (`shared-ok`), the input type takes it, and neither is a life-safety device. */
  allowShared: boolean;
  /** Standby profile and safety factor; default: NFPA 72 fire with 1.25 when the schedule has life-safety devices, else intruder grade 2 with 1.2. */
  power?: LayoutPower;
  /** Data bus cable length to check against each panel, metres (default 0). */
  busCableM?: number;
  /** Keypads the system needs (default 1 where the panel's family has a keypad in the catalog, else 0). */
  minKeypads?: number;
  /** NFPA 72 pathway for the inputs of life-safety detectors: "class-a" where the site asks for it (default Class B). */
  pathway?: "class-b" | "class-a";
  /** Stop after this many hardware candidates (default 200,000). */
  maxCandidates?: number;
}

export interface SuggestionPart {
  kind: "panel" | BoardKind;
  catalogId: string;
  name: string;
  count: number;
  unitPrice: number;
}

export type Suggestion =
  | { found: true; layout: LayoutDocument; cost: number; parts: SuggestionPart[]; result: SolveResult; sharedInputs: number; candidatesTried: number }
  | { found: false; reason: string; candidatesTried: number };

interface Item {
  kind: BoardKind;
  id: string;
  name: string;
  price: number;
  inputs: number;
  typeId: string | null;
  takesBus: boolean;
  standbyMa: number;
  alarmMa: number;
  ownSupply: { outputMa: number; maxBatteryAh: number } | null;
  supply: { outputMa: number; maxBatteryAh: number } | null;
}

interface Unit {
  dets: PlacedDetector[];
  area: string;
  room: string;
  /** Index into the class list. */
  cls: number;
}

interface State {
  panel: number;
  counts: number[];
  cost: number;
  boards: number;
  last: number;
  seq: number;
}

/** A binary heap of states, cheapest first; ties go to fewer boards, then to the earlier one. */
class StateHeap {
  private a: State[] = [];
  get size() {
    return this.a.length;
  }
  private less(x: State, y: State) {
    return x.cost !== y.cost ? x.cost < y.cost : x.boards !== y.boards ? x.boards < y.boards : x.seq < y.seq;
  }
  push(s: State) {
    const a = this.a;
    a.push(s);
    let i = a.length - 1;
    while (i > 0) {
      const p = (i - 1) >> 1;
      if (!this.less(a[i], a[p])) break;
      [a[i], a[p]] = [a[p], a[i]];
      i = p;
    }
  }
  pop(): State | undefined {
    const a = this.a;
    const top = a[0];
    const last = a.pop();
    if (a.length && last) {
      a[0] = last;
      let i = 0;
      for (;;) {
        const l = 2 * i + 1;
        const r = l + 1;
        let m = i;
        if (l < a.length && this.less(a[l], a[m])) m = l;
        if (r < a.length && this.less(a[r], a[m])) m = r;
        if (m === i) break;
        [a[i], a[m]] = [a[m], a[i]];
        i = m;
      }
    }
    return top;
  }
}

function itemsFor(ix: CatalogIndex, panel: Panel): Item[] {
  const items: Item[] = [];
  for (const e of ix.catalog.expansionBoards)
    if (e.families.includes(panel.family))
      items.push({ kind: "expansion", id: e.id, name: e.name, price: e.listPrice, inputs: e.inputs.count, typeId: e.inputs.inputType, takesBus: e.takesBusAddress, standbyMa: e.standbyMa, alarmMa: e.alarmMa, ownSupply: e.ownSupply ?? null, supply: null });
  for (const k of ix.catalog.keypads)
    if (k.families.includes(panel.family))
      items.push({ kind: "keypad", id: k.id, name: k.name, price: k.listPrice, inputs: k.inputs?.count ?? 0, typeId: k.inputs?.inputType ?? null, takesBus: k.takesBusAddress, standbyMa: k.standbyMa, alarmMa: k.alarmMa, ownSupply: null, supply: null });
  for (const s of ix.catalog.powerSupplies)
    if (s.families.includes(panel.family))
      items.push({ kind: "supply", id: s.id, name: s.name, price: s.listPrice, inputs: 0, typeId: null, takesBus: s.takesBusAddress, standbyMa: s.standbyMa, alarmMa: s.alarmMa, ownSupply: null, supply: { outputMa: s.outputMa, maxBatteryAh: s.maxBatteryAh } });
  return items;
}

export function suggestHardware(schedule: Schedule, catalog: Catalog, opts: SuggestOptions): Suggestion {
  const { wired, wireless } = splitWireless(schedule, catalog);
  if (wireless.length) return withReceivers(suggestHardware(wired, catalog, opts), schedule, wireless, catalog);
  const ix = indexCatalog(catalog);
  const placed: PlacedDetector[] = [];
  for (const sched of schedule) {
    const cat = ix.detectors.get(sched.catalogId);
    if (!cat) return { found: false, reason: `${sched.label}: its detector type is not in the catalog`, candidatesTried: 0 };
    placed.push({ sched, cat });
  }
  const anyLife = placed.some((d) => isLifeSafety(d.cat));
  const power: LayoutPower = opts.power ?? (anyLife ? { standbyProfileId: "nfpa72-fire", safetyFactor: 1.25 } : { standbyProfileId: "intruder-grade-2", safetyFactor: 1.2 });
  const busCableM = opts.busCableM ?? 0;
  const maxCandidates = opts.maxCandidates ?? 200_000;
  const { standbyH, alarmMin } = resolveStandby(power);
  const solver = createSolverWith(analyzeLoop, schedule, catalog);
  const catalogIdOf = new Map(schedule.map((d) => [d.id, d.catalogId]));
  const N = placed.length;

  // Which input types take each detector alone, and each candidate pair on a shared input: no errors from the loop engine,
  // and life-safety devices only on input types rated for them.
  const types = catalog.inputTypes;
  const classA = opts.pathway === "class-a";
  /** A life-safety detector's input is Class A where the site asks for it; every other input stays Class B. */
  const pathwayOf = (dets: PlacedDetector[]): Pick<LayoutInput, "pathway"> => (classA && dets.some((d) => isLifeSafety(d.cat)) ? { pathway: "class-a" } : {});
  const accepts = (dets: PlacedDetector[], type: InputType): boolean => {
    const life = dets.some((d) => isLifeSafety(d.cat));
    if (life && (!type.lifeSafety || dets.length > 1)) return false;
    const scheme = dets.length === 2 ? "shared" : defaultScheme(type, dets[0].sched.supervision);
    if (!type.schemes.includes(scheme) || (dets.length === 1 && scheme === "shared")) return false;
    const input: LayoutInput = { boardKey: PANEL_KEY, input: 1, detectorIds: dets.map((d) => d.sched.id), scheme, placement: "at-detector", ...pathwayOf(dets) };
    const a = analyzeLoop(loopSpecFor({ input, detectors: dets }, type), type);
    if (input.pathway === "class-a" && a.classA?.everyDeviceReported !== true) return false;
    return !a.findings.some((f) => f.severity === "error");
  };
  const classKeys = new Map<string, number>();
  const classAccepts: boolean[][] = [];
  const classOf = (dets: PlacedDetector[]): number => {
    const row = types.map((t) => accepts(dets, t));
    const key = row.map((b) => (b ? 1 : 0)).join("");
    let c = classKeys.get(key);
    if (c === undefined) {
      c = classAccepts.length;
      classKeys.set(key, c);
      classAccepts.push(row);
    }
    return c;
  };
  const singles: Unit[] = placed.map((d) => ({ dets: [d], area: d.sched.area, room: d.sched.room, cls: classOf([d]) }));
  for (const u of singles)
    if (!classAccepts[u.cls].some(Boolean)) {
      const why = pathwayOf(u.dets).pathway === "class-a" ? "has no input type in the catalog that carries it as a Class A loop (a Class A loop needs normally open contacts and an input that reports every device after a single open)" : "fits no input type in the catalog (its loop has errors on every one)";
      return { found: false, reason: `${u.dets[0].sched.label} ${why}`, candidatesTried: 0 };
    }

  // Pairs: shareable detectors, within an area first (by room, then cable), then leftovers across areas.
  const pairs: Unit[] = [];
  const paired = new Set<number>();
  if (opts.allowShared) {
    const shareable = placed
      .map((d, i) => ({ d, i }))
      .filter(({ d }) => !isLifeSafety(d.cat) && d.sched.supervision === "shared-ok")
      .sort((a, b) => a.d.sched.area.localeCompare(b.d.sched.area) || a.d.sched.room.localeCompare(b.d.sched.room) || a.d.sched.cableM - b.d.sched.cableM || a.i - b.i);
    const tryPair = (xs: typeof shareable, sameArea: boolean) => {
      let pending: (typeof shareable)[number] | null = null;
      for (const x of xs) {
        if (paired.has(x.i)) continue;
        if (pending && (!sameArea || pending.d.sched.area === x.d.sched.area)) {
          const dets = [pending.d, x.d];
          const cls = classOf(dets);
          if (classAccepts[cls].some(Boolean)) {
            pairs.push({ dets, area: pending.d.sched.area, room: pending.d.sched.room, cls });
            paired.add(pending.i);
            paired.add(x.i);
            pending = null;
            continue;
          }
        }
        pending = x;
      }
    };
    tryPair(shareable, true);
    tryPair(shareable, false);
  }
  const pairIndex = new Map<number, number>();
  pairs.forEach((p, k) => p.dets.forEach((d) => pairIndex.set(placed.indexOf(d), k)));

  let tried = 0;
  let bestFailure: string | null = null;
  const heap = new StateHeap();
  let seq = 0;
  const panels = catalog.panels;
  const panelItems = panels.map((p) => itemsFor(ix, p));
  const caps: number[][] = [];
  panels.forEach((p, pi) => {
    const items = panelItems[pi];
    const minKeypads = opts.minKeypads ?? (items.some((i) => i.kind === "keypad") ? 1 : 0);
    const detAlarm = placed.reduce((s, d) => s + (d.cat.power?.alarmMa ?? 0), 0);
    const boardsAlarm = items.reduce((s, it) => s + (it.inputs ? Math.ceil(N / it.inputs) * it.alarmMa : 0), 0) + minKeypads * Math.max(0, ...items.filter((i) => i.kind === "keypad").map((i) => i.alarmMa));
    caps.push(
      items.map((it) => {
        if (it.inputs > 0) return Math.max(Math.ceil(N / it.inputs), it.kind === "keypad" ? minKeypads : 0);
        if (it.kind === "keypad") return minKeypads;
        if (it.supply) {
          const load = detAlarm + boardsAlarm;
          const ah = batteryAh({ restMa: load, alarmMa: load, standbyH, alarmMin, safetyFactor: power.safetyFactor });
          return Math.ceil(load / Math.max(1, it.supply.outputMa)) + Math.ceil(ah / it.supply.maxBatteryAh) + 1;
        }
        return 0;
      }),
    );
    if (N > p.maxZones || busCableM > p.bus.maxCableM) return; // this panel can never carry the schedule
    heap.push({ panel: pi, counts: items.map(() => 0), cost: p.listPrice, boards: 0, last: 0, seq: seq++ });
  });

  while (heap.size) {
    const s = heap.pop()!;
    if (++tried > maxCandidates) return { found: false, reason: `stopped after ${maxCandidates} hardware candidates without finding one that carries the schedule`, candidatesTried: tried - 1 };
    const panel = panels[s.panel];
    const items = panelItems[s.panel];
    const busLimit = Math.min(panel.bus.maxDevices, panel.bus.addressMax - panel.bus.addressMin + 1);
    const busUsed = items.reduce((n, it, j) => n + (it.takesBus ? s.counts[j] : 0), 0);
    for (let j = s.last; j < items.length; j++)
      if (s.counts[j] < caps[s.panel][j] && (!items[j].takesBus || busUsed < busLimit)) {
        const counts = s.counts.slice();
        counts[j]++;
        heap.push({ panel: s.panel, counts, cost: s.cost + items[j].price, boards: s.boards + 1, last: j, seq: seq++ });
      }
    const tryIt = candidate(s, panel, items);
    if (tryIt === null) continue;
    if (tryIt.ok) return { ...tryIt.suggestion, candidatesTried: tried };
    bestFailure ??= tryIt.reason;
  }
  return {
    found: false,
    reason: bestFailure ? `no combination of catalog hardware carries this schedule; the cheapest that came close: ${bestFailure}` : "no combination of catalog hardware has enough inputs, zones or bus capacity for this schedule",
    candidatesTried: tried,
  };

  /** Null when cheap checks rule the candidate out; otherwise the solve's verdict. */
  function candidate(s: State, panel: Panel, items: Item[]): { ok: true; suggestion: Omit<Extract<Suggestion, { found: true }>, "candidatesTried"> } | { ok: false; reason: string } | null {
    const minKeypads = opts.minKeypads ?? (items.some((i) => i.kind === "keypad") ? 1 : 0);
    const keypads = items.reduce((n, it, j) => n + (it.kind === "keypad" ? s.counts[j] : 0), 0);
    if (keypads < minKeypads) return null;
    const slotsByType = new Map<string, number>([[panel.onboardInputs.inputType, panel.onboardInputs.count]]);
    items.forEach((it, j) => {
      if (it.typeId && s.counts[j]) slotsByType.set(it.typeId, (slotsByType.get(it.typeId) ?? 0) + it.inputs * s.counts[j]);
    });
    const totalSlots = [...slotsByType.values()].reduce((a, b) => a + b, 0);
    if (totalSlots < N - pairs.length) return null;
    // Rough power: everything's alarm current against every output together.
    let ratings = panel.auxOutputMa;
    let draw = placed.reduce((n, d) => n + (d.cat.power?.alarmMa ?? 0), 0);
    items.forEach((it, j) => {
      if (!s.counts[j]) return;
      if (it.supply) ratings += it.supply.outputMa * s.counts[j];
      else if (it.ownSupply) ratings += it.ownSupply.outputMa * s.counts[j];
      else draw += it.alarmMa * s.counts[j];
    });
    if (draw > ratings) return null;

    // Fewest shared inputs that fit: at the same price, more inputs of their own means more supervision.
    const slots = types.map((t) => slotsByType.get(t.id) ?? 0);
    let plan: { units: Unit[]; flow: number[][] } | null = null;
    for (let p = Math.max(0, N - totalSlots); p <= pairs.length && !plan; p++) {
      const units: Unit[] = [...pairs.slice(0, p), ...singles.filter((_, i) => !(pairIndex.has(i) && pairIndex.get(i)! < p))];
      const counts = classAccepts.map(() => 0);
      for (const u of units) counts[u.cls]++;
      const flow = assignByFlow(counts, classAccepts, slots);
      if (flow) plan = { units, flow };
    }
    if (!plan) return null;

    // Boards in a fixed order: expansion boards, keypads, supplies, each as listed in the catalog.
    const boards: LayoutBoard[] = [];
    const boardItem = new Map<string, Item>();
    let address = panel.bus.addressMin;
    items.forEach((it, j) => {
      for (let k = 0; k < s.counts[j]; k++) {
        const key = `b${boards.length + 1}`;
        boards.push({ key, kind: it.kind, catalogId: it.id, busAddress: it.takesBus ? address++ : null });
        boardItem.set(key, it);
      }
    });

    // Units to input types per the flow, keeping areas together; then to boards of that type, whole areas where they fit.
    const byType = types.map(() => [] as Unit[]);
    classAccepts.forEach((_, c) => {
      const mine = plan!.units.filter((u) => u.cls === c).sort((a, b) => a.area.localeCompare(b.area) || a.room.localeCompare(b.room));
      let k = 0;
      types.forEach((_, t) => {
        for (let n = 0; n < plan!.flow[c][t]; n++) byType[t].push(mine[k++]);
      });
    });
    const inputs: LayoutInput[] = [];
    types.forEach((type, t) => {
      const hosts = [
        ...(panel.onboardInputs.inputType === type.id ? [{ key: PANEL_KEY, free: panel.onboardInputs.count, next: 1 }] : []),
        ...boards.filter((b) => boardItem.get(b.key)!.typeId === type.id).map((b) => ({ key: b.key, free: boardItem.get(b.key)!.inputs, next: 1 })),
      ];
      const areas = new Map<string, Unit[]>();
      for (const u of byType[t]) areas.set(u.area, [...(areas.get(u.area) ?? []), u]);
      const groups = [...areas.entries()].sort((a, b) => b[1].length - a[1].length || a[0].localeCompare(b[0]));
      for (const [, group] of groups) {
        let rest = group;
        while (rest.length) {
          const fit = hosts.filter((h) => h.free >= rest.length).sort((a, b) => a.free - b.free)[0] ?? hosts.filter((h) => h.free > 0).sort((a, b) => b.free - a.free)[0];
          const take = rest.slice(0, fit.free);
          rest = rest.slice(take.length);
          for (const u of take) {
            const ids = u.dets.map((d) => d.sched.id);
            inputs.push({ boardKey: fit.key, input: fit.next++, detectorIds: ids, scheme: ids.length === 2 ? "shared" : defaultScheme(type, u.dets[0].sched.supervision), placement: "at-detector", ...pathwayOf(u.dets) });
            fit.free--;
          }
        }
      }
    });

    // Power: boards without a supply of their own go to the panel's auxiliary output or a supply board, largest first.
    const loadOf = new Map<string, { rest: number; alarm: number }>();
    for (const i of inputs) {
      const l = loadOf.get(i.boardKey) ?? { rest: 0, alarm: 0 };
      for (const id of i.detectorIds) {
        const p = ix.detectors.get(catalogIdOf.get(id)!)!.power;
        if (p) {
          l.rest += p.standbyMa;
          l.alarm += p.alarmMa;
        }
      }
      loadOf.set(i.boardKey, l);
    }
    const feeds = [
      { key: PANEL_KEY, rating: panel.auxOutputMa, maxAh: panel.maxBatteryAh, ownRest: panel.ownStandbyMa, ownAlarm: panel.ownAlarmMa, rest: loadOf.get(PANEL_KEY)?.rest ?? 0, alarm: loadOf.get(PANEL_KEY)?.alarm ?? 0 },
      ...boards.filter((b) => b.kind === "supply").map((b) => {
        const it = boardItem.get(b.key)!;
        return { key: b.key, rating: it.supply!.outputMa, maxAh: it.supply!.maxBatteryAh, ownRest: it.standbyMa, ownAlarm: it.alarmMa, rest: 0, alarm: 0 };
      }),
    ];
    const fits = (f: (typeof feeds)[number], rest: number, alarm: number) =>
      f.rest + rest <= f.rating &&
      f.alarm + alarm <= f.rating &&
      batteryAh({ restMa: f.ownRest + f.rest + rest, alarmMa: f.ownAlarm + f.alarm + alarm, standbyH, alarmMin, safetyFactor: power.safetyFactor }) <= f.maxAh;
    const fed = boards
      .filter((b) => b.kind !== "supply" && !boardItem.get(b.key)!.ownSupply)
      .map((b) => {
        const it = boardItem.get(b.key)!;
        const l = loadOf.get(b.key) ?? { rest: 0, alarm: 0 };
        return { b, rest: it.standbyMa + l.rest, alarm: it.alarmMa + l.alarm };
      })
      .sort((x, y) => y.alarm - x.alarm || y.rest - x.rest);
    for (const x of fed) {
      const f = feeds.find((f) => fits(f, x.rest, x.alarm)) ?? feeds[0];
      f.rest += x.rest;
      f.alarm += x.alarm;
      if (f.key !== PANEL_KEY) x.b.poweredBy = f.key;
    }

    const layout: LayoutDocument = { panelId: panel.id, boards, inputs, power, busCableM };
    const result = solver.solve(layout);
    if (result.counts.error > 0 || result.totals.unplacedIds.length > 0)
      return { ok: false, reason: `${panel.name} with ${plural(s.boards, "board")}: ${result.findings.find((f) => f.severity === "error")?.message ?? "detectors left unplaced"}` };
    const parts: SuggestionPart[] = [{ kind: "panel", catalogId: panel.id, name: panel.name, count: 1, unitPrice: panel.listPrice }];
    items.forEach((it, j) => {
      if (s.counts[j]) parts.push({ kind: it.kind, catalogId: it.id, name: it.name, count: s.counts[j], unitPrice: it.price });
    });
    return { ok: true, suggestion: { found: true, layout, cost: s.cost, parts, result, sharedInputs: inputs.filter((i) => i.scheme === "shared").length } };
  }
}
