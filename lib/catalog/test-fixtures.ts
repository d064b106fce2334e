// Small catalog files for the loader's tests; the line numbers in the comments are the ones the tests expect.

export const inputTypesYaml = [
  "inputTypes:", // 1
  "  - id: it-a", // 2
  "    name: Input A", // 3
  "    description: test", // 4
  "    schemes: [single-eol]", // 5
  "    eolOhms: 4700", // 6
  "    tolerancePct: 5", // 7
  "    maxLoopOhms: 100", // 8
  "    bands:", // 9
  "      single-eol:", // 10
  "        - { report: short, fromOhms: 0, toOhms: 1000 }", // 11
  "        - { report: normal, fromOhms: 1000, toOhms: 6000 }", // 12
  "        - { report: active, fromOhms: 6000, toOhms: null }", // 13
  "",
].join("\n");

export const familyYaml = [
  "panels:", // 1
  "  - id: panel-a", // 2
  "    name: Panel A", // 3
  "    description: test", // 4
  "    listPrice: 100", // 5
  "    family: fam-a", // 6
  "    onboardInputs: { count: 8, inputType: it-a }", // 7
  "    maxZones: 8", // 8
  "    bus:", // 9
  "      maxDevices: 4", // 10
  "      addressMin: 1", // 11
  "      addressMax: 4", // 12
  "      maxCableM: 300", // 13
  "    auxOutputMa: 500", // 14
  "    sirenOutputMa: 1000", // 15
  "    ownStandbyMa: 60", // 16
  "    ownAlarmMa: 100", // 17
  "    maxBatteryAh: 7", // 18
  "    supplyVolts: 13.8", // 19
  "    minDeviceVolts: 10.5", // 20
  "expansionBoards:", // 21
  "  - id: board-a", // 22
  "    name: Board A", // 23
  "    description: test", // 24
  "    listPrice: 50", // 25
  "    families: [fam-a]", // 26
  "    inputs: { count: 8, inputType: it-a }", // 27
  "    standbyMa: 25", // 28
  "    alarmMa: 30", // 29
  "    takesBusAddress: true", // 30
  "",
].join("\n");

/** A double end-of-line and a shared input type, for the resistor-value rules. */
export const schemesYaml = [
  "inputTypes:", // 1
  "  - id: it-double", // 2
  "    name: Double", // 3
  "    description: test", // 4
  "    schemes: [double-eol]", // 5
  "    eolOhms: 2200", // 6
  "    alarmOhms: 6800", // 7
  "    tolerancePct: 5", // 8
  "    maxLoopOhms: 100", // 9
  "    bands:", // 10
  "      double-eol:", // 11
  "        - { report: short, fromOhms: 0, toOhms: 1000 }", // 12
  "        - { report: normal, fromOhms: 1000, toOhms: 4000 }", // 13
  "        - { report: active, fromOhms: 4000, toOhms: 12000 }", // 14
  "        - { report: open, fromOhms: 12000, toOhms: null }", // 15
  "  - id: it-shared", // 16
  "    name: Shared", // 17
  "    description: test", // 18
  "    schemes: [shared]", // 19
  "    eolOhms: 5600", // 20
  "    sharedOhms: [2700, 5600]", // 21
  "    tolerancePct: 5", // 22
  "    maxLoopOhms: 100", // 23
  "    bands:", // 24
  "      shared:", // 25
  "        - { report: short, fromOhms: 0, toOhms: 1200 }", // 26
  "        - { report: normal, fromOhms: 1200, toOhms: 7000 }", // 27
  "        - { report: active-a, fromOhms: 7000, toOhms: 9600 }", // 28
  "        - { report: active-b, fromOhms: 9600, toOhms: 12600 }", // 29
  "        - { report: active-both, fromOhms: 12600, toOhms: 16000 }", // 30
  "        - { report: open, fromOhms: 16000, toOhms: null }", // 31
  "",
].join("\n");

/** Replace exactly one occurrence (so a fixture edit that misses fails loudly). */
export function edit(text: string, from: string, to: string): string {
  const i = text.indexOf(from);
  if (i < 0 || text.indexOf(from, i + 1) >= 0) throw new Error(`fixture edit: "${from}" must occur exactly once`);
  return text.slice(0, i) + to + text.slice(i + from.length);
}
