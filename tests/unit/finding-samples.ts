// Layouts that make the solver say each of its findings, on the fixture catalog (tests only).
import type { Catalog } from "@/lib/catalog/schema";
import type { Schedule } from "@/lib/schedule/schema";
import type { LayoutDocument } from "@/lib/layout/schema";
import { solveLayout } from "@/lib/solver";
import { fixtureCatalog, zonedCatalog } from "@/lib/solver/testing/fixture-catalog";
import { board, catalogWithPanel, det, emptyLayout, inp } from "@/lib/solver/testing/fixture-schedule";

interface Sample {
  doc: LayoutDocument;
  schedule: Schedule;
  catalog?: Catalog;
}

const doors = (n: number) => Array.from({ length: n }, (_, i) => det(`d${i + 1}`, "fx-door"));
const pirs = (n: number, catalogId = "fx-pir") => Array.from({ length: n }, (_, i) => det(`p${i + 1}`, catalogId));

/** The fixture catalog with its first expansion board off the data bus. */
const offBusCatalog: Catalog = { ...fixtureCatalog, expansionBoards: fixtureCatalog.expansionBoards.map((b, i) => (i === 0 ? { ...b, takesBusAddress: false } : b)) };

const samples: Sample[] = [
  // what does not tie up: unknown panel, boards, inputs, detectors
  { doc: emptyLayout("no-such-panel"), schedule: doors(1) },
  { doc: emptyLayout("fx-panel-small", { inputs: [inp("panel", 9, ["d1"]), inp("panel", 1, ["ghost"]), inp("panel", 2, ["d2"]), inp("panel", 3, ["d2"]), inp("nope", 1, ["d3"]), inp("panel", 4, ["d4"]), inp("panel", 4, ["d5"])] }), schedule: doors(5) },
  { doc: emptyLayout("fx-panel-small", { inputs: [inp("panel", 1, ["x"])] }), schedule: [det("x", "no-such-detector", { label: "Plant room sensor" })] },
  { doc: emptyLayout("fx-panel-small", { boards: [board("b1", "expansion", "fx-exp-8", 1), board("b1", "expansion", "fx-exp-8", 2), board("b9", "expansion", "no-such-board", 3)] }), schedule: [] },
  { doc: emptyLayout("fx-panel-small"), schedule: [], catalog: catalogWithPanel("fx-panel-small", { onboardInputs: { count: 8, inputType: "no-such-type" } }) },
  // capacity
  { doc: emptyLayout("fx-panel-small"), schedule: doors(12) },
  { doc: emptyLayout("fx-panel-small", { inputs: doors(4).map((d, i) => inp("panel", i + 1, [d.id])) }), schedule: doors(4), catalog: catalogWithPanel("fx-panel-small", { maxZones: 3 }) },
  {
    doc: emptyLayout("fx-panel-small", { boards: [board("b1", "expansion", "fx-exp-8-shared", 1)], inputs: [inp("panel", 1, ["d1", "d2"], { scheme: "double-eol" }), inp("b1", 1, ["d3"], { scheme: "shared" }), inp("panel", 2, ["d4", "d5"], { scheme: "shared" })] }),
    schedule: doors(5),
  },
  // wireless detectors wait for zones and a receiver, not for inputs
  { doc: emptyLayout("fx-panel-small"), schedule: [...doors(2), ...pirs(3, "fx-w-pir")], catalog: catalogWithPanel("fx-panel-small", { maxZones: 4 }) },
  // loops: sharing, supervision below what the schedule asks, life safety
  { doc: emptyLayout("fx-panel-large", { inputs: [inp("panel", 1, ["a", "b"]), inp("panel", 2, ["c"], { scheme: "single-eol" })] }), schedule: [det("a", "fx-door", { supervision: "shared-ok" }), det("b", "fx-door", { supervision: "double-eol" }), det("c", "fx-door", { supervision: "double-eol" })] },
  { doc: emptyLayout("fx-panel-large", { inputs: [inp("panel", 1, ["s", "a"]), inp("panel", 2, ["h"], { scheme: "single-eol" })] }), schedule: [det("s", "fx-smoke", { label: "Landing smoke" }), det("a", "fx-door", { supervision: "shared-ok" }), det("h", "fx-heat", { label: "Kitchen heat" })] },
  { doc: emptyLayout("fx-panel-fire", { power: { standbyProfileId: "nfpa72-fire", safetyFactor: 1.25 }, inputs: [inp("panel", 1, ["s"])] }), schedule: [det("s", "fx-smoke")] },
  { doc: emptyLayout("fx-panel-small", { inputs: [inp("panel", 1, ["a"]), inp("panel", 2, ["c"])] }), schedule: [det("a", "fx-door", { label: "Front door" }), det("c", "fx-door", { label: "Far shed", cableM: 2000 })] },
  // the data bus
  {
    doc: emptyLayout("fx-panel-small", {
      busCableM: 400,
      boards: [board("b1", "expansion", "fx-exp-8", 1), board("b2", "expansion", "fx-exp-8", 1), board("b3", "keypad", "fx-keypad", 9), board("b4", "keypad", "fx-keypad", null), board("b5", "expansion", "fx-exp-fire-4", 2)],
    }),
    schedule: [],
  },
  { doc: emptyLayout("fx-panel-small", { boards: [board("b1", "expansion", fixtureCatalog.expansionBoards[0].id, 4)] }), schedule: [], catalog: offBusCatalog },
  // power
  { doc: emptyLayout("fx-panel-small", { boards: [board("b1", "expansion", "fx-exp-8", 1), board("b2", "expansion", "fx-exp-8", 2, { poweredBy: "b1" }), board("b3", "expansion", "fx-exp-8-psu", 3, { poweredBy: "b1" })] }), schedule: [] },
  { doc: emptyLayout("fx-panel-small", { power: { standbyProfileId: "no-such-profile", safetyFactor: 1.2 } }), schedule: [] },
  { doc: emptyLayout("fx-panel-small", { inputs: pirs(8, "fx-pir-hungry").map((d, i) => inp("panel", i + 1, [d.id])) }), schedule: pirs(8, "fx-pir-hungry"), catalog: catalogWithPanel("fx-panel-small", { maxBatteryAh: 1, auxOutputMa: 100 }) },
  { doc: emptyLayout("fx-panel-small", { inputs: [inp("panel", 1, ["h1"]), inp("panel", 2, ["p1"])] }), schedule: [det("h1", "fx-pir-hungry", { cableM: 300, gauge: { awg: 24 } }), det("p1", "fx-pir", { cableM: 600, gauge: { awg: 24 } })] },
  // zone programming, areas and the security grade
  {
    doc: emptyLayout("fx-panel-small", {
      grade: 3,
      boards: [board("k1", "keypad", "fx-keypad", 1)],
      areas: [
        { key: "a1", name: "Offices", keypadKeys: ["k1", "nope"] },
        { key: "a2", name: "Warehouse" },
        { key: "a3", name: "Yard" },
      ],
      inputs: [
        inp("panel", 1, ["d1"]),
        inp("panel", 2, ["s1"]),
        inp("panel", 3, ["h1"]),
        inp("panel", 4, ["pb"]),
        inp("panel", 5, ["pb2"]),
        inp("panel", 6, ["d2"], { scheme: "none" }),
        inp("panel", 7, ["p1"], { scheme: "single-eol" }),
        inp("panel", 8, ["d4"]),
        inp("k1", 1, ["d5"]),
      ],
      zones: [
        { detectorId: "d1", type: "entry-exit", entryS: 60, exitS: 90, entryRoute: true },
        { detectorId: "s1", type: "instant" },
        { detectorId: "h1", type: "fire" },
        { detectorId: "pb", type: "instant" },
        { detectorId: "pb2", type: "hold-up", partSet: true },
        { detectorId: "d2", type: "instant", entryS: 20, areaKey: "ghost" },
        { detectorId: "d4", type: "instant", keypadLabel: "Back office window" },
        { detectorId: "x9", type: "instant" },
      ],
    }),
    schedule: [det("d1", "fx-door", { label: "Front" }), det("s1", "fx-smoke", { label: "Stair" }), det("h1", "fx-heat", { label: "Kitchen" }), det("pb", "fx-panic", { label: "Till" }), det("pb2", "fx-panic", { label: "Safe" }), det("d2", "fx-door", { label: "Back" }), det("p1", "fx-pir", { label: "Hall" }), det("d4", "fx-door", { label: "Window" }), det("d5", "fx-door")],
    catalog: zonedCatalog,
  },
  // outputs, sounders and strobes, wireless detectors
  {
    doc: emptyLayout("fx-panel-small", {
      boards: [board("m1", "outputs", "fx-relays-4", 1), board("r1", "receiver", "fx-receiver", 2)],
      inputs: [inp("panel", 1, ["w4"])],
      outputDevices: [
        { id: "o1", kind: "sounder", catalogId: "fx-sounder-out", label: "Front sounder", cableM: 20, gauge: { awg: 22 } },
        { id: "o2", kind: "sounder", catalogId: "fx-sounder-out-bat", label: "Rear sounder", cableM: 20, gauge: { awg: 22 } },
        { id: "o3", kind: "strobe", catalogId: "fx-strobe", label: "Gate strobe", cableM: 20, gauge: { awg: 22 } },
        { id: "o4", kind: "sounder", catalogId: "fx-sounder-in", label: "Hall sounder", cableM: 10, gauge: { awg: 22 } },
        { id: "o5", kind: "sounder", catalogId: "no-such-sounder", label: "Old sounder", cableM: 10, gauge: { awg: 22 } },
        { id: "o6", kind: "sounder", catalogId: "fx-sounder-out", label: "Far sounder", cableM: 400, gauge: { awg: 24 } },
      ],
      outputs: [
        { boardKey: "panel", output: 2, deviceIds: ["o1", "o3"] },
        { boardKey: "panel", output: 9, deviceIds: ["o4"] },
        { boardKey: "panel", output: 1, deviceIds: ["ghost", "o2", "o5"] },
        { boardKey: "m1", output: 1, deviceIds: ["o1", "o6"] },
      ],
      wireless: [
        { boardKey: "r1", detectorIds: ["w1", "w2", "w3", "wx", "dw"] },
        { boardKey: "m1", detectorIds: ["w5"] },
      ],
    }),
    schedule: [det("w1", "fx-w-pir"), det("w2", "fx-w-door"), det("w3", "fx-w-pir"), det("w4", "fx-w-pir", { label: "Lobby" }), det("w5", "fx-w-door"), det("dw", "fx-door", { label: "Shed" })],
    catalog: zonedCatalog,
  },
];

/** Every finding of every sample, message and reason together. */
export function solverSamples(): { code: string; text: string }[] {
  return samples.flatMap((s) => solveLayout(s.doc, s.schedule, s.catalog ?? fixtureCatalog).findings.map((f) => ({ code: f.code, text: `${f.message} — ${f.why}` })));
}
