import useSWR from "swr";
import type { RevisionMeta } from "@/lib/server/layouts";
import { fetcher } from "@/lib/client/fetcher";

export const revisionsKey = (layoutId: number) => `/api/layouts/${layoutId}/revisions`;

/** A layout's revision history; pass null while the history is closed, so nothing is fetched. */
export function useRevisions(layoutId: number | null) {
  const swr = useSWR<{ revisions: RevisionMeta[] }>(layoutId == null ? null : revisionsKey(layoutId), fetcher);
  return { ...swr, revisions: swr.data?.revisions ?? [] };
}
