import type { Catalog, CatalogKind, Report, WiringScheme } from "@/lib/catalog/schema";
import type { CatalogEntry } from "@/lib/catalog/loader";
import type { EntryOrigin } from "@/lib/server/catalogs";

// Words the catalog screens use for scheme and report values (GLOSSARY.md terms).

export const schemeLabel: Record<WiringScheme, string> = {
  none: "No resistor",
  "single-eol": "Single end-of-line",
  "double-eol": "Double end-of-line",
  shared: "Shared input",
};

export const reportLabel: Record<Report, string> = {
  short: "Short",
  normal: "Normal",
  active: "Active",
  "active-a": "Detector A active",
  "active-b": "Detector B active",
  "active-both": "Both active",
  open: "Open / cut",
  trouble: "Trouble",
};

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

/**
 * Whether an entry touches life safety: a fire device, a fire input type, or hardware whose inputs are
 * of a fire input type. Those screens carry the caution.
 */
export function isLifeSafety(catalog: Catalog, kind: CatalogKind, entry: CatalogEntry): boolean {
  const fireInput = (id: string | undefined) => !!id && catalog.inputTypes.some((t) => t.id === id && t.lifeSafety);
  if (kind === "detectors" || kind === "inputTypes") return "lifeSafety" in entry && entry.lifeSafety === true;
  if (kind === "panels" && "onboardInputs" in entry) return fireInput(entry.onboardInputs.inputType);
  if ((kind === "expansionBoards" || kind === "keypads") && "inputs" in entry) return fireInput(entry.inputs?.inputType);
  return false;
}
