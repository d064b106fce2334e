import type { PlanPoint } from "./geometry";
import { polylineMetres } from "./polyline";
import type { PlanScale } from "./scale";

// A cable run's length from a route drawn on the plans: each floor's part of the route measured at that floor's
// scale, plus the allowances the drawing cannot show. All in metres.

export interface RouteAllowances {
  /** Slack left at the device end (terminating, a later move of the device). */
  deviceSlackM: number;
  /** Slack at the board end (dressing the cable into the cabinet to its terminal). */
  boardSlackM: number;
  /** Vertical length: the rises between floors the route crosses. */
  riseM: number;
}

/**
 * Starting values for a new route until the organisation sets its own: half a metre at the device, a metre at the
 * board, three metres of rise per floor crossed (common practice, no published source).
 */
export const DEFAULT_DEVICE_SLACK_M = 0.5;
export const DEFAULT_BOARD_SLACK_M = 1;
export const DEFAULT_STOREY_RISE_M = 3;

export function defaultAllowances(floorsCrossed: number): RouteAllowances {
  return { deviceSlackM: DEFAULT_DEVICE_SLACK_M, boardSlackM: DEFAULT_BOARD_SLACK_M, riseM: Math.max(0, floorsCrossed) * DEFAULT_STOREY_RISE_M };
}

/** One floor's part of a route: the polyline drawn on that floor's plan and the plan's scale. */
export interface RouteLeg {
  points: readonly PlanPoint[];
  scale: PlanScale | null;
}

export type RunBasis = "measured-on-plan" | "orthogonal-estimate";

export type RunLength = { ok: true; basis: RunBasis; planM: number; allowanceM: number; totalM: number } | { ok: false; reason: string };

/** Metres to the millimetre: what the schedule stores, so a re-measure that moves nothing changes nothing. */
export const roundMetres = (m: number): number => Math.round(m * 1000) / 1000;

export const allowanceMetres = (a: RouteAllowances): number => a.deviceSlackM + a.boardSlackM + a.riseM;

export function allowancesProblem(a: RouteAllowances): string | null {
  for (const v of [a.deviceSlackM, a.boardSlackM, a.riseM]) if (!Number.isFinite(v) || v < 0) return "Allowances are lengths of zero or more";
  return null;
}

/** plan length × scale, per floor, + device slack + board slack + rise. */
export function measuredRunLength(legs: readonly RouteLeg[], allowances: RouteAllowances): RunLength {
  if (legs.length === 0) return { ok: false, reason: "The route has no points" };
  const problem = allowancesProblem(allowances);
  if (problem) return { ok: false, reason: problem };
  let planM = 0;
  for (const leg of legs) {
    if (!leg.scale) return { ok: false, reason: "A plan the route crosses has no scale yet: calibrate it first" };
    if (leg.points.length < 2 && legs.length === 1) return { ok: false, reason: "A route needs at least two points" };
    planM += polylineMetres(leg.points, leg.scale);
  }
  const allowanceM = allowanceMetres(allowances);
  return { ok: true, basis: "measured-on-plan", planM, allowanceM, totalM: roundMetres(planM + allowanceM) };
}
