import { describe, expect, it } from "vitest";
import type { WiringScheme } from "@/lib/catalog/schema";
import type { Finding } from "@/lib/findings";
import { groupFindings, numberRanges, orderFindings } from "@/lib/findings-grouping";

const CUT_WHY = "A cut that reads as an alarm is not a tamper.";
const cut = (boardKey: string, input: number): Finding => ({
  code: "cut-misread",
  severity: "warning",
  message: `Board ${boardKey}, input ${input}: one conductor cut (all at rest) reads ∞ Ω (active (alarm)), not open`,
  why: CUT_WHY,
  target: { kind: "input", boardKey, input },
});
const names: Record<string, string> = { panel: "Control panel", b1: "Expansion board 1" };
const boardName = (k: string) => names[k] ?? k;

describe("numberRanges", () => {
  it("writes consecutive inputs as ranges", () => {
    expect(numberRanges([12, 2, 5, 7, 8, 9, 10, 11])).toBe("2, 5, 7–12");
    expect(numberRanges([3])).toBe("3");
    expect(numberRanges([4, 4, 5])).toBe("4–5");
  });
});

describe("groupFindings", () => {
  it("says the same finding on many inputs once, with the inputs listed, and keeps every finding", () => {
    const fs = [2, 5, 7, 8, 9, 10, 11, 12].map((n) => cut("panel", n));
    const { groups, schemeNotes } = groupFindings(fs, { boardName });
    expect(schemeNotes).toEqual([]);
    expect(groups).toHaveLength(1);
    expect(groups[0]).toMatchObject({ code: "cut-misread", title: "a cut reads as an alarm, not as open", where: "Control panel, inputs 2, 5, 7–12", why: CUT_WHY });
    expect(groups[0].findings).toEqual(fs);
  });
  it("keeps a single finding's own message, and never merges findings about the layout or a supply", () => {
    const layout: Finding = { code: "inputs-short", severity: "error", message: "2 detectors are still to place", why: "x", target: { kind: "layout" } };
    const supply: Finding = { code: "battery-needed", severity: "note", message: "Panel: at least 4.23 Ah", why: "y", target: { kind: "supply", supplyKey: "panel" } };
    const { groups } = groupFindings([supply, { ...supply }, cut("b1", 3), layout], { boardName });
    expect(groups.map((g) => [g.code, g.title, g.where])).toEqual([
      ["inputs-short", "2 detectors are still to place", null],
      ["cut-misread", cut("b1", 3).message, null],
      ["battery-needed", "Panel: at least 4.23 Ah", null],
      ["battery-needed", "Panel: at least 4.23 Ah", null],
    ]);
  });
  it("states what a scheme brings once per scheme, across boards, and never folds an error into it", () => {
    const scheme = (k: string, n: number): WiringScheme => (k === "panel" && n <= 3 ? "single-eol" : "double-eol");
    const tamper = (n: number): Finding => ({ code: "tamper-misread", severity: "warning", message: `input ${n}: tamper open reads ∞ Ω (active (alarm)), not open`, why: "cover", target: { kind: "input", boardKey: "panel", input: n } });
    const defeat: Finding = { code: "short-reads-normal", severity: "error", message: "Defeat", why: "short", target: { kind: "input", boardKey: "panel", input: 1 } };
    const { groups, schemeNotes } = groupFindings([cut("panel", 1), tamper(1), cut("panel", 2), tamper(2), cut("panel", 3), defeat, cut("b1", 4)], { boardName, schemeOf: scheme });
    expect(schemeNotes).toHaveLength(1);
    expect(schemeNotes[0].heading).toBe("Single end-of-line on Control panel, inputs 1–3");
    expect(schemeNotes[0].groups.map((g) => [g.code, g.where, g.findings.length])).toEqual([
      ["cut-misread", "Control panel, inputs 1–3", 3],
      ["tamper-misread", "Control panel, inputs 1–2", 2],
    ]);
    expect(schemeNotes[0].remedy).toMatch(/double end-of-line/);
    // the error and the cut on a double end-of-line input stay findings of their own
    expect(groups.map((g) => g.code)).toEqual(["short-reads-normal", "cut-misread"]);
    const shown = [...groups, ...schemeNotes.flatMap((n) => n.groups)].reduce((a, g) => a + g.findings.length, 0);
    expect(shown).toBe(7);
  });
  it("orders by severity, then what the designer can act on before information", () => {
    const note = (code: string): Finding => ({ code, severity: "note", message: code, why: "", target: { kind: "layout" } });
    const warn: Finding = { ...note("rest-not-normal"), severity: "warning" };
    expect(orderFindings([note("supervision-coverage"), note("supervision-below-preference"), warn]).map((f) => f.code)).toEqual(["rest-not-normal", "supervision-below-preference", "supervision-coverage"]);
  });
});
