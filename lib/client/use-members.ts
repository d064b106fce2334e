import useSWR from "swr";
import type { listMembers } from "@/lib/server/members";
import { fetcher } from "@/lib/client/fetcher";

export type MemberList = Awaited<ReturnType<typeof listMembers>>;

export const membersKey = "/api/members";

/** The organisation's members and open invitations; `initial` is what the server page loaded. */
export function useMembers(initial?: MemberList) {
  const swr = useSWR<MemberList>(membersKey, fetcher, { fallbackData: initial, revalidateOnFocus: false });
  return { ...swr, members: swr.data?.members ?? [], invitations: swr.data?.invitations ?? [] };
}
