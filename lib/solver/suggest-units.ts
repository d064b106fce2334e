import type { Catalog, InputType, WiringScheme } from "@/lib/catalog/schema";
import { analyzeLoop } from "@/lib/loop";
import { PANEL_KEY, type LayoutInput } from "@/lib/layout/schema";
import type { SupervisionPreference } from "@/lib/schedule/schema";
import { loopSpecFor } from "@/lib/solver/loop-rules";
import { isLifeSafety, type PlacedDetector } from "@/lib/solver/resolve";
import { supplyLevels, voltageOk } from "@/lib/solver/suggest-voltage";

// What the loop engine allows, computed once per schedule for the exact model: for every detector and input type
// the wiring schemes that read without an error, and for every two shareable detectors whether a shared input of
// that type tells them apart. Detectors that behave alike everywhere form one class, so the model counts classes.

/** Supervision of one detector's loop: double end-of-line tells a cut, a short and an alarm apart; none tells nothing. */
export const SCHEME_SUPERVISION: Record<WiringScheme, number> = { "double-eol": 3, "single-eol": 2, shared: 1, none: 0 };

/** Per input type: the scheme a detector is wired with there and its supervision, or null when no scheme is error-free. */
export type SingleRow = ({ scheme: WiringScheme; supervision: number } | null)[];

export interface DetectorClass {
  members: PlacedDetector[];
  single: SingleRow;
  restMa: number;
  alarmMa: number;
  shareable: boolean;
  /** Per supply level key (suggest-voltage.ts): whether every member keeps its working voltage on that feed. */
  voltOk: Map<string, boolean>;
}

export interface UnitTables {
  classes: DetectorClass[];
  /** pairOk[a][b][t]: a detector of class a and one of class b share an input of type t. Symmetric. */
  pairOk: boolean[][][];
  /** Whether the pair must be wired with the second detector first on that type (A and B resistors swapped). */
  swapped: (a: PlacedDetector, b: PlacedDetector, t: number) => boolean;
  /** Detectors with no error-free scheme on any input type of the catalog. */
  homeless: PlacedDetector[];
}

const ORDER: WiringScheme[] = ["double-eol", "single-eol", "none"];

/** The scheme asked for when it reads without an error, else the most supervised one that does. */
function pickScheme(ok: WiringScheme[], asked: SupervisionPreference): WiringScheme | null {
  if (asked !== "shared-ok" && ok.includes(asked)) return asked;
  return ORDER.find((s) => ok.includes(s)) ?? null;
}

export function unitTables(placed: PlacedDetector[], catalog: Catalog, allowShared: boolean, classA: boolean): UnitTables {
  const types = catalog.inputTypes;
  const pathwayOf = (dets: PlacedDetector[]): Pick<LayoutInput, "pathway"> => (classA && dets.some((d) => isLifeSafety(d.cat)) ? { pathway: "class-a" } : {});
  const clean = (dets: PlacedDetector[], type: InputType, scheme: WiringScheme): boolean => {
    if (dets.some((d) => isLifeSafety(d.cat)) && (!type.lifeSafety || dets.length > 1)) return false;
    if (!type.schemes.includes(scheme)) return false;
    const input: LayoutInput = { boardKey: PANEL_KEY, input: 1, detectorIds: dets.map((d) => d.sched.id), scheme, placement: "at-detector", ...pathwayOf(dets) };
    const a = analyzeLoop(loopSpecFor({ input, detectors: dets }, type), type);
    if (input.pathway === "class-a" && a.classA?.everyDeviceReported !== true) return false;
    return !a.findings.some((f) => f.severity === "error");
  };
  // The loop depends on each detector's contact, tamper loop and life-safety rating and on the longest cable
  // (lib/solver/loop-rules.ts), never on names or rooms. A longer cable only adds series resistance, which moves
  // every reading up; so, for one kind of loop, the lengths that read without an error are those up to a limit, and
  // a binary search over the schedule's lengths finds it in a few analyses instead of one per detector
  // (assumed, not proven; every suggested layout is checked by the full solver before it is returned).
  const sig = (d: PlacedDetector) => `${d.cat.contact}|${d.cat.tamper}|${isLifeSafety(d.cat)}`;
  const gaugeOf = (d: PlacedDetector) => JSON.stringify(d.sched.gauge);
  const lengthsByGauge = new Map<string, number[]>();
  for (const d of placed) lengthsByGauge.set(gaugeOf(d), [...(lengthsByGauge.get(gaugeOf(d)) ?? []), d.sched.cableM]);
  for (const [g, ls] of lengthsByGauge) lengthsByGauge.set(g, [...new Set(ls)].sort((a, b) => a - b));
  const limits = new Map<string, number>();
  /** Whether `dets` (the last one carrying the longest cable) read without an error on `type` with `scheme`. */
  const cleanUpTo = (dets: PlacedDetector[], type: InputType, scheme: WiringScheme): boolean => {
    const longest = dets.reduce((a, b) => (b.sched.cableM > a.sched.cableM ? b : a));
    const g = gaugeOf(longest);
    const key = `${dets.map(sig).join("+")}|${type.id}|${scheme}|${g}`;
    let limit = limits.get(key);
    if (limit === undefined) {
      const ls = lengthsByGauge.get(g)!;
      const at = (len: number) => clean(dets.map((d) => ({ ...d, sched: { ...d.sched, cableM: d === longest ? len : 0, gauge: longest.sched.gauge } })), type, scheme);
      let lo = -1;
      let hi = ls.length;
      while (hi - lo > 1) {
        const mid = (lo + hi) >> 1;
        if (at(ls[mid])) lo = mid;
        else hi = mid;
      }
      limit = lo < 0 ? -Infinity : ls[lo];
      limits.set(key, limit);
    }
    return longest.sched.cableM <= limit;
  };
  const singleMemo = new Map<string, SingleRow>();
  const singleRow = (d: PlacedDetector): SingleRow => {
    const k = `${sig(d)}|${d.sched.cableM}|${gaugeOf(d)}|${d.sched.supervision}`;
    let row = singleMemo.get(k);
    if (!row) {
      row = types.map((t) => {
        const s = pickScheme(ORDER.filter((sc) => cleanUpTo([d], t, sc)), d.sched.supervision);
        return s ? { scheme: s, supervision: SCHEME_SUPERVISION[s] } : null;
      });
      singleMemo.set(k, row);
    }
    return row;
  };
  const loopKey = (d: PlacedDetector) => `${sig(d)}|${d.sched.cableM}|${gaugeOf(d)}`;
  const shareable = (d: PlacedDetector) => allowShared && !isLifeSafety(d.cat) && d.sched.supervision === "shared-ok";
  const sharedTypes = types.map((t, i) => (t.schemes.includes("shared") && !t.lifeSafety ? i : -1)).filter((i) => i >= 0);
  // 0: no, 1: in this order, 2: swapped
  const pairMemo = new Map<string, number[]>();
  const pairRow = (a: PlacedDetector, b: PlacedDetector): number[] => {
    const k = `${loopKey(a)}#${loopKey(b)}`;
    let row = pairMemo.get(k);
    if (!row) {
      row = types.map((t, i) => (!sharedTypes.includes(i) ? 0 : cleanUpTo([a, b], t, "shared") ? 1 : cleanUpTo([b, a], t, "shared") ? 2 : 0));
      pairMemo.set(k, row);
    }
    return row;
  };

  const homeless = placed.filter((d) => !singleRow(d).some(Boolean));
  const keys = [...new Map(placed.filter(shareable).map((d) => [loopKey(d), d])).values()];
  const levels = [...supplyLevels(catalog)];
  const classByKey = new Map<string, DetectorClass>();
  for (const d of placed) {
    const p = d.cat.power;
    const share = shareable(d);
    const compat = share ? keys.map((o) => pairRow(d, o).map((v) => (v ? 1 : 0)).join("")).join(",") : "-";
    const volt = levels.map(([, l]) => (voltageOk(d, l) ? 1 : 0)).join("");
    const key = `${JSON.stringify(singleRow(d))}|${p?.standbyMa ?? 0}|${p?.alarmMa ?? 0}|${compat}|${volt}`;
    let c = classByKey.get(key);
    if (!c) classByKey.set(key, (c = { members: [], single: singleRow(d), restMa: p?.standbyMa ?? 0, alarmMa: p?.alarmMa ?? 0, shareable: share, voltOk: new Map(levels.map(([k, l]) => [k, voltageOk(d, l)])) }));
    c.members.push(d);
  }
  const classes = [...classByKey.values()];
  const pairOk = classes.map((a) => classes.map((b) => types.map((_, t) => a.shareable && b.shareable && pairRow(a.members[0], b.members[0])[t] > 0)));
  return { classes, pairOk, swapped: (a, b, t) => pairRow(a, b)[t] === 2, homeless };
}
