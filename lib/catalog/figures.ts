import { kindLabel } from "./kinds";
import { CATEGORY_WORDS, SCHEME_WORDS } from "@/lib/vocabulary/words";
import { catalogKinds, type Catalog, type CatalogKind, type Detector, type ExpansionBoard, type InputType, type Keypad, type OutputBlock, type OutputModule, type Panel, type PowerSupply, type Sounder, type Strobe, type WirelessDetector, type WirelessReceiver } from "./schema";

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
    f("outputs", "Outputs", outputsText(p.outputs ?? [{ purpose: "siren", count: 1, switching: "relay", ratingMa: p.sirenOutputMa }])),
    f("maxAreas", "Max areas", p.maxAreas ?? 1),
    ...(p.zoneLabelLength ? [f("zoneLabelLength", "Keypad label length", p.zoneLabelLength, "characters")] : []),
  ];
}

/** "1 siren relay 1000 mA; 4 programmable transistor 100 mA" */
export function outputsText(blocks: OutputBlock[]): string {
  return blocks.map((b) => `${b.count} ${b.purpose} ${b.switching} ${b.ratingMa} mA`).join("; ");
}

const drawFigures = (e: { standbyMa: number; alarmMa: number; minVolts: number }) => [
  f("standbyMa", "Standby draw", e.standbyMa, "mA"),
  f("alarmMa", "Alarm draw", e.alarmMa, "mA"),
  f("minVolts", "Min voltage", e.minVolts, "V"),
];

function sounderFigures(s: Sounder): Figure[] {
  return [f("placement", "Placement", s.placement), ...drawFigures(s), f("ownBattery.chargingMa", "Own battery charging", s.ownBattery ? s.ownBattery.chargingMa : "none", s.ownBattery ? "mA" : ""), f("mounting", "Mounting", s.mounting)];
}

function strobeFigures(s: Strobe): Figure[] {
  return [...drawFigures(s), f("mounting", "Mounting", s.mounting)];
}

function outputModuleFigures(m: OutputModule): Figure[] {
  return [f("families", "Families", m.families.join(", ")), f("outputs", "Outputs", outputsText(m.outputs)), ...busFigures(m)];
}

function receiverFigures(r: WirelessReceiver): Figure[] {
  return [f("families", "Families", r.families.join(", ")), f("maxDevices", "Wireless detectors", r.maxDevices), ...busFigures(r)];
}

function wirelessDetectorFigures(d: WirelessDetector): Figure[] {
  return [
    f("category", "Category", CATEGORY_WORDS[d.category]),
    f("tamper", "Tamper", yesNo(d.tamper)),
    f("lifeSafety", "Life-safety device", yesNo(d.lifeSafety)),
    f("batteryYears", "Battery life", d.batteryYears, "years"),
    f("mounting", "Mounting", d.mounting),
  ];
}

const busFigures = (e: { standbyMa: number; alarmMa: number; takesBusAddress: boolean }) => [
  f("standbyMa", "Standby draw", e.standbyMa, "mA"),
  f("alarmMa", "Alarm draw", e.alarmMa, "mA"),
  f("takesBusAddress", "Takes a bus address", yesNo(e.takesBusAddress)),
];

function boardFigures(b: ExpansionBoard): Figure[] {
  const out = [f("families", "Families", b.families.join(", ")), f("inputs.count", "Inputs", b.inputs.count), f("inputs.inputType", "Input type", b.inputs.inputType), ...busFigures(b)];
  if (b.outputs) out.push(f("outputs", "Outputs", outputsText(b.outputs)));
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
    case "sounders":
      return sounderFigures(entry as Sounder);
    case "strobes":
      return strobeFigures(entry as Strobe);
    case "outputModules":
      return outputModuleFigures(entry as OutputModule);
    case "wirelessReceivers":
      return receiverFigures(entry as WirelessReceiver);
    case "wirelessDetectors":
      return wirelessDetectorFigures(entry as WirelessDetector);
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
