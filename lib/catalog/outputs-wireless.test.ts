import { describe, expect, it } from "vitest";
import { effectiveCatalog, loadCatalogTexts, parseCatalogFile } from "./loader";
import { shippedCatalog } from "./shipped";
import { isLifeSafetyEntry } from "./life-safety";
import { entryFigures } from "./figures";
import { familyYaml, inputTypesYaml } from "./test-fixtures";

// Sounders, strobes, output modules, wireless receivers and wireless detectors: the shipped entries, the loader's
// located refusals, and an organisation's upload of them.

const sounderYaml = [
  "sounders:",
  "  - id: org-sounder", // 2
  "    name: Org outdoor sounder",
  "    description: An outdoor sounder of our own.",
  "    listPrice: 50",
  "    placement: external", // 6
  "    standbyMa: 5",
  "    alarmMa: 250", // 8
  "    minVolts: 10",
  "    ownBattery: { chargingMa: 40 }", // 10
  "    mounting: high on a wall",
].join("\n");

const receiverYaml = [
  "wirelessReceivers:",
  "  - id: org-receiver", // 2
  "    name: Org receiver",
  "    description: Learns 16 detectors.",
  "    listPrice: 80",
  "    families: [fam-a]", // 6
  "    maxDevices: 16",
  "    standbyMa: 30",
  "    alarmMa: 30",
  "    takesBusAddress: true",
].join("\n");

const moduleYaml = [
  "outputModules:",
  "  - id: org-outputs",
  "    name: Org output module",
  "    description: Two relays.",
  "    listPrice: 40",
  "    families: [fam-a]",
  "    outputs:", // 7
  "      - { purpose: siren, count: 2, switching: relay, ratingMa: 1000 }", // 8
  "    standbyMa: 10",
  "    alarmMa: 40",
  "    takesBusAddress: true",
].join("\n");

function errorsOf(text: string) {
  const r = parseCatalogFile(text, "org.yaml");
  if (r.ok) throw new Error("expected the file to be refused");
  return r.errors;
}

describe("the shipped catalog's new kinds", () => {
  const { catalog } = shippedCatalog();
  it("has internal and external sounders, one external with its own battery and a charging current, a strobe, output modules, a receiver and wireless detectors", () => {
    expect(catalog.sounders.map((s) => s.placement).sort()).toEqual(["external", "external", "internal"]);
    const withBattery = catalog.sounders.filter((s) => s.ownBattery);
    expect(withBattery).toHaveLength(1);
    expect(withBattery[0].placement).toBe("external");
    expect(withBattery[0].ownBattery!.chargingMa).toBeGreaterThan(0);
    expect(catalog.strobes.length).toBeGreaterThanOrEqual(1);
    expect(new Set(catalog.outputModules.flatMap((m) => m.outputs.map((o) => o.switching)))).toEqual(new Set(["relay", "transistor"]));
    expect(catalog.wirelessReceivers[0].maxDevices).toBeGreaterThan(0);
    expect(catalog.wirelessDetectors.length).toBeGreaterThanOrEqual(2);
  });
  it("gives every panel outputs with the siren output first, areas, a keypad label length and its zone types", () => {
    for (const p of catalog.panels) {
      expect(p.outputs?.[0].purpose).toBe("siren");
      expect(p.maxAreas).toBeGreaterThanOrEqual(2);
      expect(p.zoneLabelLength).toBeGreaterThanOrEqual(8);
      expect(p.zoneTypes).toContain("entry-exit");
    }
    // a panel without a fire input type does not offer fire zones
    const compact = catalog.panels.find((p) => p.family === "compact")!;
    expect(compact.zoneTypes).not.toContain("fire");
  });
  it("shows the figures of each new kind with units", () => {
    const s = catalog.sounders.find((x) => x.ownBattery)!;
    expect(entryFigures("sounders", s).find((f) => f.key === "ownBattery.chargingMa")).toMatchObject({ value: s.ownBattery!.chargingMa, unit: "mA" });
    expect(entryFigures("wirelessReceivers", catalog.wirelessReceivers[0]).find((f) => f.key === "maxDevices")?.value).toBe(catalog.wirelessReceivers[0].maxDevices);
  });
  it("marks a wireless smoke detector as life safety", () => {
    const smoke = { id: "w-smoke", name: "W smoke", description: "", listPrice: 1, category: "smoke" as const, lifeSafety: true, tamper: false, batteryYears: 5, mounting: "ceiling" };
    expect(isLifeSafetyEntry(catalog, "wirelessDetectors", smoke)).toBe(true);
  });
});

describe("located refusals for the new kinds", () => {
  it("names the unit of a figure written with it", () => {
    const [e] = errorsOf(sounderYaml.replace("alarmMa: 250", "alarmMa: 250 mA"));
    expect(e).toMatchObject({ file: "org.yaml", line: 8, column: 5, path: "sounders.0.alarmMa" });
    expect(e.message).toContain("in milliamps");
  });
  it("refuses an internal sounder with its own battery, at the field", () => {
    const [e] = errorsOf(sounderYaml.replace("placement: external", "placement: internal"));
    expect(e).toMatchObject({ line: 10, path: "sounders.0.ownBattery" });
    expect(e.message).toBe("only an external sounder carries its own battery");
  });
  it("refuses a siren output on an output module", () => {
    const [e] = errorsOf(moduleYaml);
    expect(e).toMatchObject({ line: 8, path: "outputModules.0.outputs.0.purpose" });
  });
  it("refuses an unknown field and a missing one", () => {
    expect(errorsOf(receiverYaml.replace("maxDevices: 16", "maxDevice: 16")).map((e) => e.message)).toEqual(expect.arrayContaining(['unknown field "maxDevice"', 'missing field "maxDevices" (expected number)']));
  });
  it("refuses a panel listing a programmable output before its siren output, and a zone type twice", () => {
    const panel = familyYaml.replace(
      "    maxZones: 8",
      "    maxZones: 8\n    outputs:\n      - { purpose: programmable, count: 2, switching: transistor, ratingMa: 100 }\n      - { purpose: siren, count: 1, switching: relay, ratingMa: 1000 }\n    zoneTypes: [instant, fire, instant]",
    );
    const errors = loadCatalogTexts([
      { fileName: "input-types.yaml", text: inputTypesYaml },
      { fileName: "f.yaml", text: panel },
    ]);
    expect(errors.ok).toBe(false);
    if (errors.ok) return;
    expect(errors.errors.map((e) => [e.path, e.message])).toEqual([
      ["panels.0.outputs.1.purpose", "list siren outputs before programmable outputs"],
      ["panels.0.zoneTypes.2", 'zone type "instant" is listed twice'],
    ]);
  });
  it("refuses a receiver of a family no panel has, when merged", () => {
    const r = loadCatalogTexts([
      { fileName: "input-types.yaml", text: inputTypesYaml },
      { fileName: "family-a.yaml", text: familyYaml },
      { fileName: "r.yaml", text: receiverYaml.replace("[fam-a]", "[fam-z]") },
    ]);
    expect(r.ok ? [] : r.errors).toEqual([{ file: "r.yaml", line: 6, column: 16, path: "wirelessReceivers.0.families.0", message: 'no control panel in the catalog is of family "fam-z"' }]);
  });
});

describe("an organisation's upload of the new kinds", () => {
  it("adds a sounder and a receiver to the catalog", () => {
    const shipped = loadCatalogTexts([
      { fileName: "input-types.yaml", text: inputTypesYaml },
      { fileName: "family-a.yaml", text: familyYaml },
    ]);
    if (!shipped.ok) throw new Error("fixtures must load");
    const parsed = parseCatalogFile(`${sounderYaml}\n${receiverYaml}\n`, "org.yaml");
    expect(parsed.ok ? [] : parsed.errors).toEqual([]);
    if (!parsed.ok) return;
    const r = effectiveCatalog(shipped, parsed.source);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.added).toEqual([
      { kind: "sounders", id: "org-sounder" },
      { kind: "wirelessReceivers", id: "org-receiver" },
    ]);
    expect(r.catalog.sounders[0].ownBattery).toEqual({ chargingMa: 40 });
  });
  it("a file of only the old kinds still loads, with the new lists empty", () => {
    const r = parseCatalogFile(familyYaml, "old.yaml");
    expect(r.ok && [r.catalog.sounders, r.catalog.wirelessDetectors]).toEqual([[], []]);
  });
});
