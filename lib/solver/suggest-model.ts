import type { Catalog, OutputBlock, Panel } from "@/lib/catalog/schema";
import { panelOutputBlocks } from "@/lib/layout/outputs";
import type { BoardKind } from "@/lib/layout/schema";
import { patternsFor, type DeviceClass, type Pattern } from "@/lib/solver/suggest-outputs";
import type { UnitTables } from "@/lib/solver/suggest-units";
import { panelLevelKey, supplyLevelKey } from "@/lib/solver/suggest-voltage";

// The mixed-integer program for one panel, written in the LP text format HiGHS reads.
// Variables: y (a board bought), x (singles of a class on a host), q (pairs of two classes on one shared input),
// w (which supply feeds a board), r/s (that board's rest/alarm current on that supply, linearised with big-M).
// Every rule of the solver that can make a layout invalid and depends on the choice is a row: inputs per host,
// scheme per input type (through the class tables), zones, bus devices, keypads, each supply's rating at rest
// and in alarm, and its standby battery against the largest its charger takes. Sounders and strobes: z counts the
// outputs of one block of a host carrying one pattern of devices (suggest-outputs.ts), their current on the host's
// feed (on the panel's own outputs, its battery only); wireless detectors: enough receivers' places for all of them.

export interface CatalogItem {
  kind: BoardKind;
  id: string;
  name: string;
  price: number;
  inputs: number;
  type: number;
  takesBus: boolean;
  restMa: number;
  alarmMa: number;
  ownSupply: { outputMa: number; maxBatteryAh: number } | null;
  supply: { outputMa: number; maxBatteryAh: number } | null;
  outputs: OutputBlock[];
  /** Wireless detectors a receiver learns; 0 for anything else. */
  learns: number;
}

/**
 * Where detectors go: the panel's own inputs, a pool of identical boards of one kind all fed by one feed (their
 * count is the integer `n`; which board of the pool holds which detector changes no rule), or one board with a
 * supply of its own (a binary `y`, since each has its own rating and battery).
 */
export interface Host {
  kind: "onboard" | "pool" | "own";
  /** The variable counting the boards: null for the panel. */
  count: string | null;
  item: CatalogItem | null;
  itemIndex: number;
  /** For a pool: the feed ("aux" or a supply's y). */
  feed: string | null;
  inputs: number;
  type: number;
  outputs: OutputBlock[];
}

export interface PanelModel {
  panel: Panel;
  items: CatalogItem[];
  /** Most boards of each item worth buying. */
  caps: number[];
  hosts: Host[];
  /** Feeds: "aux" and each supply instance's y (`y_j_k`). */
  feeds: string[];
  pairs: [number, number][];
  /** Per host, per output block: the patterns of sounders and strobes its outputs may carry. */
  outputPatterns: Pattern[][][];
  /** False when a pattern list was cut short (then the answer is not proven optimal). */
  patternsComplete: boolean;
  lp: (phase: { minimise: "price" } | { maximise: "supervision"; maxPrice: number }) => string;
}

/** What the model places besides wired detectors. */
export interface ModelExtras {
  devices: DeviceClass[];
  /** Wireless detectors in the schedule. */
  wireless: number;
}

export interface PowerFigures {
  standbyH: number;
  alarmMin: number;
  safetyFactor: number;
}

export function itemsFor(catalog: Catalog, panel: Panel): CatalogItem[] {
  const typeIx = (id: string | undefined) => (id ? catalog.inputTypes.findIndex((t) => t.id === id) : -1);
  const items: CatalogItem[] = [];
  for (const e of catalog.expansionBoards)
    if (e.families.includes(panel.family))
      items.push({ kind: "expansion", id: e.id, name: e.name, price: e.listPrice, inputs: e.inputs.count, type: typeIx(e.inputs.inputType), takesBus: e.takesBusAddress, restMa: e.standbyMa, alarmMa: e.alarmMa, ownSupply: e.ownSupply ?? null, supply: null, outputs: e.outputs ?? [], learns: 0 });
  for (const k of catalog.keypads)
    if (k.families.includes(panel.family))
      items.push({ kind: "keypad", id: k.id, name: k.name, price: k.listPrice, inputs: k.inputs?.count ?? 0, type: typeIx(k.inputs?.inputType), takesBus: k.takesBusAddress, restMa: k.standbyMa, alarmMa: k.alarmMa, ownSupply: null, supply: null, outputs: [], learns: 0 });
  for (const s of catalog.powerSupplies)
    if (s.families.includes(panel.family))
      items.push({ kind: "supply", id: s.id, name: s.name, price: s.listPrice, inputs: 0, type: -1, takesBus: s.takesBusAddress, restMa: s.standbyMa, alarmMa: s.alarmMa, ownSupply: null, supply: { outputMa: s.outputMa, maxBatteryAh: s.maxBatteryAh }, outputs: [], learns: 0 });
  for (const o of catalog.outputModules)
    if (o.families.includes(panel.family))
      items.push({ kind: "outputs", id: o.id, name: o.name, price: o.listPrice, inputs: 0, type: -1, takesBus: o.takesBusAddress, restMa: o.standbyMa, alarmMa: o.alarmMa, ownSupply: null, supply: null, outputs: o.outputs, learns: 0 });
  for (const w of catalog.wirelessReceivers)
    if (w.families.includes(panel.family))
      items.push({ kind: "receiver", id: w.id, name: w.name, price: w.listPrice, inputs: 0, type: -1, takesBus: w.takesBusAddress, restMa: w.standbyMa, alarmMa: w.alarmMa, ownSupply: null, supply: null, outputs: [], learns: w.maxDevices });
  return items;
}

export const busLimitOf = (p: Panel) => Math.min(p.bus.maxDevices, p.bus.addressMax - p.bus.addressMin + 1);

/** Ah per mA at rest and per mA in alarm: battery = (rest × h + alarm × min / 60) / 1000 × safety factor. */
const ahPerMa = (pw: PowerFigures) => ({ rest: (pw.standbyH / 1000) * pw.safetyFactor, alarm: (pw.alarmMin / 60 / 1000) * pw.safetyFactor });

const num = (v: number) => (Number.isInteger(v) ? String(v) : v.toPrecision(12).replace(/\.?0+$/, ""));
/** A linear expression from terms, "+ 3 x - 2 y"; an empty one is "0 zero". */
function expr(terms: [number, string][]): string {
  const t = terms.filter(([c]) => c !== 0);
  if (!t.length) return "0 zero";
  // one term a line: the LP reader limits line length
  return t.map(([c, v], i) => `${c < 0 ? "-" : i ? "+" : ""} ${num(Math.abs(c))} ${v}`).join("\n   ");
}

export function buildPanelModel(catalog: Catalog, panel: Panel, units: UnitTables, minKeypads: number, pw: PowerFigures, extras: ModelExtras = { devices: [], wireless: 0 }): PanelModel {
  const items = itemsFor(catalog, panel);
  const { classes, pairOk } = units;
  const N = classes.reduce((n, c) => n + c.members.length, 0);
  const busLimit = busLimitOf(panel);
  const totalAlarm = classes.reduce((n, c) => n + c.members.length * Math.max(c.alarmMa, c.restMa), 0);
  const D = extras.devices.reduce((n, c) => n + c.members.length, 0);
  const deviceAlarm = extras.devices.reduce((n, c) => n + c.members.length * Math.max(c.alarmMa, c.restMa), 0);
  // never more boards of a kind than there are things to put on them: each device needs at most one output board,
  // and receivers carry no current of their detectors, so the fewest that learn them all are enough
  const caps = items.map((it) => {
    let cap = it.inputs > 0 ? Math.max(Math.ceil(N / it.inputs), it.kind === "keypad" ? minKeypads : 0) : it.kind === "keypad" ? minKeypads : it.supply ? Math.ceil((totalAlarm + deviceAlarm + items.reduce((n, x) => n + x.alarmMa, 0) * 4) / Math.max(1, it.supply.outputMa)) + 2 : 0;
    if (it.outputs.length && D > 0) cap = Math.max(cap, D);
    if (it.learns > 0) cap = Math.ceil(extras.wireless / it.learns);
    return it.takesBus ? Math.min(cap, busLimit) : cap;
  });
  const hosts: Host[] = [{ kind: "onboard", count: null, item: null, itemIndex: -1, feed: null, inputs: panel.onboardInputs.count, type: catalog.inputTypes.findIndex((t) => t.id === panel.onboardInputs.inputType), outputs: panelOutputBlocks(panel) }];
  const feeds = ["aux"];
  const supplies: { y: string; it: CatalogItem; j: number; k: number }[] = [];
  items.forEach((it, j) => {
    if (it.supply) for (let k = 0; k < caps[j]; k++) supplies.push({ y: `y_${j}_${k}`, it, j, k });
  });
  feeds.push(...supplies.map((s) => s.y));
  items.forEach((it, j) => {
    if (it.supply || caps[j] === 0) return;
    if (it.ownSupply) for (let k = 0; k < caps[j]; k++) hosts.push({ kind: "own", count: `y_${j}_${k}`, item: it, itemIndex: j, feed: null, inputs: it.inputs, type: it.type, outputs: it.outputs });
    else feeds.forEach((f, fi) => hosts.push({ kind: "pool", count: `n_${j}_${fi}`, item: it, itemIndex: j, feed: f, inputs: it.inputs, type: it.type, outputs: it.outputs }));
  });
  const pairs: [number, number][] = [];
  classes.forEach((_, a) => classes.forEach((__, b) => b >= a && pairOk[a][b].some(Boolean) && pairs.push([a, b])));
  // the supply level a host's detectors draw from: the panel's, unless its pool hangs on a supply board
  const levelOf = (h: Host) => (h.kind === "pool" && h.feed !== "aux" ? supplyLevelKey(items[Number(h.feed!.split("_")[1])].id, panel.id) : panelLevelKey(panel.id));
  const powered = (c: number, h: number) => classes[c].voltOk.get(levelOf(hosts[h])) !== false;
  const xOk = (c: number, h: number) => hosts[h].type >= 0 && classes[c].single[hosts[h].type] !== null && powered(c, h);
  const qOk = (p: number, h: number) => hosts[h].type >= 0 && pairOk[pairs[p][0]][pairs[p][1]][hosts[h].type] && powered(pairs[p][0], h) && powered(pairs[p][1], h);
  // sounders and strobes: the patterns each output block of each host may carry at that host's supply level
  let patternsComplete = true;
  const outputPatterns: Pattern[][][] = hosts.map((h) =>
    h.outputs.map((b) => {
      if (!extras.devices.length) return [];
      const { patterns, complete } = patternsFor(extras.devices, b.ratingMa, (c) => extras.devices[c].voltOk.get(levelOf(h)) !== false);
      patternsComplete &&= complete;
      return patterns;
    }),
  );
  const zVar = (h: number, b: number, p: number) => `z_${h}_${b}_${p}`;
  const outLoad = (h: number, key: "restMa" | "alarmMa"): [number, string][] => outputPatterns[h].flatMap((ps, b) => ps.map((p, pi): [number, string] => [p[key], zVar(h, b, pi)]));
  const hostLoad = (h: number, key: "restMa" | "alarmMa"): [number, string][] => {
    const t: [number, string][] = h > 0 ? outLoad(h, key) : [];
    classes.forEach((c, ci) => xOk(ci, h) && t.push([c[key], `x_${ci}_${h}`]));
    pairs.forEach(([a, b], p) => qOk(p, h) && t.push([classes[a][key] + classes[b][key], `q_${p}_${h}`]));
    return t;
  };
  const ah = ahPerMa(pw);

  const lp = (phase: Parameters<PanelModel["lp"]>[0]): string => {
    const rows: string[] = [];
    const binaries: string[] = [];
    const generals: string[] = [];
    const bounds: string[] = ["zero = 0"];
    const counted = hosts.filter((h) => h.count !== null);
    const priceTerms: [number, string][] = [...counted.map((h): [number, string] => [h.item!.price, h.count!]), ...supplies.map((x): [number, string] => [x.it.price, x.y])];
    let supTerms: [number, string][] = [];
    // supervision first: one point of it outweighs every spare input there could be
    const big = hosts.reduce((n, h) => n + h.inputs * (h.count === null ? 1 : h.item!.ownSupply ? 1 : caps[h.itemIndex]), 0) + 1;
    let r = 0;
    const row = (terms: [number, string][], op: string, rhs: number) => rows.push(` c${r++}: ${expr(terms)} ${op} ${num(rhs)}`);
    binaries.push(...supplies.map((x) => x.y), ...hosts.filter((h) => h.kind === "own").map((h) => h.count!));
    for (const h of hosts) if (h.kind === "pool") {
      generals.push(h.count!);
      bounds.push(`${h.count} <= ${caps[h.itemIndex]}`);
    }
    // every detector of a class placed, singly or in a pair
    classes.forEach((c, ci) => {
      const t: [number, string][] = [];
      hosts.forEach((_, h) => xOk(ci, h) && t.push([1, `x_${ci}_${h}`]));
      pairs.forEach(([a, b], p) => (a === ci || b === ci) && hosts.forEach((_, h) => qOk(p, h) && t.push([a === b ? 2 : 1, `q_${p}_${h}`])));
      row(t, "=", c.members.length);
    });
    // inputs per host; supervision and spare inputs for the second phase
    hosts.forEach((host, h) => {
      const t: [number, string][] = [];
      classes.forEach((c, ci) => {
        if (!xOk(ci, h)) return;
        t.push([1, `x_${ci}_${h}`]);
        generals.push(`x_${ci}_${h}`);
        bounds.push(`x_${ci}_${h} <= ${c.members.length}`);
      });
      pairs.forEach((_, p) => {
        if (!qOk(p, h)) return;
        t.push([1, `q_${p}_${h}`]);
        generals.push(`q_${p}_${h}`);
        // never more pairs than either class has members (half of them when both are of one class)
        const [a, b] = pairs[p];
        bounds.push(`q_${p}_${h} <= ${a === b ? Math.floor(classes[a].members.length / 2) : Math.min(classes[a].members.length, classes[b].members.length)}`);
      });
      // supervision per detector (its scheme's score, times the detectors on the input), plus one per spare input
      classes.forEach((c, ci) => xOk(ci, h) && supTerms.push([big * c.single[host.type]!.supervision - 1, `x_${ci}_${h}`]));
      pairs.forEach((_, p) => qOk(p, h) && supTerms.push([big * 2 - 1, `q_${p}_${h}`]));
      if (host.count) supTerms.push([host.inputs, host.count]);
      if (host.count) row([...t, [-host.inputs, host.count]], "<=", 0);
      else row(t, "<=", host.inputs);
    });
    // sounders and strobes: outputs used per block within the outputs bought, every device on one output
    outputPatterns.forEach((blocks, h) =>
      blocks.forEach((ps, b) => {
        if (!ps.length) return;
        const t = ps.map((_, p): [number, string] => [1, zVar(h, b, p)]);
        ps.forEach((_, p) => generals.push(zVar(h, b, p)));
        const per = hosts[h].outputs[b].count;
        if (hosts[h].count) row([...t, [-per, hosts[h].count!]], "<=", 0);
        else row(t, "<=", per);
      }),
    );
    extras.devices.forEach((c, ci) => {
      const t: [number, string][] = [];
      outputPatterns.forEach((blocks, h) => blocks.forEach((ps, b) => ps.forEach((p, pi) => p.counts[ci] && t.push([p.counts[ci], zVar(h, b, pi)]))));
      row(t, "=", c.members.length);
    });
    // wireless detectors: places enough on the receivers bought
    if (extras.wireless > 0) row(hosts.filter((h) => h.item?.learns).map((h): [number, string] => [h.item!.learns, h.count!]), ">=", extras.wireless);
    // keypads and bus devices
    const keypads = counted.filter((h) => h.item!.kind === "keypad").map((h): [number, string] => [1, h.count!]);
    if (minKeypads > 0) row(keypads, ">=", minKeypads);
    row([...counted.filter((h) => h.item!.takesBus).map((h): [number, string] => [1, h.count!]), ...supplies.filter((x) => x.it.takesBus).map((x): [number, string] => [1, x.y])], "<=", busLimit);
    items.forEach((it, j) => {
      // identical supplies and boards with their own supply are bought in order
      for (let k = 1; k < caps[j]; k++) if (it.supply || it.ownSupply) row([[1, `y_${j}_${k}`], [-1, `y_${j}_${k - 1}`]], "<=", 0);
      // no more boards of one kind than are worth buying, over all feeds
      const pools = hosts.filter((h) => h.kind === "pool" && h.itemIndex === j);
      if (pools.length > 1) row(pools.map((h) => [1, h.count!]), "<=", caps[j]);
    });
    // a pool on a supply only when the supply is bought
    for (const h of hosts) if (h.kind === "pool" && h.feed !== "aux") row([[1, h.count!], [-caps[h.itemIndex], h.feed!]], "<=", 0);
    // each feed's load: the boards on it and their detectors
    const load = (f: string, key: "restMa" | "alarmMa"): [number, string][] => [
      ...(f === "aux" ? hostLoad(0, key) : []),
      ...hosts.flatMap((h, hi) => (h.kind === "pool" && h.feed === f ? [[h.item![key], h.count!] as [number, string], ...hostLoad(hi, key)] : [])),
    ];
    const battery = (rest: [number, string][], alarm: [number, string][]): [number, string][] => [...rest.map(([c, v]): [number, string] => [c * ah.rest, v]), ...alarm.map(([c, v]): [number, string] => [c * ah.alarm, v])];
    const onRest = load("aux", "restMa");
    const onAlarm = load("aux", "alarmMa");
    row(onRest, "<=", panel.auxOutputMa);
    row(onAlarm, "<=", panel.auxOutputMa);
    // the panel's own outputs draw on its battery beside the auxiliary output, not against the output's rating
    row(battery([...onRest, ...outLoad(0, "restMa")], [...onAlarm, ...outLoad(0, "alarmMa")]), "<=", panel.maxBatteryAh - panel.ownStandbyMa * ah.rest - panel.ownAlarmMa * ah.alarm);
    // supply boards and boards with their own supply: rating and battery, only when bought
    const own = hosts.map((h, hi) => ({ h, hi })).filter(({ h }) => h.kind === "own");
    for (const { y, it, rest, alarm } of [
      ...supplies.map((x) => ({ y: x.y, it: x.it, rest: load(x.y, "restMa"), alarm: load(x.y, "alarmMa") })),
      ...own.map(({ h, hi }) => ({ y: h.count!, it: h.item!, rest: hostLoad(hi, "restMa"), alarm: hostLoad(hi, "alarmMa") })),
    ]) {
      const s = (it.supply ?? it.ownSupply)!;
      // identical supplies: the earlier one carries at least the later one's rest load (breaks their symmetry)
      const k = Number(y.split("_")[2]);
      if (k > 0) {
        const prev = `y_${y.split("_")[1]}_${k - 1}`;
        const prevRest = it.supply ? load(prev, "restMa") : hostLoad(hosts.findIndex((h) => h.count === prev), "restMa");
        row([...prevRest, ...rest.map(([c, v]): [number, string] => [-c, v])], ">=", 0);
      }
      row([...rest, [-s.outputMa, y]], "<=", 0);
      row([...alarm, [-s.outputMa, y]], "<=", 0);
      row([...battery(rest, alarm), [it.restMa * ah.rest + it.alarmMa * ah.alarm - s.maxBatteryAh, y]], "<=", 0);
    }
    let objective: string;
    if ("minimise" in phase) objective = `Minimize\n obj: ${expr(priceTerms)}`;
    else {
      row(priceTerms, "<=", phase.maxPrice - panel.listPrice);
      objective = `Maximize\n obj: ${expr(supTerms)}`;
    }
    supTerms = [];
    return [objective, "Subject To", ...rows, "Bounds", ...bounds.map((b) => ` ${b}`), ...(generals.length ? ["Generals", ...generals.map((g) => ` ${g}`)] : []), ...(binaries.length ? ["Binaries", ...binaries.map((b) => ` ${b}`)] : []), "End"].join("\n");
  };
  return { panel, items, caps, hosts, feeds, pairs, outputPatterns, patternsComplete, lp };
}
