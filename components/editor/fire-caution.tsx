import { Caution } from "@/components/ui/caution";

/** Shown once per page wherever the design holds smoke or heat detectors: a compact line that opens to the full caution. */
export function FireCaution() {
  return (
    <Caution
      testId="fire-caution"
      summary={
        <>
          <strong className="text-warn">Fire detection in this design:</strong> an aid, not an approval; the local fire code and the authority having jurisdiction decide.
        </>
      }
    >
      Smoke and heat detectors are life-safety devices. Their design must follow the local fire code and the authority having jurisdiction, and be installed and certified by
      licensed people. Loopwright&apos;s figures are an aid, not an approval.
    </Caution>
  );
}
