import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { catalogArb } from "./arbitraries";
import { parseCatalogFile, serializeCatalog, validateCatalog } from "./loader";

describe("serializeCatalog and parseCatalogFile", () => {
  it("any valid catalog survives YAML and back unchanged", () => {
    fc.assert(
      fc.property(catalogArb(), (catalog) => {
        expect(validateCatalog(catalog)).toEqual([]); // the arbitrary only makes valid catalogs
        const text = serializeCatalog(catalog);
        const back = parseCatalogFile(text, "catalog.yaml");
        expect(back.ok ? [] : back.errors).toEqual([]);
        if (back.ok) expect(back.catalog).toEqual(catalog);
      }),
      { numRuns: 150 },
    );
  });
});
