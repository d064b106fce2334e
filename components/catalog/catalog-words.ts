import type { Report, WiringScheme } from "@/lib/catalog/schema";
import type { EntryOrigin } from "@/lib/server/catalogs";
import { REPORT_WORDS, SCHEME_WORDS, sentenceWords } from "@/lib/vocabulary/words";

// Words the catalog screens use for scheme and report values: the vocabulary's, capitalised to stand alone.

export const schemeLabel: Record<WiringScheme, string> = sentenceWords(SCHEME_WORDS);
export const reportLabel: Record<Report, string> = sentenceWords(REPORT_WORDS);

export const stateLabel = {
  rest: "at rest",
  active: "detector active",
  "active-a": "detector A active",
  "active-b": "detector B active",
  "active-both": "both active",
} as const;

export const originLabel: Record<EntryOrigin, string> = {
  shipped: "Shipped",
  added: "Your upload",
  overridden: "Your upload (replaces shipped)",
};
