import type { Catalog, Panel } from "@/lib/catalog/schema";
import type { BoardKind } from "@/lib/layout/schema";
import type { UnitTables } from "@/lib/solver/suggest-units";

// The mixed-integer program for one panel, written in the LP text format HiGHS reads.
// Variables: y (a board bought), x (singles of a class on a host), q (pairs of two classes on one shared input),
// w (which supply feeds a board), r/s (that board's rest/alarm current on that supply, linearised with big-M).
// Every rule of the solver that can make a layout invalid and depends on the choice is a row: inputs per host,
// scheme per input type (through the class tables), zones, bus devices, keypads, each supply's rating at rest
// and in alarm, and its standby battery against the largest its charger takes.

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
}

export interface Host {
  /** "panel" for the on-board inputs, else the variable y of one board bought. */
  y: string | null;
  item: CatalogItem | null;
  inputs: number;
  type: number;
}

export interface PanelModel {
  panel: Panel;
  items: CatalogItem[];
  /** Instances per item, in order; instance k of item j is `y_j_k`. */
  caps: number[];
  hosts: Host[];
  /** Feeds: "aux" and each supply instance's y. */
  feeds: string[];
  /** Powered boards without their own supply: a w variable per (board, feed). */
  fedBoards: string[];
  pairs: [number, number][];
  lp: (phase: { minimise: "price" } | { maximise: "supervision"; maxPrice: number }) => string;
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
      items.push({ kind: "expansion", id: e.id, name: e.name, price: e.listPrice, inputs: e.inputs.count, type: typeIx(e.inputs.inputType), takesBus: e.takesBusAddress, restMa: e.standbyMa, alarmMa: e.alarmMa, ownSupply: e.ownSupply ?? null, supply: null });
  for (const k of catalog.keypads)
    if (k.families.includes(panel.family))
      items.push({ kind: "keypad", id: k.id, name: k.name, price: k.listPrice, inputs: k.inputs?.count ?? 0, type: typeIx(k.inputs?.inputType), takesBus: k.takesBusAddress, restMa: k.standbyMa, alarmMa: k.alarmMa, ownSupply: null, supply: null });
  for (const s of catalog.powerSupplies)
    if (s.families.includes(panel.family))
      items.push({ kind: "supply", id: s.id, name: s.name, price: s.listPrice, inputs: 0, type: -1, takesBus: s.takesBusAddress, restMa: s.standbyMa, alarmMa: s.alarmMa, ownSupply: null, supply: { outputMa: s.outputMa, maxBatteryAh: s.maxBatteryAh } });
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

export function buildPanelModel(catalog: Catalog, panel: Panel, units: UnitTables, minKeypads: number, pw: PowerFigures): PanelModel {
  const items = itemsFor(catalog, panel);
  const { classes, pairOk } = units;
  const N = classes.reduce((n, c) => n + c.members.length, 0);
  const busLimit = busLimitOf(panel);
  const maxAlarm = classes.reduce((m, c) => Math.max(m, c.alarmMa, c.restMa), 0);
  const totalAlarm = classes.reduce((n, c) => n + c.members.length * Math.max(c.alarmMa, c.restMa), 0);
  const caps = items.map((it) => {
    const cap = it.inputs > 0 ? Math.max(Math.ceil(N / it.inputs), it.kind === "keypad" ? minKeypads : 0) : it.kind === "keypad" ? minKeypads : it.supply ? Math.ceil((totalAlarm + items.reduce((n, x) => n + x.alarmMa, 0) * 4) / Math.max(1, it.supply.outputMa)) + 2 : 0;
    return it.takesBus ? Math.min(cap, busLimit) : cap;
  });
  const hosts: Host[] = [{ y: null, item: null, inputs: panel.onboardInputs.count, type: catalog.inputTypes.findIndex((t) => t.id === panel.onboardInputs.inputType) }];
  const feeds = ["aux"];
  const fedBoards: string[] = [];
  const all: { y: string; it: CatalogItem }[] = [];
  items.forEach((it, j) => {
    for (let k = 0; k < caps[j]; k++) {
      const y = `y_${j}_${k}`;
      all.push({ y, it });
      if (it.inputs > 0) hosts.push({ y, item: it, inputs: it.inputs, type: it.type });
      if (it.supply) feeds.push(y);
      else if (!it.ownSupply) fedBoards.push(y);
    }
  });
  const pairs: [number, number][] = [];
  classes.forEach((_, a) => classes.forEach((__, b) => b >= a && pairOk[a][b].some(Boolean) && pairs.push([a, b])));
  const xOk = (c: number, h: number) => hosts[h].type >= 0 && classes[c].single[hosts[h].type] !== null;
  const qOk = (p: number, h: number) => hosts[h].type >= 0 && pairOk[pairs[p][0]][pairs[p][1]][hosts[h].type];
  const hostLoad = (h: number, key: "restMa" | "alarmMa"): [number, string][] => {
    const t: [number, string][] = [];
    classes.forEach((c, ci) => xOk(ci, h) && t.push([c[key], `x_${ci}_${h}`]));
    pairs.forEach(([a, b], p) => qOk(p, h) && t.push([classes[a][key] + classes[b][key], `q_${p}_${h}`]));
    return t;
  };
  const hostOf = new Map(hosts.map((h, i) => [h.y, i]));
  const loadOf = (y: string, it: CatalogItem, key: "restMa" | "alarmMa"): [number, string][] => {
    const h = hostOf.get(y);
    return [[it[key], y], ...(h === undefined ? [] : hostLoad(h, key))];
  };
  const bigM = (it: CatalogItem) => Math.max(it.restMa, it.alarmMa) + it.inputs * 2 * maxAlarm + 1;
  const ah = ahPerMa(pw);

  const lp = (phase: Parameters<PanelModel["lp"]>[0]): string => {
    const rows: string[] = [];
    const binaries: string[] = [];
    const generals: string[] = [];
    const bounds: string[] = ["zero = 0"];
    const priceTerms: [number, string][] = all.map(({ y, it }) => [it.price, y]);
    let supTerms: [number, string][] = [];
    // supervision first: one point of it outweighs every spare input there could be
    const big = hosts.reduce((n, h) => n + h.inputs, 0) + 1;
    let r = 0;
    const row = (terms: [number, string][], op: string, rhs: number) => rows.push(` c${r++}: ${expr(terms)} ${op} ${num(rhs)}`);
    binaries.push(...all.map((a) => a.y));
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
      });
      // supervision per detector (its scheme's score, times the detectors on the input), plus one per spare input
      classes.forEach((c, ci) => xOk(ci, h) && supTerms.push([big * c.single[host.type]!.supervision - 1, `x_${ci}_${h}`]));
      pairs.forEach((_, p) => qOk(p, h) && supTerms.push([big * 2 - 1, `q_${p}_${h}`]));
      if (host.y) supTerms.push([host.inputs, host.y]);
      if (host.y) row([...t, [-host.inputs, host.y]], "<=", 0);
      else row(t, "<=", host.inputs);
    });
    // keypads and bus devices
    const keypads = all.filter((a) => a.it.kind === "keypad").map((a): [number, string] => [1, a.y]);
    if (minKeypads > 0) row(keypads, ">=", minKeypads);
    row(all.filter((a) => a.it.takesBus).map((a) => [1, a.y]), "<=", busLimit);
    // identical boards are bought in order
    items.forEach((_, j) => {
      for (let k = 1; k < caps[j]; k++) row([[1, `y_${j}_${k}`], [-1, `y_${j}_${k - 1}`]], "<=", 0);
    });
    // feeding: each powered board on exactly one feed it has bought
    const feedTerms = new Map<string, { rest: [number, string][]; alarm: [number, string][] }>(feeds.map((f) => [f, { rest: [], alarm: [] }]));
    for (const y of fedBoards) {
      const it = all.find((a) => a.y === y)!.it;
      row([...feeds.map((f): [number, string] => [1, `w_${y}_${f}`]), [-1, y]], "=", 0);
      for (const f of feeds) {
        binaries.push(`w_${y}_${f}`);
        if (f !== "aux") row([[1, `w_${y}_${f}`], [-1, f]], "<=", 0);
        const M = bigM(it);
        // r >= load - M (1 - w)
        row([[1, `r_${y}_${f}`], ...loadOf(y, it, "restMa").map(([c, v]): [number, string] => [-c, v]), [-M, `w_${y}_${f}`]], ">=", -M);
        row([[1, `s_${y}_${f}`], ...loadOf(y, it, "alarmMa").map(([c, v]): [number, string] => [-c, v]), [-M, `w_${y}_${f}`]], ">=", -M);
        feedTerms.get(f)!.rest.push([1, `r_${y}_${f}`]);
        feedTerms.get(f)!.alarm.push([1, `s_${y}_${f}`]);
      }
    }
    // the panel's auxiliary output: its on-board inputs' detectors and the boards on it
    const aux = feedTerms.get("aux")!;
    const onRest = [...hostLoad(0, "restMa"), ...aux.rest];
    const onAlarm = [...hostLoad(0, "alarmMa"), ...aux.alarm];
    row(onRest, "<=", panel.auxOutputMa);
    row(onAlarm, "<=", panel.auxOutputMa);
    row([...onRest.map(([c, v]): [number, string] => [c * ah.rest, v]), ...onAlarm.map(([c, v]): [number, string] => [c * ah.alarm, v])], "<=", panel.maxBatteryAh - panel.ownStandbyMa * ah.rest - panel.ownAlarmMa * ah.alarm);
    // supply boards: rating and battery, only when bought
    for (const { y, it } of all) {
      const s = it.supply ?? it.ownSupply;
      if (!s) continue;
      const own = !!it.ownSupply;
      const rest: [number, string][] = own ? (hostOf.has(y) ? hostLoad(hostOf.get(y)!, "restMa") : []) : feedTerms.get(y)!.rest;
      const alarm: [number, string][] = own ? (hostOf.has(y) ? hostLoad(hostOf.get(y)!, "alarmMa") : []) : feedTerms.get(y)!.alarm;
      row([...rest, [-s.outputMa, y]], "<=", 0);
      row([...alarm, [-s.outputMa, y]], "<=", 0);
      row([...rest.map(([c, v]): [number, string] => [c * ah.rest, v]), ...alarm.map(([c, v]): [number, string] => [c * ah.alarm, v]), [it.restMa * ah.rest + it.alarmMa * ah.alarm - s.maxBatteryAh, y]], "<=", 0);
    }
    let objective: string;
    if ("minimise" in phase) objective = `Minimize\n obj: ${expr(priceTerms)}`;
    else {
      row(priceTerms, "<=", phase.maxPrice - panel.listPrice);
      objective = `Maximize\n obj: ${expr(supTerms)}`;
    }
    supTerms = [];
    return [objective, "Subject To", ...rows, "Bounds", ...bounds.map((b) => ` ${b}`), ...(generals.length ? ["Generals", ...generals.map((g) => ` ${g}`)] : []), "Binaries", ...binaries.map((b) => ` ${b}`), "End"].join("\n");
  };
  return { panel, items, caps, hosts, feeds, fedBoards, pairs, lp };
}
