/** Shown wherever the design holds smoke or heat detectors. */
export function FireCaution() {
  return (
    <div role="note" data-testid="fire-caution" className="rounded-lg border border-warn bg-warn-soft p-3 text-sm">
      <p className="font-semibold text-warn">Fire detection in this design</p>
      <p className="mt-1">
        Smoke and heat detectors are life-safety devices. Their design must follow the local fire code and the authority having jurisdiction, and be installed and
        certified by licensed people. Loopwright&apos;s figures are an aid, not an approval.
      </p>
    </div>
  );
}
