// One shape for everything the loop engine and the solver report.
export type Severity = "error" | "warning" | "note";

export type FindingTarget =
  | { kind: "layout" }
  | { kind: "board"; boardKey: string }
  | { kind: "input"; boardKey: string; input: number }
  | { kind: "detector"; detectorId: string }
  | { kind: "supply"; supplyKey: string };

export interface Finding {
  /** Stable machine code, kebab-case, e.g. `short-reads-normal`. */
  code: string;
  severity: Severity;
  /** One line: what is wrong, with the figures. */
  message: string;
  /** Why it matters, in plain words for a practitioner. */
  why: string;
  target: FindingTarget;
}

export const severityRank: Record<Severity, number> = { error: 0, warning: 1, note: 2 };
