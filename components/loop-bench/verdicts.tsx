// Each fault's verdict: reported as itself, mistaken for something else, or read as normal (defeat).
import type { LoopAnalysis } from "@/lib/loop";

const FAULTS = [
  ["short-panel", "Short at the panel end"],
  ["short-detector", "Short at the detector end"],
  ["cut", "Cut conductor"],
] as const;

const WORDS = {
  detected: { title: "detected", text: "reported as itself (or as trouble) in every state", cls: "border-signal bg-signal-soft text-signal", mark: "✓" },
  mistaken: { title: "mistaken", text: "reported, but as something else in some state", cls: "border-warn bg-warn-soft text-warn", mark: "!" },
  defeat: { title: "defeat", text: "reads as normal in some state: silenced without a report", cls: "border-fault bg-fault-soft text-fault", mark: "✗" },
} as const;

export function Verdicts({ faults }: { faults: LoopAnalysis["faults"] }) {
  return (
    <ul className="grid grid-cols-1 gap-3 sm:grid-cols-3" data-testid="verdicts" aria-label="Fault verdicts">
      {FAULTS.map(([f, label]) => {
        const w = WORDS[faults[f]];
        return (
          <li key={f} className={`rounded-lg border p-3 ${w.cls}`} data-testid={`verdict-${f}`}>
            <p className="text-sm font-medium text-ink">{label}</p>
            <p className="mt-0.5 text-lg font-semibold">
              <span aria-hidden="true">{w.mark} </span>
              {w.title}
            </p>
            <p className="text-xs text-ink/80">{w.text}</p>
          </li>
        );
      })}
    </ul>
  );
}
