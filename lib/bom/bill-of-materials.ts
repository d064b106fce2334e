import type { Catalog, InputType } from "@/lib/catalog/schema";
import { boardEntry, boardInputs, indexCatalog } from "@/lib/layout/catalog-index";
import { PANEL_KEY, type LayoutDocument } from "@/lib/layout/schema";
import { formatOhms } from "@/lib/resistors/format-ohms";
import type { Schedule } from "@/lib/schedule/schema";
import { solveLayout, type SolveResult } from "@/lib/solver";
import { STANDARD_BATTERY_AH } from "@/lib/solver/battery";
import { isLifeSafety } from "@/lib/solver/resolve";

// The bill of materials of a layout: hardware, detectors, resistors and standby batteries, priced from the catalog.

/** Sealed lead-acid standby battery sizes the trade stocks, Ah: the solver's list, so the bill and the battery note agree. */
export const COMMON_BATTERY_AH = STANDARD_BATTERY_AH;

export type BomKind = "panel" | "expansion" | "keypad" | "supply" | "outputs" | "receiver" | "detector" | "sounder" | "strobe" | "resistor" | "battery";

export interface BomLine {
  kind: BomKind;
  /** Catalog id, or a made-up key for resistors and batteries ("eol-4700-5", "battery-7"). */
  key: string;
  catalogId: string | null;
  description: string;
  quantity: number;
  /** From the catalog's listPrice; null where the catalog prices nothing (resistors, batteries). */
  unitPrice: number | null;
  total: number | null;
  note: string | null;
}

export interface BillOfMaterials {
  lines: BomLine[];
  /** Sum of the priced lines. */
  total: number;
  unpricedLines: number;
  notes: string[];
}

/** The smallest common size that holds `neededAh` and the charger takes; null when none does. */
export function batterySize(neededAh: number, maxBatteryAh: number = Infinity): number | null {
  for (const s of COMMON_BATTERY_AH) if (s >= neededAh - 1e-9 && s <= maxBatteryAh + 1e-9) return s;
  return null;
}

const BATTERY_FIRE_CAUTION =
  "Fire alarm battery sizes here are estimates: the local fire code and the authority having jurisdiction decide, and licensed people install and certify the system. Loopwright's figures are an aid, not an approval.";

function add(map: Map<string, BomLine>, line: Omit<BomLine, "total">) {
  const hit = map.get(line.key);
  if (hit) {
    hit.quantity += line.quantity;
    hit.total = hit.unitPrice === null ? null : hit.unitPrice * hit.quantity;
  } else map.set(line.key, { ...line, total: line.unitPrice === null ? null : line.unitPrice * line.quantity });
}

const resistorKey = (ohms: number, tol: number) => `resistor-${ohms}-${tol}`;

export function billOfMaterials(layout: LayoutDocument, schedule: Schedule, catalog: Catalog, solved?: SolveResult): BillOfMaterials {
  const ix = indexCatalog(catalog);
  const result = solved ?? solveLayout(layout, schedule, catalog);
  const lines = new Map<string, BomLine>();
  const notes: string[] = [];
  const panel = ix.panels.get(layout.panelId);
  if (panel) add(lines, { kind: "panel", key: panel.id, catalogId: panel.id, description: panel.name, quantity: 1, unitPrice: panel.listPrice, note: null });
  else notes.push("The control panel chosen is not in the catalog: left out.");

  const typeOf = new Map<string, InputType | undefined>();
  if (panel) typeOf.set(PANEL_KEY, ix.inputTypes.get(panel.onboardInputs.inputType));
  for (const b of layout.boards) {
    const e = boardEntry(ix, b.kind, b.catalogId);
    if (!e) {
      notes.push(`${b.label ?? "A board"}: its hardware is not in the catalog: left out.`);
      continue;
    }
    add(lines, { kind: b.kind, key: e.entry.id, catalogId: e.entry.id, description: e.entry.name, quantity: 1, unitPrice: e.entry.listPrice, note: null });
    const block = boardInputs(e);
    typeOf.set(b.key, block ? ix.inputTypes.get(block.inputType) : undefined);
  }

  const placed = new Set([...result.inputs.flatMap((i) => i.detectorIds), ...(layout.wireless ?? []).flatMap((w) => w.detectorIds)]);
  let unplaced = 0;
  let lifeSafety = false;
  for (const d of schedule) {
    const cat = ix.detectors.get(d.catalogId) ?? ix.wirelessDetectors.get(d.catalogId);
    if (!cat) {
      notes.push(`${d.label}: its detector type is not in the catalog: left out.`);
      continue;
    }
    if (isLifeSafety(cat)) lifeSafety = true;
    if (!placed.has(d.id)) unplaced++;
    add(lines, { kind: "detector", key: cat.id, catalogId: cat.id, description: cat.name, quantity: 1, unitPrice: cat.listPrice, note: null });
  }
  for (const o of layout.outputDevices ?? []) {
    const cat = o.kind === "sounder" ? ix.sounders.get(o.catalogId) : ix.strobes.get(o.catalogId);
    if (!cat) notes.push(`${o.label}: its hardware is not in the catalog: left out.`);
    else add(lines, { kind: o.kind, key: cat.id, catalogId: cat.id, description: cat.name, quantity: 1, unitPrice: cat.listPrice, note: null });
  }
  if (unplaced) notes.push(`${unplaced} detector${unplaced === 1 ? " is" : "s are"} in the schedule but on no input; counted all the same.`);

  // Resistors: every used input, by value and tolerance (the layout's fitted values, else the input type's).
  const byRef = new Map(layout.inputs.map((i) => [`${i.boardKey}#${i.input}`, i]));
  for (const fig of result.inputs) {
    const inp = byRef.get(`${fig.boardKey}#${fig.input}`);
    const type = typeOf.get(fig.boardKey);
    if (!inp || !type || inp.scheme === "none") continue;
    const values: [string, number | undefined][] = [["end-of-line", inp.eolOhms ?? type.eolOhms]];
    if (inp.scheme === "double-eol") values.push(["alarm", inp.alarmOhms ?? type.alarmOhms]);
    if (inp.scheme === "shared") for (const v of inp.sharedOhms ?? type.sharedOhms ?? []) values.push(["shared input", v]);
    for (const [, ohms] of values) {
      if (ohms === undefined) continue;
      add(lines, { kind: "resistor", key: resistorKey(ohms, type.tolerancePct), catalogId: null, description: `Resistor ${formatOhms(ohms)} ±${type.tolerancePct} %`, quantity: 1, unitPrice: null, note: "not priced in the catalog" });
    }
  }

  // Standby batteries: each supply's need from the solver, rounded up to a common size.
  for (const s of result.supplies) {
    if (s.batteryNeededAh <= 0) continue;
    const size = batterySize(s.batteryNeededAh, s.maxBatteryAh);
    const nominalV = s.volts >= 20 ? 24 : 12; // a 13.8 V float charger serves a 12 V battery (common practice, no published source)
    if (size === null) {
      add(lines, {
        kind: "battery",
        key: `battery-none-${s.supplyKey}`,
        catalogId: null,
        description: `${nominalV} V standby battery for ${s.name}`,
        quantity: 1,
        unitPrice: null,
        note: `needs ${s.batteryNeededAh.toFixed(1)} Ah: no common size (${COMMON_BATTERY_AH.join(", ")} Ah) fits within its ${s.maxBatteryAh} Ah charger limit; split the load`,
      });
      continue;
    }
    const key = `battery-${nominalV}v-${size}`;
    add(lines, { kind: "battery", key, catalogId: null, description: `${nominalV} V standby battery, ${size} Ah`, quantity: 1, unitPrice: null, note: null });
    const line = lines.get(key)!;
    const who = `${s.name} (needs ${s.batteryNeededAh.toFixed(1)} Ah)`;
    line.note = line.note ? `${line.note}; ${who}` : `${who}; sizes rounded up to ${COMMON_BATTERY_AH.join(" / ")} Ah (common practice)`;
  }
  if (lifeSafety) notes.push(BATTERY_FIRE_CAUTION);

  const order: BomKind[] = ["panel", "expansion", "keypad", "supply", "outputs", "receiver", "detector", "sounder", "strobe", "resistor", "battery"];
  const ohmsOf = (l: BomLine) => (l.kind === "resistor" ? Number(l.key.split("-")[1]) : 0);
  const list = [...lines.values()].sort((a, b) => order.indexOf(a.kind) - order.indexOf(b.kind) || ohmsOf(a) - ohmsOf(b));
  const total = list.reduce((s, l) => s + (l.total ?? 0), 0);
  return { lines: list, total: Math.round(total * 100) / 100, unpricedLines: list.filter((l) => l.unitPrice === null).length, notes };
}
