// What the schematic draws, and where: each resistor where it physically sits, each contact open or closed
// for the detector states. Pure; mirrors the circuits of lib/loop/README.md (T = tamper, G = alarm contacts).
import type { DetectorState, LoopSpec } from "@/lib/loop";
import { carriesTamperPair, coresOf, fittedValues } from "@/lib/loop";
import type { InputType } from "@/lib/catalog/schema";

export interface ContactEl {
  kind: "contact";
  key: string;
  role: "alarm" | "tamper";
  detector: number;
  /** e.g. "D1 alarm". */
  label: string;
  type: "NC" | "NO";
  closed: boolean;
  /** Open because its detector is active or its tamper is open (drawn in colour). */
  operated: boolean;
}

export interface ResistorEl {
  kind: "resistor";
  key: string;
  role: "eol" | "alarm" | "shared-a" | "shared-b";
  ohms: number;
  /** Short name on the drawing: "EOL", "alarm", "A", "B". */
  label: string;
}

export interface ParallelEl {
  kind: "parallel";
  key: string;
  /** Each branch is a series of elements; the first is drawn on the line, the others below it. */
  branches: (ContactEl | ResistorEl)[][];
}

export type SeriesEl = ContactEl | ResistorEl | ParallelEl;

/** What closes the loop between the two rails at the far end. */
export type Rung = { kind: "items"; items: (ContactEl | ResistorEl)[] } | { kind: "wire" } | { kind: "loop-back"; resistor: ResistorEl };

export interface SchematicModel {
  /** At the input terminals: a resistor in series with the IN line, and/or one across the pair (cable side). */
  panel: { series: ResistorEl | null; across: ResistorEl | null };
  /** At the detector(s): elements in series along the IN conductor, then the rungs across to the return. */
  far: { series: SeriesEl[]; rungs: Rung[] };
  /** Cores drawn: 2, 4 with a loop-back pair or a tamper pair, 6 with the detectors' supply pair as well. */
  conductors: 2 | 4 | 6;
  /** A loop-back resistor is reached through a second pair out and back. */
  loopBack: boolean;
  /**
   * An alarm and tamper cable: the tamper contacts, in series on their own pair (green out from the link to the
   * alarm pair's return at the panel, white back to the input's return), not on the alarm pair. Null otherwise.
   */
  tamperPair: ContactEl[] | null;
  /** A six-core cable: the detectors' supply pair (red +, black 0 V joined to the input's return at the panel). */
  supplyPair: boolean;
}

const RESISTOR_LABEL: Record<ResistorEl["role"], string> = { eol: "EOL", alarm: "alarm", "shared-a": "A", "shared-b": "B" };

export function shortDetectorName(loop: LoopSpec, i: number): string {
  return loop.scheme === "shared" ? (i === 0 ? "A" : "B") : `D${i + 1}`;
}

export function schematicModel(loop: LoopSpec, states: readonly DetectorState[], inputType?: InputType): SchematicModel {
  const f = fittedValues(loop, inputType);
  const n = loop.detectors.length;
  const state = (i: number): DetectorState => states[i] ?? "rest";
  const resistor = (role: ResistorEl["role"], ohms: number | undefined): ResistorEl => ({ kind: "resistor", key: `r-${role}`, role, ohms: ohms ?? NaN, label: RESISTOR_LABEL[role] });
  const alarm = (i: number): ContactEl => {
    const d = loop.detectors[i];
    const active = state(i) === "active";
    const closed = d.contact === "NC" ? !active : active;
    return { kind: "contact", key: `g-${i}`, role: "alarm", detector: i, label: `${shortDetectorName(loop, i)} alarm`, type: d.contact, closed, operated: active };
  };
  const tampers: ContactEl[] = [];
  for (let i = 0; i < n; i++)
    if (loop.detectors[i].tamper) {
      const open = state(i) === "tamper";
      tampers.push({ kind: "contact", key: `t-${i}`, role: "tamper", detector: i, label: `${shortDetectorName(loop, i)} tamper`, type: "NC", closed: !open, operated: open });
    }
  const tamperOf = (i: number) => tampers.find((t) => t.detector === i);
  const groupNO = n > 0 && loop.detectors[0].contact === "NO";
  const atPanel = loop.placement === "at-panel";
  const loopBack = loop.placement === "loop-back" && loop.scheme !== "none";
  const panel: SchematicModel["panel"] = { series: null, across: null };
  const series: SeriesEl[] = [];
  let rungs: Rung[] = [];
  const alarms = Array.from({ length: n }, (_, i) => alarm(i));
  // the resistor that closes the far end: there, at the panel through a second pair, or nowhere
  const endResistor = (r: ResistorEl): Rung[] => (loopBack ? [{ kind: "loop-back", resistor: r }] : [{ kind: "items", items: [r] }]);

  if (loop.scheme === "shared") {
    for (let i = 0; i < n; i++) {
      const t = tamperOf(i);
      if (t) series.push(t);
      const r = resistor(i === 0 ? "shared-a" : "shared-b", f.sharedOhms?.[i]);
      series.push({ kind: "parallel", key: `p-${i}`, branches: [[alarms[i]], [r]] });
    }
    const eol = resistor("eol", f.eolOhms);
    if (atPanel) {
      panel.series = eol;
      rungs = [{ kind: "wire" }];
    } else rungs = endResistor(eol);
  } else if (loop.scheme === "double-eol") {
    series.push(...tampers);
    const eol = resistor("eol", f.eolOhms);
    const ra = resistor("alarm", f.alarmOhms);
    if (atPanel) {
      panel.series = eol;
      panel.across = ra;
      if (groupNO) rungs = alarms.map((g) => ({ kind: "items", items: [g] }));
      else {
        series.push(...alarms);
        rungs = [{ kind: "wire" }];
      }
    } else {
      series.push({ kind: "parallel", key: "p-group", branches: groupNO ? [...alarms.map((g) => [g]), [ra]] : [alarms, [ra]] });
      rungs = endResistor(eol);
    }
  } else if (loop.scheme === "single-eol") {
    const eol = resistor("eol", f.eolOhms);
    if (groupNO) {
      series.push(...tampers);
      const contacts: Rung[] = alarms.map((g) => ({ kind: "items", items: [g] }));
      if (atPanel) {
        panel.across = eol;
        rungs = contacts;
      } else rungs = [...contacts, ...endResistor(eol)];
    } else {
      for (let i = 0; i < n; i++) {
        const t = tamperOf(i);
        if (t) series.push(t);
        series.push(alarms[i]);
      }
      if (atPanel) {
        panel.series = eol;
        rungs = [{ kind: "wire" }];
      } else rungs = endResistor(eol);
    }
  } else {
    if (groupNO) {
      series.push(...tampers);
      rungs = alarms.map((g) => ({ kind: "items", items: [g] }));
    } else {
      for (let i = 0; i < n; i++) {
        const t = tamperOf(i);
        if (t) series.push(t);
        series.push(alarms[i]);
      }
      rungs = [{ kind: "wire" }];
    }
  }
  const cores = coresOf(loop);
  if (carriesTamperPair(cores)) {
    const six = cores === "six-core-alarm-tamper";
    const onAlarmPair = series.filter((e) => !(e.kind === "contact" && e.role === "tamper"));
    return { panel, far: { series: onAlarmPair, rungs }, conductors: six ? 6 : 4, loopBack: false, tamperPair: tampers, supplyPair: six };
  }
  return { panel, far: { series, rungs }, conductors: loopBack ? 4 : 2, loopBack, tamperPair: null, supplyPair: false };
}

/** Every resistor in the model with where it physically sits. */
export function resistorPlaces(m: SchematicModel): { role: ResistorEl["role"]; place: "panel" | "detector" }[] {
  const out: { role: ResistorEl["role"]; place: "panel" | "detector" }[] = [];
  if (m.panel.series) out.push({ role: m.panel.series.role, place: "panel" });
  if (m.panel.across) out.push({ role: m.panel.across.role, place: "panel" });
  const visit = (e: SeriesEl) => {
    if (e.kind === "resistor") out.push({ role: e.role, place: "detector" });
    else if (e.kind === "parallel") e.branches.flat().forEach(visit);
  };
  m.far.series.forEach(visit);
  for (const r of m.far.rungs) {
    if (r.kind === "items") r.items.forEach(visit);
    else if (r.kind === "loop-back") out.push({ role: r.resistor.role, place: "panel" });
  }
  return out;
}
