import fc from "fast-check";
import { describe, it } from "vitest";
import { metresToTyped } from "@/lib/format/length-input";
import { distancePx, manhattanPx } from "./geometry";
import { calibrateScale, measureMetres } from "./scale";
import { polylineLengthPx } from "./polyline";
import { snapPoint } from "./snap";
import { allowanceMetres, measuredRunLength } from "./run-length";

const coord = fc.double({ min: -5000, max: 5000, noNaN: true, noDefaultInfinity: true });
const point = fc.record({ x: coord, y: coord });
const polyline = fc.array(point, { minLength: 2, maxLength: 12 });
const allowance = fc.double({ min: 0, max: 50, noNaN: true });

describe("plan geometry properties", () => {
  it("a polyline is as long walked backwards", () => {
    fc.assert(fc.property(polyline, (line) => Math.abs(polylineLengthPx([...line].reverse()) - polylineLengthPx(line)) <= 1e-9 * (1 + polylineLengthPx(line))));
  });
  it("a polyline is never shorter than the straight line between its ends", () => {
    fc.assert(fc.property(polyline, (line) => polylineLengthPx(line) + 1e-6 >= distancePx(line[0], line[line.length - 1])));
  });
  it("calibrating on two points then measuring them gives back the typed distance", () => {
    fc.assert(
      fc.property(point, point, fc.double({ min: 0.01, max: 10000, noNaN: true }), fc.constantFrom("metric" as const, "imperial" as const), (a, b, typed, units) => {
        fc.pre(distancePx(a, b) >= 4);
        const r = calibrateScale(a, b, typed, units);
        if (!r.ok) return false;
        const back = metresToTyped(measureMetres(a, b, r.scale), units);
        // feet are shown to the hundredth
        return Math.abs(back - typed) <= (units === "imperial" ? 0.005 + typed * 1e-9 : typed * 1e-9);
      }),
    );
  });
  it("a snapped point is never farther than the tolerance, and an unsnapped one does not move", () => {
    fc.assert(
      fc.property(point, fc.array(polyline, { maxLength: 4 }), fc.double({ min: 0, max: 200, noNaN: true }), (p, routes, tol) => {
        const s = snapPoint(p, routes, tol);
        if (s.kind === "none") return s.point === p;
        return distancePx(p, s.point) <= tol + 1e-9;
      }),
    );
  });
  it("the axis-following distance is at least the straight one and at most √2 times it", () => {
    fc.assert(fc.property(point, point, (a, b) => manhattanPx(a, b) + 1e-9 >= distancePx(a, b) && manhattanPx(a, b) <= Math.SQRT2 * distancePx(a, b) + 1e-6));
  });
  it("the run length is the plan length plus the allowances, to the millimetre", () => {
    fc.assert(
      fc.property(polyline, fc.double({ min: 0.0001, max: 1, noNaN: true }), allowance, allowance, allowance, (line, mpp, d, b, rise) => {
        const a = { deviceSlackM: d, boardSlackM: b, riseM: rise };
        const r = measuredRunLength([{ points: line, scale: { metresPerPixel: mpp } }], a);
        return r.ok && Math.abs(r.totalM - (polylineLengthPx(line) * mpp + allowanceMetres(a))) <= 0.0005 + 1e-9;
      }),
    );
  });
});
