import { describe, expect, it } from "vitest";
import { analyzeRequest, analyzeRequestAsync } from "./analyze-request";
import { analyzeRequestSchema } from "./loop-schema";
import { testInputType } from "./test-support/input-types";

const loop = {
  scheme: "single-eol",
  placement: "at-detector",
  detectors: [{ label: "Front door", contact: "NC", tamper: true, lifeSafety: false }],
  tolerancePct: 5,
  cable: { gauge: { awg: 22 }, lengthM: 30, tempMinC: 0, tempMaxC: 40 },
  contactOhms: 0.05,
};
const lookup = (id: string) => (id === testInputType.id ? testInputType : undefined);
const issues = (body: unknown) => {
  const r = analyzeRequest(body, lookup);
  if (r.ok) throw new Error("expected the request to be refused");
  return r;
};

describe("analyze request", () => {
  it("analyses with an inline input type or an id, passing the target through", () => {
    const target = { kind: "input", boardKey: "main", input: 2 };
    const a = analyzeRequest({ inputType: testInputType, loop, target }, lookup);
    const b = analyzeRequest({ inputType: testInputType.id, loop, target }, lookup);
    expect(a.ok && b.ok).toBe(true);
    if (a.ok && b.ok) {
      expect(a.analysis.rows).toEqual(b.analysis.rows);
      expect(a.analysis.findings[0].target).toEqual(target);
      expect(a.analysis.resistors[0].ohms).toBe(5600); // the input type's expected value when none is fitted
    }
  });

  it("defaults placement, tamper, life safety and contact resistance", () => {
    const r = analyzeRequestSchema.safeParse({
      inputType: testInputType.id,
      loop: { scheme: "single-eol", detectors: [{ label: "Door", contact: "NC" }], tolerancePct: 5, cable: loop.cable },
    });
    expect(r.success).toBe(true);
    if (r.success) expect(r.data.loop).toMatchObject({ placement: "at-detector", contactOhms: 0.05, detectors: [{ tamper: false, lifeSafety: false }] });
  });

  it("negative length", () => {
    const r = issues({ inputType: testInputType, loop: { ...loop, cable: { ...loop.cable, lengthM: -5 } } });
    expect(r.status).toBe(400);
    expect(r.issues).toContainEqual({ path: "loop.cable.lengthM", message: "cable length can't be negative (-5 m)" });
  });

  it("shared without exactly two detectors", () => {
    const r = issues({ inputType: testInputType, loop: { ...loop, scheme: "shared" } });
    expect(r.issues).toContainEqual({ path: "loop.detectors", message: "a shared input takes exactly two detectors (this loop has 1)" });
  });

  it("scheme not supported by the input type, inline or looked up", () => {
    const seolOnly = { ...testInputType, id: "seol-only", schemes: ["single-eol"], bands: { "single-eol": testInputType.bands["single-eol"] } };
    const r = issues({ inputType: seolOnly, loop: { ...loop, scheme: "double-eol" } });
    expect(r.issues.map((i) => i.message)).toContain("Test input, every scheme does not take double end-of-line wiring (it takes single end-of-line)");
    const r2 = analyzeRequest({ inputType: "seol-only", loop: { ...loop, scheme: "double-eol" } }, () => seolOnly as typeof testInputType);
    expect(r2.ok).toBe(false);
    if (!r2.ok) expect(r2.issues[0]).toMatchObject({ path: "loop.scheme" });
  });

  it("other impossible loops", () => {
    const cases: [unknown, string, RegExp][] = [
      [{ ...loop, cable: { ...loop.cable, tempMinC: 50, tempMaxC: 10 } }, "loop.cable.tempMaxC", /upside down/],
      [{ ...loop, detectors: [] }, "loop.detectors", /at least one detector/],
      [{ ...loop, detectors: [loop.detectors[0], { ...loop.detectors[0], contact: "NO" }] }, "loop.detectors", /can't share one loop/],
      [{ ...loop, eolOhms: 0 }, "loop.eolOhms", /more than 0 Ω/],
      [{ ...loop, cable: { ...loop.cable, gauge: { awg: 22.5 } } }, "loop.cable.gauge.awg", /whole number/],
      [{ ...loop, cable: { ...loop.cable, gauge: { mm2: 0 } } }, "loop.cable.gauge.mm2", /more than 0 mm²/],
      [{ ...loop, tolerancePct: 0 }, "loop.tolerancePct", /more than 0 %/],
      [{ ...loop, placement: "in-the-attic" }, "loop.placement", /at-detector/],
      [{ ...loop, detectors: [{ ...loop.detectors[0], label: "" }] }, "loop.detectors.0.label", /needs a label/],
    ];
    for (const [l, path, msg] of cases) {
      const r = issues({ inputType: testInputType, loop: l });
      const hit = r.issues.find((i) => i.path === path);
      expect(hit, `${path} in ${JSON.stringify(r.issues)}`).toBeDefined();
      expect(hit!.message).toMatch(msg);
    }
  });

  it("resistor values neither fitted nor expected by the input type", () => {
    const bare = { ...testInputType, id: "bare-input", eolOhms: undefined, alarmOhms: undefined };
    delete (bare as Record<string, unknown>).eolOhms;
    delete (bare as Record<string, unknown>).alarmOhms;
    const r = issues({ inputType: bare, loop: { ...loop, scheme: "double-eol" } });
    expect(r.issues.map((i) => i.path)).toEqual(expect.arrayContaining(["loop.eolOhms", "loop.alarmOhms"]));
  });

  it("unknown input type id is a 404; a bad id or input type a 400", async () => {
    expect(issues({ inputType: "no-such-input", loop }).status).toBe(404);
    expect(issues({ inputType: "Not An Id!", loop }).status).toBe(400);
    const bad = issues({ inputType: { ...testInputType, tolerancePct: -1 }, loop });
    expect(bad.issues[0].path).toBe("inputType.tolerancePct");
    const r = await analyzeRequestAsync({ inputType: testInputType.id, loop }, async (id) => lookup(id));
    expect(r.ok).toBe(true);
  });
});
