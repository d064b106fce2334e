import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { analyzeLoop, type Fault, type LoopSpec } from "@/lib/loop";
import { shippedCatalog } from "@/lib/catalog/shipped";
import { currentReading, expectedReport, readingInterval, rowStatus, settingsFor, toLoopSpec, withScheme } from "@/components/loop-bench/bench-state";
import { gaugeIn, nearestAwg, resistorAtPanelShort, withRow, withSharedOhms, withState, withTamper } from "@/components/loop-bench/bench-actions";

const inputTypes = shippedCatalog().catalog.inputTypes;
const byId = (id: string) => inputTypes.find((t) => t.id === id)!;

describe("bench settings", () => {
  it("start from what the input type expects: its scheme, values and tolerance, a contact that reads normal at rest", () => {
    for (const t of inputTypes) {
      const s = settingsFor(t);
      expect(t.schemes).toContain(s.scheme);
      expect(s.eolOhms).toBe(t.eolOhms ?? null);
      expect(s.tolerancePct).toBe(t.tolerancePct);
      const a = analyzeLoop(toLoopSpec(s), t);
      expect(a.rows[0].reports, t.id).toEqual(["normal"]);
    }
    // the fire zone input's band table is laid out for normally open detectors (catalog/input-types.yaml)
    expect(settingsFor(byId("input-fire-1k-4k7")).contact).toBe("NO");
    expect(settingsFor(byId("input-2k2")).contact).toBe("NC");
  });
  it("give a shared input two detectors", () => {
    const t = byId("input-5k6");
    const s = withScheme({ ...settingsFor(t), detectorCount: 4 }, t, "shared");
    expect(toLoopSpec(s).detectors.map((d) => d.label)).toEqual(["Detector A", "Detector B"]);
    expect(toLoopSpec(s).sharedOhms).toEqual([2700, 5600]);
  });
});

// The bench works out mixes of states that analyzeLoop does not enumerate (three or four detectors); the same
// computation must give exactly the analysed interval, report and expected report on every row it does enumerate.
describe("readings worked out on the bench agree with analyzeLoop", () => {
  const loopArb = fc
    .record({
      id: fc.constantFrom(...inputTypes.map((t) => t.id)),
      n: fc.integer({ min: 1, max: 4 }),
      contact: fc.constantFrom("NC" as const, "NO" as const),
      placement: fc.constantFrom("at-detector" as const, "at-panel" as const, "loop-back" as const),
      tamper: fc.boolean(),
      lengthM: fc.integer({ min: 0, max: 1000 }),
      mm2: fc.constantFrom(0.14, 0.22, 0.5, 1.5),
      tol: fc.constantFrom(1, 2, 5, 10),
      schemePick: fc.nat(),
    })
    .map((r) => {
      const t = byId(r.id);
      const scheme = t.schemes[r.schemePick % t.schemes.length];
      const n = scheme === "shared" ? 2 : r.n;
      const loop: LoopSpec = {
        scheme,
        placement: r.placement,
        detectors: Array.from({ length: n }, (_, i) => ({ label: `D${i + 1}`, contact: scheme === "shared" ? "NC" : r.contact, tamper: r.tamper, lifeSafety: false })),
        tolerancePct: r.tol,
        cable: { gauge: { mm2: r.mm2 }, lengthM: r.lengthM, tempMinC: -10, tempMaxC: 40 },
        contactOhms: 0.05,
      };
      return { t, loop };
    });
  it("on random loops", () => {
    fc.assert(
      fc.property(loopArb, ({ t, loop }) => {
        const a = analyzeLoop(loop, t);
        expect(a.valid).toBe(true);
        for (const r of a.rows) {
          const iv = readingInterval(loop, t, r.states, r.fault)!;
          expect(iv.minOhms).toBeCloseTo(r.minOhms, 6);
          expect(iv.maxOhms === Infinity ? Infinity : iv.maxOhms).toBeCloseTo(r.maxOhms, 6);
          expect(iv.nominalOhms === Infinity ? Infinity : iv.nominalOhms).toBeCloseTo(r.nominalOhms!, 6);
          expect(iv.reports).toEqual(r.reports);
          expect(expectedReport(loop, r.states, r.fault)).toBe(r.expected);
        }
      }),
      { numRuns: 150 },
    );
  });
  it("returns the analysed row when there is one, a worked-out reading otherwise", () => {
    const t = byId("input-2k2");
    const loop = toLoopSpec({ ...settingsFor(t), detectorCount: 3 });
    const a = analyzeLoop(loop, t);
    expect(currentReading(a, loop, t, ["rest", "rest", "rest"], "none")?.row).toBe(0);
    // two of three active is not enumerated (lib/loop/loop-model.ts enumerateStates): NC in series, so open
    const mix = currentReading(a, loop, t, ["active", "active", "rest"], "none")!;
    expect(mix.row).toBeNull();
    expect(mix.maxOhms).toBe(Infinity);
    expect(mix.reports).toEqual(["active"]);
    expect(mix.label).toBe("Detector 1 and Detector 2 active");
  });
});

describe("row status", () => {
  const row = (reports: string[], expected: string, fault: Fault = "none", uncertain = reports.length > 1) => rowStatus({ reports, expected, fault, uncertain } as Parameters<typeof rowStatus>[0]);
  it("calls a fault that reads normal a defeat, and accepts trouble for a short or an open (lib/loop/README.md)", () => {
    expect(row(["normal"], "short", "short-detector")).toBe("defeat");
    expect(row(["trouble"], "short", "short-panel")).toBe("ok");
    expect(row(["trouble"], "active")).toBe("misread");
    expect(row(["active"], "open", "cut")).toBe("misread");
    expect(row(["normal", "trouble"], "normal")).toBe("uncertain");
    expect(row(["normal"], "normal")).toBe("ok");
  });
});

describe("bench actions", () => {
  const t = byId(inputTypes.find((x) => x.schemes.includes("single-eol") && x.schemes.includes("none"))?.id ?? inputTypes[0].id);
  const base = settingsFor(t);

  it("writes a conductor in the other unit: nearest AWG by area ratio, mm² to two figures", () => {
    // ASTM B258: 22 AWG ≈ 0.326 mm², 24 AWG ≈ 0.205 mm², 18 AWG ≈ 0.823 mm²
    expect(nearestAwg(0.326)).toBe(22);
    expect(nearestAwg(0.22)).toBe(24);
    expect(nearestAwg(0.75)).toBe(18);
    expect(gaugeIn({ unit: "mm2", value: 0.22 }, "awg")).toEqual({ unit: "awg", value: 24 });
    expect(gaugeIn({ unit: "awg", value: 22 }, "mm2")).toEqual({ unit: "mm2", value: 0.33 });
    const same = { unit: "awg" as const, value: 20 };
    expect(gaugeIn(same, "awg")).toBe(same);
  });

  it("sets one detector's state, and takes tamper states back to rest when tamper contacts go", () => {
    const s = withState(withState(base, 1, "tamper"), 2, "active");
    expect(s.states.slice(0, 3)).toEqual(["rest", "tamper", "active"]);
    expect(withTamper(s, false).states.slice(0, 3)).toEqual(["rest", "rest", "active"]);
    expect(withTamper(s, true).states.slice(0, 3)).toEqual(["rest", "tamper", "active"]);
  });

  it("changes one shared resistor, and takes a states-table row with its fault", () => {
    expect(withSharedOhms({ ...base, sharedOhms: [1000, 2200] }, 1, 4700).sharedOhms).toEqual([1000, 4700]);
    expect(withSharedOhms({ ...base, sharedOhms: [1000, 2200] }, 0, null).sharedOhms).toEqual([null, 2200]);
    const row = withRow(withState(base, 3, "active"), ["active", undefined], "cut");
    expect(row.fault).toBe("cut");
    expect(row.states).toEqual(["active", "rest", "rest", "active"]);
  });

  it("shows the lesson: resistor at the panel, short at the detector end, every detector at rest, never left without a resistor", () => {
    const lesson = resistorAtPanelShort({ ...withState(base, 0, "active"), scheme: "none" }, t);
    expect(lesson).toMatchObject({ placement: "at-panel", fault: "short-detector" });
    expect(lesson.scheme).not.toBe("none");
    expect(lesson.states.every((x) => x === "rest")).toBe(true);
  });
});
