import { awgAreaMm2, awgDiameterMm, METRES_PER_FOOT } from "@/lib/loop/cable";
import type { CableGauge } from "@/lib/loop/types";
import type { OrganisationSettings, UnitSystem } from "@/lib/organisation/settings-schema";

// The one way dates, money, lengths and gauges are written for people: pages, PDFs and CSV exports all format
// through makeFormat(organisation settings), so the same figure never appears in two shapes.

export type FormatSettings = Pick<OrganisationSettings, "locale" | "timeZone" | "currency" | "units">;

export interface Format {
  readonly settings: FormatSettings;
  /** Date and time in the organisation's locale and time zone, naming the zone ("3 Dec 2026, 14:05 UTC"). */
  dateTime(when: Date | string): string;
  /** The calendar date in the organisation's time zone. */
  date(when: Date | string): string;
  /** An amount with the currency, in the currency's usual decimals ("€1,234.50"). */
  money(amount: number): string;
  /** An amount as a plain number in the currency's usual decimals, for CSV cells that spreadsheets compute with. */
  moneyPlain(amount: number): string;
  /** A cable length given in metres, in the organisation's unit system; `down` for a limit that must not be overstated. */
  length(metres: number, round?: "nearest" | "down"): string;
  /** A gauge in the organisation's unit system, with the gauge as entered when it was converted. */
  gauge(gauge: CableGauge): string;
}

const asDate = (when: Date | string) => (when instanceof Date ? when : new Date(when));

/** The nearest whole AWG to a cross-section, by the ASTM B258 diameter rule. */
export function nearestAwg(mm2: number): number {
  const d = Math.sqrt((4 * mm2) / Math.PI);
  return Math.round(36 - 39 * (Math.log(d / awgDiameterMm(36)) / Math.log(92)));
}

export function metresToFeet(metres: number): number {
  return metres / METRES_PER_FOOT;
}

function lengthIn(units: UnitSystem, metres: number, locale: string, round: "nearest" | "down"): string {
  const exact = units === "imperial" ? metresToFeet(metres) : metres;
  const digits = exact < 10 ? 1 : 0;
  const value = round === "down" ? Math.floor(exact * 10 ** digits) / 10 ** digits : exact;
  const text = new Intl.NumberFormat(locale, { maximumFractionDigits: digits }).format(value);
  return `${text} ${units === "imperial" ? "ft" : "m"}`;
}

function gaugeIn(units: UnitSystem, g: CableGauge, locale: string): string {
  const mm2 = (x: number) => `${new Intl.NumberFormat(locale, { maximumFractionDigits: 2 }).format(x)} mm²`;
  if (units === "imperial") return "awg" in g ? `${g.awg} AWG` : `${nearestAwg(g.mm2)} AWG (${mm2(g.mm2)})`;
  return "mm2" in g ? mm2(g.mm2) : `${mm2(awgAreaMm2(g.awg))} (${g.awg} AWG)`;
}

export function makeFormat(settings: FormatSettings): Format {
  const dateTimeFormat = new Intl.DateTimeFormat(settings.locale, {
    timeZone: settings.timeZone,
    year: "numeric",
    month: "short",
    day: "numeric",
    hour: "2-digit",
    minute: "2-digit",
    timeZoneName: "short",
  });
  const dateFormat = new Intl.DateTimeFormat(settings.locale, { timeZone: settings.timeZone, year: "numeric", month: "short", day: "numeric" });
  const moneyFormat = new Intl.NumberFormat(settings.locale, { style: "currency", currency: settings.currency });
  const digits = moneyFormat.resolvedOptions().maximumFractionDigits ?? 2;
  const safe = (f: Intl.DateTimeFormat, when: Date | string) => {
    const d = asDate(when);
    return Number.isNaN(d.getTime()) ? String(when) : f.format(d);
  };
  return {
    settings,
    dateTime: (when) => safe(dateTimeFormat, when),
    date: (when) => safe(dateFormat, when),
    money: (amount) => moneyFormat.format(amount),
    moneyPlain: (amount) => amount.toFixed(digits),
    length: (metres, round = "nearest") => lengthIn(settings.units, metres, settings.locale, round),
    gauge: (g) => gaugeIn(settings.units, g, settings.locale),
  };
}
