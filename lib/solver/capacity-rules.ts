import type { Finding } from "@/lib/findings";
import type { ScheduleDetector } from "@/lib/schedule/schema";
import { plural } from "@/lib/vocabulary/plural";
import { unplacedFinding, type Resolved, type ResolvedInput } from "@/lib/solver/resolve";
import type { BoardFigures, CapacityTotals } from "@/lib/solver/types";
import { SCHEME_WORDS, wiredWords } from "@/lib/vocabulary/words";

// Inputs used per board and in total, zones against the panel, detectors per input.

/** The rules about what one input holds: detector count for its scheme, and a scheme its input type accepts. */
export function inputContentFindings(ri: ResolvedInput): Finding[] {
  const out: Finding[] = [];
  const { input } = ri;
  const target = { kind: "input" as const, boardKey: input.boardKey, input: input.input };
  const where = `${ri.board.name}, input ${input.input}`;
  const n = input.detectorIds.length;
  const allowed = input.scheme === "shared" ? 2 : 1;
  if (n > allowed)
    out.push({
      code: "input-too-many-detectors",
      severity: "error",
      message: `${where} holds ${plural(n, "detector")}; an input ${wiredWords(input.scheme)} takes ${allowed}`,
      why: input.scheme === "shared" ? "A shared input tells two detectors apart by their resistors; a third cannot be decoded." : "The panel would report them as one zone, so nobody could tell which one tripped. Make it a shared input where the input type allows it, or give each its own input.",
      target,
    });
  if (input.scheme === "shared" && n < 2)
    out.push({
      code: "shared-needs-two",
      severity: "error",
      message: `${where} is wired as a shared input with only one detector`,
      why: "The shared scheme's bands expect two detectors' resistors; with one, its readings land in the wrong bands. Wire it single or double end-of-line.",
      target,
    });
  const type = ri.board.inputType;
  if (type && !type.schemes.includes(input.scheme))
    out.push({
      code: "scheme-not-supported",
      severity: "error",
      message: `${where} is ${wiredWords(input.scheme)}, which ${type.name} does not accept (it takes ${type.schemes.map((s) => SCHEME_WORDS[s]).join(", ")})`,
      why: "The input has no bands for this scheme, so its readings would be misread.",
      target,
    });
  return out;
}

/** `wireless`: wireless detectors learnt per receiver board; each is a zone too. */
export function capacityFigures(r: Resolved, schedule: ScheduleDetector[], out: Finding[], wireless: Map<string, number> = new Map()): { boards: BoardFigures[]; totals: CapacityTotals } {
  const used = new Map<string, { inputs: number; detectors: number }>();
  for (const [key, n] of wireless) used.set(key, { inputs: 0, detectors: n });
  for (const ri of r.inputs) {
    const u = used.get(ri.board.key) ?? { inputs: 0, detectors: 0 };
    u.inputs++;
    u.detectors += ri.detectors.length;
    used.set(ri.board.key, u);
  }
  const boards: BoardFigures[] = r.boards.map((b) => {
    const u = used.get(b.key) ?? { inputs: 0, detectors: 0 };
    return {
      boardKey: b.key,
      kind: b.board?.kind ?? "panel",
      catalogId: b.board?.catalogId ?? r.panel.id,
      name: b.name,
      inputsTotal: b.inputCount,
      inputsUsed: u.inputs,
      inputsFree: Math.max(0, b.inputCount - u.inputs),
      detectors: u.detectors,
    };
  });
  const inputsTotal = boards.reduce((s, b) => s + b.inputsTotal, 0);
  const inputsUsed = boards.reduce((s, b) => s + b.inputsUsed, 0);
  const zonesUsed = boards.reduce((s, b) => s + b.detectors, 0);
  const unplaced = schedule.filter((d) => !r.placed.has(d.id));
  if (zonesUsed > r.panel.maxZones)
    out.push({
      code: "zones-over-panel",
      severity: "error",
      message: `${plural(zonesUsed, "zone")} placed; ${r.panel.name} reports at most ${r.panel.maxZones}`,
      why: "The panel cannot report the extra detectors as zones of their own, so they would never reach anyone. Choose a larger panel or fewer detectors.",
      target: { kind: "layout" },
    });
  const un = unplacedFinding(unplaced);
  if (un) out.push(un);
  return {
    boards,
    totals: { inputsTotal, inputsUsed, inputsFree: Math.max(0, inputsTotal - inputsUsed), zonesUsed, maxZones: r.panel.maxZones, detectorsPlaced: zonesUsed, unplacedIds: unplaced.map((d) => d.id), unplacedWirelessIds: unplaced.filter((d) => r.ix.wirelessDetectors.has(d.catalogId)).map((d) => d.id) },
  };
}
