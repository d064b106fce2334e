import type { Finding } from "@/lib/findings";
import type { SolveResult } from "@/lib/solver/types";
import { plural, pluralWord } from "@/lib/vocabulary/plural";

// Capacity rules over the whole solve: more detectors left to place than the chosen hardware has room for.
// A wired detector waits for an input; a wireless one for a place on a receiver. Both wait for a zone of the panel.

const stillToPlace = (n: number, what = "detector") => `${plural(n, what)} ${pluralWord(n, "is", "are")} still to place`;

/** Wired detectors against free inputs; wireless detectors need no input and are left out. */
export function inputsShortFinding(r: SolveResult): Finding | null {
  const wireless = new Set(r.totals.unplacedWirelessIds);
  const unplaced = r.totals.unplacedIds.filter((id) => !wireless.has(id)).length;
  const free = r.totals.inputsFree;
  if (unplaced <= free || r.boards.length === 0) return null;
  const short = unplaced - free;
  return {
    code: "inputs-short",
    severity: "error",
    message: `${stillToPlace(unplaced, wireless.size ? "wired detector" : "detector")} and ${free === 0 ? "no input is" : `only ${plural(free, "input")} ${pluralWord(free, "is", "are")}`} free: ${plural(short, "input")} short`,
    why: "Every wired detector needs an input of its own (two may share one only where the input type and both detectors allow it), so this hardware cannot carry the device schedule. Add an expansion board or a keypad with inputs, or choose a panel with more inputs.",
    target: { kind: "layout" },
  };
}

/** Every detector still to place, wired or wireless, against the zones the panel has left. */
export function zonesShortFinding(r: SolveResult): Finding | null {
  const unplaced = r.totals.unplacedIds.length;
  const wireless = r.totals.unplacedWirelessIds.length;
  const free = Math.max(0, r.totals.maxZones - r.totals.zonesUsed);
  if (unplaced <= free || r.boards.length === 0) return null;
  return {
    code: "zones-short",
    severity: "error",
    message: `${stillToPlace(unplaced)}${wireless ? ` (${wireless} wireless)` : ""} and the panel has ${free === 0 ? "no zone" : `only ${plural(free, "zone")}`} left: ${plural(unplaced - free, "zone")} short`,
    why: "Each detector, wired or wireless, is reported as a zone of its own, and the panel reports a fixed number of zones. Choose a panel with more zones or fewer detectors.",
    target: { kind: "layout" },
  };
}

/** Wireless detectors still to place against the places left on the layout's wireless receivers. */
export function receiversShortFinding(r: SolveResult): Finding | null {
  const waiting = r.totals.unplacedWirelessIds.length;
  const free = r.receivers.reduce((a, w) => a + Math.max(0, w.maxDevices - w.detectorIds.length), 0);
  if (waiting <= free || r.boards.length === 0) return null;
  return {
    code: "receivers-short",
    severity: "error",
    message: `${stillToPlace(waiting, "wireless detector")} and ${r.receivers.length === 0 ? "the layout has no wireless receiver" : free === 0 ? "no wireless receiver has room" : `the wireless receivers have room for only ${free}`}: ${plural(waiting - free, "place")} short`,
    why: "A wireless detector reports only through a wireless receiver, which learns a limited number. Add a wireless receiver.",
    target: { kind: "layout" },
  };
}

/** The solve with the capacity rules added, errors still first and the counts kept true. */
export function withCapacityCheck(r: SolveResult): SolveResult {
  const fs = [inputsShortFinding(r), zonesShortFinding(r), receiversShortFinding(r)].filter((f): f is Finding => f !== null);
  if (!fs.length) return r;
  return { ...r, findings: [...fs, ...r.findings], counts: { ...r.counts, error: r.counts.error + fs.length } };
}
