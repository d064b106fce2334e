/** Passed (green) and failed (red) shares of a set of loops. */
export function ProgressBar({ passed, failed, total, thin = false }: { passed: number; failed: number; total: number; thin?: boolean }) {
  const w = (n: number) => `${total ? (100 * n) / total : 0}%`;
  return (
    <div className={`mt-2 flex w-full overflow-hidden rounded-full bg-slate-200 ${thin ? "h-1.5" : "h-3"}`} aria-hidden="true">
      <div className="bg-signal" style={{ width: w(passed) }} />
      <div className="bg-fault" style={{ width: w(failed) }} />
    </div>
  );
}
