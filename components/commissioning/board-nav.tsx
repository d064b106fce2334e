import type { CommissioningProgressReport } from "@/lib/commissioning/progress";
import type { SheetBoard } from "@/lib/sheet/sheet-types";
import { loopsOfBoard } from "@/components/commissioning/progress-view";
import { ProgressBar } from "@/components/commissioning/progress-bar";

interface BoardNavProps {
  boards: SheetBoard[];
  progress: CommissioningProgressReport;
  boardKey: string;
  onChoose: (boardKey: string) => void;
}

/** One button per board with its count of passed loops. */
export function BoardNav({ boards, progress, boardKey, onChoose }: BoardNavProps) {
  return (
    <nav aria-label="Boards" className="grid grid-cols-2 gap-2 sm:grid-cols-3">
      {boards.map((b) => {
        const ls = loopsOfBoard(progress, b.boardKey);
        const passed = ls.filter((l) => l.status === "passed").length;
        return (
          <button
            key={b.boardKey}
            type="button"
            data-testid={`board-${b.boardKey}`}
            onClick={() => onChoose(b.boardKey)}
            aria-pressed={b.boardKey === boardKey}
            className={`min-h-16 rounded-lg border-2 p-2 text-left ${b.boardKey === boardKey ? "border-signal bg-signal-soft" : "border-line bg-white"}`}
          >
            <span className="block font-semibold">{b.name}</span>
            <span className="block text-sm tabular-nums text-slate-700">
              {passed} of {ls.length} passed
            </span>
            <ProgressBar passed={passed} failed={ls.filter((l) => l.status === "failed").length} total={ls.length} thin />
          </button>
        );
      })}
    </nav>
  );
}
