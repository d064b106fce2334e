import type { Catalog, Sounder, Strobe } from "@/lib/catalog/schema";
import type { OutputDevice } from "@/lib/layout/schema";
import { conductorOhms } from "@/lib/loop";
import { deviceDraw, DROP_TEMP_C } from "@/lib/solver/output-rules";
import { supplyLevels, type SupplyLevel } from "@/lib/solver/suggest-voltage";

// Sounders and strobes for the exact model: devices that draw alike and keep their voltage on the same feeds form one
// class; an output takes any multiset of devices whose summed draw, at rest and in alarm, is within its rating.
// Those multisets ("patterns") are listed per rating, so the model counts outputs per pattern, not devices per output.

export interface DeviceClass {
  members: OutputDevice[];
  restMa: number;
  alarmMa: number;
  /** Per supply level key (suggest-voltage.ts): whether every member keeps its working voltage in alarm on that feed. */
  voltOk: Map<string, boolean>;
}

export interface Pattern {
  /** Devices of each class on one output. */
  counts: number[];
  restMa: number;
  alarmMa: number;
}

/** At most this many devices on one output (the layout document's limit). */
export const DEVICES_PER_OUTPUT = 16;
/** Patterns listed per rating before the list is cut (the answer is then not proven optimal). */
export const PATTERN_LIMIT = 4000;

/** As the solver's output rule: the feed's voltage, on mains and at the end of discharge, less the drop on the device's cable. */
export function deviceVoltageOk(d: OutputDevice, cat: Sounder | Strobe, level: SupplyLevel): boolean {
  const dropV = (cat.alarmMa / 1000) * 2 * conductorOhms(d.gauge, d.cableM, DROP_TEMP_C);
  return level.volts - dropV >= cat.minVolts && level.endVolts - dropV >= cat.minVolts;
}

export function deviceClasses(devices: OutputDevice[], catalog: Catalog): { classes: DeviceClass[]; unknown: OutputDevice[] } {
  const levels = [...supplyLevels(catalog)];
  const byKey = new Map<string, DeviceClass>();
  const unknown: OutputDevice[] = [];
  for (const d of devices) {
    const cat = d.kind === "sounder" ? catalog.sounders.find((s) => s.id === d.catalogId) : catalog.strobes.find((s) => s.id === d.catalogId);
    if (!cat) {
      unknown.push(d);
      continue;
    }
    const { restMa, alarmMa } = deviceDraw(cat);
    const volt = levels.map(([k, l]): [string, boolean] => [k, deviceVoltageOk(d, cat, l)]);
    const key = `${restMa}|${alarmMa}|${volt.map(([, ok]) => (ok ? 1 : 0)).join("")}`;
    let c = byKey.get(key);
    if (!c) byKey.set(key, (c = { members: [], restMa, alarmMa, voltOk: new Map(volt) }));
    c.members.push(d);
  }
  return { classes: [...byKey.values()], unknown };
}

/** Every non-empty multiset of the allowed classes that one output of `ratingMa` carries; `complete` is false when cut short. */
export function patternsFor(classes: DeviceClass[], ratingMa: number, allowed: (c: number) => boolean): { patterns: Pattern[]; complete: boolean } {
  const patterns: Pattern[] = [];
  const counts = classes.map(() => 0);
  let complete = true;
  const walk = (c: number, n: number, rest: number, alarm: number) => {
    if (patterns.length >= PATTERN_LIMIT) return void (complete = false);
    if (c === classes.length) {
      if (n > 0) patterns.push({ counts: [...counts], restMa: rest, alarmMa: alarm });
      return;
    }
    walk(c + 1, n, rest, alarm);
    if (!allowed(c)) return;
    const k = classes[c];
    for (let m = 1; m <= k.members.length && n + m <= DEVICES_PER_OUTPUT; m++) {
      if (rest + m * k.restMa > ratingMa || alarm + m * k.alarmMa > ratingMa) break;
      counts[c] = m;
      walk(c + 1, n + m, rest + m * k.restMa, alarm + m * k.alarmMa);
    }
    counts[c] = 0;
  };
  walk(0, 0, 0, 0);
  return { patterns, complete };
}
