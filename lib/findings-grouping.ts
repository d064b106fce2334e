import type { WiringScheme } from "@/lib/catalog/schema";
import { severityRank, type Finding, type Severity } from "@/lib/findings";
import { SCHEME_WORDS } from "@/lib/vocabulary/words";

// Findings as people read them: the same finding on many inputs said once with the inputs listed, what comes with a
// chosen scheme said once per scheme, worst and most actionable first.

export interface FindingGroup {
  code: string;
  severity: Severity;
  /** The message itself for a single finding; a short plain title for a group. */
  title: string;
  why: string;
  /** "Control panel, inputs 2, 5, 7–12; Expansion board 1, input 3"; null when the findings are not about inputs. */
  where: string | null;
  /** Every finding in the group, each with its own figures. */
  findings: Finding[];
}

export interface SchemeNote {
  scheme: WiringScheme;
  /** "Single end-of-line on Control panel, inputs 1–16". */
  heading: string;
  /** What the scheme does by its nature, one group per kind of finding. */
  groups: FindingGroup[];
  /** How to avoid it, where a scheme does. */
  remedy: string;
}

export interface GroupedFindings {
  groups: FindingGroup[];
  schemeNotes: SchemeNote[];
}

/** What the designer can do nothing about in the layout itself: said after what they can act on. */
const INFORMATIONAL = new Set(["battery-needed", "battery-fire-caution", "life-safety-caution", "supervision-coverage", "shared-input-tradeoff", "readings-indistinguishable", "margin-thin", "powered-by-ignored"]);

/**
 * Warnings and notes that every input wired with a scheme gets from the scheme itself (common practice, no published
 * source: an open loop on a single end-of-line or plain input reads as an alarm; a shared input shares its faults).
 * Errors are never folded into a note.
 */
const INHERENT: Partial<Record<WiringScheme, { codes: Set<string>; remedy: string }>> = {
  "single-eol": { codes: new Set(["cut-misread", "tamper-misread", "readings-indistinguishable"]), remedy: "This comes with single end-of-line wiring; double end-of-line reports a cut and an opened cover as themselves." },
  none: { codes: new Set(["cut-misread", "tamper-misread", "readings-indistinguishable"]), remedy: "This comes with a loop that has no end-of-line resistor; an end-of-line scheme supervises the cable." },
  shared: { codes: new Set(["shared-input-tradeoff", "shared-supervision-lost", "readings-indistinguishable", "margin-thin"]), remedy: "This comes with sharing an input; one detector per input avoids it." },
};

/** A short title for a group of the same finding on several inputs. */
function titleOf(code: string, sample: Finding): string | null {
  const m = sample.message;
  switch (code) {
    case "cut-misread":
      return m.includes("(active") ? "a cut reads as an alarm, not as open" : "a cut is not reported as open";
    case "tamper-misread":
      return "opening a detector's cover reads as an alarm, not as a tamper";
    case "active-misread":
      return m.includes("(short)") ? "a detector's alarm reads as a short" : "a detector's alarm is reported as something else";
    case "short-misread":
      return "a short is not reported as a short";
    case "short-reads-normal":
      return "defeat: a short reads as normal";
    case "cut-reads-normal":
      return "defeat: a cut reads as normal";
    case "active-reads-normal":
      return "an alarm reads as normal";
    case "tamper-reads-normal":
      return "opening a detector's cover reads as normal";
    case "rest-not-normal":
      return "the loop may not read normal at rest";
    case "reading-uncertain":
      return "readings straddle a band edge";
    case "margin-thin":
      return "a reading sits close to a band edge";
    case "readings-indistinguishable":
      return "the panel can't tell some situations apart";
    case "supervision-below-preference":
      return "wired with less supervision than the device schedule asks for";
    case "shared-input-tradeoff":
      return "two detectors share the input: one cable fault silences both";
    case "shared-supervision-lost":
      return "sharing the input loses supervision compared with one detector per input";
    case "shared-not-wanted":
      return "on a shared input, but the device schedule asks for an input of its own";
    default:
      return null;
  }
}

/** Consecutive numbers as ranges: "2, 5, 7–12". */
export function numberRanges(ns: readonly number[]): string {
  const sorted = [...new Set(ns)].sort((a, b) => a - b);
  const parts: string[] = [];
  for (let i = 0; i < sorted.length; ) {
    let j = i;
    while (j + 1 < sorted.length && sorted[j + 1] === sorted[j] + 1) j++;
    parts.push(i === j ? `${sorted[i]}` : `${sorted[i]}–${sorted[j]}`);
    i = j + 1;
  }
  return parts.join(", ");
}

/** The inputs of a set of findings, board by board in the order met: "Control panel, inputs 2, 5, 7–12; Expansion board 1, input 3". */
export function inputsText(findings: readonly Finding[], boardName: (boardKey: string) => string): string | null {
  const byBoard = new Map<string, number[]>();
  for (const f of findings) {
    if (f.target.kind !== "input") return null;
    const list = byBoard.get(f.target.boardKey) ?? [];
    list.push(f.target.input);
    byBoard.set(f.target.boardKey, list);
  }
  return [...byBoard].map(([key, ns]) => `${boardName(key)}, ${new Set(ns).size === 1 ? "input" : "inputs"} ${numberRanges(ns)}`).join("; ");
}

const inputKey = (f: Finding) => (f.target.kind === "input" ? `${f.target.boardKey}#${f.target.input}` : null);

export interface GroupOptions {
  /** The board's name as the layout shows it; the key itself when unknown. */
  boardName?: (boardKey: string) => string;
  /** The scheme an input is wired with, to state what comes with a scheme once; without it nothing is folded into a scheme note. */
  schemeOf?: (boardKey: string, input: number) => WiringScheme | undefined;
}

function makeGroup(list: Finding[], boardName: (k: string) => string): FindingGroup {
  const first = list[0];
  const where = inputsText(list, boardName);
  const single = list.length === 1;
  return { code: first.code, severity: first.severity, title: single ? first.message : (titleOf(first.code, first) ?? first.message), why: first.why, where: single ? null : where, findings: list };
}

const order = (a: FindingGroup, b: FindingGroup) =>
  severityRank[a.severity] - severityRank[b.severity] || Number(INFORMATIONAL.has(a.code)) - Number(INFORMATIONAL.has(b.code)) || b.findings.length - a.findings.length;

/** Groups identical findings across inputs (same code, severity and reason), folds what a scheme brings into one note per scheme, and orders the rest. */
export function groupFindings(findings: readonly Finding[], options: GroupOptions = {}): GroupedFindings {
  const boardName = options.boardName ?? ((k: string) => k);
  const buckets = new Map<string, Finding[]>();
  for (const f of findings) {
    // Only findings about inputs are merged; a layout, supply, board or detector finding stands alone.
    // With schemes known, inputs of different schemes go apart, so what a scheme brings can be told from the rest.
    const scheme = f.target.kind === "input" ? (options.schemeOf?.(f.target.boardKey, f.target.input) ?? "") : "";
    const key = f.target.kind === "input" ? `${f.code}\u0000${f.severity}\u0000${f.why}\u0000${scheme}` : `single\u0000${buckets.size}`;
    const list = buckets.get(key);
    if (list) list.push(f);
    else buckets.set(key, [f]);
  }
  const groups: FindingGroup[] = [];
  const inherent = new Map<WiringScheme, Map<string, Finding[]>>();
  for (const list of buckets.values()) {
    const f = list[0];
    const scheme = options.schemeOf && f.target.kind === "input" && f.severity !== "error" ? commonScheme(list, options.schemeOf) : undefined;
    if (scheme && INHERENT[scheme]?.codes.has(f.code)) {
      const byCode = inherent.get(scheme) ?? new Map<string, Finding[]>();
      byCode.set(`${f.code}\u0000${f.why}`, [...(byCode.get(`${f.code}\u0000${f.why}`) ?? []), ...list]);
      inherent.set(scheme, byCode);
    } else groups.push(makeGroup(list, boardName));
  }
  const schemeNotes: SchemeNote[] = [...inherent].map(([scheme, byCode]) => {
    const all = [...byCode.values()].flat();
    const seen = new Set<string>();
    const inputs = all.filter((f) => {
      const k = inputKey(f)!;
      if (seen.has(k)) return false;
      seen.add(k);
      return true;
    });
    const gs = [...byCode.values()].map((list) => {
      const g = makeGroup(list, boardName);
      // In a scheme note every line is a title, even when one input has it.
      return list.length === 1 ? { ...g, title: titleOf(g.code, list[0]) ?? g.title, where: inputsText(list, boardName) } : g;
    });
    return { scheme, heading: `${SCHEME_WORDS[scheme][0].toUpperCase()}${SCHEME_WORDS[scheme].slice(1)} on ${inputsText(inputs, boardName)}`, groups: gs.sort(order), remedy: INHERENT[scheme]!.remedy };
  });
  return { groups: groups.sort(order), schemeNotes };
}

function commonScheme(list: Finding[], schemeOf: NonNullable<GroupOptions["schemeOf"]>): WiringScheme | undefined {
  let scheme: WiringScheme | undefined;
  for (const f of list) {
    if (f.target.kind !== "input") return undefined;
    const s = schemeOf(f.target.boardKey, f.target.input);
    if (!s || (scheme && s !== scheme)) return undefined;
    scheme = s;
  }
  return scheme;
}

/** Findings worst first and, within a severity, what can be acted on before what is information. */
export function orderFindings(findings: readonly Finding[]): Finding[] {
  return findings
    .map((f, i) => ({ f, i }))
    .sort((a, b) => severityRank[a.f.severity] - severityRank[b.f.severity] || Number(INFORMATIONAL.has(a.f.code)) - Number(INFORMATIONAL.has(b.f.code)) || a.i - b.i)
    .map((x) => x.f);
}
