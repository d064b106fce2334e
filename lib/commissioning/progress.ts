import type { ExpectedReading, SheetInput, TerminalSheet, TestKey } from "@/lib/sheet/sheet-types";
import type { MeasuredReading } from "@/lib/commissioning/diagnose";
import type { ReadingAdvice } from "@/lib/commissioning/advice";

// Where commissioning stands: per loop, the latest reading of each test on the terminal sheet and whether it passed.
// A loop has passed when every test on its sheet has a latest reading that passed.

export interface RecordedReading {
  boardKey: string;
  input: number;
  test: TestKey;
  reading: MeasuredReading;
  verdict: "pass" | "fail";
  diagnosis: string | null;
  recordedBy: string | null;
  /** ISO time; later readings of the same test replace earlier ones. */
  recordedAt: string;
  /** The verdict, likely cause and next check, as the phone showed them (filled in for the commissioning record). */
  advice?: ReadingAdvice;
}

export type LoopStatus = "untested" | "incomplete" | "failed" | "passed" | "cannot-test";

export interface LoopTestProgress {
  test: TestKey;
  expected: ExpectedReading;
  latest: RecordedReading | null;
  /** Readings of this test before the latest, oldest first. */
  earlier: RecordedReading[];
}

export interface LoopProgress {
  boardKey: string;
  boardName: string;
  input: number;
  zones: number[];
  labels: string[];
  lifeSafety: boolean;
  status: LoopStatus;
  tests: LoopTestProgress[];
}

export interface CommissioningProgressReport {
  loops: LoopProgress[];
  /** Used inputs (loops to test) and how many have passed: the gate for marking a layout commissioned. */
  totals: { loops: number; passed: number; failed: number; incomplete: number; untested: number; cannotTest: number };
  readingsIgnored: number;
}

export function commissioningProgress(sheet: TerminalSheet, readings: readonly RecordedReading[]): CommissioningProgressReport {
  const byLoop = new Map<string, RecordedReading[]>();
  for (const r of readings) {
    const k = `${r.boardKey}#${r.input}`;
    const list = byLoop.get(k) ?? [];
    list.push(r);
    byLoop.set(k, list);
  }
  let matched = 0;
  const loops: LoopProgress[] = [];
  for (const b of sheet.boards)
    for (const row of b.rows) {
      if (row.spare) continue;
      const r = row as SheetInput;
      const mine = (byLoop.get(`${r.boardKey}#${r.input}`) ?? []).slice().sort((x, y) => x.recordedAt.localeCompare(y.recordedAt));
      const tests: LoopTestProgress[] = r.expected.map((e) => {
        const of = mine.filter((m) => m.test === e.test);
        matched += of.length;
        return { test: e.test, expected: e, latest: of.at(-1) ?? null, earlier: of.slice(0, -1) };
      });
      let status: LoopStatus;
      if (!tests.length) status = "cannot-test";
      else if (tests.every((t) => !t.latest)) status = "untested";
      else if (tests.some((t) => t.latest?.verdict === "fail")) status = "failed";
      else if (tests.every((t) => t.latest?.verdict === "pass")) status = "passed";
      else status = "incomplete";
      loops.push({ boardKey: r.boardKey, boardName: b.name, input: r.input, zones: r.zones, labels: r.detectors.map((d) => d.label), lifeSafety: r.detectors.some((d) => d.lifeSafety), status, tests });
    }
  const count = (s: LoopStatus) => loops.filter((l) => l.status === s).length;
  return {
    loops,
    totals: { loops: loops.length, passed: count("passed"), failed: count("failed"), incomplete: count("incomplete"), untested: count("untested"), cannotTest: count("cannot-test") },
    readingsIgnored: readings.length - matched,
  };
}
