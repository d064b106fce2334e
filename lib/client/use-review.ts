import useSWR from "swr";
import type { ReviewView } from "@/lib/server/review";
import { fetcher } from "@/lib/client/fetcher";

export const reviewKey = (layoutId: number) => `/api/layouts/${layoutId}/review`;

/** A layout's review: state, the steps the caller may take, comments and decisions. Pass null while the layout is unknown. */
export function useReview(layoutId: number | null, initial?: ReviewView) {
  return useSWR<ReviewView>(layoutId == null ? null : reviewKey(layoutId), fetcher, { fallbackData: initial, revalidateOnFocus: false });
}
