import { REPORT_WORDS } from "@/lib/loop/row-labels";
import type { ExpectedReading, SheetBoard, SheetInput, TestKey } from "@/lib/sheet/sheet-types";
import { boardSummary, CARRIES_WORDS, ranges } from "@/components/sheet/sheet-words";

// The board as printed: one compact table, one row per input, the tests as columns with a space to write the
// reading and tick it; the header repeats on every page the board runs to. The screen's cards and loop drawings
// stay on screen; the PDF download carries both.

const th = "border border-slate-500 bg-slate-100 px-1 py-0.5 text-left font-semibold";
const td = "border border-slate-400 px-1 py-0.5 align-top";

/** The printed columns of tests; a shared input's A/B/both readings sit together under one column. */
export const PRINT_TEST_COLUMNS: { title: string; tests: { key: TestKey; tag: string }[] }[] = [
  { title: "At rest", tests: [{ key: "rest", tag: "" }] },
  { title: "Active", tests: [{ key: "active", tag: "" }, { key: "active-a", tag: "A" }, { key: "active-b", tag: "B" }, { key: "active-both", tag: "A+B" }] },
  { title: "Tamper", tests: [{ key: "tamper", tag: "" }, { key: "tamper-a", tag: "A" }, { key: "tamper-b", tag: "B" }] },
  { title: "Short at far end", tests: [{ key: "short", tag: "" }] },
  { title: "Cut at far end", tests: [{ key: "cut", tag: "" }] },
];

function Reading({ e, tag }: { e: ExpectedReading; tag: string }) {
  return (
    <span className="block">
      {tag ? `${tag}: ` : ""}
      <strong className="whitespace-nowrap">{e.minOhms === Infinity ? "OL" : e.rangeText}</strong> {e.reports.map((r) => REPORT_WORDS[r]).join(" or ")}
      {e.uncertain ? " (band edge)" : ""}
      <span className="block whitespace-nowrap text-slate-600">☐ ________</span>
    </span>
  );
}

/** "cores 1–2 loop, 3–4 power": the full map of what goes where is on screen and in the PDF. */
function coresText(row: SheetInput): string {
  const by = new Map<string, number[]>();
  for (const c of row.cores) by.set(CARRIES_WORDS[c.carries], [...(by.get(CARRIES_WORDS[c.carries]) ?? []), c.core]);
  return `cores ${[...by].map(([what, cores]) => `${ranges(cores)} ${what}`).join(", ")}`;
}

function InputRow({ row }: { row: SheetInput }) {
  const byKey = new Map(row.expected.map((e) => [e.test, e]));
  return (
    <tr className="sheet-print-input">
      <td className={`${td} font-semibold`}>
        {row.input}
        <span className="block font-normal">{row.terminals}</span>
        <span className="block font-normal">zone {row.zones.join(", ")}</span>
      </td>
      <td className={`${td} break-words`}>
        {row.detectors.map((d) => (
          <span key={d.id} className="block">
            <strong>{d.label}</strong> · {d.area} / {d.room} · {d.deviceType}, {d.contact}
            {d.tamper ? " + tamper" : ""}, {d.gaugeText} {d.cableM} m{d.powered ? `, powered from ${d.poweredFrom ?? "a supply"}` : ""}
            {d.lifeSafety ? " · LIFE SAFETY" : ""}
          </span>
        ))}
        <span className="block">
          {row.resistors.length ? row.resistors.map((r) => `${r.name.replace(/ resistor\b/, "")} ${r.valueText}${r.bands.length ? ` (${r.bands.join("-")})` : ""}`).join(", ") : "no resistor"}
        </span>
        <span className="block text-slate-700">
          {row.schemeText} · {row.placementText} · {coresText(row)}
        </span>
        {row.findings.map((f, i) => (
          <span key={i} className="block font-medium">
            {f.severity}: {f.message}
          </span>
        ))}
      </td>
      {row.expected.length === 0 ? (
        <td colSpan={PRINT_TEST_COLUMNS.length} className={`${td} font-medium`}>
          No expected readings: {row.noReadingsReason}
        </td>
      ) : (
        PRINT_TEST_COLUMNS.map((c) => (
          <td key={c.title} className={td}>
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
    <table className="sheet-print-table hidden w-full table-fixed border-collapse print:table" data-testid={`print-board-${board.boardKey}`}>
      <colgroup>
        <col className="w-[5%]" />
        <col className="w-[31%]" />
        {PRINT_TEST_COLUMNS.map((c) => (
          <col key={c.title} />
        ))}
      </colgroup>
      <thead>
        <tr>
          <th colSpan={2 + PRINT_TEST_COLUMNS.length} className="border-b-2 border-ink pb-0.5 text-left font-normal">
            <strong className="text-[1.4em]">
              {board.name} — {board.deviceName}
            </strong>{" "}
            · {boardSummary(board)}
          </th>
        </tr>
        <tr>
          <th className={th}>Input</th>
          <th className={th}>Detectors, resistors, cores</th>
          {PRINT_TEST_COLUMNS.map((c) => (
            <th key={c.title} className={th}>
              {c.title}
            </th>
          ))}
        </tr>
      </thead>
      <tbody>
        {used.map((row) => (
          <InputRow key={row.input} row={row} />
        ))}
        {used.length === 0 ? (
          <tr>
            <td colSpan={2 + PRINT_TEST_COLUMNS.length} className={td}>
              No input of this board is used.
            </td>
          </tr>
        ) : null}
      </tbody>
    </table>
  );
}
