// The conductor fault chosen on the loop bench: which kind, which core(s) by colour, and where along the run.
// Pure, so the choices can be tested without a browser.
import { CORE_COLOURS, coresOf, type ConductorFault, type CoreColour, type LoopSpec } from "@/lib/loop";

export type ConductorKind = "short" | "open" | "earth";
export type ConductorPosition = "panel" | "middle" | "detector";

export interface ConductorChoice {
  kind: ConductorKind;
  /** A short takes two cores, the last two picked; an open or an earth fault takes one. */
  cores: CoreColour[];
  position: ConductorPosition;
}

export const CONDUCTOR_KIND_WORDS: Record<ConductorKind | "none", string> = {
  none: "no conductor fault",
  short: "short between two cores",
  open: "one core open",
  earth: "a core to earth",
};

export const POSITION_WORDS: Record<ConductorPosition, string> = { panel: "at the panel end", middle: "in the middle of the run", detector: "at the detector end" };

/** Colours drawn for each core (white drawn with a grey edge so it shows on a light background). */
export const CORE_INK: Record<CoreColour, string> = { yellow: "#c99a06", blue: "#1f5fbf", green: "#2e8b57", white: "#ffffff", red: "#c62828", black: "#1c1c1c" };

export function coreColoursOf(loop: LoopSpec): CoreColour[] {
  return CORE_COLOURS[coresOf(loop)];
}

/** Pick or drop a core: a short keeps the last two picked, the other kinds one. */
export function toggleCore(c: ConductorChoice, colour: CoreColour): ConductorChoice {
  if (c.cores.includes(colour)) return { ...c, cores: c.cores.filter((x) => x !== colour) };
  const keep = c.kind === "short" ? c.cores.slice(-1) : [];
  return { ...c, cores: [...keep, colour] };
}

/** A new kind keeps the cores that still make sense (one for an open or an earth fault). */
export function withKind(c: ConductorChoice | null, kind: ConductorKind | "none"): ConductorChoice | null {
  if (kind === "none") return null;
  const cores = c?.cores ?? [];
  return { kind, cores: kind === "short" ? cores.slice(-2) : cores.slice(-1), position: c?.position ?? "detector" };
}

/** The engine's fault for the choice on this loop's cable, or null while cores are missing or not in the cable. */
export function conductorFaultOf(c: ConductorChoice | null, loop: LoopSpec): ConductorFault | null {
  if (!c) return null;
  const colours = coreColoursOf(loop);
  const cores = c.cores.filter((x) => colours.includes(x));
  const L = loop.cable.lengthM;
  const atM = c.position === "panel" ? 0 : c.position === "detector" ? L : L / 2;
  if (c.kind === "short") return cores.length === 2 ? { kind: "short", cores: [cores[0], cores[1]], atM } : null;
  return cores.length === 1 ? { kind: c.kind, core: cores[0], atM } : null;
}
