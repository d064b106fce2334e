"use client";

import { createContext, useContext, useMemo, type ReactNode } from "react";
import { makeFormat, type Format, type FormatSettings } from "@/lib/format/format";
import { defaultOrganisationSettings } from "@/lib/organisation/settings-schema";

// The organisation's formats for every client component under the signed-in frame (app/(app)/layout.tsx).
const FormatContext = createContext<Format>(makeFormat(defaultOrganisationSettings));

export function FormatProvider({ settings, children }: { settings: FormatSettings; children: ReactNode }) {
  const { locale, timeZone, currency, units } = settings;
  const format = useMemo(() => makeFormat({ locale, timeZone, currency, units }), [locale, timeZone, currency, units]);
  return <FormatContext.Provider value={format}>{children}</FormatContext.Provider>;
}

/** Dates, money, lengths and gauges as the organisation writes them. */
export function useFormat(): Format {
  return useContext(FormatContext);
}
