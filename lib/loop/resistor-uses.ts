// The resistors a loop carries: value, what the input type expects, preferred-series check, colour code.
import type { InputType } from "@/lib/catalog/schema";
import { colourBands } from "@/lib/resistors/colour-code";
import { nearestPreferred, preferredSeriesOf, type ESeriesName } from "@/lib/resistors/e-series";
import { fittedValues } from "./loop-problems";
import type { LoopSpec, ResistorUse } from "./types";

const preferredCache = new Map<number, { series: ESeriesName | null; nearest: number[] }>();

export function preferredInfo(ohms: number): { series: ESeriesName | null; nearest: number[] } {
  let hit = preferredCache.get(ohms);
  if (!hit) {
    const series = preferredSeriesOf(ohms);
    hit = { series, nearest: series ? [ohms] : nearestPreferred(ohms, "E24") };
    if (preferredCache.size > 10_000) preferredCache.clear();
    preferredCache.set(ohms, hit);
  }
  return { series: hit.series, nearest: hit.nearest.slice() };
}

export function resistorUses(loop: LoopSpec, inputType: InputType): ResistorUse[] {
  const f = fittedValues(loop, inputType);
  const out: ResistorUse[] = [];
  const tol = loop.tolerancePct;
  if (loop.scheme === "single-eol" || loop.scheme === "double-eol" || loop.scheme === "shared") add(out, "eol", f.eolOhms, inputType.eolOhms, tol);
  if (loop.scheme === "double-eol") add(out, "alarm", f.alarmOhms, inputType.alarmOhms, tol);
  if (loop.scheme === "shared") {
    add(out, "shared-a", f.sharedOhms?.[0], inputType.sharedOhms?.[0], tol);
    add(out, "shared-b", f.sharedOhms?.[1], inputType.sharedOhms?.[1], tol);
  }
  return out;
}

function add(out: ResistorUse[], role: ResistorUse["role"], ohms: number | undefined, expectedOhms: number | undefined, tol: number): void {
  if (ohms === undefined) return;
  out.push({ role, ohms, expectedOhms: expectedOhms ?? null, preferred: preferredInfo(ohms), bands: colourBands(ohms, tol) ?? [] });
}
