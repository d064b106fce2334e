import { REPORT_WORDS } from "@/lib/loop/row-labels";
import type { ExpectedReading, SheetBoard, SheetInput, TestKey } from "@/lib/sheet/sheet-types";
import { boardSummary, CARRIES_WORDS, ranges } from "@/components/sheet/sheet-words";
import { SheetPrintFindings } from "@/components/sheet/sheet-print-findings";

// The board as printed: one compact table, one row per input, the tests as columns with a space to write the
// reading and tick it; the header repeats should a board run over. The board's findings follow the table, grouped.
// The screen's cards and loop drawings stay on screen; the PDF download carries both. Sizes and spacing are in
// components/sheet/sheet-print-style.tsx, so that a full board fits one sheet of paper.

/** Boards with more inputs used than this print in the smaller type, so that a 32-input board still fits one page. */
export const DENSE_PRINT_ROWS = 16;
export const densePrint = (board: SheetBoard) => board.rows.filter((r) => !r.spare).length > DENSE_PRINT_ROWS;

/** The printed columns of tests; a shared input's A/B/both readings sit together under one column. */
export const PRINT_TEST_COLUMNS: { title: string; tests: { key: TestKey; tag: string }[] }[] = [
  { title: "At rest", tests: [{ key: "rest", tag: "" }] },
  { title: "Active", tests: [{ key: "active", tag: "" }, { key: "active-a", tag: "A" }, { key: "active-b", tag: "B" }, { key: "active-both", tag: "A+B" }] },
  { title: "Tamper", tests: [{ key: "tamper", tag: "" }, { key: "tamper-a", tag: "A" }, { key: "tamper-b", tag: "B" }] },
  { title: "Short at far end", tests: [{ key: "short", tag: "" }] },
  { title: "Cut at far end", tests: [{ key: "cut", tag: "" }] },
];

/** The expected reading and what the panel reports, then a box to tick; the measured value is written beside it. */
function Reading({ e, tag }: { e: ExpectedReading; tag: string }) {
  // a shared input's tagged reading needs no word when the tag already says it ("A: … ☐", detector A active)
  const word = tag && e.reports.length === 1 && e.reports[0] === e.expectedReport ? "" : e.reports.map((r) => REPORT_WORDS[r]).join(" or ");
  return (
    <span className="sheet-print-reading">
      <strong className="whitespace-nowrap">
        {tag ? `${tag}: ` : ""}
        {e.minOhms === Infinity ? "OL" : e.rangeText}
      </strong>{" "}
      {word}
      {e.uncertain ? " (band edge)" : ""} <span className="whitespace-nowrap text-slate-600">☐</span>
    </span>
  );
}

/** "cores 1–2 loop, 3–4 power": the full map of what goes where is on screen and in the PDF. */
function coresText(row: SheetInput): string {
  const by = new Map<string, number[]>();
  for (const c of row.cores) by.set(CARRIES_WORDS[c.carries], [...(by.get(CARRIES_WORDS[c.carries]) ?? []), c.core]);
  return `cores ${[...by].map(([what, cores]) => `${ranges(cores)} ${what}`).join(", ")}`;
}

/** Resistors of the same value said once: "end-of-line and alarm 4.7 kΩ"; the colour bands are in the board's key. */
function resistorsText(row: SheetInput): string {
  if (!row.resistors.length) return "no resistor";
  const byValue = new Map<string, string[]>();
  for (const r of row.resistors) byValue.set(r.valueText, [...(byValue.get(r.valueText) ?? []), r.name.replace(/ resistor\b/, "")]);
  return [...byValue].map(([value, names]) => `${names.join(" and ")} ${value}`).join(", ");
}

/** Each resistor value on the board once with its IEC 60062 colour bands: "5.6 kΩ green-blue-red-gold". */
export function bandsKey(board: SheetBoard): string {
  const seen = new Map<number, string>();
  for (const row of board.rows) if (!row.spare) for (const r of row.resistors) if (r.bands.length && !seen.has(r.ohms)) seen.set(r.ohms, `${r.valueText} ${r.bands.join("-")}`);
  return [...seen].sort((a, b) => a[0] - b[0]).map(([, text]) => text).join(", ");
}

/** The loop's second line on paper; "end-of-line" as the trade's short form, EOL, to keep a row to a line. */
export function wiringText(row: SheetInput): string {
  return `${resistorsText(row)} · ${row.schemeText}, ${row.placementText} · ${coresText(row)}`.replace(/end-of-line/g, "EOL");
}

function InputRow({ row }: { row: SheetInput }) {
  const byKey = new Map(row.expected.map((e) => [e.test, e]));
  return (
    <tr className="sheet-print-input">
      <td>
        <strong>{row.input}</strong>
        <span className="block">zone {row.zones.join(", ")}</span>
      </td>
      {/* one flowing paragraph, not a line per part: it wraps with no half-empty lines, so a row takes two or three lines */}
      <td className="break-words">
        {row.detectors.map((d, i) => (
          <span key={d.id}>
            {i > 0 ? " · " : ""}
            <strong>{d.label}</strong> · {d.area} / {d.room} · {d.deviceType}, {d.contact}
            {d.tamper ? " + tamper" : ""}, {d.gaugeText} {d.cableM} m{d.powered ? `, powered from ${d.poweredFrom ?? "a supply"}` : ""}
            {d.lifeSafety ? " · LIFE SAFETY" : ""}
          </span>
        ))}
        <span className="text-slate-700"> — {wiringText(row)}</span>
      </td>
      {row.expected.length === 0 ? (
        <td colSpan={PRINT_TEST_COLUMNS.length} className="font-medium">
          No expected readings: {row.noReadingsReason}
        </td>
      ) : (
        PRINT_TEST_COLUMNS.map((c) => (
          <td key={c.title}>
            {c.tests.map((t) => {
              const e = byKey.get(t.key);
              return e ? <Reading key={t.key} e={e} tag={t.tag} /> : null;
            })}
          </td>
        ))
      )}
    </tr>
  );
}

export function SheetBoardPrint({ board }: { board: SheetBoard }) {
  const used = board.rows.filter((r): r is SheetInput => !r.spare);
  return (
    <>
      <table className="sheet-print-table hidden w-full table-fixed border-collapse print:table" data-testid={`print-board-${board.boardKey}`}>
        <colgroup>
          <col className="sheet-col-input" />
          <col className="sheet-col-detectors" />
          {PRINT_TEST_COLUMNS.map((c) => (
            <col key={c.title} className={`sheet-col-test${c.tests.length > 1 ? " sheet-col-wide" : ""}`} />
          ))}
        </colgroup>
        <thead>
          <tr>
            <th colSpan={2 + PRINT_TEST_COLUMNS.length} className="sheet-print-board-head">
              <strong>
                {board.name} — {board.deviceName}
              </strong>{" "}
              · {boardSummary(board)}
              {bandsKey(board) ? ` · colour bands: ${bandsKey(board)}` : ""}
            </th>
          </tr>
          <tr>
            {/* terminals are always N+ / N− (lib/sheet/build-sheet.ts terminalsText); said once here to save a line a row */}
            <th>Input (N+ / N−)</th>
            <th>Detectors, resistors, cores</th>
            {PRINT_TEST_COLUMNS.map((c) => (
              <th key={c.title}>{c.title}</th>
            ))}
          </tr>
        </thead>
        <tbody>
          {used.map((row) => (
            <InputRow key={row.input} row={row} />
          ))}
          {used.length === 0 ? (
            <tr>
              <td colSpan={2 + PRINT_TEST_COLUMNS.length}>No input of this board is used.</td>
            </tr>
          ) : null}
        </tbody>
      </table>
      <SheetPrintFindings board={board} />
    </>
  );
}
