import type { ContactType, WiringScheme } from "@/lib/catalog/schema";
import type { Placement } from "@/lib/loop/types";
import type { SheetCore } from "@/lib/sheet/sheet-types";

// Which core of the cable goes where, panel end and far end. The wiring is the loop engine's (lib/loop/README.md):
// tamper contacts in series with the line; NC contacts in series, NO contacts across the pair; a loop-back
// resistor reached through cores 3 and 4, so that it is electrically at the far end of cores 1 and 2.

export interface CoreMapInput {
  scheme: WiringScheme;
  placement: Placement;
  contact: ContactType;
  /** Any detector on the loop has a tamper contact. */
  tamper: boolean;
  /** Any detector on the loop needs power. */
  powered: boolean;
  input: number;
  /** Where the powered detectors take their supply from, e.g. "Control panel auxiliary output". */
  powerFrom?: string | null;
}

/** The loop carries its series resistor on a second pair out and back. */
export function usesLoopBack(scheme: WiringScheme, placement: Placement): boolean {
  return placement === "loop-back" && scheme !== "none";
}

/** NO contacts sit across the pair (single end-of-line and no resistor); every other case is a series chain. */
function acrossThePair(scheme: WiringScheme, contact: ContactType): boolean {
  return contact === "NO" && (scheme === "single-eol" || scheme === "none");
}

function chainWords(scheme: WiringScheme, tamper: boolean): string {
  const parts: string[] = [];
  if (tamper) parts.push("tamper contact");
  if (scheme === "double-eol") parts.push("alarm contact with the alarm resistor across it");
  else if (scheme === "shared") parts.push("each detector's contact with its own resistor across it");
  else parts.push("alarm contact");
  return parts.join(", then ");
}

export function coreMap(c: CoreMapInput): SheetCore[] {
  const plus = `input ${c.input} +`;
  const minus = `input ${c.input} −`;
  const lb = usesLoopBack(c.scheme, c.placement);
  const eolAtFar = c.placement === "at-detector" && c.scheme !== "none";
  const eolAtTerminals = c.placement === "at-panel" && c.scheme !== "none";
  const panelSide = (terminal: string) => (eolAtTerminals ? `${terminal} (the resistor sits at these terminals)` : terminal);
  const cores: SheetCore[] = [];

  if (acrossThePair(c.scheme, c.contact)) {
    const t = c.tamper ? "through the tamper contact to " : "";
    cores.push({ core: 1, carries: "loop", panelEnd: panelSide(plus), farEnd: `${t}one side of the alarm contact` });
    cores.push({
      core: 2,
      carries: "loop",
      panelEnd: panelSide(minus),
      farEnd: eolAtFar ? "other side of the alarm contact; the end-of-line resistor across the contact" : "other side of the alarm contact",
    });
    if (lb) {
      cores.push({ core: 3, carries: "loop-back", panelEnd: "one leg of the end-of-line resistor (not on the input terminals)", farEnd: `joined to core 1 at the alarm contact${c.tamper ? ", after the tamper contact" : ""}` });
      cores.push({ core: 4, carries: "loop-back", panelEnd: "other leg of the end-of-line resistor", farEnd: "joined to core 2 at the alarm contact" });
    }
  } else {
    const chain = chainWords(c.scheme, c.tamper);
    cores.push({ core: 1, carries: "loop", panelEnd: panelSide(plus), farEnd: `start of the chain: ${chain}` });
    if (lb) {
      cores.push({ core: 2, carries: "loop", panelEnd: minus, farEnd: "joined to core 4 (no contact, no resistor)" });
      cores.push({ core: 3, carries: "loop-back", panelEnd: "one leg of the end-of-line resistor (not on the input terminals)", farEnd: "end of the contact chain" });
      cores.push({ core: 4, carries: "loop-back", panelEnd: "other leg of the end-of-line resistor", farEnd: "joined to core 2" });
    } else
      cores.push({
        core: 2,
        carries: "loop",
        panelEnd: panelSide(minus),
        farEnd: eolAtFar ? "end of the chain, through the end-of-line resistor in series" : "end of the chain",
      });
  }
  if (c.powered) {
    const from = c.powerFrom ? ` (${c.powerFrom})` : "";
    const n = cores.length;
    cores.push({ core: n + 1, carries: "power", panelEnd: `+ supply${from}`, farEnd: "detector supply +" });
    cores.push({ core: n + 2, carries: "power", panelEnd: `0 V${from}`, farEnd: "detector supply 0 V" });
  }
  return cores;
}
