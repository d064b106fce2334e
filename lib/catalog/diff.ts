import { catalogKinds, type Catalog, type CatalogKind } from "./schema";

export interface ChangedEntry {
  kind: CatalogKind;
  id: string;
  /** Dotted paths of the fields that differ, e.g. `bands.single-eol.2.toOhms`; a list whose length changed is one path. */
  paths: string[];
}

export interface CatalogDiff {
  added: { kind: CatalogKind; id: string }[];
  removed: { kind: CatalogKind; id: string }[];
  changed: ChangedEntry[];
}

function diffValues(a: unknown, b: unknown, path: string, out: string[]): void {
  if (Object.is(a, b)) return;
  const at = (k: string | number) => (path ? `${path}.${k}` : String(k));
  if (Array.isArray(a) && Array.isArray(b)) {
    if (a.length !== b.length) {
      out.push(path);
      return;
    }
    a.forEach((x, i) => diffValues(x, b[i], at(i), out));
    return;
  }
  if (a && b && typeof a === "object" && typeof b === "object" && !Array.isArray(a) && !Array.isArray(b)) {
    const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
    for (const k of keys) {
      const x = (a as Record<string, unknown>)[k];
      const y = (b as Record<string, unknown>)[k];
      if (x === undefined && y === undefined) continue;
      diffValues(x, y, at(k), out);
    }
    return;
  }
  out.push(path);
}

/** What changed between two catalogs, entry by entry (matched by kind and id). */
export function catalogDiff(before: Catalog, after: Catalog): CatalogDiff {
  const diff: CatalogDiff = { added: [], removed: [], changed: [] };
  for (const kind of catalogKinds) {
    const a = new Map<string, unknown>((before[kind] ?? []).map((e) => [e.id, e]));
    const b = new Map<string, unknown>((after[kind] ?? []).map((e) => [e.id, e]));
    for (const id of a.keys()) if (!b.has(id)) diff.removed.push({ kind, id });
    for (const [id, entry] of b) {
      if (!a.has(id)) {
        diff.added.push({ kind, id });
        continue;
      }
      const paths: string[] = [];
      diffValues(a.get(id), entry, "", paths);
      if (paths.length) diff.changed.push({ kind, id, paths });
    }
  }
  return diff;
}
