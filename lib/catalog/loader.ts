import { constructFromEvents, dump, parseEvents, type Event } from "js-yaml";
import type { z } from "zod";
import { entryIssues } from "./entry-rules";
import { kindLabel } from "./kinds";
import { formatPath, sortErrors, type CatalogError, type CatalogPath } from "./errors";
import { buildPositionIndex, countLines, type PositionIndex } from "./positions";
import {
  catalogFileSchema,
  catalogKinds,
  type Catalog,
  type CatalogFile,
  type CatalogKind,
  type Detector,
  type ExpansionBoard,
  type InputType,
  type Keypad,
  type OutputModule,
  type Panel,
  type PowerSupply,
  type Sounder,
  type Strobe,
  type WirelessDetector,
  type WirelessReceiver,
} from "./schema";

export { catalogDiff, type CatalogDiff, type ChangedEntry } from "./diff";
export type { CatalogError, CatalogPath } from "./errors";
export { kindLabel } from "./kinds";

/** One parsed file, kept with its position index so later cross-file checks can still point at lines. */
export interface CatalogSource {
  fileName: string;
  catalog: CatalogFile;
  positions: PositionIndex;
}

export type ParseResult = { ok: true; catalog: CatalogFile; source: CatalogSource } | { ok: false; errors: CatalogError[] };

/** A whole validated catalog and the files it came from. */
export interface LoadedCatalog {
  catalog: Catalog;
  sources: CatalogSource[];
}

export type CatalogResult = ({ ok: true } & LoadedCatalog) | { ok: false; errors: CatalogError[] };

export interface EntryKey {
  kind: CatalogKind;
  id: string;
}

export type EffectiveResult =
  | ({ ok: true; overridden: EntryKey[]; added: EntryKey[] } & LoadedCatalog)
  | { ok: false; errors: CatalogError[] };

interface EntryTypes {
  inputTypes: InputType;
  panels: Panel;
  expansionBoards: ExpansionBoard;
  keypads: Keypad;
  powerSupplies: PowerSupply;
  detectors: Detector;
  sounders: Sounder;
  strobes: Strobe;
  outputModules: OutputModule;
  wirelessReceivers: WirelessReceiver;
  wirelessDetectors: WirelessDetector;
}
export type CatalogEntry = EntryTypes[CatalogKind];
export type FoundEntry = { [K in CatalogKind]: { kind: K; entry: EntryTypes[K] } }[CatalogKind];


const unitOf: [RegExp, string][] = [
  [/Ohms$/, "ohms"],
  [/Ma$/, "milliamps"],
  [/Volts$/, "volts"],
  [/Ah$/, "amp-hours"],
  [/M$/, "metres"],
  [/Pct$/, "percent"],
];

function valueAt(data: unknown, path: CatalogPath): { found: boolean; value: unknown } {
  let cur: unknown = data;
  for (const seg of path) {
    if (cur === null || typeof cur !== "object" || !Object.prototype.hasOwnProperty.call(cur, seg)) return { found: false, value: undefined };
    cur = (cur as Record<string | number, unknown>)[seg];
  }
  return { found: true, value: cur };
}

/** A zod issue in the catalog's words: a missing field, a number written with its unit, and the rest as zod says. */
function issueMessage(issue: z.core.$ZodIssue, data: unknown): string {
  const path = issue.path as CatalogPath;
  const last = path[path.length - 1];
  if (issue.code === "invalid_type") {
    const at = valueAt(data, path);
    if (!at.found && path.length > 0) return `missing field "${String(last)}" (expected ${issue.expected})`;
    if (issue.expected === "number" && typeof at.value === "string") {
      const unit = typeof last === "string" ? unitOf.find(([re]) => re.test(last))?.[1] : undefined;
      return `expected a number${unit ? ` in ${unit}` : ""}, found the text "${at.value}": write a plain number, the unit is in the field name`;
    }
  }
  return issue.message;
}

function locateError(file: string, positions: PositionIndex, path: CatalogPath, message: string, at?: CatalogPath): CatalogError {
  const pos = positions.locate(at ?? path);
  return { file, line: pos.line, column: pos.column, path: formatPath(path), message };
}

function yamlError(e: unknown, fileName: string, text: string): CatalogError {
  const lineCount = countLines(text);
  const mark = (e as { mark?: { line?: number; column?: number } })?.mark;
  const reason = (e as { reason?: string })?.reason ?? (e instanceof Error ? e.message : String(e));
  const line = typeof mark?.line === "number" ? Math.min(Math.max(1, mark.line + 1), lineCount) : 1;
  const column = typeof mark?.column === "number" && typeof mark?.line === "number" && mark.line + 1 <= lineCount ? Math.max(1, mark.column + 1) : 1;
  return { file: fileName, line, column, path: "", message: `not readable as YAML: ${reason}` };
}

/**
 * Parse one catalog file (a partial catalog: any of the entry lists). Checks the schema and the rules on
 * each entry alone, and duplicate ids inside the file; cross references wait for `mergeCatalogs`.
 */
export function parseCatalogFile(text: string, fileName: string): ParseResult {
  let data: unknown;
  let events: Event[];
  try {
    // one parse gives both the data and, from the same events, the positions
    events = parseEvents(text, { filename: fileName });
    const docs = constructFromEvents(events, { source: text, filename: fileName });
    if (docs.length !== 1)
      return { ok: false, errors: [{ file: fileName, line: 1, column: 1, path: "", message: docs.length ? "one YAML document per file (found a `---` separator)" : "the file is empty" }] };
    data = docs[0];
  } catch (e) {
    return { ok: false, errors: [yamlError(e, fileName, text)] };
  }
  const positions = buildPositionIndex(text, events);
  const parsed = catalogFileSchema.safeParse(data);
  if (!parsed.success) {
    const errors: CatalogError[] = [];
    for (const issue of parsed.error.issues) {
      const path = issue.path as CatalogPath;
      if (issue.code === "unrecognized_keys")
        for (const k of issue.keys) errors.push(locateError(fileName, positions, [...path, k], `unknown field "${k}"`));
      else errors.push(locateError(fileName, positions, path, issueMessage(issue, data)));
    }
    return { ok: false, errors: sortErrors(errors) };
  }
  const source: CatalogSource = { fileName, catalog: parsed.data, positions };
  const errors = validateLocated(locatedFrom([source]), { references: false });
  return errors.length ? { ok: false, errors } : { ok: true, catalog: parsed.data, source };
}

interface LocatedEntry {
  kind: CatalogKind;
  entry: CatalogEntry;
  file: string;
  positions: PositionIndex;
  /** The entry's own path in its file, e.g. `["panels", 2]`. */
  base: CatalogPath;
}

function locatedFrom(sources: CatalogSource[]): LocatedEntry[] {
  const out: LocatedEntry[] = [];
  for (const s of sources)
    for (const kind of catalogKinds)
      (s.catalog[kind] ?? []).forEach((entry, i) => out.push({ kind, entry, file: s.fileName, positions: s.positions, base: [kind, i] }));
  return out;
}

function assemble(entries: LocatedEntry[]): Catalog {
  const c = Object.fromEntries(catalogKinds.map((k) => [k, []])) as unknown as Catalog;
  for (const e of entries) (c[e.kind] as CatalogEntry[]).push(e.entry);
  return c;
}

function validateLocated(entries: LocatedEntry[], opts: { references: boolean }): CatalogError[] {
  const errors: CatalogError[] = [];
  const err = (e: LocatedEntry, path: CatalogPath, message: string, at?: CatalogPath) =>
    errors.push(locateError(e.file, e.positions, [...e.base, ...path], message, at ? [...e.base, ...at] : undefined));

  const byId = new Map<string, LocatedEntry>();
  for (const e of entries) {
    const first = byId.get(e.entry.id);
    if (first) {
      const where = first.positions.locate([...first.base, "id"]);
      err(e, ["id"], `duplicate id "${e.entry.id}": already used by the ${kindLabel[first.kind]} at ${first.file}:${where.line}`);
    } else byId.set(e.entry.id, e);
    for (const issue of entryIssues(e.kind, e.entry)) err(e, issue.path, issue.message, issue.at);
  }

  if (opts.references) {
    const inputTypes = new Set(entries.filter((e) => e.kind === "inputTypes").map((e) => e.entry.id));
    const families = new Set(entries.filter((e) => e.kind === "panels").map((e) => (e.entry as Panel).family));
    const inputRef = (e: LocatedEntry, path: CatalogPath, id: string) => {
      if (!inputTypes.has(id)) err(e, path, `input type "${id}" is not in the catalog`);
    };
    for (const e of entries) {
      if (e.kind === "panels") inputRef(e, ["onboardInputs", "inputType"], (e.entry as Panel).onboardInputs.inputType);
      if (e.kind === "expansionBoards") inputRef(e, ["inputs", "inputType"], (e.entry as ExpansionBoard).inputs.inputType);
      if (e.kind === "keypads") {
        const block = (e.entry as Keypad).inputs;
        if (block) inputRef(e, ["inputs", "inputType"], block.inputType);
      }
      if (e.kind === "expansionBoards" || e.kind === "keypads" || e.kind === "powerSupplies" || e.kind === "outputModules" || e.kind === "wirelessReceivers")
        (e.entry as ExpansionBoard | Keypad | PowerSupply | OutputModule | WirelessReceiver).families.forEach((f, i) => {
          if (!families.has(f)) err(e, ["families", i], `no control panel in the catalog is of family "${f}"`);
        });
    }
  }
  return sortErrors(errors);
}

/**
 * Merge parsed files into one catalog and validate the whole: duplicate ids across files, input types and
 * families that nothing defines. All or nothing.
 */
export function mergeCatalogs(files: CatalogSource[]): CatalogResult {
  const entries = locatedFrom(files);
  const errors = validateLocated(entries, { references: true });
  return errors.length ? { ok: false, errors } : { ok: true, catalog: assemble(entries), sources: files };
}

/** Parse and merge in one step (file names must be unique). */
export function loadCatalogTexts(files: { fileName: string; text: string }[]): CatalogResult {
  const sources: CatalogSource[] = [];
  const errors: CatalogError[] = [];
  for (const f of files) {
    const r = parseCatalogFile(f.text, f.fileName);
    if (r.ok) sources.push(r.source);
    else errors.push(...r.errors);
  }
  if (errors.length) return { ok: false, errors };
  return mergeCatalogs(sources);
}

/** Attribute each entry of a catalog to where it was written: its (kind, id) occurrence in the sources, latest source first. */
function locateCatalog(catalog: Catalog, sources: CatalogSource[]): LocatedEntry[] {
  const all = locatedFrom(sources);
  const seen = new Map<string, number>();
  const out: LocatedEntry[] = [];
  for (const kind of catalogKinds)
    (catalog[kind] as CatalogEntry[]).forEach((entry, i) => {
      const k = `${kind}\u0000${entry.id}`;
      const n = seen.get(k) ?? 0;
      seen.set(k, n + 1);
      const matches = all.filter((e) => e.kind === kind && e.entry.id === entry.id);
      const m = matches.length > 1 && n < matches.length ? matches[n] : matches[matches.length - 1];
      out.push(m ? { ...m, entry } : { kind, entry, file: "catalog", positions: fallbackPositions, base: [kind, i] });
    });
  return out;
}

const withArticle = (word: string) => `${/^[aeiou]/.test(word) ? "an" : "a"} ${word}`;

const fallbackPositions: PositionIndex = { lineCount: 1, has: () => false, locate: () => ({ line: 1, column: 1 }) };

/**
 * Validate a whole catalog (schema, entry rules, duplicate ids, references). Without sources, positions
 * refer to the catalog as `serializeCatalog` writes it, under the file name `catalog.yaml`.
 */
export function validateCatalog(catalog: Catalog, sources?: CatalogSource[]): CatalogError[] {
  let srcs = sources;
  if (!srcs) {
    let text = "";
    try {
      text = serializeCatalog(catalog);
    } catch {
      text = "";
    }
    srcs = [{ fileName: "catalog.yaml", catalog, positions: buildPositionIndex(text) }];
  }
  const schema = catalogFileSchema.safeParse(catalog);
  if (!schema.success) {
    const p = srcs[0]?.positions ?? fallbackPositions;
    const file = srcs[0]?.fileName ?? "catalog";
    return sortErrors(schema.error.issues.map((i) => locateError(file, p, i.path as CatalogPath, issueMessage(i, catalog))));
  }
  return validateLocated(locateCatalog(schema.data, srcs), { references: true });
}

/**
 * The catalog an organisation works with: the shipped catalog plus its own uploaded file.
 * - An uploaded entry with a new id is added (after the shipped entries of its kind).
 * - An uploaded entry with the id of a shipped entry of the same kind replaces it whole (no field-by-field
 *   merge, so an override never mixes two sources' figures) and keeps the shipped entry's place.
 * - An uploaded id that a shipped entry of another kind uses is an error; so is an id twice in the upload.
 * - Shipped entries cannot be removed. The result is validated as a whole, so an override that leaves a
 *   shipped entry dangling (say, a panel whose family changes) is refused, pointing at the shipped entry.
 */
export function effectiveCatalog(shipped: LoadedCatalog, orgFile?: CatalogSource): EffectiveResult {
  const base = locateCatalog(shipped.catalog, shipped.sources);
  if (!orgFile) {
    const errors = validateLocated(base, { references: true });
    return errors.length ? { ok: false, errors } : { ok: true, ...shipped, overridden: [], added: [] };
  }
  const errors: CatalogError[] = [];
  const merged = [...base];
  const indexOf = new Map(base.map((e, i) => [e.entry.id, i]));
  const fromOrg = new Set<string>();
  const overridden: EntryKey[] = [];
  const added: EntryKey[] = [];
  for (const e of locatedFrom([orgFile])) {
    const id = e.entry.id;
    const here = () => locateError(e.file, e.positions, [...e.base, "id"], "");
    if (fromOrg.has(id)) {
      errors.push({ ...here(), message: `duplicate id "${id}" in the uploaded file` });
      continue;
    }
    fromOrg.add(id);
    const i = indexOf.get(id);
    if (i === undefined) {
      merged.push(e);
      added.push({ kind: e.kind, id });
    } else if (merged[i].kind !== e.kind) {
      errors.push({ ...here(), message: `id "${id}" is ${withArticle(kindLabel[merged[i].kind])} in the shipped catalog; an override must be of the same kind` });
    } else {
      merged[i] = e;
      overridden.push({ kind: e.kind, id });
    }
  }
  if (errors.length) return { ok: false, errors: sortErrors(errors) };
  // order: shipped kinds' order with overrides in place, additions after their kind's shipped entries
  const ordered = catalogKinds.flatMap((k) => merged.filter((e) => e.kind === k));
  const invalid = validateLocated(ordered, { references: true });
  if (invalid.length) return { ok: false, errors: invalid };
  return { ok: true, catalog: assemble(ordered), sources: [...shipped.sources, orgFile], overridden, added };
}

export function findEntry(catalog: Catalog, id: string): FoundEntry | undefined {
  for (const kind of catalogKinds) {
    const entry = (catalog[kind] as CatalogEntry[]).find((e) => e.id === id);
    if (entry) return { kind, entry } as FoundEntry;
  }
  return undefined;
}

/** The catalog as one YAML file that `parseCatalogFile` reads back to the same catalog. Empty lists are left out. */
export function serializeCatalog(catalog: Catalog | CatalogFile): string {
  const out: Record<string, unknown> = {};
  for (const kind of catalogKinds) {
    const list = catalog[kind];
    if (list && list.length) out[kind] = JSON.parse(JSON.stringify(list)); // drops undefined optionals
  }
  return dump(out, { noRefs: true, lineWidth: -1 });
}
