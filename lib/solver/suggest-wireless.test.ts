import { beforeAll, describe, expect, it } from "vitest";
import type { Highs } from "highs";
import { shippedCatalog } from "@/lib/catalog/shipped";
import { solveLayout } from "@/lib/solver";
import { highsSolver } from "@/lib/solver/highs-loader";
import { suggestHardware } from "@/lib/solver/suggest";
import { suggestExact } from "@/lib/solver/suggest-exact";
import { splitWireless } from "@/lib/solver/suggest-wireless";
import { det } from "@/lib/solver/testing/fixture-schedule";

const { catalog } = shippedCatalog();
const wired = [det("d1", "contact-door-surface"), det("d2", "motion-wall")];
const wireless = [det("w1", "wireless-motion"), det("w2", "wireless-door")];
const schedule = [...wired, ...wireless];

let highs: Highs;
beforeAll(async () => {
  highs = await highsSolver();
});

describe("suggestions with wireless detectors", () => {
  it("splits the schedule by whether the detector type is wireless", () => {
    const s = splitWireless(schedule, catalog);
    expect(s.wired.map((d) => d.id)).toEqual(["d1", "d2"]);
    expect(s.wireless.map((d) => d.id)).toEqual(["w1", "w2"]);
  });

  for (const [name, suggest] of [
    ["the search", () => suggestHardware(schedule, catalog, { allowShared: false })],
    ["the exact model", () => suggestExact(highs, schedule, catalog, { allowShared: false })],
  ] as const)
    it(`${name} puts the wired detectors on inputs and learns the wireless ones on a receiver, priced`, () => {
      const s = suggest();
      expect(s.found).toBe(true);
      if (!s.found) return;
      const wiredOnly = suggestHardware(wired, catalog, { allowShared: false });
      if (!wiredOnly.found) throw new Error("the wired detectors alone have a suggestion");
      const receiver = catalog.wirelessReceivers.find((r) => r.id === "receiver-32")!; // the shipped catalog's one receiver
      expect(s.layout.boards.filter((b) => b.kind === "receiver").map((b) => b.catalogId)).toEqual([receiver.id]);
      const rx = s.layout.boards.find((b) => b.kind === "receiver")!;
      expect(s.layout.wireless?.map((w) => ({ ...w, detectorIds: [...w.detectorIds].sort() }))).toEqual([{ boardKey: rx.key, detectorIds: ["w1", "w2"] }]);
      expect(s.layout.inputs.flatMap((i) => i.detectorIds).sort()).toEqual(["d1", "d2"]);
      expect(s.parts.find((p) => p.kind === "receiver")).toMatchObject({ catalogId: receiver.id, count: 1, unitPrice: receiver.listPrice });
      expect(s.cost).toBeCloseTo(s.parts.reduce((a, p) => a + p.count * p.unitPrice, 0), 6);
      // checked again with the full schedule: nothing left, no error, the receiver on a bus address of its own
      const again = solveLayout(s.layout, schedule, catalog);
      expect(again.counts.error).toBe(0);
      expect(again.totals.unplacedIds).toEqual([]);
      const addresses = s.layout.boards.map((b) => b.busAddress).filter((a) => a !== null);
      expect(new Set(addresses).size).toBe(addresses.length);
    });

  it("says why when no receiver of the panel's family exists", () => {
    const none = { ...catalog, wirelessReceivers: [] };
    const s = suggestHardware(schedule, none, { allowShared: false });
    expect(s.found).toBe(false);
    if (!s.found) expect(s.reason).toMatch(/no wireless receiver of its family/);
  });
});
