"use client";

import { useMemo, useState } from "react";
import { knownCurrencies, knownTimeZones, organisationSettingsSchema, paperLabels, paperSizes, unitSystemLabels, unitSystems, type OrganisationSettingsInput } from "@/lib/organisation/settings-schema";
import { sendJson } from "@/lib/client/fetcher";
import { useSchemaForm } from "@/lib/client/use-schema-form";
import { makeFormat } from "@/lib/format/format";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/auth/auth-frame";
import { SelectField } from "./select-field";

const FIELDS = ["name", "currency", "locale", "timeZone", "paper", "units", "soloApproval"] as const;
const LOCALES = ["en-GB", "en-US", "en-AU", "en-CA", "en-IE", "en-NZ", "de-DE", "fr-FR", "es-ES", "it-IT", "nl-NL", "sv-SE", "da-DK", "pl-PL"];

export function SettingsForm({ initial }: { initial: OrganisationSettingsInput }) {
  const [saved, setSaved] = useState(initial);
  const [message, setMessage] = useState<string | null>(null);
  const form = useSchemaForm(organisationSettingsSchema, FIELDS);
  const zones = useMemo(() => knownTimeZones(), []);
  const currencies = useMemo(() => knownCurrencies(), []);
  const sample = makeFormat(saved);

  async function onSubmit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    setMessage(null);
    const d = new FormData(e.currentTarget);
    const text = (k: string) => String(d.get(k) ?? "");
    const values = { name: text("name"), currency: text("currency"), locale: text("locale"), timeZone: text("timeZone"), paper: text("paper"), units: text("units"), soloApproval: d.get("soloApproval") === "on" };
    await form.submit(values, async (body) => {
      setSaved(await sendJson<OrganisationSettingsInput>("/api/organisation", "PATCH", body));
      setMessage("Settings saved.");
    });
  }

  return (
    <div className="grid grid-cols-1 gap-6 lg:grid-cols-3">
      <Card className="lg:col-span-2">
        <form onSubmit={onSubmit} className="space-y-4" aria-label="Organisation settings" noValidate>
          <Field label="Organisation name" name="name" defaultValue={saved.name} required error={form.errors.name} />
          <Field label="Currency" name="currency" defaultValue={saved.currency} list="currency-codes" maxLength={3} required error={form.errors.currency} hint="ISO 4217 code; every price is shown in it." />
          <datalist id="currency-codes">
            {currencies.map((c) => (
              <option key={c} value={c} />
            ))}
          </datalist>
          <Field label="Language and region" name="locale" defaultValue={saved.locale} list="locales" required error={form.errors.locale} hint="A language tag such as en-GB or en-US: how dates and numbers are written." />
          <datalist id="locales">
            {LOCALES.map((l) => (
              <option key={l} value={l} />
            ))}
          </datalist>
          <SelectField label="Time zone" name="timeZone" defaultValue={saved.timeZone} options={zones.map((z) => [z, z.replaceAll("_", " ")])} error={form.errors.timeZone} />
          <SelectField label="Default paper" name="paper" defaultValue={saved.paper} options={paperSizes.map((p) => [p, paperLabels[p]])} error={form.errors.paper} />
          <SelectField label="Units" name="units" defaultValue={saved.units} options={unitSystems.map((u) => [u, unitSystemLabels[u]])} error={form.errors.units} />
          <label className="flex items-start gap-2 text-sm" htmlFor="soloApproval">
            <input id="soloApproval" name="soloApproval" type="checkbox" defaultChecked={saved.soloApproval} className="mt-1" />
            <span>
              <span className="font-medium">One person may both send a layout for review and approve it</span>
              <span className="block text-xs text-slate-500">Off: a second member must approve. Approvals made alone are marked as approved without a second review.</span>
              {form.errors.soloApproval ? <span className="block text-xs text-fault">{form.errors.soloApproval}</span> : null}
            </span>
          </label>
          <FormMessage error={form.error} />
          {message ? (
            <p role="status" className="text-sm text-signal">
              {message}
            </p>
          ) : null}
          <Button type="submit" disabled={form.busy}>
            {form.busy ? "Saving…" : "Save settings"}
          </Button>
        </form>
      </Card>
      <Card>
        <h2 className="mb-2 font-semibold">How figures are written</h2>
        <dl className="space-y-1 text-sm" data-testid="format-sample">
          <dt className="text-slate-500">A price</dt>
          <dd>{sample.money(1234.5)}</dd>
          <dt className="text-slate-500">A date</dt>
          <dd>{sample.dateTime("2026-12-03T14:05:00Z")}</dd>
          <dt className="text-slate-500">A cable run</dt>
          <dd>
            {sample.length(30)} of {sample.gauge({ mm2: 0.22 })}
          </dd>
        </dl>
      </Card>
    </div>
  );
}
