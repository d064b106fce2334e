import { REPORT_WORDS } from "@/lib/loop/row-labels";
import type { ExpectedReading, SheetBoard, SheetInput, TestKey } from "@/lib/sheet/sheet-types";
import { CARRIES_WORDS, FITTED_WORDS } from "@/components/sheet/sheet-words";

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
      <strong className="whitespace-nowrap">{e.rangeText}</strong> {e.reports.map((r) => REPORT_WORDS[r]).join(" or ")}
      {e.uncertain ? " (band edge)" : ""}
      <span className="block whitespace-nowrap text-slate-600">read ________ ☐ ok</span>
    </span>
  );
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
            {d.tamper ? " + tamper" : ""}, {d.gaugeText} {d.cableM} m{d.lifeSafety ? " · LIFE SAFETY" : ""}
          </span>
        ))}
        <span className="block">
          {row.resistors.length ? row.resistors.map((r) => `${r.valueText} ±${r.tolerancePct} % ${r.bands.length ? `(${r.bands.join("-")})` : "(no colour code)"} ${FITTED_WORDS[r.fittedAt]}`).join("; ") : "no resistor"} · {row.schemeText}
        </span>
        <span className="block text-slate-700">Cores: {row.cores.map((c) => `${c.core} ${CARRIES_WORDS[c.carries]} ${c.panelEnd} → ${c.farEnd}`).join("; ")}</span>
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
  if (!used.length) return null;
  return (
    <table className="sheet-print-table hidden w-full table-fixed border-collapse print:table" data-testid={`print-board-${board.boardKey}`}>
      <thead>
        <tr>
          <th className={`${th} w-[7%]`}>Input</th>
          <th className={`${th} w-[33%]`}>Detectors, resistors, cores</th>
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
      </tbody>
    </table>
  );
}
