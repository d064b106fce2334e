import type { CatalogKind } from "./schema";

/** Singular words for each kind of entry, as the UI and messages name them. */
export const kindLabel: Record<CatalogKind, string> = {
  inputTypes: "input type",
  panels: "control panel",
  expansionBoards: "expansion board",
  keypads: "keypad",
  powerSupplies: "power supply",
  detectors: "detector",
  sounders: "sounder",
  strobes: "strobe",
  outputModules: "output module",
  wirelessReceivers: "wireless receiver",
  wirelessDetectors: "wireless detector",
};

/** Plural headings for each kind. */
export const kindHeading: Record<CatalogKind, string> = {
  inputTypes: "Input types",
  panels: "Control panels",
  expansionBoards: "Expansion boards",
  keypads: "Keypads",
  powerSupplies: "Power supplies",
  detectors: "Detectors",
  sounders: "Sounders",
  strobes: "Strobes and beacons",
  outputModules: "Output modules",
  wirelessReceivers: "Wireless receivers",
  wirelessDetectors: "Wireless detectors",
};
