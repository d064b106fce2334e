import { catalogFileSchema, type Catalog } from "@/lib/catalog/schema";
import { fixtureCatalogInput } from "@/lib/solver/testing/fixture-catalog";

// A catalog small enough to search by brute force: one- and two-input boards, so capacity, sharing and power all bind
// with three or four detectors. Input types and detectors come from the fixture catalog.

const panel = fixtureCatalogInput.panels[0];
const exp = fixtureCatalogInput.expansionBoards[0];

export const tinyCatalog: Catalog = catalogFileSchema.parse({
  inputTypes: fixtureCatalogInput.inputTypes,
  detectors: fixtureCatalogInput.detectors,
  panels: [
    { ...panel, id: "tiny-a", name: "Tiny panel A", listPrice: 100, onboardInputs: { count: 1, inputType: "fx-dual" }, maxZones: 8, bus: { maxDevices: 4, addressMin: 1, addressMax: 4, maxCableM: 300 }, auxOutputMa: 150, ownStandbyMa: 50, ownAlarmMa: 90, maxBatteryAh: 7 },
    { ...panel, id: "tiny-b", name: "Tiny panel B", listPrice: 130, onboardInputs: { count: 2, inputType: "fx-shared" }, maxZones: 8, bus: { maxDevices: 3, addressMin: 1, addressMax: 3, maxCableM: 300 }, auxOutputMa: 300, ownStandbyMa: 60, ownAlarmMa: 100, maxBatteryAh: 7 },
    { ...fixtureCatalogInput.panels[2], id: "tiny-fire", name: "Tiny fire panel", listPrice: 120, onboardInputs: { count: 1, inputType: "fx-fire" }, maxZones: 4, bus: { maxDevices: 3, addressMin: 1, addressMax: 3, maxCableM: 300 } },
  ],
  expansionBoards: [
    { ...exp, id: "tiny-exp-1", name: "Tiny expansion 1", listPrice: 30, inputs: { count: 1, inputType: "fx-dual" }, standbyMa: 10, alarmMa: 15 },
    { ...exp, id: "tiny-exp-2s", name: "Tiny expansion 2, shared-capable", listPrice: 50, inputs: { count: 2, inputType: "fx-shared" }, standbyMa: 15, alarmMa: 20 },
    { ...exp, id: "tiny-exp-psu", name: "Tiny expansion 1 with supply", listPrice: 45, inputs: { count: 1, inputType: "fx-dual" }, standbyMa: 20, alarmMa: 25, ownSupply: { outputMa: 300, maxBatteryAh: 7 } },
    { ...exp, id: "tiny-fire-exp", name: "Tiny fire expansion", listPrice: 40, families: ["fx-beta"], inputs: { count: 1, inputType: "fx-fire" }, standbyMa: 10, alarmMa: 30 },
  ],
  keypads: [
    { ...fixtureCatalogInput.keypads[0], id: "tiny-kp", name: "Tiny keypad", listPrice: 20, standbyMa: 20, alarmMa: 40 },
    { ...fixtureCatalogInput.keypads[1], id: "tiny-kp-1", name: "Tiny keypad with an input", listPrice: 28, families: ["fx-alpha", "fx-beta"], inputs: { count: 1, inputType: "fx-dual" }, standbyMa: 25, alarmMa: 45 },
  ],
  powerSupplies: [{ ...fixtureCatalogInput.powerSupplies[0], id: "tiny-psu", name: "Tiny supply", listPrice: 25, outputMa: 400, maxBatteryAh: 7, families: ["fx-alpha", "fx-beta"] }],
});

/**
 * The tiny catalog's alpha family with sounders, strobes, an output module, a wireless receiver and wireless detectors:
 * small enough for brute force with a few of each. Panel A offers two areas and one 200 mA siren output, panel B one
 * area and a 500 mA siren output; the output module's relays carry what the panels' outputs cannot.
 */
export const tinyOutputsCatalog: Catalog = catalogFileSchema.parse({
  inputTypes: fixtureCatalogInput.inputTypes,
  detectors: fixtureCatalogInput.detectors,
  // working voltages lowered to 9 V so a cable of some metres still leaves enough at the battery's end of discharge
  sounders: fixtureCatalogInput.sounders.map((x) => ({ ...x, minVolts: 9 })),
  strobes: fixtureCatalogInput.strobes,
  wirelessDetectors: fixtureCatalogInput.wirelessDetectors,
  panels: [
    { ...tinyCatalog.panels[0], outputs: [{ purpose: "siren", count: 1, switching: "relay", ratingMa: 200 }], maxAreas: 2 },
    { ...tinyCatalog.panels[1], outputs: [{ purpose: "siren", count: 1, switching: "relay", ratingMa: 500 }], maxAreas: 1 },
  ],
  expansionBoards: [tinyCatalog.expansionBoards[0]],
  keypads: [tinyCatalog.keypads[0]],
  powerSupplies: tinyCatalog.powerSupplies,
  outputModules: [{ ...fixtureCatalogInput.outputModules[0], id: "tiny-relays-2", name: "Tiny relay module", listPrice: 20, outputs: [{ purpose: "programmable", count: 2, switching: "relay", ratingMa: 400 }], standbyMa: 10, alarmMa: 30 }],
  wirelessReceivers: [{ ...fixtureCatalogInput.wirelessReceivers[0], id: "tiny-receiver", name: "Tiny receiver", listPrice: 35, maxDevices: 2, standbyMa: 30, alarmMa: 35 }],
});
