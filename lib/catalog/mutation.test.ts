import { readFileSync, readdirSync } from "node:fs";
import { join } from "node:path";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { loadCatalogTexts, parseCatalogFile, validateCatalog } from "./loader";
import { countLines } from "./positions";
import { catalogFileSchema } from "./schema";

const dir = join(process.cwd(), "catalog");
const files = readdirSync(dir)
  .filter((f) => f.endsWith(".yaml"))
  .sort()
  .map((fileName) => ({ fileName, text: readFileSync(join(dir, fileName), "utf8") }));

type Mutation = (lines: string[]) => string[];
const at = (lines: string[], u: number) => Math.min(lines.length - 1, Math.floor(u * lines.length));

const mutationArb: fc.Arbitrary<Mutation> = fc.oneof(
  fc.double({ min: 0, max: 1, maxExcluded: true, noNaN: true }).map((u): Mutation => (l) => l.filter((_, i) => i !== at(l, u))), // delete a line
  fc.double({ min: 0, max: 1, maxExcluded: true, noNaN: true }).map((u): Mutation => (l) => {
    const i = at(l, u); // duplicate a line
    return [...l.slice(0, i + 1), l[i], ...l.slice(i + 1)];
  }),
  fc.tuple(fc.double({ min: 0, max: 1, maxExcluded: true, noNaN: true }), fc.constantFrom('"$1"', "$1 ohms", "'$1'", "$1mA")).map(([u, to]): Mutation => (l) => {
    const i = at(l, u); // change a number to a string
    return l.map((s, j) => (j === i ? s.replace(/(?<=[:\[,]\s*)(\d+(?:\.\d+)?)/, to) : s));
  }),
  fc.tuple(fc.double({ min: 0, max: 1, maxExcluded: true, noNaN: true }), fc.integer({ min: -3, max: 3 })).map(([u, d]): Mutation => (l) => {
    const i = at(l, u); // change indentation
    return l.map((s, j) => (j !== i ? s : d >= 0 ? " ".repeat(d) + s : s.replace(new RegExp(`^ {0,${-d}}`), "")));
  }),
  fc
    .tuple(fc.double({ min: 0, max: 1, maxExcluded: true, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), fc.string({ unit: fc.constantFrom(..."{}[]:,-#&*!|>'\"%@`?\t\\Ω\u0000"), minLength: 1, maxLength: 4 }))
    .map(([u, v, junk]): Mutation => (l) => {
      const i = at(l, u); // insert garbage characters
      return l.map((s, j) => (j === i ? s.slice(0, Math.floor(v * s.length)) + junk + s.slice(Math.floor(v * s.length)) : s));
    }),
  fc.double({ min: 0, max: 1, maxExcluded: true, noNaN: true }).map((u): Mutation => (l) => {
    // swap an id reference for a missing one
    const refs = l.flatMap((s, j) => (/inputType: |families: \[/.test(s) ? [j] : []));
    if (!refs.length) return l;
    const i = refs[Math.floor(u * refs.length)];
    return l.map((s, j) => (j === i ? s.replace(/(inputType: |families: \[)[a-z0-9-]+/, "$1no-such-ref") : s));
  }),
);

function checkErrors(errors: { file: string; line: number; column: number; path: string; message: string }[], texts: Map<string, string>) {
  expect(errors.length).toBeGreaterThan(0);
  for (const e of errors) {
    const text = texts.get(e.file);
    expect(text, `error names a known file: ${e.file}`).toBeDefined();
    expect(Number.isInteger(e.line) && e.line >= 1 && e.line <= countLines(text!), `line ${e.line} of ${countLines(text!)}`).toBe(true);
    expect(Number.isInteger(e.column) && e.column >= 1).toBe(true);
    expect(typeof e.path).toBe("string");
    expect(e.message.length).toBeGreaterThan(0);
  }
}

describe("mutated catalog files", () => {
  it("are either valid or refused with located errors, never a throw or a partial catalog", () => {
    const outcomes = { valid: 0, refused: 0 };
    fc.assert(
      fc.property(fc.integer({ min: 0, max: files.length - 1 }), fc.array(mutationArb, { minLength: 1, maxLength: 3 }), (fi, mutations) => {
        const lines = files[fi].text.split("\n");
        const text = mutations.reduce((l, m) => m(l), lines).join("\n");
        const set = files.map((f, i) => (i === fi ? { ...f, text } : f));
        const texts = new Map(set.map((f) => [f.fileName, f.text]));

        const one = parseCatalogFile(text, files[fi].fileName);
        if (one.ok) expect(catalogFileSchema.safeParse(one.catalog).success).toBe(true);
        else {
          expect(Object.keys(one).sort()).toEqual(["errors", "ok"]);
          checkErrors(one.errors, texts);
        }

        const all = loadCatalogTexts(set);
        if (all.ok) {
          outcomes.valid++;
          expect(validateCatalog(all.catalog, all.sources)).toEqual([]);
        } else {
          outcomes.refused++;
          expect(Object.keys(all).sort()).toEqual(["errors", "ok"]);
          checkErrors(all.errors, texts);
        }
      }),
      { numRuns: 250 },
    );
    // both outcomes occur, so the property tested something on each side
    expect(outcomes.valid).toBeGreaterThan(0);
    expect(outcomes.refused).toBeGreaterThan(0);
  }, 60_000);
});
