import { z } from "zod";
import { MIN_CALIBRATION_PX } from "./scale";
import { distancePx } from "./geometry";

// Floor plan request schemas, shared by the route handlers, the plan page and the OpenAPI document.

export const planItemKinds = ["detector", "panel", "expansion-board", "keypad", "power-supply", "sounder", "riser"] as const;
export type PlanItemKind = (typeof planItemKinds)[number];
/** What a cable route may end at. */
export const boardKinds: readonly PlanItemKind[] = ["panel", "expansion-board"];

/** Plan pixels: from the top-left corner, within any image the upload accepts. */
const coordinate = z.number("Enter a number").finite("Enter a finite number").min(0, "Keep the point on the plan").max(1_000_000, "Keep the point on the plan");
export const planPointSchema = z.strictObject({ x: coordinate, y: coordinate });

const metres = (what: string) => z.number(`Enter the ${what}`).finite().min(0, `The ${what} cannot be negative`).max(1000, `The ${what} is at most 1000 m`);
const rowId = z.coerce.number().int().positive().max(2 ** 31);

export const calibrateSchema = z
  .strictObject({
    a: planPointSchema,
    b: planPointSchema,
    /** In the organisation's length unit (metres or feet). */
    distance: z.number("Enter the real distance between the two points").finite().positive("Enter a distance of more than zero").max(100_000, "Enter at most 100000"),
  })
  .refine((c) => distancePx(c.a, c.b) >= MIN_CALIBRATION_PX, { path: ["b"], message: `Pick two points at least ${MIN_CALIBRATION_PX} pixels apart` });
export type CalibrateInput = z.infer<typeof calibrateSchema>;

/** What a calibrated plan keeps: the picked points and the distance as typed, in the unit it was typed in. */
export interface PlanCalibration extends CalibrateInput {
  units: "metric" | "imperial";
}

export const placeItemSchema = z.discriminatedUnion("kind", [
  z.strictObject({ kind: z.literal("detector"), detectorId: rowId, x: coordinate, y: coordinate }),
  z.strictObject({ kind: z.enum(planItemKinds.filter((k) => k !== "detector") as [Exclude<PlanItemKind, "detector">, ...Exclude<PlanItemKind, "detector">[]]), label: z.string().trim().max(200, "Use at most 200 characters").default(""), x: coordinate, y: coordinate }),
]);
export type PlaceItemInput = z.infer<typeof placeItemSchema>;

export const moveItemSchema = z.strictObject({ x: coordinate, y: coordinate });

export const routeAllowancesSchema = z.strictObject({ deviceSlackM: metres("slack at the device"), boardSlackM: metres("slack at the board"), riseM: metres("rise between floors") });

export const routeLegSchema = z.strictObject({ planId: rowId, points: z.array(planPointSchema).min(1, "A leg needs at least one point").max(500, "At most 500 points per floor") });
export type StoredRouteLeg = z.infer<typeof routeLegSchema>;

export const saveRouteSchema = z
  .strictObject({
    fromItemId: rowId,
    toItemId: rowId,
    /** One leg per floor, from the device's floor to the board's; omitted allowances take the defaults. */
    legs: z.array(routeLegSchema).min(1, "Draw the route").max(20, "At most 20 floors"),
    allowances: routeAllowancesSchema.optional(),
  })
  .refine((r) => r.legs.length > 1 || r.legs[0].points.length >= 2, { path: ["legs", 0, "points"], message: "A route needs at least two points" })
  .refine((r) => new Set(r.legs.map((l) => l.planId)).size === r.legs.length, { path: ["legs"], message: "Each floor appears once in a route" });
export type SaveRouteInput = z.infer<typeof saveRouteSchema>;
