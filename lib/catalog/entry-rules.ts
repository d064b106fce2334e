import type { CatalogPath } from "./errors";
import { expectedReadings, type ExpectedReading } from "./expected-readings";
import type { Band, CatalogKind, Detector, ExpansionBoard, InputType, OutputBlock, OutputModule, Panel, Sounder, WiringScheme, WirelessDetector } from "./schema";

/** A rule broken by one entry. `path` is the field at fault; `at` where to point in the file if it differs (a missing field). */
export interface EntryIssue {
  path: CatalogPath;
  at?: CatalogPath;
  message: string;
}

const fmt = (ohms: number) => `${Math.round(ohms * 10) / 10} Ω`;
const bandText = (b: Band) => `${fmt(b.fromOhms)}–${b.toOhms === null ? "∞" : fmt(b.toOhms)} (${b.report})`;
const stateText = {
  rest: "at rest",
  active: "with the detector active",
  "active-a": "with detector A active",
  "active-b": "with detector B active",
  "active-both": "with detectors A and B active",
} as const;
const sharedReports = new Set(["active-a", "active-b", "active-both"]);

function bandIndexAt(bands: Band[], ohms: number): number {
  const i = bands.findIndex((b) => ohms >= b.fromOhms && (b.toOhms === null || ohms < b.toOhms));
  return i < 0 ? bands.length - 1 : i;
}

/** Rules the zod schema cannot express on one input type: each scheme has its values and a band table that reads them right. */
export function inputTypeIssues(it: InputType): EntryIssue[] {
  const issues: EntryIssue[] = [];
  const listed = new Set<WiringScheme>();
  it.schemes.forEach((s, i) => {
    if (listed.has(s)) issues.push({ path: ["schemes", i], message: `scheme "${s}" is listed twice` });
    listed.add(s);
  });
  const needsEol = listed.has("single-eol") || listed.has("double-eol") || listed.has("shared");
  it.schemes.forEach((s, i) => {
    const at: CatalogPath = ["schemes", i];
    if (s !== "none" && it.eolOhms === undefined) issues.push({ path: ["eolOhms"], at, message: `scheme "${s}" is listed but eolOhms is missing` });
    if (s === "double-eol" && it.alarmOhms === undefined)
      issues.push({ path: ["alarmOhms"], at, message: `scheme "double-eol" is listed but alarmOhms (the resistor across the contact) is missing` });
    if (s === "shared" && !it.sharedOhms)
      issues.push({ path: ["sharedOhms"], at, message: `scheme "shared" is listed but sharedOhms (two different values) is missing` });
    if (!it.bands[s]) issues.push({ path: ["bands", s], at: ["bands"], message: `scheme "${s}" is listed but has no band table` });
  });
  if (it.eolOhms !== undefined && !needsEol)
    issues.push({ path: ["eolOhms"], message: "eolOhms is given but no listed scheme uses an end-of-line resistor" });
  if (it.alarmOhms !== undefined && !listed.has("double-eol"))
    issues.push({ path: ["alarmOhms"], message: `alarmOhms is given but "double-eol" is not listed` });
  if (it.sharedOhms) {
    if (!listed.has("shared")) issues.push({ path: ["sharedOhms"], message: `sharedOhms is given but "shared" is not listed` });
    if (it.sharedOhms[0] === it.sharedOhms[1])
      issues.push({ path: ["sharedOhms", 1], message: `the two shared-input values must differ (both ${fmt(it.sharedOhms[0])}): the panel could not tell the detectors apart` });
  }

  for (const [scheme, bands] of Object.entries(it.bands) as [WiringScheme, Band[] | undefined][]) {
    if (!bands) continue;
    if (!listed.has(scheme)) {
      issues.push({ path: ["bands", scheme], message: `band table for "${scheme}", which is not in schemes` });
      continue;
    }
    bands.forEach((b, i) => {
      if (scheme !== "shared" && sharedReports.has(b.report))
        issues.push({ path: ["bands", scheme, i, "report"], message: `"${b.report}" is only for shared inputs` });
    });
    if (scheme === "shared" && it.sharedOhms && it.sharedOhms[0] === it.sharedOhms[1]) continue;
    const expected = expectedReadings(it, scheme);
    if (!expected) continue; // the missing value is reported above
    const misread = (readings: ExpectedReading[]) =>
      readings.filter((e) => {
        const b = bands[bandIndexAt(bands, e.nominalOhms)];
        return !(b.report === e.report && b.fromOhms <= e.minOhms && (b.toOhms === null || e.maxOhms < b.toOhms));
      });
    const wrong = misread(expected);
    // a double end-of-line table may be laid out for NO contacts instead (fire zones)
    if (wrong.length && scheme === "double-eol" && misread(expectedReadings(it, scheme, "NO")!).length === 0) continue;
    for (const e of wrong) {
      const i = bandIndexAt(bands, e.nominalOhms);
      const b = bands[i];
      issues.push({
        path: ["bands", scheme, i],
        message:
          `a sound loop ${stateText[e.state]}` +
          ` reads ${fmt(e.minOhms)}–${fmt(e.maxOhms)} (±${it.tolerancePct} %, up to ${fmt(it.maxLoopOhms)} of loop) and must fall wholly in one "${e.report}" band; band ${i} is ${bandText(b)}` +
          (scheme === "double-eol" ? " (nor does the table read normally open contacts, rest at eol + alarm, active at eol)" : ""),
      });
    }
  }
  return issues;
}

export function panelIssues(p: Panel): EntryIssue[] {
  const issues: EntryIssue[] = [];
  if (p.bus.addressMax < p.bus.addressMin)
    issues.push({ path: ["bus", "addressMax"], message: `addressMax (${p.bus.addressMax}) is below addressMin (${p.bus.addressMin})` });
  else if (p.bus.maxDevices > p.bus.addressMax - p.bus.addressMin + 1)
    issues.push({ path: ["bus", "maxDevices"], message: `maxDevices (${p.bus.maxDevices}) exceeds the ${p.bus.addressMax - p.bus.addressMin + 1} addresses ${p.bus.addressMin}–${p.bus.addressMax}` });
  if (p.minDeviceVolts >= p.supplyVolts)
    issues.push({ path: ["minDeviceVolts"], message: `minDeviceVolts (${p.minDeviceVolts} V) must be below supplyVolts (${p.supplyVolts} V)` });
  if (p.maxZones < p.onboardInputs.count)
    issues.push({ path: ["maxZones"], message: `maxZones (${p.maxZones}) is below the ${p.onboardInputs.count} on-board inputs` });
  if (p.outputs) issues.push(...outputBlockIssues(p.outputs));
  p.zoneTypes?.forEach((t, i) => {
    if (p.zoneTypes!.indexOf(t) !== i) issues.push({ path: ["zoneTypes", i], message: `zone type "${t}" is listed twice` });
  });
  return issues;
}

/** Siren outputs come first, so outputs number the same way on the panel, the sheet and the editor. */
function outputBlockIssues(blocks: OutputBlock[], sirenAllowed = true): EntryIssue[] {
  const issues: EntryIssue[] = [];
  let programmableSeen = false;
  blocks.forEach((b, i) => {
    if (b.purpose === "siren" && !sirenAllowed) issues.push({ path: ["outputs", i, "purpose"], message: "only a control panel has siren outputs; list these as programmable" });
    else if (b.purpose === "siren" && programmableSeen) issues.push({ path: ["outputs", i, "purpose"], message: "list siren outputs before programmable outputs" });
    if (b.purpose === "programmable") programmableSeen = true;
  });
  return issues;
}

export function sounderIssues(s: Sounder): EntryIssue[] {
  // An internal sounder runs from the system's own battery; only an external one carries a battery of its own.
  if (s.ownBattery && s.placement === "internal") return [{ path: ["ownBattery"], message: "only an external sounder carries its own battery" }];
  return [];
}

export function wirelessDetectorIssues(d: WirelessDetector): EntryIssue[] {
  if ((d.category === "smoke" || d.category === "heat") && !d.lifeSafety)
    return [{ path: ["lifeSafety"], message: `a ${d.category} detector is a life-safety device: lifeSafety must be true` }];
  return [];
}

export function detectorIssues(d: Detector): EntryIssue[] {
  // Smoke and heat detectors are fire devices whatever else they are used for.
  if ((d.category === "smoke" || d.category === "heat") && !d.lifeSafety)
    return [{ path: ["lifeSafety"], message: `a ${d.category} detector is a life-safety device: lifeSafety must be true` }];
  return [];
}

/** Rules on one entry alone (no cross references). */
export function entryIssues(kind: CatalogKind, entry: unknown): EntryIssue[] {
  switch (kind) {
    case "inputTypes":
      return inputTypeIssues(entry as InputType);
    case "panels":
      return panelIssues(entry as Panel);
    case "detectors":
      return detectorIssues(entry as Detector);
    case "expansionBoards":
      return (entry as ExpansionBoard).outputs ? outputBlockIssues((entry as ExpansionBoard).outputs!, false) : [];
    case "outputModules":
      return outputBlockIssues((entry as OutputModule).outputs, false);
    case "sounders":
      return sounderIssues(entry as Sounder);
    case "wirelessDetectors":
      return wirelessDetectorIssues(entry as WirelessDetector);
    default:
      return [];
  }
}
