import { manhattanPx, type PlanPoint } from "./geometry";
import { allowanceMetres, allowancesProblem, roundMetres, type RouteAllowances, type RunLength } from "./run-length";
import type { PlanScale } from "./scale";

// Without a drawn route, the run is estimated along the plan's axes (cables follow walls and ceiling grids, so the
// straight line would be short). Between floors the estimate goes through the riser marked on each plan.

export interface PlacedPoint {
  floorId: number;
  point: PlanPoint;
  scale: PlanScale | null;
}

/** Where the vertical riser sits on each floor's plan, by floor id. */
export type RiserPoints = ReadonlyMap<number, PlanPoint>;

const noScale: RunLength = { ok: false, reason: "The plan has no scale yet: calibrate it first" };

export function orthogonalEstimate(device: PlacedPoint, board: PlacedPoint, allowances: RouteAllowances, risers: RiserPoints = new Map()): RunLength {
  const problem = allowancesProblem(allowances);
  if (problem) return { ok: false, reason: problem };
  if (!device.scale || !board.scale) return noScale;
  let planM: number;
  if (device.floorId === board.floorId) {
    planM = manhattanPx(device.point, board.point) * device.scale.metresPerPixel;
  } else {
    const up = risers.get(device.floorId);
    const down = risers.get(board.floorId);
    if (!up || !down) return { ok: false, reason: "Mark the riser on both floors' plans to estimate a run between floors" };
    planM = manhattanPx(device.point, up) * device.scale.metresPerPixel + manhattanPx(down, board.point) * board.scale.metresPerPixel;
  }
  const allowanceM = allowanceMetres(allowances);
  return { ok: true, basis: "orthogonal-estimate", planM, allowanceM, totalM: roundMetres(planM + allowanceM) };
}
