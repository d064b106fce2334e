import { describe, expect, it } from "vitest";
import { catalogSummary } from "@/lib/catalog/figures";
import { shippedCatalog } from "@/lib/catalog/shipped";
import { columnsFor, compareRows, matches, tableQuery, tableStateFrom, visibleRows, type CatalogRow } from "@/components/catalog/catalog-table-model";

// The catalog tables' filtering and sorting (pure; kept beside the catalog's integration tests).
const rows: CatalogRow[] = catalogSummary(shippedCatalog().catalog).map((r) => ({ ...r, origin: r.id === "motion-wall" ? "overridden" : "shipped", lifeSafety: false }));
const state = tableStateFrom({});

describe("catalog table model", () => {
  it("gives each kind the columns its figures have, labelled with their units", () => {
    const panelCols = columnsFor("panels", rows);
    expect(panelCols.map((c) => c.key)).toEqual(expect.arrayContaining(["onboardInputs.count", "maxZones", "bus.maxDevices", "auxOutputMa", "maxBatteryAh", "listPrice"]));
    expect(panelCols.find((c) => c.key === "auxOutputMa")).toMatchObject({ label: "Auxiliary output", unit: "mA" });
    expect(columnsFor("inputTypes", rows).map((c) => c.key)).not.toContain("listPrice"); // input types carry no price
  });

  it("sorts numbers as numbers both ways, rows without the figure last either way", () => {
    const up = visibleRows(rows, "detectors", { ...state, sort: "power.standbyMa", dir: "asc" });
    const down = visibleRows(rows, "detectors", { ...state, sort: "power.standbyMa", dir: "desc" });
    const values = (list: CatalogRow[]) => list.map((r) => r.figures.find((f) => f.key === "power.standbyMa")?.value ?? null);
    const withValue = values(up).filter((v): v is number => typeof v === "number");
    expect(withValue).toEqual([...withValue].sort((a, b) => a - b));
    expect(values(down).filter((v) => v !== null)).toEqual([...withValue].reverse());
    expect(values(up).slice(withValue.length).every((v) => v === null)).toBe(true); // unpowered detectors after the powered ones
    expect(values(down).slice(withValue.length).every((v) => v === null)).toBe(true);
    // 10 before 9 would be text order; numbers must compare as numbers
    const a = { ...rows[0], figures: [{ key: "n", label: "n", value: 9, unit: "" }] };
    const b = { ...rows[0], figures: [{ key: "n", label: "n", value: 10, unit: "" }] };
    expect(compareRows(a, b, "n", "asc")).toBeLessThan(0);
  });

  it("filters by every word of the query, by kind and by source", () => {
    // "smoke" alone also finds the heat detector whose description mentions smoke; "smoke optical" does not
    expect(visibleRows(rows, "detectors", { ...state, q: "smoke" }).map((r) => r.id)).toEqual(["smoke-4wire-nc", "smoke-4wire-no", "heat-fixed-no"].sort((x, y) => rows.find((r) => r.id === x)!.name.localeCompare(rows.find((r) => r.id === y)!.name)));
    expect(visibleRows(rows, "detectors", { ...state, q: "Smoke OPTICAL" }).map((r) => r.id).sort()).toEqual(["smoke-4wire-nc", "smoke-4wire-no"]);
    expect(rows.filter((r) => matches(r, "ceiling motion")).map((r) => r.id)).toEqual(["motion-ceiling"]);
    expect(visibleRows(rows, "detectors", { ...state, source: "upload" }).map((r) => r.id)).toEqual(["motion-wall"]);
    expect(visibleRows(rows, "panels", { ...state, q: "motion" })).toEqual([]);
  });

  it("reads and writes the state in the address, ignoring what it does not know", () => {
    expect(tableStateFrom({ kind: "nonsense", sort: "x;drop", dir: "sideways", source: "elsewhere" })).toEqual(state);
    const s = tableStateFrom({ kind: "panels", q: "32", sort: "maxZones", dir: "desc" });
    expect(s).toMatchObject({ kind: "panels", q: "32", sort: "maxZones", dir: "desc" });
    expect(tableStateFrom(Object.fromEntries(new URLSearchParams(tableQuery(s).slice(1))))).toEqual(s);
    expect(tableQuery(state)).toBe("");
  });
});
