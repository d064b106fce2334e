import type { Metadata } from "next";
import { pageActor } from "@/lib/server/session";
import { PageHeader } from "@/components/ui/page-header";
import { Refusal } from "@/components/ui/refusal";
import { NewSiteForm } from "@/components/sites/new-site-form";

export const metadata: Metadata = { title: "New site" };

export default async function NewSitePage() {
  const { allowed, reason } = await pageActor("site:write", "/sites/new");
  if (!allowed) return <Refusal reason={reason} />;
  return (
    <>
      <PageHeader title="New site" subtitle="The building the alarm system is for: who to contact, and its floors, areas and rooms." />
      <NewSiteForm />
    </>
  );
}
