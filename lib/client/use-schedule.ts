import useSWR from "swr";
import type { ScheduleDetector } from "@/lib/schedule/schema";
import { fetcher } from "@/lib/client/fetcher";

export const scheduleKey = (siteId: number) => `/api/sites/${siteId}/schedule`;

/** A site's device schedule; `initial` is what the server page loaded. */
export function useSchedule(siteId: number, initial?: ScheduleDetector[]) {
  const swr = useSWR<{ detectors: ScheduleDetector[] }>(scheduleKey(siteId), fetcher, { fallbackData: initial ? { detectors: initial } : undefined, revalidateOnFocus: false });
  return { ...swr, detectors: swr.data?.detectors ?? [] };
}
