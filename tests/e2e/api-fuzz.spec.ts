import { gzipSync } from "node:zlib";
import { test, expect, type APIRequestContext } from "@playwright/test";
import fc from "fast-check";
import { permissionTable, type Role } from "@/lib/auth/permissions";
import { routes, scheduleCsv } from "@/tests/api-registry/routes";
import { routeKey, type RouteEntry } from "@/tests/api-registry/types";
import { expectErrorBody, send, snapshotTables, setUpApiSuite } from "./support-api";

// Every JSON API of the registry sent bodies that are wrong by construction (a wrong type, a missing required
// key, an unknown key, strings and arrays past any limit, negative and non-finite numbers, 10,000 levels of
// nesting, text that is not JSON, the wrong content type): each answer must be a 4xx with a readable `error`,
// never a 5xx, and no table may change. Then every string field gets a lone surrogate (422 naming the field),
// and the upload routes get wrong files behind right names.

const RUNS = 25;

const suite = setUpApiSuite();

// ---------------------------------------------------------------------------------------------
// Mutations of a valid body, each one invalid whatever the schema's details.

type Path = (string | number)[];
type Kind = "string" | "number" | "boolean" | "null" | "array" | "object";
interface Node {
  path: Path;
  kind: Kind;
  value: unknown;
}

const kindOf = (v: unknown): Kind => (v === null ? "null" : Array.isArray(v) ? "array" : (typeof v as Kind));

function nodesOf(v: unknown, path: Path = [], out: Node[] = []): Node[] {
  if (path.length) out.push({ path, kind: kindOf(v), value: v });
  if (Array.isArray(v)) v.forEach((x, i) => nodesOf(x, [...path, i], out));
  else if (v && typeof v === "object") for (const [k, x] of Object.entries(v)) nodesOf(x, [...path, k], out);
  return out;
}

function setAt(root: unknown, path: Path, value: unknown): unknown {
  const copy = structuredClone(root) as Record<string | number, unknown>;
  let at = copy as Record<string | number, unknown>;
  for (const k of path.slice(0, -1)) at = at[k] as Record<string | number, unknown>;
  at[path[path.length - 1]] = value;
  return copy;
}

/** JSON text with one node replaced by raw text (for what JSON.stringify cannot write: 1e999, deep nesting). */
function withRaw(root: unknown, path: Path, raw: string): string {
  const marker = "\u0000raw-marker\u0000";
  return JSON.stringify(setAt(root, path, marker)).replace(JSON.stringify(marker), raw);
}

interface Case {
  label: string;
  body: string | Buffer;
  contentType: string;
}

const json = (label: string, value: unknown): Case => ({ label, body: JSON.stringify(value), contentType: "application/json" });
const raw = (label: string, body: string | Buffer, contentType = "application/json"): Case => ({ label, body, contentType });
const dotted = (p: Path) => p.join(".");

// Wrong types that no coercion in the schemas turns valid (z.coerce.number takes "12", true and [5], so numbers get objects and letters).
const notNumeric = fc.constantFrom("twelve", "Ω", "12 Ω", "0x1g", "NaN?", "∞");
const wrongFor: Record<Kind, fc.Arbitrary<unknown>> = {
  string: fc.oneof(fc.integer(), fc.boolean(), fc.constant({}), fc.array(fc.integer(), { minLength: 1, maxLength: 3 })),
  number: fc.oneof(notNumeric, fc.constant({}), fc.dictionary(fc.string({ minLength: 1, maxLength: 4 }), fc.integer(), { minKeys: 1, maxKeys: 2 })),
  boolean: fc.oneof(fc.constantFrom("true", "yes", "1"), fc.integer(), fc.constant({})),
  null: fc.oneof(fc.constant({ unexpected: true }), fc.constant([[]])),
  array: fc.oneof(fc.string(), fc.integer(), fc.constant({ 0: "a" })),
  object: fc.oneof(fc.string(), fc.integer(), fc.array(fc.integer())),
};

const HUGE = 1_100_000; // characters: past every string limit (the largest, a CSV file, is 1 MiB)

function mutations(entry: RouteEntry, body: Record<string, unknown>): fc.Arbitrary<Case> {
  const nodes = nodesOf(body);
  const byKind = (kinds: Kind[]) => nodes.filter((n) => kinds.includes(n.kind));
  const pick = (list: Node[]) => fc.constantFrom(...list);
  const arbs: fc.Arbitrary<Case>[] = [];
  const text = JSON.stringify(body);
  const withExtraKey = (key: string, value: string) => (text === "{}" ? `{${JSON.stringify(key)}:${value}}` : `{${JSON.stringify(key)}:${value},${text.slice(1)}`);

  if (nodes.length) arbs.push(pick(nodes).chain((n) => wrongFor[n.kind].map((v) => json(`wrong type at ${dotted(n.path)}: ${JSON.stringify(v)}`, setAt(body, n.path, v)))));
  if (entry.requiredKeys?.length)
    arbs.push(
      fc.constantFrom(...entry.requiredKeys).map((k) => {
        const copy = { ...body };
        delete copy[k];
        return json(`missing ${k}`, copy);
      }),
    );
  // every root schema is strict: an unknown key (unicode, or one that names Object's own properties) is refused
  arbs.push(
    fc
      .oneof(fc.string({ unit: "binary", minLength: 1, maxLength: 12 }), fc.constantFrom("__proto__", "constructor", "prototype", "toString"))
      .filter((k) => !Object.hasOwn(body, k))
      .map((k) => raw(`unknown key ${JSON.stringify(k)}`, withExtraKey(k, "1"))),
  );
  const strings = byKind(["string"]);
  if (strings.length) arbs.push(pick(strings).chain((n) => fc.constantFrom("x", "é", "\u{1F525}").map((c) => json(`${HUGE} × ${JSON.stringify(c)} at ${dotted(n.path)}`, setAt(body, n.path, c.repeat(HUGE))))));
  const arrays = byKind(["array"]);
  if (arrays.length) arbs.push(pick(arrays).map((n) => json(`20000 items at ${dotted(n.path)}`, setAt(body, n.path, Array(20000).fill((n.value as unknown[])[0] ?? 0)))));
  const numbers = byKind(["number"]);
  const negatable = numbers.filter((n) => !entry.negativeAllowed?.includes(dotted(n.path)));
  if (negatable.length)
    arbs.push(pick(negatable).chain((n) => fc.oneof(fc.integer({ min: -1e9, max: -1 }), fc.double({ max: -1e-9, noNaN: true, noDefaultInfinity: true }), fc.constant(-1e308)).map((v) => json(`negative ${v} at ${dotted(n.path)}`, setAt(body, n.path, v)))));
  if (numbers.length) arbs.push(pick(numbers).chain((n) => fc.constantFrom("1e999", "-1e999", "NaN", "Infinity", "-Infinity", "0x10").map((r) => raw(`${r} at ${dotted(n.path)}`, withRaw(body, n.path, r)))));
  const leaves = byKind(["string", "number", "boolean"]);
  const deep = (n: number) => "[".repeat(n) + "]".repeat(n);
  arbs.push(
    fc.constantFrom(
      raw("10000 nested arrays as the body", deep(10_000)),
      raw("10000 nested objects as the body", '{"a":'.repeat(10_000) + "1" + "}".repeat(10_000)),
      raw("200000 nested arrays as the body", deep(200_000)),
    ),
  );
  if (leaves.length) arbs.push(pick(leaves).map((n) => raw(`10000 nested arrays at ${dotted(n.path)}`, withRaw(body, n.path, deep(10_000)))));
  arbs.push(
    fc.oneof(
      fc.constantFrom("", "{", "not json", "{'a': 1}", `${text}}`, `${text} trailing`, "\uFEFF" + text, "undefined", "null", "[]", '"a string"', "42", "true"),
      fc.string({ unit: "binary", maxLength: 40 }).filter((s) => !isJson(s)),
      fc.uint8Array({ minLength: 1, maxLength: 64 }).map((b) => Buffer.from(b)).filter((b) => !isJson(b.toString("utf8"))),
    ).map((b) => raw(`not a JSON object: ${JSON.stringify(b.toString()).slice(0, 60)}`, b)),
  );
  arbs.push(fc.constantFrom("text/plain", "application/x-www-form-urlencoded", "multipart/form-data; boundary=x", "application/xml", "text/json", "application/octet-stream").map((t) => raw(`a valid body sent as ${t}`, text, t)));
  return fc.oneof(...arbs);
}

function isJson(s: string): boolean {
  try {
    const v = JSON.parse(s);
    return v !== null && typeof v === "object" && !Array.isArray(v);
  } catch {
    return false;
  }
}

/** A caller of the demo organisation the permission allows (admin first). */
function callerFor(entry: RouteEntry): APIRequestContext {
  if (entry.access === "public") return suite.callers.signedOut.api;
  const role = (["admin", "engineer", "designer", "installer"] as Role[]).find((r) => (permissionTable[entry.access as keyof typeof permissionTable] as readonly Role[]).includes(r))!;
  return suite.callers.demo[role].api;
}

test.describe("JSON APIs refuse malformed bodies with a 4xx and store nothing", () => {
  for (const entry of routes.filter((e) => e.body === "json")) {
    test(routeKey(entry), async ({ playwright }) => {
      test.setTimeout(180_000);
      const api = callerFor(entry);
      const valid = await entry.build({ caller: { kind: "demo", role: null, email: null, password: null }, demo: suite.demoIds, fixtures: suite.fixtures });
      const body = valid.json as Record<string, unknown>;
      const before = await snapshotTables(suite.conn);
      const seen: string[] = [];
      await fc.assert(
        fc.asyncProperty(mutations(entry, body), async (c) => {
          const res = await api.fetch(valid.url, { method: valid.method, data: c.body, headers: { "content-type": c.contentType }, maxRedirects: 0 });
          const status = res.status();
          seen.push(`${status} ${c.label.slice(0, 80)}`);
          expect(status, `${c.label}: ${(await res.text()).slice(0, 300)}`).toBeGreaterThanOrEqual(400);
          expect(status, c.label).toBeLessThan(500);
          await expectErrorBody(res, c.label);
        }),
        { numRuns: RUNS },
      );
      expect(await snapshotTables(suite.conn), "a refused body changed the database").toEqual(before);
      // the unmutated request is accepted, so the refusals above came from the mutations
      const ok = await send(playwright, api, valid);
      expect(ok.status(), await ok.text()).toBe(entry.success);
      console.log(`${routeKey(entry)}: ${seen.length} bodies refused (${[...new Set(seen.map((s) => s.slice(0, 3)))].join(", ")})`);
    });
  }
});

// ---------------------------------------------------------------------------------------------
// Text that is not Unicode: half a surrogate pair (legal in JSON text as an escape, storable in no column)
// in each string of a valid body, and in a key. One place answers it: the route wrapper's JSON reading.

const surrogates = ["\ud800", "\udfff", "tail \ud83d", "\udd25 head"];

test.describe("JSON APIs answer a lone surrogate in any text with a 422 naming the field, and store nothing", () => {
  for (const entry of routes.filter((e) => e.body === "json")) {
    test(routeKey(entry), async () => {
      test.setTimeout(180_000);
      const api = callerFor(entry);
      const valid = await entry.build({ caller: { kind: "demo", role: null, email: null, password: null }, demo: suite.demoIds, fixtures: suite.fixtures });
      const body = valid.json as Record<string, unknown>;
      const before = await snapshotTables(suite.conn);
      const cases = nodesOf(body)
        .filter((n) => n.kind === "string")
        .map((n, i) => ({ field: dotted(n.path), text: JSON.stringify(setAt(body, n.path, `${n.value as string}${surrogates[i % surrogates.length]}`)) }));
      const rest = JSON.stringify(body).slice(1);
      cases.push({ field: "odd\udc00key", text: `{${JSON.stringify("odd\udc00key")}:1${rest === "}" ? "" : ","}${rest}` });
      for (const c of cases) {
        expect(c.text, "JSON.stringify escapes a lone surrogate as \\uXXXX").toMatch(/\\ud[89a-f][0-9a-f]{2}/i);
        const res = await api.fetch(valid.url, { method: valid.method, data: c.text, headers: { "content-type": "application/json" }, maxRedirects: 0 });
        const text = await res.text();
        expect(res.status(), `${c.field}: ${text.slice(0, 300)}`).toBe(422);
        await expectErrorBody(res, c.field);
        expect(JSON.parse(text).issues?.[0]?.path, text.slice(0, 300)).toBe(c.field);
      }
      expect(await snapshotTables(suite.conn), "a refused body changed the database").toEqual(before);
      console.log(`${routeKey(entry)}: ${cases.length} fields with a lone surrogate refused`);
    });
  }
});

// ---------------------------------------------------------------------------------------------
// Uploads: wrong content behind a right name, oversize files, archive bombs, path tricks.

const yamlText = () => suite.fixtures.goodCatalogFile().buffer;
const png = Buffer.from("89504e470d0a1a0a0000000d49484452000000010000000108060000001f15c4890000000d49444154789c6360000002000154a24f5d0000000049454e44ae426082", "hex");
const zip = Buffer.concat([Buffer.from("504b0304140000000800", "hex"), Buffer.alloc(200, 0x41)]);
const gzipBomb = gzipSync(Buffer.alloc(64 * 1024 * 1024, 0x20)); // 64 MiB of spaces in about 64 KiB
// the "billion laughs" shape in YAML: nine levels of aliases, each nine times the one below
const yamlBomb = ['a: &a ["lol","lol","lol","lol","lol","lol","lol","lol","lol"]', ...Array.from({ length: 8 }, (_, i) => {
  const p = String.fromCharCode(97 + i);
  const q = String.fromCharCode(98 + i);
  return `${q}: &${q} [*${p},*${p},*${p},*${p},*${p},*${p},*${p},*${p},*${p}]`;
})].join("\n");

test.describe("uploads refuse wrong files with a 4xx and store nothing", () => {
  test("catalog uploads: wrong content behind .yaml, oversize, archives and an alias bomb, bad names", async () => {
    const api = suite.callers.demo.engineer.api;
    const before = await snapshotTables(suite.conn);
    const file = (name: string, mimeType: string, buffer: Buffer) => ({ name, mimeType, buffer });
    const cases: { label: string; status: number | "4xx"; multipart?: Record<string, string | ReturnType<typeof file>>; raw?: { body: Buffer | string; contentType: string } }[] = [
      { label: "a PNG image named .yaml", status: 415, multipart: { mode: "store", file: file("catalog.yaml", "application/yaml", png) } },
      { label: "a ZIP archive named .yaml", status: 415, multipart: { mode: "store", file: file("catalog.yaml", "application/yaml", zip) } },
      { label: "a gzip bomb (64 MiB of spaces) named .yaml", status: 415, multipart: { mode: "store", file: file("catalog.yaml", "text/plain", gzipBomb) } },
      { label: "a gzip bomb declared as application/gzip", status: 415, multipart: { mode: "store", file: file("catalog.yaml", "application/gzip", gzipBomb) } },
      { label: "a NUL byte inside YAML text", status: 415, multipart: { mode: "store", file: file("catalog.yaml", "application/yaml", Buffer.concat([yamlText(), Buffer.from([0])])) } },
      { label: "bytes that are not UTF-8", status: 415, multipart: { mode: "store", file: file("catalog.yaml", "application/yaml", Buffer.from([0x64, 0x3a, 0x20, 0xc3, 0x28, 0xa0, 0xa1])) } },
      { label: "UTF-16 text", status: 415, multipart: { mode: "store", file: file("catalog.yaml", "application/yaml", Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from(yamlText().toString("utf8"), "utf16le")])) } },
      { label: "declared as image/png", status: 415, multipart: { mode: "store", file: file("catalog.yaml", "image/png", yamlText()) } },
      { label: "declared as UTF-16", status: 415, multipart: { mode: "store", file: file("catalog.yaml", "text/yaml; charset=utf-16", yamlText()) } },
      { label: "a 300 KiB file", status: 413, multipart: { mode: "store", file: file("catalog.yaml", "application/yaml", Buffer.concat([yamlText(), Buffer.alloc(300 * 1024, 0x20)])) } },
      { label: "a 10 MiB form", status: 413, multipart: { mode: "store", file: file("catalog.yaml", "application/yaml", Buffer.alloc(10 * 1024 * 1024, 0x20)) } },
      { label: "a YAML alias bomb", status: "4xx", multipart: { mode: "store", file: file("catalog.yaml", "application/yaml", Buffer.from(yamlBomb)) } },
      { label: "a .exe name", status: 415, multipart: { mode: "store", file: file("catalog.exe", "application/yaml", yamlText()) } },
      { label: "a .yaml.exe name", status: 415, multipart: { mode: "store", file: file("catalog.yaml.exe", "application/yaml", yamlText()) } },
      { label: "a NUL in the name", status: 422, multipart: { mode: "store", file: file("catalog\u0000.yaml", "application/yaml", yamlText()) } },
      { label: "a header injection in the name", status: 422, multipart: { mode: "store", file: file("catalog\r\nX-Injected: 1.yaml", "application/yaml", yamlText()) } },
      { label: "a name that is only a directory", status: "4xx", multipart: { mode: "store", file: file("../../", "application/yaml", yamlText()) } },
      { label: "a hidden-file name", status: 422, multipart: { mode: "store", file: file("../.yaml", "application/yaml", yamlText()) } },
      { label: "a 500-character name", status: 422, multipart: { mode: "store", file: file(`${"a".repeat(500)}.yaml`, "application/yaml", yamlText()) } },
      { label: "no file field", status: 422, multipart: { mode: "store" } },
      { label: "a mode that does not exist", status: 422, multipart: { mode: "overwrite", file: file("catalog.yaml", "application/yaml", yamlText()) } },
      { label: "JSON instead of a form", status: 415, raw: { body: JSON.stringify({ mode: "store", file: yamlText().toString("utf8") }), contentType: "application/json" } },
      { label: "a form whose boundary does not match", status: "4xx", raw: { body: "--other\r\nContent-Disposition: form-data; name=\"mode\"\r\n\r\nstore\r\n--other--\r\n", contentType: "multipart/form-data; boundary=expected" } },
    ];
    for (const c of cases) {
      const res = c.multipart ? await api.post("/api/catalog/uploads", { multipart: c.multipart }) : await api.post("/api/catalog/uploads", { data: c.raw!.body, headers: { "content-type": c.raw!.contentType } });
      const status = res.status();
      if (c.status === "4xx") {
        expect(status, `${c.label}: ${(await res.text()).slice(0, 300)}`).toBeGreaterThanOrEqual(400);
        expect(status, c.label).toBeLessThan(500);
      } else expect(status, `${c.label}: ${(await res.text()).slice(0, 300)}`).toBe(c.status);
      await expectErrorBody(res, c.label);
    }
    expect(await snapshotTables(suite.conn), "a refused upload changed the database").toEqual(before);

    // a path in the name of a good file: only the base name is kept (it is shown and offered on download, never used as a path)
    for (const name of ["../../etc/catalog.yaml", "..\\..\\windows\\catalog.yaml", "C:\\fakepath\\catalog.yaml", "/tmp/catalog.yaml"]) {
      const res = await api.post("/api/catalog/uploads", { multipart: { mode: "preview", file: file(name, "application/yaml", yamlText()) } });
      expect(res.status(), `${name}: ${(await res.text()).slice(0, 200)}`).toBe(200);
      expect((await res.json()).preview.fileName, name).toBe("catalog.yaml");
    }
    expect(await snapshotTables(suite.conn), "a preview changed the database").toEqual(before);
  });

  test("schedule CSV import: binary files, archives, oversize and odd shapes are refused on confirm and never a 5xx on preview", async () => {
    const api = suite.callers.demo.designer.api;
    const { siteId } = await suite.fixtures.scratchSite();
    const before = await snapshotTables(suite.conn);
    const asText = (b: Buffer) => b.toString("latin1");
    const header = "label,type,area,room,cable_m,gauge,supervision";
    const csvs: { label: string; csv: string; fileName?: string }[] = [
      { label: "a PNG image", csv: asText(png), fileName: "schedule.csv" },
      { label: "a ZIP archive", csv: asText(zip), fileName: "schedule.csv" },
      { label: "a gzip bomb", csv: asText(gzipBomb.subarray(0, 200_000)), fileName: "schedule.csv" },
      { label: "NUL bytes", csv: `${header}\nDoor\u0000,contact-door-surface,G,Hall,12,22 AWG,single-eol`, fileName: "../../etc/passwd" },
      { label: "an unterminated quote", csv: `${header}\n"Door,contact-door-surface,G,Hall,12,22 AWG,single-eol` },
      { label: "10000 columns, the label column repeated", csv: `${header},${"label,".repeat(9_999)}label\nDoor,contact-door-surface,G,Hall,12,22 AWG,single-eol` },
      { label: "a 300000-character label", csv: `${header}\n"${"x".repeat(300_000)}",contact-door-surface,G,Hall,12,22 AWG,single-eol` },
      { label: "negative and non-finite cable lengths", csv: `${header}\nA,contact-door-surface,G,Hall,-12,22 AWG,single-eol\nB,contact-door-surface,G,Hall,1e999,22 AWG,single-eol\nC,contact-door-surface,G,Hall,NaN,22 AWG,single-eol` },
      { label: "a good file with one bad row", csv: `${scheduleCsv}\nBad,no-such-detector,G,Hall,12,22 AWG,single-eol` },
      { label: "only a header", csv: header },
      { label: "empty", csv: "" },
    ];
    for (const c of csvs) {
      const confirm = await api.post(`/api/sites/${siteId}/schedule/import`, { data: { mode: "confirm", csv: c.csv, ...(c.fileName ? { fileName: c.fileName } : {}) } });
      expect(confirm.status(), `${c.label} (confirm): ${(await confirm.text()).slice(0, 300)}`).toBe(422);
      await expectErrorBody(confirm, c.label);
      const preview = await api.post(`/api/sites/${siteId}/schedule/import`, { data: { mode: "preview", csv: c.csv } });
      expect(preview.status(), `${c.label} (preview)`).toBeLessThan(500);
      if (preview.status() === 200) {
        const p = (await preview.json()) as { errors: unknown[]; rows: unknown[] };
        expect(p.errors.length > 0 || p.rows.length === 0, `${c.label}: the preview lists the problems (or has nothing to import)`).toBe(true);
      }
    }
    for (const size of [1024 * 1024 + 1, 3 * 1024 * 1024]) {
      const res = await api.post(`/api/sites/${siteId}/schedule/import`, { data: { mode: "confirm", csv: `${header}\n${"x".repeat(size)}` } });
      expect([413, 422], `a ${size}-character file`).toContain(res.status());
      await expectErrorBody(res, `a ${size}-character file`);
    }
    expect(await snapshotTables(suite.conn), "a refused import changed the database").toEqual(before);
  });
});
