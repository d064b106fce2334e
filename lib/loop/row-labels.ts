// Plain descriptions of a row and of a report, for findings and the loop bench.
import type { Report } from "@/lib/catalog/schema";
import { REPORT_WORDS } from "@/lib/vocabulary/words";
import type { DetectorState, Fault, LoopDetector } from "./types";

export const FAULT_WORDS: Record<Fault, string> = {
  none: "",
  "short-panel": "a short across the pair at the panel end",
  "short-detector": "a short across the pair at the detector end",
  cut: "one conductor cut",
};

export { REPORT_WORDS };

export function statesLabel(detectors: readonly LoopDetector[], states: readonly DetectorState[]): string {
  let active = "";
  let tampered = "";
  let nActive = 0;
  for (let i = 0; i < states.length; i++) {
    if (states[i] === "active") {
      active = nActive++ === 0 ? detectors[i].label : `${active} and ${detectors[i].label}`;
    } else if (states[i] === "tamper") tampered = tampered === "" ? detectors[i].label : `${tampered} and ${detectors[i].label}`;
  }
  if (nActive === 0 && tampered === "") return "all at rest";
  const a = nActive === 0 ? "" : nActive === states.length && states.length > 2 ? "all active" : `${active} active`;
  const t = tampered === "" ? "" : `${tampered} tamper open`;
  return a && t ? `${a}, ${t}` : a || t;
}

export function rowLabel(detectors: readonly LoopDetector[], states: readonly DetectorState[], fault: Fault): string {
  const s = statesLabel(detectors, states);
  return fault === "none" ? s : `${FAULT_WORDS[fault]} (${s})`;
}

export function reportsWords(reports: readonly Report[]): string {
  if (reports.length === 1) return REPORT_WORDS[reports[0]];
  return reports.map((r) => REPORT_WORDS[r]).join(" or ");
}
