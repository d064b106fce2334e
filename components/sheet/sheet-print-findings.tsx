import type { SheetBoard, SheetInput } from "@/lib/sheet/sheet-types";
import type { Finding } from "@/lib/findings";
import { groupFindings } from "@/lib/findings-grouping";

/** A board's findings as they go on paper: what a scheme brings said once, the same finding on many inputs said once with the inputs listed. */
export function boardPrintFindings(board: SheetBoard) {
  const used = board.rows.filter((r): r is SheetInput => !r.spare);
  const findings: Finding[] = used.flatMap((r) => r.findings.map((f) => ({ ...f, target: { kind: "input" as const, boardKey: r.boardKey, input: r.input } })));
  const scheme = new Map(used.map((r) => [r.input, r.scheme]));
  return groupFindings(findings, { boardName: () => board.name, schemeOf: (_, input) => scheme.get(input) });
}

const SEVERITY_WORDS = { error: "Error", warning: "Warning", note: "Note" } as const;

export function SheetPrintFindings({ board }: { board: SheetBoard }) {
  const { groups, schemeNotes } = boardPrintFindings(board);
  if (groups.length === 0 && schemeNotes.length === 0) return null;
  return (
    <ul className="sheet-print-findings hidden print:block" data-testid={`print-findings-${board.boardKey}`}>
      {groups.map((g, i) => (
        <li key={`g${i}`} className={g.severity === "error" ? "font-semibold" : ""}>
          <strong>{SEVERITY_WORDS[g.severity]}</strong>
          {g.where ? ` (${g.where})` : ""}: {g.title}
        </li>
      ))}
      {schemeNotes.map((n) => (
        <li key={n.scheme}>
          <strong>{n.heading}:</strong> {[...new Set(n.groups.map((g) => g.title))].join("; ")}. {n.remedy}
        </li>
      ))}
    </ul>
  );
}
