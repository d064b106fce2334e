import type { LoopProgress, LoopStatus } from "@/lib/commissioning/progress";
import { STATUS_WORDS } from "@/components/commissioning/progress-view";

const STATUS_STYLE: Record<LoopStatus, string> = {
  untested: "border-line bg-white",
  incomplete: "border-warn bg-warn-soft",
  failed: "border-fault bg-fault-soft",
  passed: "border-signal bg-signal-soft",
  "cannot-test": "border-fault bg-white",
};

/** A board's loops with where each stands; picking one opens it. */
export function LoopList({ boardName, loops, onChoose }: { boardName: string | undefined; loops: LoopProgress[]; onChoose: (input: number) => void }) {
  return (
    <section aria-label="Loops">
      <h2 className="mb-2 text-lg font-semibold">{boardName}: pick a loop</h2>
      <ul className="grid grid-cols-1 gap-2 sm:grid-cols-2">
        {loops.map((l) => (
          <li key={l.input}>
            <button type="button" data-testid={`loop-${l.boardKey}-${l.input}`} data-status={l.status} onClick={() => onChoose(l.input)} className={`min-h-16 w-full rounded-lg border-2 p-3 text-left ${STATUS_STYLE[l.status]}`}>
              <span className="block font-semibold">
                Input {l.input} · zone {l.zones.join(", ")}
              </span>
              <span className="block text-sm">{l.labels.join(" + ")}</span>
              <span className="block text-xs font-medium uppercase tracking-wide">
                {STATUS_WORDS[l.status]}
                {l.lifeSafety ? " · life safety" : ""}
              </span>
            </button>
          </li>
        ))}
      </ul>
    </section>
  );
}
