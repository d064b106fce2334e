import type { SheetBoard } from "@/lib/sheet/sheet-types";

export const boardAnchor = (boardKey: string) => `board-${boardKey}`;

/** The boards of the sheet as links, so a long sheet on a phone is one tap from each board. */
export function SheetBoardIndex({ boards }: { boards: SheetBoard[] }) {
  if (boards.length < 2) return null;
  return (
    <nav aria-label="Boards on this sheet" className="no-print mb-4 rounded-lg border border-line bg-white p-3 text-sm" data-testid="sheet-board-index">
      <h2 className="font-semibold">Boards</h2>
      <ol className="mt-1 flex flex-wrap gap-2">
        {boards.map((b) => {
          const used = b.rows.filter((r) => !r.spare).length;
          return (
            <li key={b.boardKey}>
              <a href={`#${boardAnchor(b.boardKey)}`} className="inline-block rounded-md border border-line px-2 py-1 text-signal hover:bg-signal-soft">
                {b.name} <span className="text-xs text-slate-600">({used} of {b.rows.length} used)</span>
              </a>
            </li>
          );
        })}
      </ol>
    </nav>
  );
}
