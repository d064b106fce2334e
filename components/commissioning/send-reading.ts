import { describeError, FetchError, sendJson } from "@/lib/client/fetcher";
import { reviveLoopJson } from "@/lib/client/revive-loop-json";
import type { RecordResult } from "@/lib/server/commissioning";
import { isRetryable, type QueuedReading, type SendOutcome } from "@/components/commissioning/reading-queue";

export const readingsUrl = (layoutId: number) => `/api/layouts/${layoutId}/commissioning/readings`;

/** What a failed send means for the waiting list: kept for another try, or refused for good. */
export function failedOutcome(e: unknown): SendOutcome<never> {
  if (e instanceof FetchError) {
    if (e.unreachable) return { kind: "retry", error: "no connection to the server" };
    return isRetryable(e.status) ? { kind: "retry", error: describeError(e) } : { kind: "refused", error: describeError(e) };
  }
  return { kind: "retry", error: "no connection to the server" };
}

/** Sends one reading from the waiting list; never throws. */
export async function sendReading(layoutId: number, q: QueuedReading): Promise<SendOutcome<RecordResult>> {
  try {
    const body = await sendJson<unknown>(readingsUrl(layoutId), "POST", { clientId: q.clientId, boardKey: q.boardKey, input: q.input, test: q.test, reading: q.reading });
    // A 2xx without the stored reading (an unreadable answer) is not proof the server has it: try again.
    if (!body || typeof body !== "object" || !("reading" in body)) return { kind: "retry", error: "The server sent an unreadable answer." };
    return { kind: "saved", result: reviveLoopJson<RecordResult>(body) };
  } catch (e) {
    return failedOutcome(e);
  }
}
