import type { Finding } from "@/lib/findings";
import { PANEL_KEY, type LayoutPower } from "@/lib/layout/schema";
import { conductorOhms } from "@/lib/loop/cable";
import { batteryAh } from "@/lib/solver/battery";
import { fmt } from "@/lib/solver/format";
import type { GenerationMemo } from "@/lib/solver/memo";
import { isLifeSafety, type PlacedDetector, type Resolved, type ResolvedBoard } from "@/lib/solver/resolve";
import { resolveStandby } from "@/lib/solver/standby-profiles";
import type { DetectorVoltage, SolveResult, SupplyFigures } from "@/lib/solver/types";

// Current from each supply against its rating, standby battery, and the voltage left at each powered detector.

/** Conductor temperature for the voltage-drop figure: the hot end of the default range (common practice, no published source). */
export const VOLTAGE_DROP_TEMP_C = 40;

/** Volts to the centivolt: a drop of a few hundredths matters near the limit. */
const volts = (v: number) => String(Number(v.toFixed(2)));

interface Sums {
  restMa: number;
  alarmMa: number;
}

function detectorSums(dets: PlacedDetector[]): Sums {
  let restMa = 0;
  let alarmMa = 0;
  for (const d of dets)
    if (d.cat.power) {
      restMa += d.cat.power.standbyMa;
      alarmMa += d.cat.power.alarmMa;
    }
  return { restMa, alarmMa };
}

export type VoltageFigure = Omit<DetectorVoltage, "detectorId" | "supplyKey">;

export interface PowerMemos {
  boardSums: GenerationMemo<Sums>;
  voltage: GenerationMemo<VoltageFigure>;
}

export function checkPower(r: Resolved, power: LayoutPower, memos: PowerMemos, out: Finding[]): Pick<SolveResult, "supplies" | "detectors" | "battery"> {
  const { panel } = r;
  // Which detectors sit on which board.
  const onBoard = new Map<string, PlacedDetector[]>();
  for (const ri of r.inputs) {
    const list = onBoard.get(ri.board.key);
    if (list) list.push(...ri.detectors);
    else onBoard.set(ri.board.key, [...ri.detectors]);
  }
  const sumsOf = (b: ResolvedBoard): Sums => {
    const dets = onBoard.get(b.key) ?? [];
    return memos.boardSums.get(`${b.key}|${dets.map((d) => `${d.sched.id}:${d.cat.id}`).join(",")}`, () => detectorSums(dets));
  };

  const supplies: SupplyFigures[] = [];
  const bySupply = new Map<string, SupplyFigures>();
  const add = (s: SupplyFigures) => {
    supplies.push(s);
    bySupply.set(s.supplyKey, s);
  };
  add({ supplyKey: PANEL_KEY, name: "Control panel auxiliary output", kind: "panel", volts: panel.supplyVolts, ratingMa: panel.auxOutputMa, loadRestMa: 0, loadAlarmMa: 0, ownRestMa: panel.ownStandbyMa, ownAlarmMa: panel.ownAlarmMa, batteryNeededAh: 0, maxBatteryAh: panel.maxBatteryAh, powers: [] });
  for (const b of r.boards) {
    if (!b.entry || !b.board) continue;
    if (b.entry.kind === "supply")
      add({ supplyKey: b.key, name: b.name, kind: "supply-board", volts: b.entry.entry.outputVolts, ratingMa: b.entry.entry.outputMa, loadRestMa: 0, loadAlarmMa: 0, ownRestMa: b.entry.entry.standbyMa, ownAlarmMa: b.entry.entry.alarmMa, batteryNeededAh: 0, maxBatteryAh: b.entry.entry.maxBatteryAh, powers: [] });
    else if (b.entry.kind === "expansion" && b.entry.entry.ownSupply)
      // A board's own supply has no voltage of its own in the catalog: taken as the panel's (common practice, no published source).
      add({ supplyKey: b.key, name: `${b.name} own supply`, kind: "own-supply", volts: panel.supplyVolts, ratingMa: b.entry.entry.ownSupply.outputMa, loadRestMa: 0, loadAlarmMa: 0, ownRestMa: b.entry.entry.standbyMa, ownAlarmMa: b.entry.entry.alarmMa, batteryNeededAh: 0, maxBatteryAh: b.entry.entry.ownSupply.maxBatteryAh, powers: [] });
  }

  // Where each board's detectors draw from.
  const feedOf = new Map<string, SupplyFigures>();
  const panelAux = bySupply.get(PANEL_KEY)!;
  feedOf.set(PANEL_KEY, panelAux);
  const panelSums = sumsOf(r.boards[0]);
  panelAux.loadRestMa += panelSums.restMa;
  panelAux.loadAlarmMa += panelSums.alarmMa;
  for (const b of r.boards) {
    if (!b.entry || !b.board) continue;
    const target = { kind: "board" as const, boardKey: b.key };
    const own = bySupply.get(b.key);
    const sums = sumsOf(b);
    if (own) {
      if (b.board.poweredBy !== undefined)
        out.push({ code: "powered-by-ignored", severity: "note", message: `${b.name} has its own supply; "powered by ${r.names.get(b.board.poweredBy) ?? b.board.poweredBy}" is ignored`, why: "A supply board or a board with its own supply powers itself.", target });
      own.loadRestMa += sums.restMa;
      own.loadAlarmMa += sums.alarmMa;
      feedOf.set(b.key, own);
      continue;
    }
    let feed = panelAux;
    if (b.board.poweredBy !== undefined) {
      const s = bySupply.get(b.board.poweredBy);
      if (s && s.kind === "supply-board") feed = s;
      else
        out.push({
          code: "powered-by-invalid",
          severity: "error",
          message: `${b.name} is set to be powered by ${r.names.get(b.board.poweredBy) ?? b.board.poweredBy}, which is not a power supply in this layout`,
          why: "Its current is counted on the panel's auxiliary output instead; wire it to a real supply.",
          target,
        });
    }
    feed.loadRestMa += b.entry.entry.standbyMa + sums.restMa;
    feed.loadAlarmMa += b.entry.entry.alarmMa + sums.alarmMa;
    feed.powers.push(b.key);
    feedOf.set(b.key, feed);
  }

  // Standby battery.
  const { profile, standbyH, alarmMin } = resolveStandby(power);
  if (!profile)
    out.push({ code: "standby-profile-unknown", severity: "error", message: `Standby profile ${power.standbyProfileId} is unknown; 24 h and 5 min are used`, why: "Battery sizes depend on the standby profile.", target: { kind: "layout" } });
  const sf = power.safetyFactor;
  for (const s of supplies) {
    const target = { kind: "supply" as const, supplyKey: s.supplyKey };
    if (s.loadRestMa > s.ratingMa || s.loadAlarmMa > s.ratingMa)
      out.push({
        code: "supply-overloaded",
        severity: "error",
        message: `${s.name} supplies ${fmt(s.loadRestMa)} mA at rest and ${fmt(s.loadAlarmMa)} mA in alarm; it is rated ${fmt(s.ratingMa)} mA`,
        why: "Past its rating the output's protection trips or its voltage sags, and everything on it can drop out. Move boards to a power supply or choose a larger one.",
        target,
      });
    const restMa = s.ownRestMa + s.loadRestMa;
    const alarmMa = s.ownAlarmMa + s.loadAlarmMa;
    s.batteryNeededAh = batteryAh({ restMa, alarmMa, standbyH, alarmMin, safetyFactor: sf });
    const working = `${fmt(standbyH)} h × ${fmt(restMa)} mA + ${fmt(alarmMin)} min × ${fmt(alarmMa)} mA = ${fmt(s.batteryNeededAh / sf)} Ah, × ${fmt(sf)}`;
    if (s.batteryNeededAh > s.maxBatteryAh)
      out.push({
        code: "battery-too-large",
        severity: "error",
        message: `${s.name} needs a ${fmt(s.batteryNeededAh)} Ah standby battery (${working}); it can charge at most ${fmt(s.maxBatteryAh)} Ah`,
        why: "A battery larger than the charger is rated for does not recharge in time after a mains failure. Split the load onto another supply.",
        target,
      });
    else
      out.push({
        code: "battery-needed",
        severity: "note",
        message: `${s.name}: standby battery of at least ${fmt(s.batteryNeededAh)} Ah (${working}); it can charge up to ${fmt(s.maxBatteryAh)} Ah`,
        why: `Sized for ${profile?.label ?? "24 h and 5 min"}${profile ? ` (${profile.source})` : ""}. Use the next standard battery size up.`,
        target,
      });
  }
  const fire = profile?.lifeSafety || r.inputs.some((ri) => ri.detectors.some((d) => isLifeSafety(d.cat)));
  if (fire)
    out.push({
      code: "battery-fire-caution",
      severity: "note",
      message: "Fire alarm battery sizes here are an estimate; the local fire code and the authority having jurisdiction decide",
      why: "Standby and alarm periods, derating and charger limits for fire systems are set by the local fire code and the authority having jurisdiction; have the calculation checked under licensed practice. Loopwright is an aid, not an approval.",
      target: { kind: "layout" },
    });

  // Voltage at each powered detector after the drop on its cable.
  const detectors: DetectorVoltage[] = [];
  for (const ri of r.inputs) {
    const feed = feedOf.get(ri.board.key) ?? panelAux;
    for (const d of ri.detectors) {
      const p = d.cat.power;
      if (!p) continue;
      const v = memos.voltage.get(`${d.sched.id}|${d.cat.id}|${feed.volts}|${panel.minDeviceVolts}`, () => {
        const cableOhms = 2 * conductorOhms(d.sched.gauge, d.sched.cableM, VOLTAGE_DROP_TEMP_C);
        const dropV = (p.alarmMa / 1000) * cableOhms;
        const minVolts = Math.max(p.minVolts, panel.minDeviceVolts);
        const volts = feed.volts - dropV;
        return { supplyVolts: feed.volts, currentMa: p.alarmMa, cableOhms, dropV, volts, minVolts, ok: volts >= minVolts };
      });
      detectors.push({ detectorId: d.sched.id, supplyKey: feed.supplyKey, ...v });
      if (!v.ok) {
        const limit = p.minVolts >= panel.minDeviceVolts ? `its minimum of ${volts(p.minVolts)} V` : `the panel's minimum device voltage of ${volts(panel.minDeviceVolts)} V`;
        out.push({
          code: "detector-voltage-low",
          severity: "error",
          message: `${d.sched.label} gets ${volts(v.volts)} V: ${volts(v.supplyVolts)} V less ${volts(v.dropV)} V dropped over ${fmt(d.sched.cableM)} m of cable (${fmt(v.currentMa)} mA × ${fmt(v.cableOhms)} Ω out and back), below ${limit}`,
          why: "A detector below its working voltage may not report, or may report false alarms. Use a thicker cable, a shorter run, or a power supply closer to it.",
          target: { kind: "detector", detectorId: d.sched.id },
        });
      }
    }
  }
  return { supplies, detectors, battery: { profileId: power.standbyProfileId, source: profile?.source ?? null, standbyH, alarmMin, safetyFactor: sf } };
}
