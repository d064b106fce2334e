import type { BomLine } from "@/lib/bom/bill-of-materials";

// How the compare page writes its figures.

export const ma = (x: number) => `${Math.round(x)} mA`;
export const pct = (x: number | null) => (x === null ? "no inputs used" : `${Math.round(x * 100)} %`);
export { plural } from "@/lib/vocabulary/plural";

/** The bill of materials lines that are boards and supplies (not resistors, batteries or cable). */
export const HARDWARE: BomLine["kind"][] = ["panel", "expansion", "keypad", "supply"];

export const SEVERITY_STYLE = { error: "text-fault", warning: "text-warn", note: "text-slate-600" } as const;

const SHARING = " by sharing: ";

/** A summary sentence for "In short": the sharing sentences are listed in full per layout further down. */
export function shortSummary(sentence: string): string {
  const at = sentence.indexOf(SHARING);
  return at < 0 ? sentence : `${sentence.slice(0, at)} by sharing; what each shared input trades is listed below.`;
}

/** Whether column i is best on a measure: not when every layout ties on it. */
export function isBest(best: number[] | undefined, i: number, columns: number): boolean {
  return !!best && best.length < columns && best.includes(i);
}

/** How heavily a supply is loaded in alarm, as a text colour: over its rating, above 80 %, or fine. */
export function loadStyle(alarmLoad: number): string {
  return alarmLoad > 1 ? "font-semibold text-fault" : alarmLoad > 0.8 ? "text-warn" : "text-slate-600";
}
