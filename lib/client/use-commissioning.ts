import useSWR from "swr";
import type { CommissioningView } from "@/lib/server/commissioning";
import { fetcher } from "@/lib/client/fetcher";
import { reviveLoopJson } from "@/lib/client/revive-loop-json";

export const commissioningKey = (layoutId: number) => `/api/layouts/${layoutId}/commissioning`;

const fetchView = async (url: string) => reviveLoopJson<CommissioningView>(await fetcher<unknown>(url));

/**
 * A layout's commissioning: progress, readings and photos of the approved revision. `initial` is what the server
 * page loaded, shown at once; the copy is fetched again on mount (a cached copy may be older than the page) and
 * updated by the screen itself after each write, not on focus.
 */
export function useCommissioning(layoutId: number | null, initial?: CommissioningView) {
  const swr = useSWR<CommissioningView>(layoutId == null ? null : commissioningKey(layoutId), fetchView, { fallbackData: initial, revalidateOnFocus: false });
  return { ...swr, view: swr.data ?? initial ?? null };
}
