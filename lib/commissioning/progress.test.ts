import { describe, expect, it } from "vitest";
import { shippedCatalog } from "@/lib/catalog/shipped";
import { buildTerminalSheet } from "@/lib/sheet/build-sheet";
import { largeLayout, largeSchedule } from "@/lib/sheet/testing/sample-layouts";
import { commissioningProgress, type RecordedReading } from "@/lib/commissioning/progress";
import { transition } from "@/lib/review/state-machine";

const { catalog } = shippedCatalog();
const sheet = buildTerminalSheet(largeLayout, largeSchedule, catalog);
const at = (n: number) => `2026-12-01T10:${String(n).padStart(2, "0")}:00.000Z`;
const passAll = (boardKey: string, input: number, t0: number): RecordedReading[] => {
  const row = sheet.boards.flatMap((b) => b.rows).find((r) => !r.spare && r.boardKey === boardKey && r.input === input)!;
  if (row.spare) return [];
  return row.expected.map((e, i) => ({ boardKey, input, test: e.test, reading: e.minOhms === Infinity ? { kind: "open" } : { kind: "ohms", ohms: e.nominalOhms }, verdict: "pass", diagnosis: null, recordedBy: "Test installer", recordedAt: at(t0 + i) }));
};

describe("commissioning progress", () => {
  it("starts untested, and passes a loop only when every test on its sheet has passed", () => {
    expect(commissioningProgress(sheet, []).totals).toEqual({ loops: 2, passed: 0, failed: 0, incomplete: 0, untested: 2, cannotTest: 0 });
    const shared = passAll("panel", 1, 0);
    const some = commissioningProgress(sheet, shared.slice(0, 3));
    expect(some.loops[0].status).toBe("incomplete");
    const one = commissioningProgress(sheet, shared);
    expect(one.loops.map((l) => l.status)).toEqual(["passed", "untested"]);
  });
  it("takes the latest reading of a test: a failed test retested and passed counts as passed", () => {
    const readings = [...passAll("panel", 1, 10), ...passAll("deol", 1, 30)];
    readings.push({ ...readings[0], verdict: "fail", diagnosis: "x", recordedAt: at(1) });
    const p = commissioningProgress(sheet, readings);
    expect(p.totals.passed).toBe(2);
    expect(p.loops[0].tests[0].earlier).toHaveLength(1);
    readings.push({ ...readings[0], verdict: "fail", diagnosis: "x", recordedAt: at(59) });
    expect(commissioningProgress(sheet, readings).loops[0].status).toBe("failed");
  });
  it("feeds the review gate: a layout can be marked commissioned only once every loop has passed", () => {
    const all = commissioningProgress(sheet, [...passAll("panel", 1, 0), ...passAll("deol", 1, 20)]).totals;
    const half = commissioningProgress(sheet, passAll("panel", 1, 0)).totals;
    const ctx = (t: typeof all) => ({ can: () => true, commissioning: { loops: t.loops, passed: t.passed } });
    expect(transition("approved", "commission", ctx(half)).ok).toBe(false);
    expect(transition("approved", "commission", ctx(all)).ok).toBe(true);
  });
  it("counts readings for inputs or tests not on the sheet as ignored", () => {
    const stray: RecordedReading = { boardKey: "panel", input: 9, test: "rest", reading: { kind: "open" }, verdict: "fail", diagnosis: null, recordedBy: null, recordedAt: at(0) };
    expect(commissioningProgress(sheet, [stray]).readingsIgnored).toBe(1);
  });
});
