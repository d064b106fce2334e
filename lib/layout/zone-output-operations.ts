import { indexCatalog } from "@/lib/layout/catalog-index";
import { boardName } from "@/lib/layout/names";
import type { LayoutContext, LayoutEdit } from "@/lib/layout/operations";
import { slotsOf } from "@/lib/layout/outputs";
import { documentParts, type LayoutDocument, type OutputDevice, type OutputRef, type SecurityGrade, type ZoneProgram } from "@/lib/layout/schema";
import { standbyProfileForGrade } from "@/lib/solver/grade-rules";
import { standbyProfile } from "@/lib/solver/standby-profiles";
import { OUTPUT_PURPOSE_WORDS, ZONE_TYPE_WORDS } from "@/lib/vocabulary/words";

// Pure editor operations for sounders and strobes on outputs, zone programming, areas and the grade. Like
// operations.ts: a new document and one sentence for the screen reader; a refused edit returns the same document.

const refuse = (layout: LayoutDocument, message: string): LayoutEdit => ({ ok: false, layout, message });
const done = (layout: LayoutDocument, message: string): LayoutEdit => ({ ok: true, layout, message });

function freeKey(taken: Set<string>, stem: string): string {
  let n = 1;
  while (taken.has(`${stem}-${n}`)) n++;
  return `${stem}-${n}`;
}

/** A new sounder or strobe of this layout, on no output yet. */
export function addOutputDevice(doc: LayoutDocument, ctx: LayoutContext, device: Omit<OutputDevice, "id">): LayoutEdit {
  const ix = indexCatalog(ctx.catalog);
  const cat = device.kind === "sounder" ? ix.sounders.get(device.catalogId) : ix.strobes.get(device.catalogId);
  if (!cat) return refuse(doc, `No ${device.kind} of that type in the catalog`);
  const parts = documentParts(doc);
  const id = freeKey(new Set(parts.outputDevices.map((d) => d.id)), device.kind);
  return done({ ...doc, outputDevices: [...parts.outputDevices, { id, ...device }] }, `${device.label} (${cat.name}) added, on no output yet`);
}

/** Where a sounder or strobe is, or null when it is on no output. */
export function outputOf(doc: LayoutDocument, deviceId: string): OutputRef | null {
  const o = documentParts(doc).outputs.find((x) => x.deviceIds.includes(deviceId));
  return o ? { boardKey: o.boardKey, output: o.output } : null;
}

/** Put a sounder or strobe on an output (`to`), or back to none (`null`), taking it off wherever it was. */
export function placeOutputDevice(doc: LayoutDocument, ctx: LayoutContext, deviceId: string, to: OutputRef | null): LayoutEdit {
  const parts = documentParts(doc);
  const device = parts.outputDevices.find((d) => d.id === deviceId);
  if (!device) return refuse(doc, "That sounder or strobe is not in this layout");
  let name = "";
  if (to) {
    const slots = slotsOf(doc, indexCatalog(ctx.catalog), to.boardKey);
    const slot = slots.find((s) => s.output === to.output);
    if (!slot) return refuse(doc, slots.length ? `${boardName(doc, to.boardKey)} has outputs 1 to ${slots.length}` : `${boardName(doc, to.boardKey)} has no outputs`);
    name = `${boardName(doc, to.boardKey)}, ${OUTPUT_PURPOSE_WORDS[slot.purpose]} ${slots.filter((s) => s.purpose === slot.purpose && s.output <= slot.output).length}`;
  }
  const outputs = parts.outputs.map((o) => ({ ...o, deviceIds: o.deviceIds.filter((id) => id !== deviceId) }));
  if (to) {
    const at = outputs.findIndex((o) => o.boardKey === to.boardKey && o.output === to.output);
    if (at >= 0) outputs[at] = { ...outputs[at], deviceIds: [...outputs[at].deviceIds, deviceId] };
    else outputs.push({ boardKey: to.boardKey, output: to.output, deviceIds: [deviceId] });
  }
  return done({ ...doc, outputs: outputs.filter((o) => o.deviceIds.length > 0) }, to ? `${device.label} on ${name}` : `${device.label} taken off its output`);
}

export function removeOutputDevice(doc: LayoutDocument, ctx: LayoutContext, deviceId: string): LayoutEdit {
  const off = placeOutputDevice(doc, ctx, deviceId, null);
  if (!off.ok) return off;
  const parts = documentParts(off.layout);
  const device = parts.outputDevices.find((d) => d.id === deviceId)!;
  return done({ ...off.layout, outputDevices: parts.outputDevices.filter((d) => d.id !== deviceId) }, `${device.label} removed`);
}

/** Change a zone's programming; options its new type does not allow are dropped rather than kept unseen. */
export function setZoneProgram(doc: LayoutDocument, ctx: LayoutContext, detectorId: string, patch: Partial<Omit<ZoneProgram, "detectorId">>): LayoutEdit {
  const d = ctx.schedule.find((x) => x.id === detectorId);
  if (!d) return refuse(doc, "That detector is not in the device schedule");
  const parts = documentParts(doc);
  const before = parts.zones.find((z) => z.detectorId === detectorId);
  const next: ZoneProgram = { ...(before ?? { detectorId, type: "instant" }), ...patch, detectorId };
  if (next.areaKey !== undefined && !parts.areas.some((a) => a.key === next.areaKey)) return refuse(doc, "No such area in this layout");
  if (next.type !== "entry-exit") {
    delete next.entryS;
    delete next.exitS;
  }
  if (next.type !== "instant") delete next.entryRoute;
  if (next.type === "hold-up") delete next.partSet;
  const zones = before ? parts.zones.map((z) => (z.detectorId === detectorId ? next : z)) : [...parts.zones, next];
  return done({ ...doc, zones }, `${d.label}: ${ZONE_TYPE_WORDS[next.type]} zone`);
}

export function addArea(doc: LayoutDocument, _ctx: LayoutContext, name: string): LayoutEdit {
  const trimmed = name.trim();
  if (!trimmed) return refuse(doc, "Name the area");
  const parts = documentParts(doc);
  if (parts.areas.some((a) => a.name.toLowerCase() === trimmed.toLowerCase())) return refuse(doc, `There is already an area ${trimmed}`);
  const key = freeKey(new Set(parts.areas.map((a) => a.key)), "area");
  return done({ ...doc, areas: [...parts.areas, { key, name: trimmed }] }, `Area ${trimmed} added`);
}

/** Remove an area; its zones fall back to the first remaining area. */
export function removeArea(doc: LayoutDocument, _ctx: LayoutContext, key: string): LayoutEdit {
  const parts = documentParts(doc);
  const area = parts.areas.find((a) => a.key === key);
  if (!area) return refuse(doc, "No such area in this layout");
  const zones = parts.zones.map((z) => {
    if (z.areaKey !== key) return z;
    const { areaKey: _gone, ...rest } = z;
    return rest;
  });
  return done({ ...doc, areas: parts.areas.filter((a) => a.key !== key), zones }, `Area ${area.name} removed`);
}

/** Choose the grade; an intruder system's battery is then sized for the grade (a fire profile is left alone). */
export function setGrade(doc: LayoutDocument, _ctx: LayoutContext, grade: SecurityGrade): LayoutEdit {
  const fire = standbyProfile(doc.power.standbyProfileId)?.lifeSafety ?? false;
  const power = fire ? doc.power : { ...doc.power, standbyProfileId: standbyProfileForGrade(grade) };
  const profile = standbyProfile(power.standbyProfileId);
  return done({ ...doc, grade, power }, `Security grade ${grade}${fire ? "" : `; battery sized for ${profile?.label ?? "the grade"}`}`);
}

/** Choose the keypads an area is set and unset from: each must be a keypad of this layout. */
export function setAreaKeypads(doc: LayoutDocument, _ctx: LayoutContext, key: string, keypadKeys: string[]): LayoutEdit {
  const parts = documentParts(doc);
  const area = parts.areas.find((a) => a.key === key);
  if (!area) return refuse(doc, "No such area in this layout");
  const keypads = new Set(doc.boards.filter((b) => b.kind === "keypad").map((b) => b.key));
  const stray = keypadKeys.find((k) => !keypads.has(k));
  if (stray !== undefined) return refuse(doc, "An area is set from a keypad of this layout");
  const chosen = doc.boards.filter((b) => keypadKeys.includes(b.key)).map((b) => b.key);
  const areas = parts.areas.map((a) => (a.key === key ? { ...a, keypadKeys: chosen } : a));
  const names = chosen.map((k) => boardName(doc, k));
  return done({ ...doc, areas }, names.length ? `Area ${area.name} set from ${names.join(" and ")}` : `Area ${area.name} set from no keypad`);
}
