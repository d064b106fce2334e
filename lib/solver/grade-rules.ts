import type { Finding } from "@/lib/findings";
import type { SecurityGrade } from "@/lib/layout/schema";
import type { ResolvedInput } from "@/lib/solver/resolve";
import { CHECK_EDITION, standbyProfile } from "@/lib/solver/standby-profiles";
import type { GradeFigures } from "@/lib/solver/types";
import { wiredWords } from "@/lib/vocabulary/words";

// What the security grade (EN 50131-1, grades 1 to 4) changes. Clause numbers are not given: the rules below
// are recalled, not checked against a copy of the standard, so each is marked from memory or as trade practice.

/** Where each grade rule comes from, as shown on screen. */
export const GRADE_SOURCES = {
  // EN 50131-1 limits the entry time; 45 s is the figure recalled (from memory).
  entry: `EN 50131-1, entry time (45 s recalled from memory). ${CHECK_EDITION}`,
  // No published exit-time limit is recalled; 60 s is trade practice (common practice, no published source).
  exit: `trade practice, not a clause of a standard. ${CHECK_EDITION}`,
  // EN 50131-6 standby periods by grade (see standby-profiles.ts; from memory).
  standby: `EN 50131-6, standby period by security grade (from memory). ${CHECK_EDITION}`,
  // EN 50131-1 asks higher grades to monitor interconnections and signal tamper apart (from memory).
  supervision: `EN 50131-1, interconnection monitoring and tamper signalling at grades 3 and 4 (from memory). ${CHECK_EDITION}`,
} as const;

export const MAX_ENTRY_S = 45; // EN 50131-1 entry time, from memory
export const MAX_EXIT_S = 60; // common practice, no published source

export function gradeFigures(grade: SecurityGrade): GradeFigures {
  const high = grade >= 3;
  const rules = [
    { text: `Entry time at most ${MAX_ENTRY_S} s`, source: GRADE_SOURCES.entry },
    { text: `Exit time at most ${MAX_EXIT_S} s`, source: GRADE_SOURCES.exit },
    { text: high ? "Standby battery for 30 h (supply fault reported onward) or 60 h" : "Standby battery for 12 h", source: GRADE_SOURCES.standby },
    high
      ? { text: "Every input supervised with an end-of-line resistor; a detector's tamper reported apart from its alarm (double end-of-line)", source: GRADE_SOURCES.supervision }
      : { text: "Unsupervised inputs and tamper in series with the alarm contact accepted", source: GRADE_SOURCES.supervision },
  ];
  return { grade, maxEntryS: MAX_ENTRY_S, maxExitS: MAX_EXIT_S, standbyProfileIds: high ? ["intruder-grade-3-30h", "intruder-grade-3-60h"] : ["intruder-grade-2"], rules };
}

/** The intruder standby profile a grade selects when the designer chooses the grade. */
export function standbyProfileForGrade(grade: SecurityGrade): string {
  return grade >= 3 ? "intruder-grade-3-60h" : "intruder-grade-2";
}

const INTRUDER_PROFILES = new Set(["intruder-grade-2", "intruder-grade-3-30h", "intruder-grade-3-60h"]);

/** The standby profile against the grade, and the supervision each input gives against what the grade asks. */
export function checkGrade(g: GradeFigures, standbyProfileId: string, inputs: ResolvedInput[], out: Finding[]): void {
  if (INTRUDER_PROFILES.has(standbyProfileId) && !g.standbyProfileIds.includes(standbyProfileId)) {
    const want = g.standbyProfileIds.map((id) => standbyProfile(id)?.label ?? id).join(" or ");
    out.push({
      code: "grade-standby-profile",
      severity: "warning",
      message: `The battery is sized for ${standbyProfile(standbyProfileId)?.label ?? "another grade"}; a grade ${g.grade} system asks for ${want}`,
      why: `The standby period follows the security grade (${GRADE_SOURCES.standby})`,
      target: { kind: "layout" },
    });
  }
  if (g.grade < 3) return;
  for (const ri of inputs) {
    const { input } = ri;
    const target = { kind: "input" as const, boardKey: input.boardKey, input: input.input };
    const where = `${ri.board.name}, input ${input.input}`;
    if (input.scheme === "none")
      out.push({
        code: "grade-unsupervised",
        severity: "error",
        message: `${where} is ${wiredWords("none")}; a grade ${g.grade} system supervises every input`,
        why: `Without an end-of-line resistor a short across the loop reads as normal and defeats the detector. ${GRADE_SOURCES.supervision}`,
        target,
      });
    else if (input.scheme !== "double-eol" && ri.detectors.some((d) => d.cat.tamper))
      out.push({
        code: "grade-tamper-not-apart",
        severity: "warning",
        message: `${where} is ${wiredWords(input.scheme)}: its detector's tamper reads the same as its alarm; a grade ${g.grade} system reports tamper apart`,
        why: `Wire it double end-of-line, or take the tamper to an input of its own, so the panel can tell an attack on the detector from an alarm. ${GRADE_SOURCES.supervision}`,
        target,
      });
  }
}
