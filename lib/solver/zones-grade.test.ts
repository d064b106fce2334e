import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { layoutDocumentSchema, type LayoutDocument, type ZoneProgram } from "@/lib/layout/schema";
import { solveLayout } from "@/lib/solver";
import { gradeFigures, MAX_ENTRY_S, MAX_EXIT_S, standbyProfileForGrade } from "@/lib/solver/grade-rules";
import { standbyProfile } from "@/lib/solver/standby-profiles";
import { keypadLabel } from "@/lib/solver/zone-rules";
import { fixtureCatalog, zonedCatalog } from "@/lib/solver/testing/fixture-catalog";
import { board, det, emptyLayout, inp } from "@/lib/solver/testing/fixture-schedule";

// Zone programming, areas, wireless detectors and the security grade.

const codes = (doc: LayoutDocument, schedule = [det("d1", "fx-door")], catalog = zonedCatalog) => solveLayout(doc, schedule, catalog).findings.map((f) => f.code);
const oneZone = (zone: Omit<ZoneProgram, "detectorId">, over: Partial<LayoutDocument> = {}) => emptyLayout("fx-panel-small", { inputs: [inp("panel", 1, ["d1"])], zones: [{ detectorId: "d1", ...zone }], ...over });

describe("layouts made before zone programming", () => {
  it("still parse and solve with the same findings as before: every new part is optional", () => {
    const old = { panelId: "fx-panel-small", boards: [], inputs: [{ boardKey: "panel", input: 1, detectorIds: ["s1"], scheme: "double-eol", placement: "at-detector" }], power: { standbyProfileId: "nfpa72-fire", safetyFactor: 1.25 }, busCableM: 0 };
    const parsed = layoutDocumentSchema.parse(old);
    const r = solveLayout(parsed, [det("s1", "fx-smoke"), det("p1", "fx-panic")], fixtureCatalog);
    // a fire device with no programming is a fire zone, so no zone rule fires
    expect(r.zones.map((z) => z.type)).toEqual(["fire"]);
    expect(r.findings.filter((f) => f.code.startsWith("zone-") || f.code.startsWith("area") || f.code.startsWith("output"))).toEqual([]);
  });
});

describe("zone rules", () => {
  it("a life-safety device only on a fire or 24-hour zone", () => {
    const smoke = [det("d1", "fx-smoke")];
    expect(codes(oneZone({ type: "24-hour" }), smoke, fixtureCatalog)).not.toContain("zone-life-safety-type");
    expect(codes(oneZone({ type: "fire" }), smoke, fixtureCatalog)).not.toContain("zone-life-safety-type");
    for (const type of ["instant", "entry-exit", "tamper", "technical", "hold-up"] as const) expect(codes(oneZone({ type }), smoke, fixtureCatalog)).toContain("zone-life-safety-type");
  });

  it("a hold-up device only on a hold-up zone, never part-set", () => {
    const button = [det("d1", "fx-panic")];
    expect(codes(oneZone({ type: "hold-up" }), button)).not.toContain("zone-hold-up-type");
    expect(codes(oneZone({ type: "24-hour" }), button)).toContain("zone-hold-up-type");
    expect(codes(oneZone({ type: "hold-up", partSet: true }), button)).toContain("zone-hold-up-part-set");
    expect(codes(oneZone({ type: "hold-up", partSet: false }), button)).not.toContain("zone-hold-up-part-set");
  });

  it("entry and exit times beyond the grade's limits are errors, only when a grade is chosen", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 600 }), fc.integer({ min: 0, max: 600 }), fc.option(fc.constantFrom(1, 2, 3, 4), { nil: undefined }), (entryS, exitS, grade) => {
        const found = codes(oneZone({ type: "entry-exit", entryS, exitS }, { grade })).filter((c) => c === "zone-time-over-grade").length;
        const expected = grade === undefined ? 0 : Number(entryS > MAX_ENTRY_S) + Number(exitS > MAX_EXIT_S);
        expect(found).toBe(expected);
      }),
      { numRuns: 80 },
    );
  });

  it("times on a zone that is not entry/exit, and an entry route on one that is not instant, are warnings", () => {
    expect(codes(oneZone({ type: "instant", entryS: 30 }))).toContain("zone-option-not-allowed");
    expect(codes(oneZone({ type: "entry-exit", entryRoute: true }))).toContain("zone-option-not-allowed");
    expect(codes(oneZone({ type: "instant", entryRoute: true, chime: true }))).not.toContain("zone-option-not-allowed");
  });

  it("a type the panel does not offer is an error", () => {
    expect(codes(oneZone({ type: "fire" }))).toContain("zone-type-not-offered"); // the zoned fixture panel offers no fire zones
    expect(codes(oneZone({ type: "technical" }))).not.toContain("zone-type-not-offered");
  });
});

describe("keypad labels", () => {
  it("the keypad shows the label's first characters, never more than its length, and says when it cuts", () => {
    fc.assert(
      fc.property(fc.string({ unit: "grapheme", maxLength: 40 }), fc.integer({ min: 4, max: 32 }), (label, n) => {
        const k = keypadLabel(label, n);
        expect([...k.text].length).toBeLessThanOrEqual(n);
        expect(label.startsWith(k.text)).toBe(true);
        expect(k.cut).toBe([...label].length > n);
      }),
    );
  });
  it("a programmed label longer than the panel's is a warning naming what shows", () => {
    const r = solveLayout(oneZone({ type: "instant", keypadLabel: "Back office window" }), [det("d1", "fx-door")], zonedCatalog);
    const f = r.findings.find((x) => x.code === "keypad-label-cut");
    expect(f?.severity).toBe("warning");
    expect(f?.message).toContain('"Back offic"'); // 10 characters on the zoned fixture panel
    expect(r.zones[0]).toMatchObject({ keypadLabel: "Back offic", labelCut: true, label: "Back office window" });
  });
});

describe("areas", () => {
  it("are checked against the panel's maximum", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 6 }), (n) => {
        const areas = Array.from({ length: n }, (_, i) => ({ key: `a${i}`, name: `Area ${i}` }));
        expect(codes(emptyLayout("fx-panel-small", { areas }), []).includes("areas-over-panel")).toBe(n > 2); // the zoned fixture panel sets 2
      }),
      { numRuns: 20 },
    );
  });
  it("a zone without an area goes in the first; each area counts its zones", () => {
    const doc = emptyLayout("fx-panel-small", {
      inputs: [inp("panel", 1, ["d1"]), inp("panel", 2, ["d2"])],
      areas: [
        { key: "off", name: "Offices", keypadKeys: ["k1"] },
        { key: "wh", name: "Warehouse" },
      ],
      boards: [board("k1", "keypad", "fx-keypad", 1)],
      zones: [{ detectorId: "d2", type: "instant", areaKey: "wh", partSet: true }],
    });
    const r = solveLayout(doc, [det("d1", "fx-door"), det("d2", "fx-door")], zonedCatalog);
    expect(r.zones.map((z) => [z.number, z.areaName, z.partSet])).toEqual([
      [1, "Offices", false],
      [2, "Warehouse", true],
    ]);
    expect(r.areas.map((a) => [a.name, a.zones, a.keypadKeys])).toEqual([
      ["Offices", 1, ["k1"]],
      ["Warehouse", 1, []],
    ]);
    expect(r.findings.filter((f) => f.code.startsWith("area"))).toEqual([]);
  });
});

describe("wireless detectors", () => {
  const doc = (n: number) =>
    emptyLayout("fx-panel-small", { boards: [board("r1", "receiver", "fx-receiver", 1)], wireless: [{ boardKey: "r1", detectorIds: Array.from({ length: n }, (_, i) => `w${i}`) }] });
  const sched = (n: number) => Array.from({ length: n }, (_, i) => det(`w${i}`, "fx-w-pir"));
  it("count as zones and against the receiver's limit", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 5 }), (n) => {
        const r = solveLayout(doc(n), sched(n), zonedCatalog);
        expect(r.totals.zonesUsed).toBe(n);
        expect(r.totals.unplacedIds).toEqual([]);
        expect(r.findings.some((f) => f.code === "receiver-over-limit")).toBe(n > 2); // fixture receiver learns 2
        expect(r.zones.every((z) => z.wireless && z.input === null)).toBe(true);
      }),
      { numRuns: 12 },
    );
  });
  it("draw no current: only the receiver's own draw is on the supply", () => {
    const s = solveLayout(doc(2), sched(2), zonedCatalog).supplies[0];
    expect(s.loadAlarmMa).toBe(45); // fixture receiver, 45 mA in alarm
  });
});

describe("the security grade", () => {
  it("selects a standby profile the grade accepts, and the limits it lists name their source", () => {
    for (const g of [1, 2, 3, 4] as const) {
      const fig = gradeFigures(g);
      expect(fig.standbyProfileIds).toContain(standbyProfileForGrade(g));
      expect(standbyProfile(standbyProfileForGrade(g))).toBeDefined();
      for (const rule of fig.rules) expect(rule.source).toMatch(/from memory|trade practice/);
    }
  });
  it("grades 3 and 4 refuse unsupervised inputs and want tamper apart; grades 1 and 2 do not", () => {
    const layout = (grade: number) =>
      emptyLayout("fx-panel-small", { grade, power: { standbyProfileId: standbyProfileForGrade(grade as 1), safetyFactor: 1.2 }, inputs: [inp("panel", 1, ["d1"], { scheme: "none" }), inp("panel", 2, ["p1"], { scheme: "single-eol" })] });
    const sched = [det("d1", "fx-door"), det("p1", "fx-pir")];
    for (const g of [1, 2]) expect(codes(layout(g), sched).filter((c) => c.startsWith("grade-"))).toEqual([]);
    for (const g of [3, 4]) expect(codes(layout(g), sched).filter((c) => c.startsWith("grade-"))).toEqual(["grade-unsupervised", "grade-tamper-not-apart"]);
  });
  it("warns when the battery is sized for another grade", () => {
    expect(codes(emptyLayout("fx-panel-small", { grade: 3 }), [])).toContain("grade-standby-profile"); // the default layout sizes for grades 1–2
    expect(codes(emptyLayout("fx-panel-small", { grade: 2 }), [])).not.toContain("grade-standby-profile");
  });
});
