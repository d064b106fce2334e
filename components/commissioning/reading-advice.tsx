import type { ReadingAdvice } from "@/lib/commissioning/advice";

/** After a reading: the verdict, the likely cause and the next thing to check (computed on the phone). */
export function ReadingAdviceView({ advice, testId, title }: { advice: ReadingAdvice; testId: string; title: string }) {
  const pass = advice.verdict === "pass";
  return (
    <div data-testid={testId} data-verdict={advice.verdict} aria-live="polite" className={`mt-2 rounded-md border-2 p-2 ${pass ? "border-signal bg-signal-soft" : "border-fault bg-fault-soft"}`}>
      <p className="text-xs font-medium uppercase tracking-wide text-slate-700">{title}</p>
      <p className={`text-lg font-bold ${pass ? "text-signal" : "text-fault"}`}>{advice.headline}</p>
      {advice.likelyCause ? (
        <p className="mt-1 text-sm" data-testid={`${testId}-cause`}>
          <strong>Likely cause:</strong> {advice.likelyCause}
        </p>
      ) : null}
      <p className="mt-1 text-sm" data-testid={`${testId}-next`}>
        <strong>Next check:</strong> {advice.nextCheck}
      </p>
    </div>
  );
}
