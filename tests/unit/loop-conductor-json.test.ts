import { describe, expect, it } from "vitest";
import { analyzeLoop, loopJsonReplacer, loopJsonReviver } from "@/lib/loop";
import { loopAnalysisJsonSchema } from "@/lib/openapi/loop-analysis-schema";
import { testInputType } from "@/lib/loop/test-support/input-types";

describe("conductor faults and Class A in the API's JSON", () => {
  it("an analysis with every conductor fault, and a Class A one, match the documented schema", () => {
    const loop = {
      scheme: "single-eol" as const,
      placement: "loop-back" as const,
      detectors: [{ label: "Door", contact: "NC" as const, tamper: true, lifeSafety: false }],
      tolerancePct: 5,
      cable: { gauge: { mm2: 0.22 }, lengthM: 30, tempMinC: 10, tempMaxC: 40 },
      contactOhms: 0.05,
      conductorFaults: "all" as const,
    };
    const json = (x: unknown) => JSON.parse(JSON.stringify(x, loopJsonReplacer));
    const a = json(analyzeLoop(loop, testInputType));
    expect(a.conductors.faults.length).toBeGreaterThan(30);
    expect(loopAnalysisJsonSchema.safeParse(a).error?.issues ?? []).toEqual([]);
    const classA = json(
      analyzeLoop({ ...loop, placement: "at-detector", conductorFaults: undefined, pathway: "class-a", detectors: [{ label: "Hall", contact: "NO", tamper: false, lifeSafety: true }] }, testInputType),
    );
    expect(classA.classA.opens).toHaveLength(4);
    expect(loopAnalysisJsonSchema.safeParse(classA).error?.issues ?? []).toEqual([]);
    expect(JSON.parse(JSON.stringify(classA), loopJsonReviver).classA.opens[0].rest.maxOhms).toBe(Infinity);
  });
});
