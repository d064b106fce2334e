import type { QueuedReading } from "@/components/commissioning/reading-queue";
import { waitingText } from "@/components/commissioning/reading-queue";
import { RETRY_MS } from "@/components/commissioning/queue-store";
import { useFormat } from "@/components/format/format-provider";

interface WaitingBannerProps {
  waiting: QueuedReading[];
  online: boolean;
  lastTry: Date | null;
  onSend: () => void;
}

/** How many readings are kept on the device, and a way to send them now. */
export function WaitingBanner({ waiting, online, lastTry, onSend }: WaitingBannerProps) {
  const fmt = useFormat();
  if (!waiting.length)
    return (
      <p className="mt-2 text-sm text-slate-600" data-testid="queue" data-count={0}>
        {waitingText(0)}
        {online ? "" : " You are offline: readings are kept on this device until the connection is back."}
      </p>
    );
  return (
    <div className="mt-2 flex flex-wrap items-center justify-between gap-2 rounded-md border border-warn bg-warn-soft p-2" role="status" data-testid="queue" data-count={waiting.length}>
      <p className="font-semibold">
        {waitingText(waiting.length)}
        <span className="block text-xs font-normal">
          Kept on this device and sent again every {RETRY_MS / 1000} s and when the connection comes back{online ? "" : " (offline now)"}
          {lastTry ? `; last try ${fmt.dateTime(lastTry)}` : ""}
          {waiting[0]?.lastError ? ` (${waiting[0].lastError})` : ""}.
        </span>
      </p>
      <button type="button" onClick={onSend} className="min-h-12 rounded-md bg-ink px-4 font-semibold text-white">
        Send now
      </button>
    </div>
  );
}
