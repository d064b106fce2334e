import useSWR from "swr";
import type { LayoutView } from "@/lib/server/layouts";
import { fetcher } from "@/lib/client/fetcher";

export const layoutKey = (layoutId: number) => `/api/layouts/${layoutId}`;

/** One layout and its current document. Not revalidated on focus: the editor decides when to take the server's copy. */
export function useLayout(layoutId: number | null) {
  return useSWR<LayoutView>(layoutId == null ? null : layoutKey(layoutId), fetcher, { revalidateOnFocus: false, revalidateIfStale: false });
}
