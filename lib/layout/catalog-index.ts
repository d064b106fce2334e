import type { Catalog, Detector, ExpansionBoard, InputType, Keypad, OutputModule, Panel, PowerSupply, Sounder, Strobe, WirelessDetector, WirelessReceiver } from "@/lib/catalog/schema";
import type { BoardKind } from "@/lib/layout/schema";

// Id lookups over a catalog, built once per catalog object.

export interface CatalogIndex {
  catalog: Catalog;
  inputTypes: Map<string, InputType>;
  panels: Map<string, Panel>;
  expansionBoards: Map<string, ExpansionBoard>;
  keypads: Map<string, Keypad>;
  powerSupplies: Map<string, PowerSupply>;
  detectors: Map<string, Detector>;
  sounders: Map<string, Sounder>;
  strobes: Map<string, Strobe>;
  outputModules: Map<string, OutputModule>;
  wirelessReceivers: Map<string, WirelessReceiver>;
  wirelessDetectors: Map<string, WirelessDetector>;
}

export type BoardEntry =
  | { kind: "expansion"; entry: ExpansionBoard }
  | { kind: "keypad"; entry: Keypad }
  | { kind: "supply"; entry: PowerSupply }
  | { kind: "outputs"; entry: OutputModule }
  | { kind: "receiver"; entry: WirelessReceiver };

const cache = new WeakMap<Catalog, CatalogIndex>();

export function indexCatalog(catalog: Catalog): CatalogIndex {
  let ix = cache.get(catalog);
  if (!ix) {
    // a frozen revision's catalog may predate a kind: its list is then absent
    const byId = <T extends { id: string }>(xs: T[] | undefined) => new Map((xs ?? []).map((x) => [x.id, x]));
    ix = {
      catalog,
      inputTypes: byId(catalog.inputTypes),
      panels: byId(catalog.panels),
      expansionBoards: byId(catalog.expansionBoards),
      keypads: byId(catalog.keypads),
      powerSupplies: byId(catalog.powerSupplies),
      detectors: byId(catalog.detectors),
      sounders: byId(catalog.sounders),
      strobes: byId(catalog.strobes),
      outputModules: byId(catalog.outputModules),
      wirelessReceivers: byId(catalog.wirelessReceivers),
      wirelessDetectors: byId(catalog.wirelessDetectors),
    };
    cache.set(catalog, ix);
  }
  return ix;
}

export function boardEntry(ix: CatalogIndex, kind: BoardKind, catalogId: string): BoardEntry | null {
  if (kind === "expansion") {
    const entry = ix.expansionBoards.get(catalogId);
    return entry ? { kind, entry } : null;
  }
  if (kind === "keypad") {
    const entry = ix.keypads.get(catalogId);
    return entry ? { kind, entry } : null;
  }
  if (kind === "outputs") {
    const entry = ix.outputModules.get(catalogId);
    return entry ? { kind, entry } : null;
  }
  if (kind === "receiver") {
    const entry = ix.wirelessReceivers.get(catalogId);
    return entry ? { kind, entry } : null;
  }
  const entry = ix.powerSupplies.get(catalogId);
  return entry ? { kind, entry } : null;
}

/** The input block of a board: expansion boards always, keypads sometimes, supplies never. */
export function boardInputs(b: BoardEntry): { count: number; inputType: string } | null {
  if (b.kind === "supply" || b.kind === "outputs" || b.kind === "receiver") return null;
  return b.entry.inputs ?? null;
}
