import { route } from "@/lib/server/route";
import { readOrganisationSettings, updateOrganisationSettings } from "@/lib/server/organisation-settings";
import { organisationSettingsSchema } from "@/lib/organisation/settings-schema";

// GET /api/organisation — the caller's organisation's settings
export const GET = route({ permission: "organisation:manage" }, async ({ actor }) => readOrganisationSettings(actor));

// PATCH /api/organisation — saves the settings (all fields); one audit entry per changed setting
export const PATCH = route({ permission: "organisation:manage", body: organisationSettingsSchema }, async ({ actor, body }) => updateOrganisationSettings(actor, body));
