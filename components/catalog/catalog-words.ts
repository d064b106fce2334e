import type { Report, WiringScheme } from "@/lib/catalog/schema";
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
