import { useCallback } from "react";
import useSWR from "swr";
import type { LayoutView } from "@/lib/server/layouts";
import { fetcher } from "@/lib/client/fetcher";

export const layoutKey = (layoutId: number) => `/api/layouts/${layoutId}`;

/**
 * One layout and its current document, read only when `reload` is called: the editor starts from the page's
 * copy and decides when to take the server's (never on mount, focus or reconnect).
 */
export function useLayout(layoutId: number | null) {
  const swr = useSWR<LayoutView>(layoutId == null ? null : layoutKey(layoutId), fetcher, { revalidateOnMount: false, revalidateOnFocus: false, revalidateIfStale: false, revalidateOnReconnect: false });
  const { mutate } = swr;
  /** The server's latest copy; throws a FetchError when it cannot be read. */
  const reload = useCallback(async (): Promise<LayoutView> => {
    if (layoutId == null) throw new Error("No layout to reload.");
    const latest = await fetcher<LayoutView>(layoutKey(layoutId));
    await mutate(latest, { revalidate: false });
    return latest;
  }, [layoutId, mutate]);
  return { ...swr, reload };
}
