import type { Metadata } from "next";
import { pageActor } from "@/lib/server/session";
import { readOrganisationSettings } from "@/lib/server/organisation-settings";
import { PageHeader } from "@/components/ui/page-header";
import { Refusal } from "@/components/ui/refusal";
import { SettingsForm } from "@/components/organisation/settings-form";

export const metadata: Metadata = { title: "Organisation settings" };

export default async function SettingsPage() {
  const { actor, allowed, reason } = await pageActor("organisation:manage", "/settings");
  if (!allowed) return <Refusal reason={reason} />;
  const settings = await readOrganisationSettings(actor);
  return (
    <>
      <PageHeader title="Organisation settings" subtitle="Money, dates, paper and units for everyone in the organisation, and who may approve a layout." />
      <SettingsForm initial={settings} />
    </>
  );
}
