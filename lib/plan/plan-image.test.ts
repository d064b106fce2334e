import { describe, expect, it } from "vitest";
import { checkPlanImage, MAX_PLAN_BYTES } from "./plan-image";
import { jpegHeader, pngHeader } from "./test-images";
import { calibrateSchema, placeItemSchema, saveRouteSchema } from "./plan-schema";

describe("plan upload checks", () => {
  it("reads a PNG's width and height from its IHDR chunk", () => {
    // ISO/IEC 15948 §11.2.2: width and height are the first two 4-byte fields of IHDR
    expect(checkPlanImage({ fileName: "ground floor.png", bytes: pngHeader(4961, 3508) })).toEqual({ ok: true, contentType: "image/png", fileName: "ground floor.png", size: 33, width: 4961, height: 3508 });
  });
  it("reads a JPEG's size from its start-of-frame, past the segments before it", () => {
    // ITU-T T.81 B.2.2: SOF holds precision, then height, then width
    expect(checkPlanImage({ fileName: "first.jpeg", bytes: jpegHeader(1200, 800) })).toMatchObject({ ok: true, contentType: "image/jpeg", fileName: "first.jpg", width: 1200, height: 800 });
  });
  it("goes by the bytes, not the name", () => {
    expect(checkPlanImage({ fileName: "plan.jpg", bytes: pngHeader(10, 10) })).toMatchObject({ ok: true, contentType: "image/png", fileName: "plan.png" });
    expect(checkPlanImage({ fileName: "plan.png", bytes: new TextEncoder().encode("%PDF-1.7 not an image") })).toMatchObject({ ok: false, status: 415 });
    expect(checkPlanImage({ fileName: "plan.png", bytes: pngHeader(10, 10).slice(0, 20) })).toMatchObject({ ok: false, status: 415 });
  });
  it("refuses empty, oversized and degenerate images", () => {
    expect(checkPlanImage({ fileName: "a.png", bytes: new Uint8Array() })).toMatchObject({ ok: false, status: 422 });
    const big = new Uint8Array(MAX_PLAN_BYTES + 1);
    big.set(pngHeader(10, 10));
    expect(checkPlanImage({ fileName: "a.png", bytes: big })).toMatchObject({ ok: false, status: 413 });
    expect(checkPlanImage({ fileName: "a.png", bytes: pngHeader(0, 10) })).toMatchObject({ ok: false, status: 422 });
    expect(checkPlanImage({ fileName: "a.png", bytes: pngHeader(20000, 20000) })).toMatchObject({ ok: false, status: 422, reason: expect.stringMatching(/million pixels/) });
  });
});

describe("plan request schemas", () => {
  it("calibration needs two points apart and a positive distance", () => {
    expect(calibrateSchema.safeParse({ a: { x: 0, y: 0 }, b: { x: 500, y: 0 }, distance: 12.5 }).success).toBe(true);
    const close = calibrateSchema.safeParse({ a: { x: 0, y: 0 }, b: { x: 1, y: 1 }, distance: 12.5 });
    expect(close.success || close.error.issues[0].path).toEqual(["b"]);
    expect(calibrateSchema.safeParse({ a: { x: 0, y: 0 }, b: { x: 500, y: 0 }, distance: 0 }).success).toBe(false);
    expect(calibrateSchema.safeParse({ a: { x: -1, y: 0 }, b: { x: 500, y: 0 }, distance: 1 }).success).toBe(false);
  });
  it("a detector is placed by its schedule id, other devices with a label", () => {
    expect(placeItemSchema.parse({ kind: "detector", detectorId: "12", x: 3, y: 4 })).toEqual({ kind: "detector", detectorId: 12, x: 3, y: 4 });
    expect(placeItemSchema.parse({ kind: "panel", x: 3, y: 4 })).toEqual({ kind: "panel", label: "", x: 3, y: 4 });
    expect(placeItemSchema.safeParse({ kind: "detector", x: 3, y: 4 }).success).toBe(false);
    expect(placeItemSchema.safeParse({ kind: "lamp", label: "x", x: 3, y: 4 }).success).toBe(false);
  });
  it("a route has two points on one floor or legs on distinct floors", () => {
    const p = { x: 1, y: 1 };
    expect(saveRouteSchema.safeParse({ fromItemId: 1, toItemId: 2, legs: [{ planId: 1, points: [p, p] }] }).success).toBe(true);
    expect(saveRouteSchema.safeParse({ fromItemId: 1, toItemId: 2, legs: [{ planId: 1, points: [p] }] }).success).toBe(false);
    expect(saveRouteSchema.safeParse({ fromItemId: 1, toItemId: 2, legs: [{ planId: 1, points: [p] }, { planId: 2, points: [p] }] }).success).toBe(true);
    expect(saveRouteSchema.safeParse({ fromItemId: 1, toItemId: 2, legs: [{ planId: 1, points: [p] }, { planId: 1, points: [p] }] }).success).toBe(false);
    expect(saveRouteSchema.safeParse({ fromItemId: 1, toItemId: 2, legs: [{ planId: 1, points: [p, p] }], allowances: { deviceSlackM: -1, boardSlackM: 0, riseM: 0 } }).success).toBe(false);
  });
});
