import "server-only";
import { db } from "./db";
import { audit } from "./audit";
import { ApiError } from "./errors";
import { forgetOrganisation } from "./actor-cache";
import { settingsOf, type Actor } from "./session";
import { Organisation } from "@/models";
import type { OrganisationSettingsInput } from "@/lib/organisation/settings-schema";

export type OrganisationSettingsView = OrganisationSettingsInput;

function view(org: Organisation): OrganisationSettingsView {
  return { name: org.name, ...settingsOf(org) };
}

export async function readOrganisationSettings(actor: Actor): Promise<OrganisationSettingsView> {
  const org = await Organisation.findByPk(actor.organisationId);
  if (!org) throw new ApiError(404, "The organisation was not found.");
  return view(org);
}

/** Saves the settings; one audit entry per setting that changed, in the same transaction. */
export async function updateOrganisationSettings(actor: Actor, input: OrganisationSettingsInput): Promise<OrganisationSettingsView> {
  return db().transaction(async (transaction) => {
    const org = await Organisation.findByPk(actor.organisationId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!org) throw new ApiError(404, "The organisation was not found.");
    const before = view(org);
    const changed = (Object.keys(input) as (keyof OrganisationSettingsInput)[]).filter((k) => before[k] !== input[k]);
    if (!changed.length) return before;
    await org.update(input, { transaction });
    forgetOrganisation(org.id, transaction);
    for (const key of changed)
      await audit({ organisationId: org.id, userId: actor.userId, action: "organisation.setting", entityType: "organisation", entityId: org.id, detail: { setting: key, from: before[key], to: input[key] } }, transaction);
    return view(org);
  });
}
