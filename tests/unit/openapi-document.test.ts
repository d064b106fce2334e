import { readdirSync, readFileSync, statSync } from "node:fs";
import { join, relative } from "node:path";
import { describe, expect, it } from "vitest";
import { openApiDocument } from "@/lib/openapi/document";
import { exportedMethods, openApiPathOf } from "@/lib/openapi/route-paths";
import { loopAnalysisJsonSchema } from "@/lib/openapi/loop-analysis-schema";
import { namedSchemas } from "@/lib/openapi/components";
import { analyzeLoop, loopJsonReplacer, type LoopSpec } from "@/lib/loop";
import { shippedCatalog } from "@/lib/catalog/shipped";
import { permissionTable } from "@/lib/auth/permissions";

// The document is held against the file system: a route.ts added under app/api without a description
// here fails this test, and so does a description of a route that no longer exists.

function routeFiles(dir: string): string[] {
  const out: string[] = [];
  for (const name of readdirSync(dir)) {
    const p = join(dir, name);
    if (statSync(p).isDirectory()) out.push(...routeFiles(p));
    else if (name === "route.ts") out.push(p);
  }
  return out;
}

const root = process.cwd();
const routes = routeFiles(join(root, "app", "api")).map((f) => {
  const rel = relative(root, f);
  const source = readFileSync(f, "utf8");
  return { file: rel, source, path: openApiPathOf(rel), methods: exportedMethods(source) };
});

/** Each `export const METHOD = route({ ..., body: name ... })` of a route file, with the module `name` is imported from. */
function handlerBodies(source: string): { method: string; name: string; from: string | null }[] {
  const out: { method: string; name: string; from: string | null }[] = [];
  for (const m of source.matchAll(/export const (GET|POST|PUT|PATCH|DELETE) = route\(\{(.*?)\}, async/g)) {
    const name = /\bbody: (\w+)/.exec(m[2])?.[1];
    if (!name) continue;
    const imp = [...source.matchAll(/import \{([^}]*)\} from "([^"]+)"/g)].find((i) => i[1].split(",").some((n) => n.trim() === name));
    out.push({ method: m[1], name, from: imp ? imp[2] : null });
  }
  return out;
}
const doc = openApiDocument();
type Operation = { operationId: string; responses: Record<string, { content?: Record<string, { schema: unknown }> }>; requestBody?: unknown; parameters?: { name: string; in: string }[]; security?: unknown[]; "x-permission"?: string };
const operations: { path: string; method: string; op: Operation }[] = Object.entries(doc.paths).flatMap(([path, item]) =>
  Object.entries(item as Record<string, Operation>).map(([method, op]) => ({ path, method, op })),
);

function refs(x: unknown, out: string[] = []): string[] {
  if (Array.isArray(x)) x.forEach((v) => refs(v, out));
  else if (x && typeof x === "object")
    for (const [k, v] of Object.entries(x)) {
      if (k === "$ref" && typeof v === "string") out.push(v);
      else refs(v, out);
    }
  return out;
}

describe("path helpers", () => {
  it("maps App Router folders to OpenAPI paths", () => {
    expect(openApiPathOf("app/api/sites/[siteId]/route.ts")).toBe("/api/sites/{siteId}");
    expect(openApiPathOf("app/api/auth/[...nextauth]/route.ts")).toBe("/api/auth/{nextauth}");
    expect(openApiPathOf("app/(group)/api/x/[[...rest]]/route.ts")).toBe("/api/x/{rest}");
    expect(openApiPathOf("app/api/openapi.json/route.ts")).toBe("/api/openapi.json");
  });
  it("finds exported handler methods in each form", () => {
    expect(exportedMethods("export const GET = route(...);\nexport async function POST() {}")).toEqual(["GET", "POST"]);
    expect(exportedMethods("const handler = x;\nexport { handler as GET, handler as POST };")).toEqual(["GET", "POST"]);
    expect(exportedMethods("export const dynamic = 'force-dynamic';\nexport const PATCH = r;")).toEqual(["PATCH"]);
  });
});

describe("the OpenAPI document", () => {
  it("is OpenAPI 3.1.0 with an info block and JSON-serialisable", () => {
    expect(doc.openapi).toBe("3.1.0");
    expect(doc.info).toMatchObject({ title: expect.any(String), version: expect.any(String) });
    expect(JSON.parse(JSON.stringify(doc))).toEqual(doc);
  });

  it("finds the route files it is checked against", () => {
    expect(routes.map((r) => r.path)).toEqual(expect.arrayContaining(["/api/health", "/api/sites", "/api/loops/analyze", "/api/openapi.json"]));
  });

  it("describes every method of every route.ts under app/api", () => {
    const missing: string[] = [];
    for (const r of routes) {
      if (r.methods.length === 0) missing.push(`${r.file} exports no handler this test recognises`);
      for (const m of r.methods) if (!doc.paths[r.path]?.[m.toLowerCase() as "get"]) missing.push(`${m} ${r.path} (${r.file})`);
    }
    expect(missing).toEqual([]);
  });

  it("describes nothing that has no route file", () => {
    const stale = operations.filter(({ path, method }) => !routes.some((r) => r.path === path && r.methods.includes(method.toUpperCase()))).map((o) => `${o.method.toUpperCase()} ${o.path}`);
    expect(stale).toEqual([]);
  });

  it("resolves every $ref to a component schema", () => {
    const schemas = (doc.components as { schemas: Record<string, unknown> }).schemas;
    const all = refs(doc);
    expect(all.length).toBeGreaterThan(20);
    const dangling = all.filter((r) => !r.startsWith("#/components/schemas/") || !(r.slice("#/components/schemas/".length) in schemas));
    expect(dangling).toEqual([]);
  });

  it("gives unique operation ids, declared path parameters, a success response and the error shape on every refusal", () => {
    const ids = operations.map((o) => o.op.operationId);
    expect(new Set(ids).size).toBe(ids.length);
    for (const { path, op } of operations) {
      const templated = [...path.matchAll(/\{([^}]+)\}/g)].map((m) => m[1]);
      expect((op.parameters ?? []).filter((p) => p.in === "path").map((p) => p.name).sort(), path).toEqual(templated.sort());
      const statuses = Object.keys(op.responses);
      expect(statuses.some((s) => /^2\d\d$/.test(s)), path).toBe(true);
      for (const s of statuses.filter((s) => /^[45]\d\d$/.test(s))) expect(op.responses[s].content?.["application/json"].schema, `${path} ${s}`).toEqual({ $ref: "#/components/schemas/Error" });
      if (op["x-permission"]) {
        expect(Object.keys(permissionTable)).toContain(op["x-permission"]);
        expect(statuses).toEqual(expect.arrayContaining(["401", "403"]));
      } else expect(op.security).toEqual([]);
      if (op.requestBody) expect(statuses).toContain("422");
    }
  });

  it("documents each JSON body with the very zod schema its handler parses", async () => {
    const bodies = routes.flatMap((r) => handlerBodies(r.source).map((b) => ({ ...b, route: r })));
    expect(bodies.length).toBeGreaterThanOrEqual(20);
    const wrong: string[] = [];
    for (const b of bodies) {
      const where = `${b.method} ${b.route.path} (body: ${b.name})`;
      if (!b.from) {
        wrong.push(`${where}: the schema is not imported from a module`);
        continue;
      }
      const schema = ((await import(b.from)) as Record<string, unknown>)[b.name];
      const component = Object.entries(namedSchemas).find(([, s]) => s === schema)?.[0];
      const documented = (doc.paths[b.route.path]?.[b.method.toLowerCase() as "get"] as { requestBody?: { content?: Record<string, { schema?: unknown }> } } | undefined)?.requestBody?.content?.["application/json"]?.schema;
      if (!component) wrong.push(`${where}: no component is made from it`);
      else if (JSON.stringify(documented) !== JSON.stringify({ $ref: `#/components/schemas/${component}` })) wrong.push(`${where}: documented as ${JSON.stringify(documented)}, not ${component}`);
    }
    expect(wrong).toEqual([]);
  });

  it("documents the catalog upload form from the schema the server reads it with", async () => {
    const { catalogUploadFormSchema } = await import("@/lib/catalog/upload-schema");
    expect(namedSchemas.CatalogUploadForm).toBe(catalogUploadFormSchema);
    const op = doc.paths["/api/catalog/uploads"].post as unknown as { requestBody: { content: Record<string, { schema: unknown }> } };
    expect(op.requestBody.content["multipart/form-data"].schema).toEqual({ $ref: "#/components/schemas/CatalogUploadForm" });
    const form = (doc.components as { schemas: Record<string, { properties: Record<string, Record<string, unknown>>; required: string[] }> }).schemas.CatalogUploadForm;
    expect(form.required).toEqual(["file"]);
    expect(form.properties.mode.enum).toEqual(["preview", "store"]);
    expect(form.properties.file).toMatchObject({ type: "string", contentMediaType: "text/yaml" });
  });

  it("is built from pure request schemas: neither lib/openapi nor any *-schema.ts under lib imports server code", () => {
    const files = (dir: string): string[] => readdirSync(dir).flatMap((n) => (statSync(join(dir, n)).isDirectory() ? files(join(dir, n)) : [join(dir, n)]));
    const checked = files(join(root, "lib")).filter((f) => /\.ts$/.test(f) && !/\.test\.ts$/.test(f) && (relative(root, f).startsWith(join("lib", "openapi")) || /-schema\.ts$/.test(f)));
    expect(checked.map((f) => relative(root, f))).toEqual(expect.arrayContaining([join("lib", "openapi", "components.ts"), join("lib", "members", "member-schema.ts"), join("lib", "catalog", "upload-schema.ts")]));
    const impure = checked.filter((f) => /from "(@\/lib\/server\/|server-only|\.\.?\/.*server)|import "server-only"/.test(readFileSync(f, "utf8"))).map((f) => relative(root, f));
    expect(impure).toEqual([]);
  });

  it("describes POST /api/loops/analyze: the request, the analysis, and 401/403/404/422", () => {
    const op = doc.paths["/api/loops/analyze"].post as unknown as Operation;
    expect(op["x-permission"]).toBe("loop:analyze");
    expect(Object.keys(op.responses)).toEqual(expect.arrayContaining(["200", "401", "403", "404", "422"]));
    expect(op.responses["200"].content?.["application/json"].schema).toEqual({ $ref: "#/components/schemas/LoopAnalysis" });
    const schemas = (doc.components as { schemas: Record<string, { properties?: Record<string, Record<string, unknown>>; required?: string[] }> }).schemas;
    expect(schemas.AnalyzeRequest.required).toEqual(expect.arrayContaining(["inputType", "loop"]));
    expect(schemas.AnalyzeRequest.properties!.inputType.oneOf).toEqual([{ $ref: "#/components/schemas/Id" }, { $ref: "#/components/schemas/InputType" }]);
    const loop = schemas.LoopSpec;
    expect(loop.properties!.placement.enum).toEqual(["at-detector", "at-panel", "loop-back"]);
    expect(loop.required).toEqual(expect.arrayContaining(["scheme", "detectors", "tolerancePct", "cable"]));
    expect(schemas.Error.required).toEqual(["error"]);
    expect(Object.keys(schemas.Error.properties!)).toEqual(["error", "issues"]);
  });
});

// The documented response schema parses what the engine really sends, for each scheme and placement.
describe("the documented LoopAnalysis schema", () => {
  const inputTypes = shippedCatalog().catalog.inputTypes;
  const byId = (id: string) => inputTypes.find((t) => t.id === id)!;
  const cable = { gauge: { mm2: 0.22 }, lengthM: 120, tempMinC: -10, tempMaxC: 40 };
  const det = (label: string, contact: "NC" | "NO" = "NC", tamper = true) => ({ label, contact, tamper, lifeSafety: false });
  const cases: [string, LoopSpec][] = [
    ["input-2k2", { scheme: "single-eol", placement: "at-detector", detectors: [det("Door"), det("Window")], tolerancePct: 5, cable, contactOhms: 0.05 }],
    ["input-2k2", { scheme: "single-eol", placement: "at-panel", detectors: [det("Door", "NO", false)], tolerancePct: 5, cable, contactOhms: 0.05, eolOhms: 2350 }],
    ["input-2k2", { scheme: "none", placement: "at-detector", detectors: [det("Door")], tolerancePct: 5, cable, contactOhms: 0.05 }],
    ["input-4k7", { scheme: "double-eol", placement: "loop-back", detectors: [det("A"), det("B"), det("C")], tolerancePct: 5, cable, contactOhms: 0.05 }],
    ["input-5k6", { scheme: "shared", placement: "at-detector", detectors: [det("A"), det("B")], tolerancePct: 5, cable, contactOhms: 0.05 }],
    ["input-fire-1k-4k7", { scheme: "double-eol", placement: "at-detector", detectors: [{ label: "Smoke", contact: "NO", tamper: false, lifeSafety: true }], tolerancePct: 5, cable, contactOhms: 0.05 }],
  ];
  for (const [id, loop] of cases)
    it(`${id}, ${loop.scheme}, ${loop.placement}`, () => {
      const json = JSON.parse(JSON.stringify(analyzeLoop(loop, byId(id)), loopJsonReplacer));
      const r = loopAnalysisJsonSchema.safeParse(json);
      expect(r.success ? [] : r.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`)).toEqual([]);
      // an interrupted series loop reads an open circuit; it must travel as "Infinity", not null
      if (loop.placement !== "at-panel") expect(json.rows.find((x: { fault: string }) => x.fault === "cut").maxOhms).toBe("Infinity");
    });

  it("refuses an analysis whose open reading was sent as null", () => {
    const loop = cases[0][1];
    const json = JSON.parse(JSON.stringify(analyzeLoop(loop, byId("input-2k2"))));
    expect(loopAnalysisJsonSchema.safeParse(json).success).toBe(false);
  });
});
