import type { CatalogEntry } from "./loader";
import type { Catalog, CatalogKind, Detector } from "./schema";

// The one life-safety rule. Screens, sheets and reports touching a life-safety device carry the fire caution.

/** A fire device: marked life-safety in the catalog, or a smoke or heat detector whatever its mark. */
export function isLifeSafety(d: Pick<Detector, "lifeSafety" | "category">): boolean {
  return d.lifeSafety || d.category === "smoke" || d.category === "heat";
}

/**
 * Whether a catalog entry touches life safety: a fire device (the rule above), a fire input type, or hardware
 * whose inputs are of a fire input type.
 */
export function isLifeSafetyEntry(catalog: Catalog, kind: CatalogKind, entry: CatalogEntry): boolean {
  const fireInput = (id: string | undefined) => !!id && catalog.inputTypes.some((t) => t.id === id && t.lifeSafety);
  if ((kind === "detectors" || kind === "wirelessDetectors") && "category" in entry) return isLifeSafety(entry);
  if (kind === "inputTypes") return "lifeSafety" in entry && entry.lifeSafety === true;
  if (kind === "panels" && "onboardInputs" in entry) return fireInput(entry.onboardInputs.inputType);
  if ((kind === "expansionBoards" || kind === "keypads") && "inputs" in entry) return fireInput(entry.inputs?.inputType);
  return false;
}
