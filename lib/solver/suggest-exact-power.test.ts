import { beforeAll, describe, expect, it } from "vitest";
import type { Highs } from "highs";
import type { Catalog } from "@/lib/catalog/schema";
import { solveLayout } from "@/lib/solver";
import { highsSolver } from "@/lib/solver/highs-loader";
import { suggestHardware } from "@/lib/solver/suggest";
import { suggestExact } from "@/lib/solver/suggest-exact";
import { board, det, emptyLayout, inp } from "@/lib/solver/testing/fixture-schedule";
import { tinyCatalog } from "@/lib/solver/testing/tiny-catalog";

// Power placement: detectors placed by area without regard to their current, then boards fed first-fit, can load
// a battery past its charger while another placement of the same hardware is powered within every limit.

let highs: Highs;
beforeAll(async () => {
  highs = await highsSolver();
});

// Tiny panel A with two on-board inputs and a charger for at most 1 Ah; one two-input board; a keypad; a supply.
const catalog: Catalog = {
  ...tinyCatalog,
  panels: [{ ...tinyCatalog.panels[0], onboardInputs: { count: 2, inputType: "fx-dual" }, maxBatteryAh: 1 }],
  expansionBoards: [{ ...tinyCatalog.expansionBoards[0], id: "tiny-exp-2", name: "Tiny expansion 2", inputs: { count: 2, inputType: "fx-dual" } }],
};
// Area A: two motion detectors (15 mA at rest, 20 mA in alarm each); area B: two door contacts (no current).
const schedule = [det("m1", "fx-pir", { area: "A", cableM: 5 }), det("m2", "fx-pir", { area: "A", cableM: 5 }), det("c1", "fx-door", { area: "B" }), det("c2", "fx-door", { area: "B" })];
const power = { standbyProfileId: "intruder-grade-2", safetyFactor: 1.2 };

describe("exact power placement", () => {
  it("powers the hardware a first-fit placement overloads, and is cheaper than the older search", () => {
    // The area-first placement: area A fills the panel's inputs (the first host with room for the whole area),
    // area B the board; keypad and board are then fed first-fit, both onto the supply as the panel has no room.
    const firstFit = emptyLayout("tiny-a", {
      busCableM: 0,
      power,
      boards: [board("kp", "keypad", "tiny-kp", 1, { poweredBy: "psu" }), board("e1", "expansion", "tiny-exp-2", 2, { poweredBy: "psu" }), board("psu", "supply", "tiny-psu", 3)],
      inputs: [inp("panel", 1, ["m1"]), inp("panel", 2, ["m2"]), inp("e1", 1, ["c1"]), inp("e1", 2, ["c2"])],
    });
    const overloaded = solveLayout(firstFit, schedule, catalog);
    // panel: (50 + 30 mA) × 12 h + (90 + 40 mA) × 15 min = 992.5 mAh, × 1.2 = 1.191 Ah > 1 Ah
    // (EN 50131-6 grade 2: 12 h standby; 15 min alarm and the 1.2 factor as the profile states)
    expect(overloaded.findings.map((f) => f.code)).toContain("battery-too-large");

    // a generous time limit: the proof must not depend on how busy the machine is
    const s = suggestExact(highs, schedule, catalog, { allowShared: false, power, areas: "none", timeLimitS: 60 });
    expect(s.found).toBe(true);
    if (!s.found) return;
    expect(s.proof.optimal).toBe(true);
    // the same hardware: panel 100 + keypad 20 + board 30 + supply 25 (tiny catalog prices)
    expect(s.cost).toBe(175);
    const again = solveLayout(s.layout, schedule, catalog);
    expect(again.counts.error).toBe(0);
    expect(again.totals.unplacedIds).toEqual([]);
    // the motion detectors are on the board the supply feeds; the door contacts on the panel
    const onPanel = s.layout.inputs.filter((i) => i.boardKey === "panel").flatMap((i) => i.detectorIds);
    expect(onPanel.sort()).toEqual(["c1", "c2"]);

    const old = suggestHardware(schedule, catalog, { allowShared: false, power });
    expect(!old.found || old.cost > s.cost).toBe(true);
  });
});
