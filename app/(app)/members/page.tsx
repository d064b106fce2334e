import type { Metadata } from "next";
import { pageActor } from "@/lib/server/session";
import { listMembers } from "@/lib/server/members";
import { PageHeader } from "@/components/ui/page-header";
import { Refusal } from "@/components/ui/refusal";
import { MemberAdmin } from "@/components/members/member-admin";

export const metadata: Metadata = { title: "Members" };

export default async function MembersPage() {
  const { actor, allowed, reason } = await pageActor("members:read", "/members");
  if (!allowed) return <Refusal reason={reason} />;
  const data = await listMembers(actor.organisationId);
  return (
    <>
      <PageHeader title="Members" subtitle="Who works on this organisation's designs, and in which role." />
      <MemberAdmin initial={data} selfUserId={actor.userId} />
    </>
  );
}
