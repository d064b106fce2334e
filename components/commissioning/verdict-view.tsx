import type { ReadingVerdict } from "@/lib/commissioning/diagnose";
import { FaultRanking } from "@/components/loop-bench/fault-finder-panel";

/** The instant diagnosis of a typed reading: pass or fail, and what a failure most likely means. */
export function VerdictView({ v, testId }: { v: ReadingVerdict; testId: string }) {
  const pass = v.verdict === "pass";
  return (
    <div data-testid={testId} data-verdict={v.verdict} className={`mt-2 rounded-md border-2 p-2 ${pass ? "border-signal bg-signal-soft" : "border-fault bg-fault-soft"}`}>
      <p className={`text-lg font-bold ${pass ? "text-signal" : "text-fault"}`}>
        {pass ? "PASS" : "FAIL"} · {v.readingText} <span className="text-sm font-medium text-ink">(expected {v.expectedText})</span>
      </p>
      {v.diagnoses.map((d, i) => (
        <p key={i} className="mt-1 text-sm" data-code={d.code}>
          {d.text}
        </p>
      ))}
      {v.ranking?.length ? (
        <div className="mt-2 border-t border-fault/30 pt-2">
          <p className="text-sm font-semibold">What fits this reading best</p>
          <FaultRanking ranking={v.ranking} limit={3} testId={`${testId}-ranking`} />
        </div>
      ) : null}
    </div>
  );
}
