import { kindLabel } from "./kinds";
import { CATEGORY_WORDS, SCHEME_WORDS } from "@/lib/vocabulary/words";
import { catalogKinds, type Catalog, type CatalogKind, type Detector, type ExpansionBoard, type InputType, type Keypad, type Panel, type PowerSupply } from "./schema";

/** One figure of an entry for a table cell: `key` is the schema field it comes from. */
export interface Figure {
  key: string;
  label: string;
  value: number | string;
  /** "" when the value has no unit. */
  unit: string;
}

export interface SummaryRow {
  id: string;
  name: string;
  kind: CatalogKind;
  kindLabel: string;
  description: string;
  /** Input types carry no price. */
  listPrice: number | null;
  figures: Figure[];
}

const yesNo = (b: boolean) => (b ? "yes" : "no");
const f = (key: string, label: string, value: number | string, unit = ""): Figure => ({ key, label, value, unit });

function inputTypeFigures(it: InputType): Figure[] {
  const out = [f("schemes", "Wiring schemes", it.schemes.map((s) => SCHEME_WORDS[s]).join(", "))];
  if (it.eolOhms !== undefined) out.push(f("eolOhms", "End-of-line resistor", it.eolOhms, "Ω"));
  if (it.alarmOhms !== undefined) out.push(f("alarmOhms", "Alarm resistor", it.alarmOhms, "Ω"));
  if (it.sharedOhms) out.push(f("sharedOhms", "Shared-input resistors", `${it.sharedOhms[0]} / ${it.sharedOhms[1]}`, "Ω"));
  out.push(f("tolerancePct", "Tolerance", it.tolerancePct, "%"), f("maxLoopOhms", "Max loop resistance", it.maxLoopOhms, "Ω"), f("lifeSafety", "Fire devices allowed", yesNo(it.lifeSafety)));
  return out;
}

function panelFigures(p: Panel): Figure[] {
  return [
    f("family", "Family", p.family),
    f("onboardInputs.count", "On-board inputs", p.onboardInputs.count),
    f("onboardInputs.inputType", "Input type", p.onboardInputs.inputType),
    f("maxZones", "Max zones", p.maxZones),
    f("bus.maxDevices", "Bus devices", p.bus.maxDevices),
    f("bus.address", "Bus addresses", `${p.bus.addressMin}–${p.bus.addressMax}`),
    f("bus.maxCableM", "Bus cable", p.bus.maxCableM, "m"),
    f("auxOutputMa", "Auxiliary output", p.auxOutputMa, "mA"),
    f("sirenOutputMa", "Siren output", p.sirenOutputMa, "mA"),
    f("ownStandbyMa", "Own standby draw", p.ownStandbyMa, "mA"),
    f("ownAlarmMa", "Own alarm draw", p.ownAlarmMa, "mA"),
    f("maxBatteryAh", "Max standby battery", p.maxBatteryAh, "Ah"),
    f("supplyVolts", "Supply", p.supplyVolts, "V"),
    f("minDeviceVolts", "Min device voltage", p.minDeviceVolts, "V"),
  ];
}

const busFigures = (e: { standbyMa: number; alarmMa: number; takesBusAddress: boolean }) => [
  f("standbyMa", "Standby draw", e.standbyMa, "mA"),
  f("alarmMa", "Alarm draw", e.alarmMa, "mA"),
  f("takesBusAddress", "Takes a bus address", yesNo(e.takesBusAddress)),
];

function boardFigures(b: ExpansionBoard): Figure[] {
  const out = [f("families", "Families", b.families.join(", ")), f("inputs.count", "Inputs", b.inputs.count), f("inputs.inputType", "Input type", b.inputs.inputType), ...busFigures(b)];
  if (b.ownSupply) out.push(f("ownSupply.outputMa", "Own supply output", b.ownSupply.outputMa, "mA"), f("ownSupply.maxBatteryAh", "Own max battery", b.ownSupply.maxBatteryAh, "Ah"));
  return out;
}

function keypadFigures(k: Keypad): Figure[] {
  const out = [f("families", "Families", k.families.join(", ")), f("inputs.count", "Inputs", k.inputs?.count ?? 0)];
  if (k.inputs) out.push(f("inputs.inputType", "Input type", k.inputs.inputType));
  return [...out, ...busFigures(k)];
}

function powerSupplyFigures(p: PowerSupply): Figure[] {
  return [
    f("families", "Families", p.families.join(", ")),
    f("outputMa", "Output", p.outputMa, "mA"),
    f("outputVolts", "Output voltage", p.outputVolts, "V"),
    f("maxBatteryAh", "Max standby battery", p.maxBatteryAh, "Ah"),
    ...busFigures(p),
  ];
}

function detectorFigures(d: Detector): Figure[] {
  const out = [
    f("category", "Category", CATEGORY_WORDS[d.category]),
    f("contact", "Contact", d.contact),
    f("tamper", "Tamper loop", yesNo(d.tamper)),
    f("lifeSafety", "Life-safety device", yesNo(d.lifeSafety)),
  ];
  if (d.power)
    out.push(f("power.standbyMa", "Standby draw", d.power.standbyMa, "mA"), f("power.alarmMa", "Alarm draw", d.power.alarmMa, "mA"), f("power.minVolts", "Min voltage", d.power.minVolts, "V"));
  else out.push(f("power", "Power", "unpowered"));
  out.push(f("mounting", "Mounting", d.mounting));
  return out;
}

/** The key figures of one entry, with units. */
export function entryFigures(kind: CatalogKind, entry: Catalog[CatalogKind][number]): Figure[] {
  switch (kind) {
    case "inputTypes":
      return inputTypeFigures(entry as InputType);
    case "panels":
      return panelFigures(entry as Panel);
    case "expansionBoards":
      return boardFigures(entry as ExpansionBoard);
    case "keypads":
      return keypadFigures(entry as Keypad);
    case "powerSupplies":
      return powerSupplyFigures(entry as PowerSupply);
    case "detectors":
      return detectorFigures(entry as Detector);
  }
}

/** One row per entry, kinds in catalog order, for the catalog pages to render as they are. */
export function catalogSummary(catalog: Catalog, kinds: readonly CatalogKind[] = catalogKinds): SummaryRow[] {
  return kinds.flatMap((kind) =>
    (catalog[kind] as Catalog[CatalogKind][number][]).map((entry) => ({
      id: entry.id,
      name: entry.name,
      kind,
      kindLabel: kindLabel[kind],
      description: entry.description,
      listPrice: "listPrice" in entry ? entry.listPrice : null,
      figures: entryFigures(kind, entry),
    })),
  );
}
