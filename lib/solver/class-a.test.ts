// Class A pathways (NFPA 72: the loop returns to the panel, so a single open leaves every device reporting) in the
// layout, the solver and the hardware suggestion.
import { describe, expect, it } from "vitest";
import type { Catalog } from "@/lib/catalog/schema";
import { layoutDocumentSchema } from "@/lib/layout/schema";
import type { Schedule } from "@/lib/schedule/schema";
import { createSolver, solveLayout, suggestHardware } from "@/lib/solver";
import { fixtureCatalog } from "@/lib/solver/testing/fixture-catalog";
import { det, emptyLayout, inp } from "@/lib/solver/testing/fixture-schedule";

const fire = { standbyProfileId: "nfpa72-fire", safetyFactor: 1.25 };
const schedule: Schedule = [det("s1", "fx-smoke", { label: "Stair smoke" }), det("h1", "fx-heat", { label: "Kitchen heat" })];

/** The fixture catalog with a normally closed smoke detector, which a Class A loop can't carry. */
const withNcSmoke: Catalog = {
  ...fixtureCatalog,
  detectors: [...fixtureCatalog.detectors, { ...fixtureCatalog.detectors.find((d) => d.id === "fx-smoke")!, id: "fx-smoke-nc", name: "Smoke detector, NC", contact: "NC" }],
};

describe("Class A in the layout and the solver", () => {
  it("the layout document takes a pathway per input and refuses anything but class-a or class-b", () => {
    const doc = emptyLayout("fx-panel-fire", { power: fire, inputs: [inp("panel", 1, ["s1"], { pathway: "class-a" })] });
    expect(layoutDocumentSchema.safeParse(doc).success).toBe(true);
    const bad = { ...doc, inputs: [{ ...doc.inputs[0], pathway: "class-c" }] };
    expect(layoutDocumentSchema.safeParse(bad).error?.issues[0].path).toEqual(["inputs", 0, "pathway"]);
  });

  it("solves a Class A fire input: every device still reports after a single open, no error", () => {
    const doc = emptyLayout("fx-panel-fire", { power: fire, inputs: [inp("panel", 1, ["s1"], { pathway: "class-a" }), inp("panel", 2, ["h1"])] });
    const r = solveLayout(doc, schedule, fixtureCatalog);
    expect(r.counts.error).toBe(0);
    const [a, b] = r.inputs;
    expect(a.pathway).toBe("class-a");
    expect(a.loop?.classAEveryDeviceReported).toBe(true);
    expect(b.pathway).toBe("class-b");
    expect(b.loop?.classAEveryDeviceReported).toBeUndefined();
  });

  it("an incremental solver sees a change of pathway (the loop cache keys on it)", () => {
    const solver = createSolver([det("n1", "fx-smoke-nc", { label: "Hall smoke" })], withNcSmoke);
    const doc = (pathway: "class-a" | "class-b") => emptyLayout("fx-panel-fire", { power: fire, inputs: [inp("panel", 1, ["n1"], { pathway })] });
    const classB = solver.solve(doc("class-b")).findings.filter((f) => f.target.kind === "input" && f.severity === "error");
    const classA = solver.solve(doc("class-a")).findings.filter((f) => f.target.kind === "input" && f.severity === "error");
    // normally closed contacts in series can't be fed from both ends: the Class A loop is refused
    expect(classA.some((f) => /Class A loop puts each detector's normally open contact across the pair/.test(f.message))).toBe(true);
    expect(classB.some((f) => /Class A/.test(f.message))).toBe(false);
  });
});

describe("suggestHardware with a Class A pathway", () => {
  it("wires each life-safety detector's input Class A, and leaves intruder detectors' inputs Class B", () => {
    const s = suggestHardware(schedule, fixtureCatalog, { allowShared: false, pathway: "class-a" });
    expect(s.found).toBe(true);
    if (!s.found) return;
    expect(s.layout.inputs.map((i) => [i.detectorIds[0], i.pathway])).toEqual([
      ["s1", "class-a"],
      ["h1", "class-a"],
    ]);
    expect(s.result.counts.error).toBe(0);
    expect(s.result.inputs.every((i) => i.pathway === "class-a" && i.loop?.classAEveryDeviceReported === true)).toBe(true);
    // the fixture catalog has no panel with both fire and intruder inputs: an intruder schedule on its own
    const doors = suggestHardware([det("d1", "fx-door", { label: "Front door" })], fixtureCatalog, { allowShared: false, pathway: "class-a" });
    expect(doors.found && doors.layout.inputs.every((i) => i.pathway === undefined)).toBe(true);
  });

  it("says so when a life-safety detector can't be wired Class A", () => {
    const s = suggestHardware([det("n1", "fx-smoke-nc", { label: "Hall smoke" })], withNcSmoke, { allowShared: false, pathway: "class-a" });
    expect(s.found).toBe(false);
    if (!s.found) expect(s.reason).toMatch(/^Hall smoke has no input type in the catalog that carries it as a Class A loop/);
  });

  it("without the option the suggestion stays Class B", () => {
    const s = suggestHardware(schedule, fixtureCatalog, { allowShared: false });
    expect(s.found && s.layout.inputs.every((i) => i.pathway === undefined)).toBe(true);
  });
});
