import { describe, expect, it } from "vitest";
import { catalogDiff, effectiveCatalog, findEntry, loadCatalogTexts, mergeCatalogs, parseCatalogFile, serializeCatalog, validateCatalog, type CatalogSource } from "./loader";
import type { CatalogError } from "./errors";
import { edit, familyYaml, inputTypesYaml, schemesYaml } from "./test-fixtures";

function errorsOf(text: string, file = "f.yaml"): CatalogError[] {
  const r = parseCatalogFile(text, file);
  if (r.ok) throw new Error("expected the file to be refused");
  expect(r).not.toHaveProperty("catalog");
  return r.errors;
}

function source(text: string, file: string): CatalogSource {
  const r = parseCatalogFile(text, file);
  if (!r.ok) throw new Error(JSON.stringify(r.errors));
  return r.source;
}

const base = () => [
  { fileName: "input-types.yaml", text: inputTypesYaml },
  { fileName: "family-a.yaml", text: familyYaml },
];

describe("parseCatalogFile", () => {
  it("reads the fixtures", () => {
    const r = loadCatalogTexts(base());
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.catalog.panels[0].bus.maxCableM).toBe(300);
    expect(r.catalog.inputTypes[0].lifeSafety).toBe(false); // schema default
    expect(parseCatalogFile(schemesYaml, "s.yaml").ok).toBe(true);
  });

  it("refuses malformed YAML at js-yaml's position", () => {
    expect(errorsOf(edit(familyYaml, "      addressMax: 4", "     addressMax: 4"))).toEqual([
      { file: "f.yaml", line: 12, column: 6, path: "", message: "not readable as YAML: bad indentation of a mapping entry" },
    ]);
    const dup = errorsOf(edit(familyYaml, "    maxZones: 8", "    maxZones: 8\n    maxZones: 9"));
    expect(dup).toEqual([{ file: "f.yaml", line: 9, column: 5, path: "", message: "not readable as YAML: duplicated mapping key" }]);
  });

  it("refuses an empty file at line 1", () => {
    const [e] = errorsOf("");
    expect(e).toMatchObject({ line: 1, column: 1, path: "" });
    expect(e.message).toMatch(/empty/);
    expect(errorsOf("# nothing here\n")[0]).toMatchObject({ line: 1, column: 1 });
  });

  it("refuses a missing field at the entry", () => {
    expect(errorsOf(edit(familyYaml, "    maxZones: 8", "    # maxZones left out"))).toEqual([
      { file: "f.yaml", line: 2, column: 5, path: "panels.0.maxZones", message: 'missing field "maxZones" (expected number)' },
    ]);
  });

  it("refuses a figure written with its unit, naming the unit", () => {
    const [e, ...rest] = errorsOf(edit(familyYaml, "maxCableM: 300", "maxCableM: 300 m"));
    expect(rest).toEqual([]);
    expect(e).toMatchObject({ line: 13, column: 7, path: "panels.0.bus.maxCableM" });
    expect(e.message).toContain('expected a number in metres, found the text "300 m"');
  });

  it("refuses a wrong type inside a flow mapping at the key", () => {
    const [e] = errorsOf(edit(familyYaml, "{ count: 8, inputType: it-a }\n    maxZones", "{ count: eight, inputType: it-a }\n    maxZones"));
    expect(e).toMatchObject({ line: 7, column: 22, path: "panels.0.onboardInputs.count" });
  });

  it("refuses an unknown field at the field and reports the one it replaced", () => {
    expect(errorsOf(edit(familyYaml, "    listPrice: 100", "    listPrise: 100"))).toEqual([
      { file: "f.yaml", line: 2, column: 5, path: "panels.0.listPrice", message: 'missing field "listPrice" (expected number)' },
      { file: "f.yaml", line: 5, column: 5, path: "panels.0.listPrise", message: 'unknown field "listPrise"' },
    ]);
  });

  it("refuses a root that is not a mapping, and a kind that is not a list", () => {
    expect(errorsOf("- a\n- b\n")[0]).toMatchObject({ line: 1, column: 1, path: "" });
    expect(errorsOf("panels: 3\n")[0]).toMatchObject({ line: 1, column: 1, path: "panels" });
  });

  it("refuses overlapping bands at the band's fromOhms", () => {
    const [e, ...rest] = errorsOf(edit(inputTypesYaml, "normal, fromOhms: 1000", "normal, fromOhms: 900"));
    expect(rest).toEqual([]);
    expect(e).toMatchObject({ line: 12, column: 29, path: "inputTypes.0.bands.single-eol.1.fromOhms" });
    expect(e.message).toMatch(/overlap/);
  });

  it("refuses bands out of order", () => {
    const swapped = edit(
      inputTypesYaml,
      "        - { report: normal, fromOhms: 1000, toOhms: 6000 }\n        - { report: active, fromOhms: 6000, toOhms: null }",
      "        - { report: active, fromOhms: 6000, toOhms: null }\n        - { report: normal, fromOhms: 1000, toOhms: 6000 }",
    );
    const errors = errorsOf(swapped);
    expect(errors.map(({ line, column, path }) => ({ line, column, path }))).toEqual([
      { line: 12, column: 29, path: "inputTypes.0.bands.single-eol.1.fromOhms" }, // gap 1000–6000
      { line: 12, column: 45, path: "inputTypes.0.bands.single-eol.1.toOhms" }, // infinity before the end
      { line: 13, column: 45, path: "inputTypes.0.bands.single-eol.2.toOhms" }, // last band not to infinity
    ]);
  });

  it("refuses a normal band that does not hold the EOL value's spread", () => {
    // 4.7 kΩ ±5 % plus 100 Ω of loop reads 4465–5035 Ω; a normal band ending at 4900 Ω cuts it
    const text = edit(edit(inputTypesYaml, "normal, fromOhms: 1000, toOhms: 6000", "normal, fromOhms: 1000, toOhms: 4900"), "active, fromOhms: 6000", "active, fromOhms: 4900");
    const [e, ...rest] = errorsOf(text);
    expect(rest).toEqual([]);
    expect(e).toMatchObject({ line: 12, column: 11, path: "inputTypes.0.bands.single-eol.1" });
    expect(e.message).toContain("4465 Ω–5035 Ω");
  });

  it("accepts a double end-of-line table laid out for NO contacts, and refuses one that fits neither way round", () => {
    // NO contacts: rest reads eol + alarm (9 kΩ), active reads eol (2.2 kΩ)
    const no = edit(
      edit(schemesYaml, "normal, fromOhms: 1000, toOhms: 4000", "active, fromOhms: 1000, toOhms: 4000"),
      "active, fromOhms: 4000, toOhms: 12000",
      "normal, fromOhms: 4000, toOhms: 12000",
    );
    expect(parseCatalogFile(no, "f.yaml").ok).toBe(true);
    const neither = edit(schemesYaml, "active, fromOhms: 4000, toOhms: 12000", "trouble, fromOhms: 4000, toOhms: 12000");
    const [e, ...rest] = errorsOf(neither);
    expect(rest).toEqual([]);
    expect(e).toMatchObject({ line: 14, column: 11, path: "inputTypes.0.bands.double-eol.2" });
    expect(e.message).toContain("8550 Ω–9550 Ω");
  });

  it("refuses a scheme listed without its band table", () => {
    const [e] = errorsOf(edit(inputTypesYaml, "schemes: [single-eol]", "schemes: [none, single-eol]"));
    expect(e).toMatchObject({ line: 9, column: 5, path: "inputTypes.0.bands.none" });
  });

  it("refuses shared-input reports on a single end-of-line table", () => {
    const [e] = errorsOf(edit(inputTypesYaml, "report: active,", "report: active-a,"));
    expect(e).toMatchObject({ line: 13, column: 13, path: "inputTypes.0.bands.single-eol.2.report" });
  });

  it("refuses double-eol without alarmOhms, at the scheme", () => {
    expect(errorsOf(edit(schemesYaml, "    alarmOhms: 6800", "    # no alarm resistor"))).toEqual([
      {
        file: "f.yaml",
        line: 5,
        column: 15,
        path: "inputTypes.0.alarmOhms",
        message: 'scheme "double-eol" is listed but alarmOhms (the resistor across the contact) is missing',
      },
    ]);
  });

  it("refuses shared without sharedOhms, and with two equal values", () => {
    const [missing, ...rest] = errorsOf(edit(schemesYaml, "    sharedOhms: [2700, 5600]", "    # none"));
    expect(rest).toEqual([]);
    expect(missing).toMatchObject({ line: 19, column: 15, path: "inputTypes.1.sharedOhms" });
    const [equal, ...rest2] = errorsOf(edit(schemesYaml, "[2700, 5600]", "[5600, 5600]"));
    expect(rest2).toEqual([]);
    expect(equal).toMatchObject({ line: 21, column: 24, path: "inputTypes.1.sharedOhms.1" });
  });

  it("refuses a value no listed scheme uses", () => {
    const [e] = errorsOf(edit(schemesYaml, "schemes: [double-eol]", "schemes: [single-eol]"));
    expect(e).toMatchObject({ line: 7, column: 5, path: "inputTypes.0.alarmOhms" });
  });

  it("refuses a duplicate id inside one file, naming the first", () => {
    const [e] = errorsOf(edit(familyYaml, "id: board-a", "id: panel-a"));
    expect(e).toMatchObject({ line: 22, column: 5, path: "expansionBoards.0.id" });
    expect(e.message).toBe('duplicate id "panel-a": already used by the control panel at f.yaml:2');
  });
});

describe("mergeCatalogs", () => {
  it("refuses a dangling input type reference in the file that makes it", () => {
    const r = loadCatalogTexts([{ fileName: "input-types.yaml", text: edit(inputTypesYaml, "id: it-a", "id: it-b") }, base()[1]]);
    expect(r).toEqual({
      ok: false,
      errors: [
        { file: "family-a.yaml", line: 7, column: 32, path: "panels.0.onboardInputs.inputType", message: 'input type "it-a" is not in the catalog' },
        { file: "family-a.yaml", line: 27, column: 25, path: "expansionBoards.0.inputs.inputType", message: 'input type "it-a" is not in the catalog' },
      ],
    });
  });

  it("refuses a board family no panel has", () => {
    const r = loadCatalogTexts([base()[0], { fileName: "family-a.yaml", text: edit(familyYaml, "families: [fam-a]", "families: [fam-b]") }]);
    expect(r).toEqual({
      ok: false,
      errors: [{ file: "family-a.yaml", line: 26, column: 16, path: "expansionBoards.0.families.0", message: 'no control panel in the catalog is of family "fam-b"' }],
    });
  });

  it("refuses an id used in two files, at the later one", () => {
    const extra = "detectors:\n  - id: board-a\n    name: D\n    description: ''\n    listPrice: 1\n    category: motion\n    lifeSafety: false\n    contact: NC\n    tamper: true\n    power: null\n    mounting: wall\n";
    const r = loadCatalogTexts([...base(), { fileName: "extra.yaml", text: extra }]);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors).toEqual([
      { file: "extra.yaml", line: 2, column: 5, path: "detectors.0.id", message: 'duplicate id "board-a": already used by the expansion board at family-a.yaml:22' },
    ]);
  });

  it("refuses smoke detectors not marked life-safety", () => {
    const smoke = "detectors:\n  - id: smoke-x\n    name: D\n    description: ''\n    listPrice: 1\n    category: smoke\n    lifeSafety: false\n    contact: NO\n    tamper: false\n    power: null\n    mounting: ceiling\n";
    expect(errorsOf(smoke)).toEqual([
      { file: "f.yaml", line: 7, column: 5, path: "detectors.0.lifeSafety", message: "a smoke detector is a life-safety device: lifeSafety must be true" },
    ]);
  });

  it("validateCatalog agrees with the merge and locates in the serialized text without sources", () => {
    const r = mergeCatalogs([source(inputTypesYaml, "input-types.yaml"), source(familyYaml, "family-a.yaml")]);
    if (!r.ok) throw new Error("fixtures must merge");
    expect(validateCatalog(r.catalog, r.sources)).toEqual([]);
    expect(validateCatalog(r.catalog)).toEqual([]);
    const broken = structuredClone(r.catalog);
    broken.expansionBoards[0].families = ["nobody"];
    const [e] = validateCatalog(broken);
    const text = serializeCatalog(broken);
    const line = text.split("\n").findIndex((l) => l.includes("- nobody")) + 1;
    expect(e).toMatchObject({ file: "catalog.yaml", line, path: "expansionBoards.0.families.0" });
    expect(validateCatalog(broken, r.sources)[0]).toMatchObject({ file: "family-a.yaml", line: 26, column: 16 });
  });
});

describe("effectiveCatalog", () => {
  const shipped = () => {
    const r = loadCatalogTexts(base());
    if (!r.ok) throw new Error("fixtures must load");
    return r;
  };
  const orgPanel = (family: string, id = "panel-a") =>
    edit(edit(edit(familyYaml, "id: panel-a", `id: ${id}`), "family: fam-a", `family: ${family}`), "expansionBoards:", "expansionBoardsX:").split("expansionBoardsX:")[0];

  it("returns the shipped catalog unchanged without an upload", () => {
    const s = shipped();
    const r = effectiveCatalog(s);
    expect(r.ok && r.catalog).toEqual(s.catalog);
  });

  it("adds new ids and replaces same-kind ids whole, in place", () => {
    const org = orgPanel("fam-a").replace("listPrice: 100", "listPrice: 90") + orgPanel("fam-a", "panel-b").replace("panels:\n", "");
    const r = effectiveCatalog(shipped(), source(org, "org.yaml"));
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.catalog.panels.map((p) => [p.id, p.listPrice])).toEqual([
      ["panel-a", 90],
      ["panel-b", 100],
    ]);
    expect(r.overridden).toEqual([{ kind: "panels", id: "panel-a" }]);
    expect(r.added).toEqual([{ kind: "panels", id: "panel-b" }]);
    expect(catalogDiff(shipped().catalog, r.catalog)).toEqual({
      added: [{ kind: "panels", id: "panel-b" }],
      removed: [],
      changed: [{ kind: "panels", id: "panel-a", paths: ["listPrice"] }],
    });
  });

  it("refuses an override of another kind", () => {
    const org = orgPanel("fam-a", "board-a");
    const r = effectiveCatalog(shipped(), source(org, "org.yaml"));
    expect(r).toEqual({
      ok: false,
      errors: [{ file: "org.yaml", line: 2, column: 5, path: "panels.0.id", message: 'id "board-a" is an expansion board in the shipped catalog; an override must be of the same kind' }],
    });
  });

  it("refuses an override that leaves a shipped entry dangling, pointing at the shipped entry", () => {
    const r = effectiveCatalog(shipped(), source(orgPanel("fam-z"), "org.yaml"));
    expect(r).toEqual({
      ok: false,
      errors: [{ file: "family-a.yaml", line: 26, column: 16, path: "expansionBoards.0.families.0", message: 'no control panel in the catalog is of family "fam-a"' }],
    });
  });
});

describe("catalogDiff and findEntry", () => {
  it("lists changed field paths inside nested entries", () => {
    const r = loadCatalogTexts(base());
    if (!r.ok) throw new Error("fixtures must load");
    const after = structuredClone(r.catalog);
    after.inputTypes[0].bands["single-eol"]![1].toOhms = 5900;
    after.inputTypes[0].bands["single-eol"]![2].fromOhms = 5900;
    after.panels[0].bus.maxCableM = 400;
    after.expansionBoards = [];
    expect(catalogDiff(r.catalog, after)).toEqual({
      added: [],
      removed: [{ kind: "expansionBoards", id: "board-a" }],
      changed: [
        { kind: "inputTypes", id: "it-a", paths: ["bands.single-eol.1.toOhms", "bands.single-eol.2.fromOhms"] },
        { kind: "panels", id: "panel-a", paths: ["bus.maxCableM"] },
      ],
    });
    expect(catalogDiff(r.catalog, r.catalog)).toEqual({ added: [], removed: [], changed: [] });
  });

  it("finds an entry of any kind by id", () => {
    const r = loadCatalogTexts(base());
    if (!r.ok) throw new Error("fixtures must load");
    expect(findEntry(r.catalog, "board-a")).toEqual({ kind: "expansionBoards", entry: r.catalog.expansionBoards[0] });
    expect(findEntry(r.catalog, "it-a")?.kind).toBe("inputTypes");
    expect(findEntry(r.catalog, "nothing")).toBeUndefined();
  });
});
