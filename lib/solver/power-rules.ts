import type { Finding } from "@/lib/findings";
import { PANEL_KEY, type LayoutPower } from "@/lib/layout/schema";
import { conductorOhms, LIFE_SAFETY_CAUTION } from "@/lib/loop";
import { defaultEndOfDischargeVolts } from "@/lib/catalog/schema";
import { batteryAh, batteryPickText, pickBattery, STANDARD_BATTERY_AH } from "@/lib/solver/battery";
import { fmt, fmtUp } from "@/lib/solver/format";
import { attachBreakdown } from "@/lib/solver/supply-breakdown";
import type { Detector } from "@/lib/catalog/schema";
import type { InputOutcome } from "@/lib/solver/loop-rules";
import type { PlacedDetector, Resolved, ResolvedBoard, ResolvedInput } from "@/lib/solver/resolve";
import { CHECK_EDITION, resolveStandby } from "@/lib/solver/standby-profiles";
import type { DetectorVoltage, OutputDeviceVoltage, SolveResult, SupplyFigures } from "@/lib/solver/types";
import { outputDeviceVoltage, type OutputLoad } from "@/lib/solver/output-rules";
import { outputSlots, panelOutputBlocks } from "@/lib/layout/outputs";

// Current from each supply against its rating, standby battery, and the voltage left at each powered detector.

/** Conductor temperature for the voltage-drop figure: the hot end of the default range (common practice, no published source). */
export const VOLTAGE_DROP_TEMP_C = 40;

/** The panel's supply as its auxiliary output: what powered detectors and boards are wired to, and what its rating is for. */
export const PANEL_AUX_NAME = "Control panel auxiliary output";

/**
 * The panel's battery figures carry its own outputs' sounders and strobes beside the auxiliary output, so their heading
 * names both, e.g. "Control panel auxiliary output and siren outputs"; without output loads it is the auxiliary output alone.
 */
export function panelSupplyName(purposes: ReadonlySet<"siren" | "programmable">): string {
  const used = (["siren", "programmable"] as const).filter((p) => purposes.has(p));
  return used.length ? `${PANEL_AUX_NAME} and ${used.join(" and ")} outputs` : PANEL_AUX_NAME;
}

/** Volts to the centivolt: a drop of a few hundredths matters near the limit. */
const volts = (v: number) => String(Number(v.toFixed(2)));

interface Sums {
  restMa: number;
  alarmMa: number;
}

/** A detector's voltage figure and finding, kept per detector id; the schedule is fixed for a solver, so only the feed can change. */
export interface VoltageEntry {
  fig: DetectorVoltage;
  finding: Finding | null;
  panelMinVolts: number;
  catId: string;
}

function voltageAt(d: PlacedDetector, p: NonNullable<Detector["power"]>, feed: SupplyFigures, panelMinVolts: number): VoltageEntry {
  const cableOhms = 2 * conductorOhms(d.sched.gauge, d.sched.cableM, VOLTAGE_DROP_TEMP_C);
  const dropV = (p.alarmMa / 1000) * cableOhms;
  const minVolts = Math.max(p.minVolts, panelMinVolts);
  const v = feed.volts - dropV;
  const endV = feed.endVolts - dropV;
  const fig: DetectorVoltage = {
    detectorId: d.sched.id,
    supplyKey: feed.supplyKey,
    supplyVolts: feed.volts,
    currentMa: p.alarmMa,
    cableOhms,
    dropV,
    volts: v,
    minVolts,
    ok: v >= minVolts,
    endSupplyVolts: feed.endVolts,
    endVolts: endV,
    endMinVolts: p.minVolts,
    okOnBattery: endV >= p.minVolts,
  };
  let finding: Finding | null = null;
  if (!fig.ok) {
    const limit = p.minVolts >= panelMinVolts ? `its minimum of ${volts(p.minVolts)} V` : `the panel's minimum device voltage of ${volts(panelMinVolts)} V`;
    finding = {
      code: "detector-voltage-low",
      severity: "error",
      message: `${d.sched.label} gets ${volts(v)} V: ${volts(feed.volts)} V less ${volts(dropV)} V dropped over ${fmt(d.sched.cableM)} m of cable (${fmt(p.alarmMa)} mA × ${fmt(cableOhms)} Ω out and back), below ${limit}`,
      why: "A detector below its working voltage may not report, or may report false alarms. Use a thicker cable, a shorter run, or a power supply closer to it.",
      target: { kind: "detector", detectorId: d.sched.id },
    };
  } else if (!fig.okOnBattery) {
    finding = {
      code: "detector-voltage-low-on-battery",
      severity: "error",
      message: `${d.sched.label} gets ${volts(endV)} V at the end of the standby period: the battery's ${volts(feed.endVolts)} V less ${volts(dropV)} V dropped over ${fmt(d.sched.cableM)} m of cable (${fmt(p.alarmMa)} mA × ${fmt(cableOhms)} Ω out and back), below its minimum of ${volts(p.minVolts)} V (it gets ${volts(v)} V on mains)`,
      why: `On a mains failure the detector runs from the standby battery, whose voltage falls as it discharges; by the end of the standby period this detector is below its working voltage and may not report. Use a thicker cable, a shorter run, or a power supply closer to it.${d.cat.lifeSafety ? ` ${LIFE_SAFETY_CAUTION}` : ""}`,
      target: { kind: "detector", detectorId: d.sched.id },
    };
  }
  return { fig, finding, panelMinVolts, catId: d.cat.id };
}

/**
 * Supplies and detector voltages from an earlier solve. `touched` (a patched solve: boards, power and outputs as
 * before) names the boards whose inputs changed; a supply feeding none of them keeps its figures and findings,
 * and an input kept from that solve keeps its detectors' voltages. Null: everything is worked out again.
 */
export interface PowerMemo {
  touched: Set<string> | null;
  supplies: Map<string, { fig: SupplyFigures; findings: Finding[] }>;
  inputs: Map<ResolvedInput, { feed: SupplyFigures; figs: DetectorVoltage[]; findings: Finding[] }>;
}

export function checkPower(
  r: Resolved,
  outcomes: InputOutcome[],
  power: LayoutPower,
  voltageCache: Map<string, VoltageEntry>,
  out: Finding[],
  loads: OutputLoad[] = [],
  memo: PowerMemo = { touched: null, supplies: new Map(), inputs: new Map() },
): Pick<SolveResult, "supplies" | "detectors" | "battery" | "outputDevices"> {
  const { panel } = r;
  // Current drawn by each board's detectors: per-input sums come cached with the input's outcome.
  const boardSums = new Map<string, Sums>();
  for (let i = 0; i < outcomes.length; i++) {
    const key = r.inputs[i].board.key;
    const s = boardSums.get(key);
    if (s) {
      s.restMa += outcomes[i].restMa;
      s.alarmMa += outcomes[i].alarmMa;
    } else boardSums.set(key, { restMa: outcomes[i].restMa, alarmMa: outcomes[i].alarmMa });
  }
  const none: Sums = { restMa: 0, alarmMa: 0 };
  const sumsOf = (b: ResolvedBoard): Sums => boardSums.get(b.key) ?? none;

  const supplies: SupplyFigures[] = [];
  const bySupply = new Map<string, SupplyFigures>();
  const add = (s: SupplyFigures) => {
    supplies.push(s);
    bySupply.set(s.supplyKey, s);
  };
  add({ supplyKey: PANEL_KEY, name: PANEL_AUX_NAME, kind: "panel", volts: panel.supplyVolts, endVolts: panel.endOfDischargeVolts ?? defaultEndOfDischargeVolts(panel.supplyVolts), ratingMa: panel.auxOutputMa, loadRestMa: 0, loadAlarmMa: 0, outputRestMa: 0, outputAlarmMa: 0, ownRestMa: panel.ownStandbyMa, ownAlarmMa: panel.ownAlarmMa, batteryRestMa: 0, batteryAlarmMa: 0, breakdown: [], batteryNeededAh: 0, batteryPick: null, maxBatteryAh: panel.maxBatteryAh, powers: [] });
  for (const b of r.boards) {
    if (!b.entry || !b.board) continue;
    if (b.entry.kind === "supply")
      add({ supplyKey: b.key, name: b.name, kind: "supply-board", volts: b.entry.entry.outputVolts, endVolts: b.entry.entry.endOfDischargeVolts ?? defaultEndOfDischargeVolts(b.entry.entry.outputVolts), ratingMa: b.entry.entry.outputMa, loadRestMa: 0, loadAlarmMa: 0, outputRestMa: 0, outputAlarmMa: 0, ownRestMa: b.entry.entry.standbyMa, ownAlarmMa: b.entry.entry.alarmMa, batteryRestMa: 0, batteryAlarmMa: 0, breakdown: [], batteryNeededAh: 0, batteryPick: null, maxBatteryAh: b.entry.entry.maxBatteryAh, powers: [] });
    else if (b.entry.kind === "expansion" && b.entry.entry.ownSupply)
      // A board's own supply has no voltage of its own in the catalog: taken as the panel's (common practice, no published source).
      add({ supplyKey: b.key, name: `${b.name} own supply`, kind: "own-supply", volts: panel.supplyVolts, endVolts: panel.endOfDischargeVolts ?? defaultEndOfDischargeVolts(panel.supplyVolts), ratingMa: b.entry.entry.ownSupply.outputMa, loadRestMa: 0, loadAlarmMa: 0, outputRestMa: 0, outputAlarmMa: 0, ownRestMa: b.entry.entry.standbyMa, ownAlarmMa: b.entry.entry.alarmMa, batteryRestMa: 0, batteryAlarmMa: 0, breakdown: [], batteryNeededAh: 0, batteryPick: null, maxBatteryAh: b.entry.entry.ownSupply.maxBatteryAh, powers: [] });
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
        out.push({ code: "powered-by-ignored", severity: "note", message: `${b.name} has its own supply; "powered by ${r.names.get(b.board.poweredBy) ?? "a board not in this layout"}" is ignored`, why: "A supply board or a board with its own supply powers itself.", target });
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
          message: `${b.name} is set to be powered by ${r.names.get(b.board.poweredBy) ?? "a board that is gone"}, which is not a power supply in this layout`,
          why: "Its current is counted on the panel's auxiliary output instead; wire it to a real supply.",
          target,
        });
    }
    feed.loadRestMa += b.entry.entry.standbyMa + sums.restMa;
    feed.loadAlarmMa += b.entry.entry.alarmMa + sums.alarmMa;
    feed.powers.push(b.key);
    feedOf.set(b.key, feed);
  }

  // Sounders and strobes: on the panel's own outputs they draw from its battery beside the auxiliary output; on a
  // board's outputs they draw through the supply that feeds the board, counting against its rating.
  const panelPurposes = new Set<"siren" | "programmable">();
  const panelSlots = outputSlots(panelOutputBlocks(panel), PANEL_KEY);
  for (const l of loads) {
    const feed = l.boardKey === PANEL_KEY ? panelAux : (feedOf.get(l.boardKey) ?? panelAux);
    if (l.boardKey === PANEL_KEY) {
      const purpose = panelSlots.find((x) => x.output === l.output)?.purpose;
      if (purpose) panelPurposes.add(purpose);
      feed.outputRestMa += l.restMa;
      feed.outputAlarmMa += l.alarmMa;
    } else {
      feed.loadRestMa += l.restMa;
      feed.loadAlarmMa += l.alarmMa;
    }
  }

  panelAux.name = panelSupplyName(panelPurposes);

  // Standby battery.
  const outer = out;
  const { profile, standbyH, alarmMin } = resolveStandby(power);
  if (!profile)
    out.push({ code: "standby-profile-unknown", severity: "error", message: "The standby profile chosen is not known; 24 h standby and 5 min in alarm are used", why: "Battery sizes depend on the standby profile.", target: { kind: "layout" } });
  const sf = power.safetyFactor;
  // With a patch, a supply none of whose boards changed is the one from before, findings and all.
  const { touched } = memo;
  const touchedSupplies = new Set<string>();
  if (touched) for (const key of touched) touchedSupplies.add((feedOf.get(key) ?? panelAux).supplyKey);
  const supplyMemo = new Map<string, { fig: SupplyFigures; findings: Finding[] }>();
  for (let i = 0; i < supplies.length; i++) {
    const kept = touched && !touchedSupplies.has(supplies[i].supplyKey) ? memo.supplies.get(supplies[i].supplyKey) : undefined;
    if (kept) {
      supplies[i] = kept.fig;
      bySupply.set(kept.fig.supplyKey, kept.fig);
      supplyMemo.set(kept.fig.supplyKey, kept);
      for (const f of kept.findings) outer.push(f);
      continue;
    }
    const s = supplies[i];
    const out: Finding[] = [];
    supplyMemo.set(s.supplyKey, { fig: s, findings: out });
    const target = { kind: "supply" as const, supplyKey: s.supplyKey };
    if (s.loadRestMa > s.ratingMa || s.loadAlarmMa > s.ratingMa)
      out.push({
        code: "supply-overloaded",
        severity: "error",
        message: `${s.supplyKey === PANEL_KEY ? PANEL_AUX_NAME : s.name} supplies ${fmt(s.loadRestMa)} mA at rest and ${fmt(s.loadAlarmMa)} mA in alarm; it is rated ${fmt(s.ratingMa)} mA`,
        why: "Past its rating the output's protection trips or its voltage sags, and everything on it can drop out. Move boards to a power supply or choose a larger one.",
        target,
      });
    const restMa = (s.batteryRestMa = s.ownRestMa + s.loadRestMa + s.outputRestMa);
    const alarmMa = (s.batteryAlarmMa = s.ownAlarmMa + s.loadAlarmMa + s.outputAlarmMa);
    s.batteryNeededAh = batteryAh({ restMa, alarmMa, standbyH, alarmMin, safetyFactor: sf });
    s.batteryPick = pickBattery(s.batteryNeededAh, s.maxBatteryAh, s.volts);
    // The same labels as the figures panel: "battery load at rest" is own draw plus output load.
    const working = `${fmt(standbyH)} h × ${fmt(restMa)} mA battery load at rest + ${fmt(alarmMin)} min × ${fmt(alarmMa)} mA battery load in alarm = ${fmt(s.batteryNeededAh / sf)} Ah, × ${fmt(sf)}`;
    if (s.batteryNeededAh > s.maxBatteryAh)
      out.push({
        code: "battery-too-large",
        severity: "error",
        message: `${s.name} needs a standby battery of at least ${fmtUp(s.batteryNeededAh)} Ah (${working}); it can charge at most ${fmt(s.maxBatteryAh)} Ah`,
        why: "A battery larger than the charger is rated for does not recharge in time after a mains failure. Split the load onto another supply.",
        target,
      });
    else
      out.push({
        code: "battery-needed",
        severity: "note",
        message: `${s.name}: standby battery of at least ${fmtUp(s.batteryNeededAh)} Ah, ${s.batteryPick ? `fit ${batteryPickText(s.batteryPick)}` : "no standard battery set fits its charger"} (${working}); it can charge up to ${fmt(s.maxBatteryAh)} Ah`,
        why: `Sized for ${profile?.label ?? "24 h and 5 min"}${profile ? ` (${profile.source}). ${CHECK_EDITION}` : "."} ${s.batteryPick ? `Standard sizes are ${STANDARD_BATTERY_AH.join(", ")} Ah.` : "Split the load onto another supply, or choose one whose charger takes a larger battery."}`,
        target,
      });
      for (const f of out) outer.push(f);
  }
  memo.supplies = supplyMemo;
  const fire = profile?.lifeSafety || outcomes.some((o) => o.lifeSafety);
  if (fire)
    out.push({
      code: "battery-fire-caution",
      severity: "note",
      message: "Fire alarm battery sizes here are an estimate; the local fire code and the authority having jurisdiction decide",
      why: "Standby and alarm periods, derating and charger limits for fire systems are set by the local fire code and the authority having jurisdiction; have the calculation checked under licensed practice. Loopwright is an aid, not an approval.",
      target: { kind: "layout" },
    });

  attachBreakdown(r, supplies, feedOf, loads, touched ? touchedSupplies : undefined);
  const outputDevices: OutputDeviceVoltage[] = loads.map((l) => outputDeviceVoltage(l, l.boardKey === PANEL_KEY ? panelAux : (feedOf.get(l.boardKey) ?? panelAux), out));

  // Voltage at each powered detector after the drop on its cable.
  const detectors: DetectorVoltage[] = [];
  const inputMemo: PowerMemo["inputs"] = new Map();
  for (const ri of r.inputs) {
    const feed = feedOf.get(ri.board.key) ?? panelAux;
    let v = touched ? memo.inputs.get(ri) : undefined;
    if (!v || v.feed.supplyKey !== feed.supplyKey) {
      v = { feed, figs: [], findings: [] };
      for (const d of ri.detectors) {
        const p = d.cat.power;
        if (!p) continue;
        let c = voltageCache.get(d.sched.id);
        if (!c || c.fig.supplyKey !== feed.supplyKey || c.fig.supplyVolts !== feed.volts || c.fig.endSupplyVolts !== feed.endVolts || c.panelMinVolts !== panel.minDeviceVolts || c.catId !== d.cat.id) {
          c = voltageAt(d, p, feed, panel.minDeviceVolts);
          voltageCache.set(d.sched.id, c);
        }
        v.figs.push(c.fig);
        if (c.finding) v.findings.push(c.finding);
      }
    }
    inputMemo.set(ri, v);
    for (const f of v.figs) detectors.push(f);
    for (const f of v.findings) out.push(f);
  }
  memo.inputs = inputMemo;
  return { supplies, detectors, outputDevices, battery: { profileId: power.standbyProfileId, source: profile?.source ?? null, standbyH, alarmMin, safetyFactor: sf } };
}
