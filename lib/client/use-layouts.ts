import useSWR from "swr";
import type { LayoutMeta } from "@/lib/server/layouts";
import { fetcher } from "@/lib/client/fetcher";

export const layoutsKey = (siteId: number) => `/api/sites/${siteId}/layouts`;

/** A site's layouts with their current revision's summary. */
export function useLayouts(siteId: number, initial?: LayoutMeta[]) {
  const swr = useSWR<{ layouts: LayoutMeta[] }>(layoutsKey(siteId), fetcher, { fallbackData: initial ? { layouts: initial } : undefined, revalidateOnFocus: false });
  return { ...swr, layouts: swr.data?.layouts ?? [] };
}
