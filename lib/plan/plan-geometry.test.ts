import { describe, expect, it } from "vitest";
import { calibrateScale, measureMetres } from "./scale";
import { polylineLengthPx, polylineMetres } from "./polyline";
import { snapPoint } from "./snap";
import { defaultAllowances, measuredRunLength } from "./run-length";
import { orthogonalEstimate } from "./orthogonal";

// Hand-worked figures: every expected value below is worked out in the comment beside it.

describe("scale calibration", () => {
  it("metres per pixel from two points and a distance in metres", () => {
    // (100,100)–(400,500): √(300² + 400²) = 500 px; 10 m / 500 px = 0.02 m/px
    const r = calibrateScale({ x: 100, y: 100 }, { x: 400, y: 500 }, 10, "metric");
    expect(r).toEqual({ ok: true, scale: { metresPerPixel: 0.02 }, metres: 10 });
  });
  it("a distance typed in feet is turned into metres first", () => {
    // 50 ft × 0.3048 m/ft = 15.24 m (NIST Handbook 44 Appendix C); 15.24 m / 500 px = 0.03048 m/px
    const r = calibrateScale({ x: 100, y: 100 }, { x: 400, y: 500 }, 50, "imperial");
    expect(r.ok && r.metres).toBe(15.24);
    expect(r.ok && r.scale.metresPerPixel).toBeCloseTo(0.03048, 12);
  });
  it("refuses a zero or negative distance and points on top of each other", () => {
    expect(calibrateScale({ x: 0, y: 0 }, { x: 100, y: 0 }, 0, "metric")).toMatchObject({ ok: false, reason: expect.stringMatching(/more than zero/) });
    expect(calibrateScale({ x: 0, y: 0 }, { x: 100, y: 0 }, -3, "metric").ok).toBe(false);
    expect(calibrateScale({ x: 7, y: 7 }, { x: 8, y: 8 }, 5, "metric")).toMatchObject({ ok: false, reason: expect.stringMatching(/4 pixels apart/) });
  });
  it("measures a straight distance at the scale", () => {
    // (0,0)–(60,80) = 100 px × 0.02 m/px = 2 m
    expect(measureMetres({ x: 0, y: 0 }, { x: 60, y: 80 }, { metresPerPixel: 0.02 })).toBeCloseTo(2, 12);
  });
});

describe("polyline length", () => {
  it("sums its segments", () => {
    // (0,0)→(30,40) is 50 px, (30,40)→(30,100) is 60 px: 110 px; at 0.02 m/px, 2.2 m
    const line = [
      { x: 0, y: 0 },
      { x: 30, y: 40 },
      { x: 30, y: 100 },
    ];
    expect(polylineLengthPx(line)).toBe(110);
    expect(polylineMetres(line, { metresPerPixel: 0.02 })).toBeCloseTo(2.2, 12);
  });
  it("is zero for a single point or none", () => {
    expect(polylineLengthPx([])).toBe(0);
    expect(polylineLengthPx([{ x: 5, y: 5 }])).toBe(0);
  });
});

describe("snapping to routes", () => {
  const route = [
    { x: 0, y: 0 },
    { x: 100, y: 0 },
    { x: 100, y: 100 },
  ];
  it("snaps to a vertex within the tolerance", () => {
    // (103,4) is 5 px from the corner (100,0)
    expect(snapPoint({ x: 103, y: 4 }, [route], 10)).toEqual({ kind: "vertex", point: { x: 100, y: 0 }, route: 0, index: 1 });
  });
  it("snaps to the nearest point of a segment when no vertex is within reach", () => {
    // (50,6) is 6 px above (50,0) on the first segment, 50 px from either end
    expect(snapPoint({ x: 50, y: 6 }, [route], 10)).toEqual({ kind: "segment", point: { x: 50, y: 0 }, route: 0, index: 0 });
  });
  it("prefers a vertex within reach over a nearer segment", () => {
    // (96,8): the corner (100,0) is √(16 + 64) ≈ 8.9 px away, the second segment only 4 px; the corner wins
    expect(snapPoint({ x: 96, y: 8 }, [route], 10)).toMatchObject({ kind: "vertex", point: { x: 100, y: 0 } });
  });
  it("leaves a point out of reach where it is", () => {
    expect(snapPoint({ x: 50, y: 20 }, [route], 10)).toEqual({ kind: "none", point: { x: 50, y: 20 } });
  });
  it("picks the route that is nearest", () => {
    const other = [
      { x: 0, y: 10 },
      { x: 100, y: 10 },
    ];
    // (40,7): 7 px from route 0's first segment, 3 px from route 1
    expect(snapPoint({ x: 40, y: 7 }, [route, other], 10)).toEqual({ kind: "segment", point: { x: 40, y: 10 }, route: 1, index: 0 });
  });
});

describe("run length from a drawn route", () => {
  const scale = { metresPerPixel: 0.02 };
  it("adds the slack at each end to the measured length", () => {
    // 300 px + 400 px = 700 px × 0.02 m/px = 14 m; + 0.5 m device slack + 1 m board slack + 0 rise = 15.5 m
    const r = measuredRunLength(
      [
        {
          points: [
            { x: 0, y: 0 },
            { x: 300, y: 0 },
            { x: 300, y: 400 },
          ],
          scale,
        },
      ],
      defaultAllowances(0),
    );
    expect(r).toEqual({ ok: true, basis: "measured-on-plan", planM: 14, allowanceM: 1.5, totalM: 15.5 });
  });
  it("across two floors, each at its own scale, with the rise between them", () => {
    // floor A: (0,0)→(0,250) = 250 px × 0.02 = 5 m; floor B: 100 px + 60 px = 160 px × 0.05 = 8 m;
    // + 3 m rise + 0.5 m + 1 m slack = 17.5 m
    const r = measuredRunLength(
      [
        {
          points: [
            { x: 0, y: 0 },
            { x: 0, y: 250 },
          ],
          scale,
        },
        {
          points: [
            { x: 10, y: 10 },
            { x: 10, y: 110 },
            { x: 70, y: 110 },
          ],
          scale: { metresPerPixel: 0.05 },
        },
      ],
      defaultAllowances(1),
    );
    expect(r.ok && r.totalM).toBe(17.5);
    expect(r.ok && r.allowanceM).toBe(4.5);
  });
  it("typed allowances replace the defaults", () => {
    // 100 px × 0.02 = 2 m; + 0.25 + 0.75 + 6.4 = 9.4 m
    const r = measuredRunLength(
      [
        {
          points: [
            { x: 0, y: 0 },
            { x: 100, y: 0 },
          ],
          scale,
        },
      ],
      { deviceSlackM: 0.25, boardSlackM: 0.75, riseM: 6.4 },
    );
    expect(r.ok && r.totalM).toBe(9.4);
  });
  it("says why it cannot measure", () => {
    const line = [
      { x: 0, y: 0 },
      { x: 1, y: 1 },
    ];
    expect(measuredRunLength([], defaultAllowances(0))).toMatchObject({ ok: false, reason: expect.stringMatching(/no points/) });
    expect(measuredRunLength([{ points: line, scale: null }], defaultAllowances(0))).toMatchObject({ ok: false, reason: expect.stringMatching(/no scale/) });
    expect(measuredRunLength([{ points: [line[0]], scale }], defaultAllowances(0))).toMatchObject({ ok: false, reason: expect.stringMatching(/two points/) });
    expect(measuredRunLength([{ points: line, scale }], { deviceSlackM: -1, boardSlackM: 0, riseM: 0 })).toMatchObject({ ok: false, reason: expect.stringMatching(/zero or more/) });
  });
});

describe("orthogonal estimate without a route", () => {
  const scale = { metresPerPixel: 0.02 };
  it("runs along the plan's axes on one floor", () => {
    // (100,100)→(400,500): 300 + 400 = 700 px × 0.02 = 14 m (the straight line would be 10 m); + 1.5 m slack = 15.5 m
    const r = orthogonalEstimate({ floorId: 1, point: { x: 100, y: 100 }, scale }, { floorId: 1, point: { x: 400, y: 500 }, scale }, defaultAllowances(0));
    expect(r).toEqual({ ok: true, basis: "orthogonal-estimate", planM: 14, allowanceM: 1.5, totalM: 15.5 });
  });
  it("goes through the riser between floors", () => {
    // floor 1: (100,100)→riser (50,20) = 50 + 80 = 130 px × 0.02 = 2.6 m
    // floor 2: riser (200,200)→(260,120) = 60 + 80 = 140 px × 0.05 = 7 m; + 3 m rise + 1.5 m slack = 14.1 m
    const risers = new Map([
      [1, { x: 50, y: 20 }],
      [2, { x: 200, y: 200 }],
    ]);
    const r = orthogonalEstimate({ floorId: 1, point: { x: 100, y: 100 }, scale }, { floorId: 2, point: { x: 260, y: 120 }, scale: { metresPerPixel: 0.05 } }, defaultAllowances(1), risers);
    expect(r.ok && r.totalM).toBe(14.1);
  });
  it("asks for the riser or the scale when it is missing", () => {
    const r = orthogonalEstimate({ floorId: 1, point: { x: 0, y: 0 }, scale }, { floorId: 2, point: { x: 0, y: 0 }, scale }, defaultAllowances(1));
    expect(r).toMatchObject({ ok: false, reason: expect.stringMatching(/riser/) });
    expect(orthogonalEstimate({ floorId: 1, point: { x: 0, y: 0 }, scale: null }, { floorId: 1, point: { x: 5, y: 0 }, scale }, defaultAllowances(0)).ok).toBe(false);
  });
});
