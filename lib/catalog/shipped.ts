import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { formatCatalogError } from "./errors";
import { loadCatalogTexts, type CatalogResult, type LoadedCatalog } from "./loader";

// Node-only: reads the shipped catalog's YAML files. Everything else in lib/catalog is pure.

const cache = new Map<string, CatalogResult>();

/** The shipped catalog directory: `catalog/` at the repository root (the working directory of the app and its tests). */
export function shippedCatalogDir(): string {
  return join(/*turbopackIgnore: true*/ process.cwd(), "catalog");
}

/** Read and validate every `*.yaml` file in the directory, in name order; cached per directory. */
export function loadShippedCatalog(dir: string = shippedCatalogDir()): CatalogResult {
  const hit = cache.get(dir);
  if (hit) return hit;
  const files = readdirSync(dir)
    .filter((f) => f.endsWith(".yaml"))
    .sort()
    .map((fileName) => ({ fileName, text: readFileSync(join(dir, fileName), "utf8") }));
  const result = loadCatalogTexts(files);
  cache.set(dir, result);
  return result;
}

/** The shipped catalog; throws if it does not validate (a defect in the shipped files, never a user's doing). */
export function shippedCatalog(dir?: string): LoadedCatalog {
  const r = loadShippedCatalog(dir);
  if (!r.ok) throw new Error(`the shipped catalog does not validate:\n${r.errors.map(formatCatalogError).join("\n")}`);
  return { catalog: r.catalog, sources: r.sources };
}

/** Forget cached results (for tests and for a development server after editing the files). */
export function clearShippedCatalogCache(): void {
  cache.clear();
}
