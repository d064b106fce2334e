import type { Finding } from "@/lib/findings";
import { plural } from "@/lib/vocabulary/plural";

// What a detector placed on a plan shows: its zone number and its state, told apart by shape and by text, never
// by colour alone (WCAG 2.2 SC 1.4.1 Use of Color).

export type MarkerState = { kind: "unassigned" } | { kind: "assigned"; zone: number } | { kind: "findings"; zone: number | null; errors: number; warnings: number };

/** unassigned: a hollow circle; assigned: a square; with errors or warnings: a triangle. */
export type MarkerShape = "circle" | "square" | "triangle";

export interface Marker {
  shape: MarkerShape;
  /** Printed inside the shape: the zone number, or a dash when the detector is on no input. */
  text: string;
  /** The whole state in words, for screen readers and the tooltip. */
  description: string;
}

interface SolvedLayout {
  zones: readonly { number: number; detectorId: string }[];
  findings: readonly Finding[];
  inputs: readonly { boardKey: string; input: number; detectorIds: readonly string[] }[];
}

/** Each detector's state in one layout: its zone, and the errors and warnings aimed at it or at its input. */
export function markerStates(detectorIds: readonly string[], layout: SolvedLayout | null): Map<string, MarkerState> {
  const out = new Map<string, MarkerState>();
  const zoneOf = new Map(layout?.zones.map((z) => [z.detectorId, z.number]) ?? []);
  const inputOf = new Map<string, string>();
  for (const i of layout?.inputs ?? []) for (const d of i.detectorIds) inputOf.set(d, `${i.boardKey}#${i.input}`);
  for (const id of detectorIds) {
    const zone = zoneOf.get(id) ?? null;
    const onInput = inputOf.get(id);
    let errors = 0;
    let warnings = 0;
    for (const f of layout?.findings ?? []) {
      const t = f.target;
      const aimed = (t.kind === "detector" && t.detectorId === id) || (t.kind === "input" && onInput === `${t.boardKey}#${t.input}`);
      if (!aimed) continue;
      if (f.severity === "error") errors++;
      else if (f.severity === "warning") warnings++;
    }
    if (errors || warnings) out.set(id, { kind: "findings", zone, errors, warnings });
    else out.set(id, zone === null ? { kind: "unassigned" } : { kind: "assigned", zone });
  }
  return out;
}

export function markerOf(label: string, state: MarkerState): Marker {
  switch (state.kind) {
    case "unassigned":
      return { shape: "circle", text: "–", description: `${label}: on no input yet` };
    case "assigned":
      return { shape: "square", text: String(state.zone), description: `${label}: zone ${state.zone}` };
    case "findings": {
      const what = [state.errors ? plural(state.errors, "error") : "", state.warnings ? plural(state.warnings, "warning") : ""].filter(Boolean).join(" and ");
      return { shape: "triangle", text: state.zone === null ? "!" : `${state.zone}!`, description: `${label}: ${state.zone === null ? "no zone" : `zone ${state.zone}`}, ${what}` };
    }
  }
}
