import type { Finding } from "@/lib/findings";
import type { SolveResult } from "@/lib/solver/types";
import { plural, pluralWord } from "@/lib/vocabulary/plural";

// A capacity rule over the whole solve: more detectors left to place
// than there are free inputs means the chosen hardware cannot carry the device schedule.

export function inputsShortFinding(r: SolveResult): Finding | null {
  const unplaced = r.totals.unplacedIds.length;
  const free = r.totals.inputsFree;
  if (unplaced <= free || r.boards.length === 0) return null;
  const short = unplaced - free;
  return {
    code: "inputs-short",
    severity: "error",
    message: `${plural(unplaced, "detector")} ${pluralWord(unplaced, "is", "are")} still to place and ${free === 0 ? "no input is" : `only ${plural(free, "input")} ${pluralWord(free, "is", "are")}`} free: ${plural(short, "input")} short`,
    why: "Every detector needs an input of its own (two may share one only where the input type and both detectors allow it), so this hardware cannot carry the device schedule. Add an expansion board or a keypad with inputs, or choose a panel with more inputs.",
    target: { kind: "layout" },
  };
}

/** The solve with the capacity rule added, errors still first and the counts kept true. */
export function withCapacityCheck(r: SolveResult): SolveResult {
  const f = inputsShortFinding(r);
  if (!f) return r;
  return { ...r, findings: [f, ...r.findings], counts: { ...r.counts, error: r.counts.error + 1 } };
}
