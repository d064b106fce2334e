import type { OutputBlock, Sounder, Strobe } from "@/lib/catalog/schema";
import { outputSlots, panelOutputBlocks, type OutputSlot } from "@/lib/layout/outputs";
import type { Finding } from "@/lib/findings";
import { conductorOhms } from "@/lib/loop";
import { documentParts, PANEL_KEY, type OutputDevice } from "@/lib/layout/schema";
import { fmt, listNames } from "@/lib/solver/format";
import { plural, pluralWord } from "@/lib/vocabulary/plural";
import { OUTPUT_PURPOSE_WORDS } from "@/lib/vocabulary/words";
import type { Resolved, ResolvedBoard } from "@/lib/solver/resolve";
import type { OutputDeviceVoltage, OutputFigures, SupplyFigures } from "@/lib/solver/types";

// Outputs and what they drive: sounders and strobes against each output's rating, their current added to the
// supply behind the output, and the voltage left at each after the drop on its cable.

/** Conductor temperature for the drop: the same hot end as for powered detectors (common practice, no published source). */
export const DROP_TEMP_C = 40;

export function boardOutputBlocks(r: Resolved, b: ResolvedBoard): OutputBlock[] {
  if (b.key === PANEL_KEY) return panelOutputBlocks(r.panel);
  if (b.entry?.kind === "outputs") return b.entry.entry.outputs;
  if (b.entry?.kind === "expansion") return b.entry.entry.outputs ?? [];
  return [];
}

/** One sounder or strobe on an output: what it draws at rest (with its battery's charging current) and in alarm. */
export interface OutputLoad {
  device: OutputDevice;
  cat: Sounder | Strobe;
  boardKey: string;
  output: number;
  restMa: number;
  alarmMa: number;
}

/** At rest a sounder draws its standby current plus its own battery's charging current; in alarm, its alarm current. */
export function deviceDraw(cat: Sounder | Strobe): { restMa: number; alarmMa: number } {
  const charging = "ownBattery" in cat && cat.ownBattery ? cat.ownBattery.chargingMa : 0;
  return { restMa: cat.standbyMa + charging, alarmMa: cat.alarmMa };
}

const slotName = (board: ResolvedBoard, s: OutputSlot, slots: OutputSlot[]) => {
  const nth = slots.filter((x) => x.purpose === s.purpose && x.output <= s.output).length;
  return `${board.name}, ${OUTPUT_PURPOSE_WORDS[s.purpose]} ${nth}`;
};

export function checkOutputs(r: Resolved, out: Finding[]): { outputs: OutputFigures[]; loads: OutputLoad[] } {
  const parts = documentParts(r.layout);
  const devices = new Map(parts.outputDevices.map((d) => [d.id, d]));
  const used = new Set<string>();
  const outputs: OutputFigures[] = [];
  const loads: OutputLoad[] = [];
  for (const o of parts.outputs) {
    if (o.deviceIds.length === 0) continue;
    const board = r.byKey.get(o.boardKey);
    const target = { kind: "board" as const, boardKey: o.boardKey };
    const slots = board ? outputSlots(boardOutputBlocks(r, board), board.key) : [];
    const slot = slots.find((s) => s.output === o.output);
    if (!board || !slot) {
      out.push({
        code: "output-out-of-range",
        severity: "error",
        message: !board ? `Output ${o.output} of a board that is not in this layout` : slots.length === 0 ? `${board.name} has no outputs` : `${board.name} has outputs 1 to ${slots.length}, not ${o.output}`,
        why: "There is no such output to wire the sounder or strobe to, so it would never sound.",
        target,
      });
      continue;
    }
    const name = slotName(board, slot, slots);
    const here: OutputLoad[] = [];
    for (const id of o.deviceIds) {
      const d = devices.get(id);
      if (!d) {
        out.push({ code: "output-device-unknown", severity: "error", message: `${name}: a sounder or strobe set on it is no longer in this layout`, why: "It may have been removed after it was set here.", target });
        continue;
      }
      if (used.has(id)) {
        out.push({ code: "output-device-placed-twice", severity: "error", message: `${d.label} is on more than one output (again on ${name})`, why: "A sounder or strobe is wired to one output.", target });
        continue;
      }
      used.add(id);
      const cat = d.kind === "sounder" ? r.ix.sounders.get(d.catalogId) : r.ix.strobes.get(d.catalogId);
      if (!cat) {
        out.push({ code: "output-device-type-unknown", severity: "error", message: `${d.label}: its ${d.kind} type is not in the catalog`, why: "Its current is unknown, so it is left out of the output and battery figures.", target });
        continue;
      }
      here.push({ device: d, cat, boardKey: board.key, output: o.output, ...deviceDraw(cat) });
    }
    const restMa = here.reduce((s, l) => s + l.restMa, 0);
    const alarmMa = here.reduce((s, l) => s + l.alarmMa, 0);
    const ok = restMa <= slot.ratingMa && alarmMa <= slot.ratingMa;
    if (!ok)
      out.push({
        code: "output-overloaded",
        severity: "error",
        message: `${name} drives ${listNames(here.map((l) => l.device.label))}: ${fmt(alarmMa)} mA in alarm and ${fmt(restMa)} mA at rest; its ${slot.switching} is rated ${fmt(slot.ratingMa)} mA`,
        why: "Past its rating the output's protection trips or its contact or transistor fails, and nothing on it sounds. Move a sounder or strobe to another output, or drive them through an output module's relay.",
        target,
      });
    loads.push(...here);
    outputs.push({ boardKey: board.key, output: o.output, name, purpose: slot.purpose, switching: slot.switching, ratingMa: slot.ratingMa, deviceIds: here.map((l) => l.device.id), restMa, alarmMa, ok });
  }
  const unplaced = parts.outputDevices.filter((d) => !used.has(d.id));
  if (unplaced.length)
    out.push({
      code: "output-devices-unplaced",
      severity: "warning",
      message: `${plural(unplaced.length, "sounder or strobe", "sounders or strobes")} ${pluralWord(unplaced.length, "is", "are")} on no output: ${listNames(unplaced.map((d) => d.label))}`,
      why: "A sounder or strobe on no output never sounds, and its current is in no battery figure.",
      target: { kind: "layout" },
    });
  return { outputs, loads };
}

/** The voltage at a sounder or strobe in alarm, on mains and at the end of the standby period, as for a powered detector. */
export function outputDeviceVoltage(l: OutputLoad, feed: SupplyFigures, out: Finding[]): OutputDeviceVoltage {
  const cableOhms = 2 * conductorOhms(l.device.gauge, l.device.cableM, DROP_TEMP_C);
  const dropV = (l.alarmMa / 1000) * cableOhms;
  const v: OutputDeviceVoltage = {
    deviceId: l.device.id,
    boardKey: l.boardKey,
    output: l.output,
    supplyKey: feed.supplyKey,
    supplyVolts: feed.volts,
    currentMa: l.alarmMa,
    cableOhms,
    dropV,
    volts: feed.volts - dropV,
    minVolts: l.cat.minVolts,
    ok: feed.volts - dropV >= l.cat.minVolts,
    endVolts: feed.endVolts - dropV,
    okOnBattery: feed.endVolts - dropV >= l.cat.minVolts,
  };
  const volts = (x: number) => String(Number(x.toFixed(2)));
  const drop = `${volts(dropV)} V dropped over ${fmt(l.device.cableM)} m of cable (${fmt(l.alarmMa)} mA × ${fmt(cableOhms)} Ω out and back)`;
  const target = { kind: "board" as const, boardKey: l.boardKey };
  if (!v.ok)
    out.push({
      code: "output-device-voltage-low",
      severity: "error",
      message:
        v.volts > 0
          ? `${l.device.label} gets ${volts(v.volts)} V in alarm: ${volts(feed.volts)} V less ${drop}, below its minimum of ${volts(l.cat.minVolts)} V`
          : `${l.device.label} gets no usable voltage in alarm: ${drop} is more than the ${volts(feed.volts)} V supply; it needs at least ${volts(l.cat.minVolts)} V`,
      why: "A sounder or strobe below its working voltage sounds weakly or not at all. Use a thicker cable, a shorter run, or an output nearer to it.",
      target,
    });
  else if (!v.okOnBattery)
    out.push({
      code: "output-device-voltage-low-on-battery",
      severity: "error",
      message: `${l.device.label} gets ${volts(v.endVolts)} V in alarm at the end of the standby period: the battery's ${volts(feed.endVolts)} V less ${drop}, below its minimum of ${volts(l.cat.minVolts)} V`,
      why: "After a mains failure the alarm sounds from the standby battery, whose voltage falls as it discharges. Use a thicker cable, a shorter run, or an output nearer to it.",
      target,
    });
  return v;
}
