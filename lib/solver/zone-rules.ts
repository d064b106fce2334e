import type { ZoneType } from "@/lib/catalog/schema";
import { isLifeSafety } from "@/lib/catalog/life-safety";
import type { Finding } from "@/lib/findings";
import { LIFE_SAFETY_CAUTION } from "@/lib/loop";
import { documentParts, type ZoneProgram } from "@/lib/layout/schema";
import { plural, pluralWord } from "@/lib/vocabulary/plural";
import { listNames } from "@/lib/solver/format";
import { ZONE_TYPE_WORDS } from "@/lib/vocabulary/words";
import { GRADE_SOURCES } from "@/lib/solver/grade-rules";
import type { Resolved, ResolvedInput } from "@/lib/solver/resolve";
import type { AreaFigures, GradeFigures, ZoneFigures } from "@/lib/solver/types";
import type { WirelessPlaced } from "@/lib/solver/wireless-rules";

// Zone programming: each placed detector is a zone with a type, an area, part-set membership and the options its
// type allows; areas against the panel; the rules tying detectors, types, times and labels together.

/** Zone types a life-safety device may report on: fire, or a 24-hour type (trade rule, common practice, no published source). */
export const LIFE_SAFETY_ZONE_TYPES: ZoneType[] = ["fire", "24-hour"];

interface ZoneSource {
  detectorId: string;
  label: string;
  lifeSafety: boolean;
  holdUp: boolean;
  boardKey: string;
  input: number | null;
  where: string;
  wireless: boolean;
}

/** The zones of one input, in detector order: the panel numbers wired zones in board and input order. */
function zoneSources(ri: ResolvedInput): ZoneSource[] {
  return ri.detectors.map((d) => ({ detectorId: d.sched.id, label: d.sched.label, lifeSafety: isLifeSafety(d.cat), holdUp: d.cat.category === "panic", boardKey: ri.board.key, input: ri.input.input, where: `${ri.board.name}, input ${ri.input.input}`, wireless: false }));
}

/** Wireless zones come after every wired one, by receiver. */
function wirelessSources(wireless: WirelessPlaced[]): ZoneSource[] {
  return wireless.map((w) => ({ detectorId: w.sched.id, label: w.sched.label, lifeSafety: isLifeSafety(w.cat), holdUp: w.cat.category === "panic", boardKey: w.board.key, input: null, where: w.board.name, wireless: true }));
}

/** The same zone under another number; written out field by field, as a spread is slow over hundreds of zones. */
function renumbered(z: ZoneFigures, number: number): ZoneFigures {
  return {
    number,
    detectorId: z.detectorId,
    label: z.label,
    keypadLabel: z.keypadLabel,
    labelCut: z.labelCut,
    type: z.type,
    areaKey: z.areaKey,
    areaName: z.areaName,
    partSet: z.partSet,
    entryS: z.entryS,
    exitS: z.exitS,
    entryRoute: z.entryRoute,
    chime: z.chime,
    where: z.where,
    boardKey: z.boardKey,
    input: z.input,
    wireless: z.wireless,
  };
}

/** A zone not yet programmed: fire for a life-safety device, hold-up for a hold-up device, else instant, so layouts made before zone programming stay valid. */
function defaultZoneType(src: ZoneSource): ZoneType {
  return src.lifeSafety ? "fire" : src.holdUp ? "hold-up" : "instant";
}

/** The label as the keypad shows it: cut to `length` characters (by code point, so no half characters). */
export function keypadLabel(label: string, length: number | undefined): { text: string; cut: boolean } {
  const chars = [...label];
  if (length === undefined || chars.length <= length) return { text: label, cut: false };
  return { text: chars.slice(0, length).join(""), cut: true };
}

/** One zone worked out: its figures (numbered as when it was made), its findings, its label when cut and not yet programmed. */
interface ZoneEntry {
  fig: ZoneFigures;
  findings: Finding[];
  cutUnprogrammed: string | null;
}

/**
 * Zones of each wired input from an earlier solve. `reuse` says the programming, areas, grade and panel are those
 * of that solve (a patched solve), so an input kept from it keeps its zones and only their numbers are redone.
 */
export interface ZoneMemo {
  entries: Map<ResolvedInput, ZoneEntry[]>;
  reuse: boolean;
}

export function checkZones(r: Resolved, wireless: WirelessPlaced[], grade: GradeFigures | null, out: Finding[], memo: ZoneMemo = { entries: new Map(), reuse: false }): { zones: ZoneFigures[]; areas: AreaFigures[] } {
  const { panel } = r;
  const parts = documentParts(r.layout);
  const programs = new Map<string, ZoneProgram>(parts.zones.map((z) => [z.detectorId, z]));
  const areaByKey = new Map(parts.areas.map((a) => [a.key, a]));
  const maxAreas = panel.maxAreas ?? 1;
  if (parts.areas.length > maxAreas)
    out.push({
      code: "areas-over-panel",
      severity: "error",
      message: `${plural(parts.areas.length, "area")} in this layout; ${panel.name} sets and unsets at most ${maxAreas}`,
      why: "The panel cannot set the extra areas on their own. Merge areas or choose a panel with more.",
      target: { kind: "layout" },
    });
  for (const a of parts.areas)
    for (const k of a.keypadKeys ?? []) {
      const b = r.byKey.get(k);
      if (b?.board?.kind !== "keypad")
        out.push({ code: "area-keypad-unknown", severity: "error", message: b ? `Area ${a.name} is set from ${b.name}, which is not a keypad` : `Area ${a.name} is set from a keypad that is not in this layout`, why: "An area is set and unset from a keypad of this layout.", target: { kind: "layout" } });
    }

  const zones: ZoneFigures[] = [];
  const cutUnprogrammed: string[] = [];
  const zoneOf = (src: ZoneSource, number: number): ZoneEntry => {
    const out: Finding[] = [];
    const p = programs.get(src.detectorId);
    const type: ZoneType = p?.type ?? defaultZoneType(src);
    const target = { kind: "detector" as const, detectorId: src.detectorId };
    const area = p?.areaKey !== undefined ? areaByKey.get(p.areaKey) : parts.areas[0];
    if (p?.areaKey !== undefined && !area)
      out.push({ code: "zone-area-unknown", severity: "error", message: `${src.label} is set to an area that is not in this layout`, why: "The zone would never be set or unset. Choose one of the layout's areas.", target });
    const typeWord = ZONE_TYPE_WORDS[type];
    if (p && panel.zoneTypes && !panel.zoneTypes.includes(type))
      out.push({ code: "zone-type-not-offered", severity: "error", message: `${src.label} is a ${typeWord} zone, which ${panel.name} does not offer`, why: `The panel cannot be programmed so. It offers ${panel.zoneTypes.map((t) => ZONE_TYPE_WORDS[t]).join(", ")} zones.`, target });
    if (src.lifeSafety && !LIFE_SAFETY_ZONE_TYPES.includes(type))
      out.push({
        code: "zone-life-safety-type",
        severity: "error",
        message: `${src.label} is a life-safety device on ${type === "entry-exit" || type === "instant" ? "an" : "a"} ${typeWord} zone`,
        why: `A fire device must report whether the system is set or not: put it on a fire or 24-hour zone. ${LIFE_SAFETY_CAUTION}`,
        target,
      });
    if (src.holdUp && type !== "hold-up")
      out.push({ code: "zone-hold-up-type", severity: "error", message: `${src.label} is a hold-up device on ${type === "entry-exit" || type === "instant" ? "an" : "a"} ${typeWord} zone`, why: "A hold-up device must report at all times, silently where so programmed: put it on a hold-up zone.", target });
    if (type === "hold-up" && p?.partSet)
      out.push({ code: "zone-hold-up-part-set", severity: "error", message: `${src.label} is a hold-up zone in the part-set`, why: "A hold-up zone is a 24-hour type and is never set or unset with its area, so it belongs to no part-set.", target });
    const timesGiven = p?.entryS !== undefined || p?.exitS !== undefined;
    if (timesGiven && type !== "entry-exit")
      out.push({ code: "zone-option-not-allowed", severity: "warning", message: `${src.label} has entry or exit times but is a ${typeWord} zone`, why: "Only entry/exit zones have entry and exit times; the panel ignores them on other types.", target });
    if (p?.entryRoute && type !== "instant")
      out.push({ code: "zone-option-not-allowed", severity: "warning", message: `${src.label} is on the entry route but is ${type === "entry-exit" ? "an" : "a"} ${typeWord} zone`, why: "The entry route is for instant zones passed on the way to the keypad during the entry time.", target });
    if (grade && type === "entry-exit") {
      if ((p?.entryS ?? 0) > grade.maxEntryS)
        out.push({ code: "zone-time-over-grade", severity: "error", message: `${src.label}: entry time ${p!.entryS} s; grade ${grade.grade} allows at most ${grade.maxEntryS} s`, why: `A longer entry time gives an intruder time to reach the panel before the alarm. ${GRADE_SOURCES.entry}`, target });
      if ((p?.exitS ?? 0) > grade.maxExitS)
        out.push({ code: "zone-time-over-grade", severity: "error", message: `${src.label}: exit time ${p!.exitS} s; grade ${grade.grade} allows at most ${grade.maxExitS} s`, why: `Exit time is ${GRADE_SOURCES.exit}`, target });
    }
    const label = p?.keypadLabel ?? src.label;
    const shown = keypadLabel(label, panel.zoneLabelLength);
    if (shown.cut && p)
      out.push({
        code: "keypad-label-cut",
        severity: "warning",
        message: `${src.label}: the keypad shows "${shown.text}" of "${label}" (${panel.zoneLabelLength} characters)`,
        why: "The keypad's display is cut off after its label length; give the zone a shorter keypad label that still says where it is.",
        target,
      });
    const fig: ZoneFigures = {
      number,
      detectorId: src.detectorId,
      label,
      keypadLabel: shown.text,
      labelCut: shown.cut,
      type,
      areaKey: area?.key ?? null,
      areaName: area?.name ?? null,
      partSet: p?.partSet ?? false,
      entryS: type === "entry-exit" ? (p?.entryS ?? null) : null,
      exitS: type === "entry-exit" ? (p?.exitS ?? null) : null,
      entryRoute: type === "instant" && (p?.entryRoute ?? false),
      chime: p?.chime ?? false,
      where: src.where,
      boardKey: src.boardKey,
      input: src.input,
      wireless: src.wireless,
    };
    return { fig, findings: out, cutUnprogrammed: shown.cut && !p ? label : null };
  };
  const take = (e: ZoneEntry) => {
    const number = zones.length + 1;
    if (e.fig.number !== number) e.fig = renumbered(e.fig, number);
    zones.push(e.fig);
    for (const f of e.findings) out.push(f);
    if (e.cutUnprogrammed !== null) cutUnprogrammed.push(e.cutUnprogrammed);
  };
  const entries = new Map<ResolvedInput, ZoneEntry[]>();
  for (const ri of r.inputs) {
    let list = memo.reuse ? memo.entries.get(ri) : undefined;
    if (!list) list = zoneSources(ri).map((src) => zoneOf(src, 0));
    entries.set(ri, list);
    for (const e of list) take(e);
  }
  memo.entries = entries;
  for (const src of wirelessSources(wireless)) take(zoneOf(src, 0));
  if (cutUnprogrammed.length)
    out.push({
      code: "keypad-labels-cut",
      severity: "note",
      message: `The keypad shows only the first ${panel.zoneLabelLength} characters of the labels of ${plural(cutUnprogrammed.length, "zone")}: ${listNames(cutUnprogrammed)}`,
      why: "Zones not yet programmed take the detector's label; give each a keypad label short enough to read whole.",
      target: { kind: "layout" },
    });
  const zoned = parts.zones.length ? new Set(zones.map((z) => z.detectorId)) : null;
  const stray = zoned ? parts.zones.filter((z) => !zoned.has(z.detectorId)).length : 0;
  if (stray)
    out.push({ code: "zone-not-placed", severity: "note", message: `${plural(stray, "zone")} ${pluralWord(stray, "is", "are")} programmed for ${pluralWord(stray, "a detector", "detectors")} on no input or receiver`, why: "Their programming is kept and used once the detectors are placed.", target: { kind: "layout" } });
  const areas: AreaFigures[] = parts.areas.map((a) => ({ key: a.key, name: a.name, zones: zones.filter((z) => z.areaKey === a.key).length, keypadKeys: a.keypadKeys ?? [] }));
  return { zones, areas };
}
