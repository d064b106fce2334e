import type { ReactNode } from "react";
import { Caution } from "@/components/ui/caution";

/**
 * The caution every fire / life-safety screen carries, once per page: a compact line that opens to the full text.
 * A screen may give its own full text (what it is about: a sheet, a review); the line is the same everywhere.
 */
export function LifeSafetyCaution({ className = "", children }: { className?: string; children?: ReactNode }) {
  return (
    <Caution
      testId="life-safety-caution"
      className={className}
      summary={
        <>
          <strong className="text-warn">Life safety:</strong> an aid, not an approval; the local fire code and the authority having jurisdiction decide.
        </>
      }
    >
      {children ?? (
        <>
          Fire detection design must follow the local fire code and the authority having jurisdiction, and be installed and certified by licensed people. Standby battery sizing
          for a fire system follows the same code. Loopwright&apos;s figures are an aid, not an approval.
        </>
      )}
    </Caution>
  );
}

/** For mains-fed hardware. */
export function MainsCaution({ className = "" }: { className?: string }) {
  return (
    <p role="note" className={`rounded-md border border-line bg-white px-3 py-2 text-sm ${className}`}>
      <strong>Mains power.</strong> Connecting mains is work for a qualified electrician under local wiring rules.
    </p>
  );
}
