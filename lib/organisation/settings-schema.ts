import { z } from "zod";

// The organisation's settings: shared by the settings form, PATCH /api/organisation, the OpenAPI document and
// the formatting module (lib/format).

export const paperSizes = ["a4", "letter"] as const;
export type PaperSize = (typeof paperSizes)[number];
export const paperLabels: Record<PaperSize, string> = { a4: "A4", letter: "US Letter" };

export const unitSystems = ["metric", "imperial"] as const;
export type UnitSystem = (typeof unitSystems)[number];
export const unitSystemLabels: Record<UnitSystem, string> = { metric: "Metric (m, mm²)", imperial: "Imperial (ft, AWG)" };

/** The ISO 4217 codes this runtime's Intl knows (the same list in Node and the browser, from ICU). */
export function knownCurrencies(): string[] {
  return Intl.supportedValuesOf("currency");
}

/** IANA time zones this runtime's Intl knows, with UTC first. */
export function knownTimeZones(): string[] {
  return ["UTC", ...Intl.supportedValuesOf("timeZone").filter((z) => z !== "UTC")];
}

export const isKnownCurrency = (code: string) => /^[A-Z]{3}$/.test(code) && knownCurrencies().includes(code);

export function isKnownLocale(tag: string): boolean {
  try {
    return Intl.getCanonicalLocales(tag).length === 1 && Intl.NumberFormat.supportedLocalesOf([tag]).length === 1;
  } catch {
    return false;
  }
}

export function isKnownTimeZone(zone: string): boolean {
  try {
    new Intl.DateTimeFormat("en", { timeZone: zone });
    return true;
  } catch {
    return false;
  }
}

export const currencySchema = z
  .string()
  .trim()
  .transform((s) => s.toUpperCase())
  .refine(isKnownCurrency, "Enter a three-letter ISO 4217 currency code, e.g. EUR, GBP or USD");

export const organisationNameSchema = z.string().trim().min(1, "Enter the organisation's name").max(200, "Use at most 200 characters");

export const organisationSettingsSchema = z.strictObject({
  name: organisationNameSchema,
  currency: currencySchema,
  locale: z.string().trim().max(35, "Use at most 35 characters").refine(isKnownLocale, "Enter a language tag such as en-GB, en-US or de-DE"),
  timeZone: z.string().trim().max(64).refine(isKnownTimeZone, "Choose a time zone from the list, e.g. Europe/London or UTC"),
  paper: z.enum(paperSizes, "Choose A4 or US Letter"),
  units: z.enum(unitSystems, "Choose metric or imperial units"),
  soloApproval: z.boolean(),
});
export type OrganisationSettingsInput = z.infer<typeof organisationSettingsSchema>;

/** What every page, PDF and CSV formats with, and what the actor carries. */
export interface OrganisationSettings {
  currency: string;
  locale: string;
  timeZone: string;
  paper: PaperSize;
  units: UnitSystem;
  /** One person may both submit and approve a layout (off unless the organisation turns it on). */
  soloApproval: boolean;
}

export const defaultOrganisationSettings: OrganisationSettings = { currency: "EUR", locale: "en-GB", timeZone: "UTC", paper: "a4", units: "metric", soloApproval: false };
