import type { RefusedReading } from "@/components/commissioning/reading-queue";

/** Readings the server refused for good (not retried), each with its reason, until the installer dismisses it. */
export function RefusedList({ refused, onDismiss }: { refused: RefusedReading[]; onDismiss: (clientId: string) => void }) {
  if (!refused.length) return null;
  return (
    <ul className="mt-2 space-y-1 text-sm" data-testid="refused">
      {refused.map((r) => (
        <li key={r.clientId} className="rounded-md border border-fault bg-fault-soft p-2">
          The server refused {r.reading} ({r.test}, {r.boardKey} input {r.input}): {r.reason}{" "}
          <button type="button" className="ml-1 underline" onClick={() => onDismiss(r.clientId)}>
            Dismiss
          </button>
        </li>
      ))}
    </ul>
  );
}
