import type { SheetBoard, SpareInput } from "@/lib/sheet/sheet-types";

// Words the terminal sheet uses for where a resistor is fitted and what a core carries, on screen and printed.
export const FITTED_WORDS = { "at-detector": "at the detector", "at-panel-terminals": "at the panel terminals", "loop-back": "at the panel, on the loop-back cores" } as const;
export const CARRIES_WORDS = { loop: "loop", "loop-back": "loop-back", power: "power" } as const;

/** The line under a board's name: its input type, bus address and how many inputs it uses. */
export function boardSummary(b: SheetBoard): string {
  const used = b.rows.filter((r) => !r.spare).length;
  const type = b.inputType ? `${b.inputType.name}, parts ±${b.inputType.tolerancePct} %` : "input type unknown";
  return `${type}${b.busAddress !== null ? ` · data bus address ${b.busAddress}` : ""} · ${used} of ${b.rows.length} ${b.rows.length === 1 ? "input" : "inputs"} used`;
}

/** Spare inputs that carry the same note, together: "inputs 9–12, 14: …". */
export function spareGroups(spare: readonly SpareInput[]): { inputs: string; note: string }[] {
  const byNote = new Map<string, number[]>();
  for (const s of spare) byNote.set(s.note, [...(byNote.get(s.note) ?? []), s.input]);
  return [...byNote].map(([note, inputs]) => ({ inputs: `${inputs.length === 1 ? "Input" : "Inputs"} ${ranges(inputs)}`, note }));
}

/** 1, 2, 3, 5 → "1–3, 5". */
export function ranges(numbers: readonly number[]): string {
  const sorted = [...numbers].sort((a, b) => a - b);
  const out: string[] = [];
  for (let i = 0; i < sorted.length; ) {
    let j = i;
    while (j + 1 < sorted.length && sorted[j + 1] === sorted[j] + 1) j++;
    out.push(j > i ? `${sorted[i]}–${sorted[j]}` : `${sorted[i]}`);
    i = j + 1;
  }
  return out.join(", ");
}
