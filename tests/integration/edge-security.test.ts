import { request as httpRequest } from "node:http";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { CookieClient, ensureBuild, startServer, type RunningServer } from "@/tests/api-registry/http-server";
import { makeOrganisation, testDb } from "./support";
import { Site } from "@/models";

// The production server (next start) probed from outside, as a browser on another site or a careless
// client would: forged state-changing requests, bodies without a length, text that is not Unicode,
// redirects after sign-in, caching and security headers, and the development outbox.

const root = process.cwd();
const distDir = process.env.NEXT_DIST_DIR || ".next";
const secret = process.env.NEXTAUTH_SECRET || readFileSync(join(root, ".data", "session-secret"), "utf8").trim();
const EVIL = "https://evil.example";

let server: RunningServer | undefined;
let admin: CookieClient;
let engineer: CookieClient;
let base: string;
let organisationId: number;

beforeAll(async () => {
  testDb();
  const { org, actors } = await makeOrganisation("Edge");
  organisationId = org.id;
  ensureBuild(root, distDir);
  // the outbox flag is on: a production build must ignore it
  server = await startServer({ root, distDir, databaseUrl: process.env.DATABASE_URL!, secret, env: { LOOPWRIGHT_DEV_OUTBOX: "1" } });
  base = server.base;
  admin = new CookieClient(base);
  await admin.signIn(actors.admin.email, "test-password-1");
  engineer = new CookieClient(base);
  await engineer.signIn(actors.engineer.email, "test-password-1");
}, 1_000_000);

afterAll(() => server?.stop());

/** fetch as `who` (a signed-in cookie jar, or nobody), never following redirects. */
function call(who: CookieClient | null, path: string, init: { method?: string; headers?: Record<string, string>; body?: BodyInit } = {}) {
  return fetch(base + path, { method: init.method ?? "GET", headers: { ...(who ? { cookie: who.cookieHeader() } : {}), ...init.headers }, body: init.body, redirect: "manual" });
}

const json = (value: unknown, extra: Record<string, string> = {}) => ({ headers: { "content-type": "application/json", ...extra }, body: JSON.stringify(value) });
const siteBody = (name: string) => ({ name, address: "1 Edge Row", description: "", areas: [] });
const sitesNamed = (name: string) => Site.count({ where: { organisationId, name } });

describe("forged requests: another site's Origin or Referer is refused with 403 on every state-changing verb", () => {
  it("refuses JSON POST, PATCH, PUT and DELETE, multipart and body-less requests from another origin, and stores nothing", async () => {
    const made = await admin.request("/api/sites", { method: "POST", json: siteBody("Edge target") });
    expect(made.status).toBe(200);
    const siteId = made.json.id as number;
    const layout = await admin.request(`/api/sites/${siteId}/layouts`, { method: "POST", json: { name: "Edge layout", panelId: "panel-large-32" } });
    expect(layout.status).toBe(200);
    const layoutId = layout.json.layout.id as number;

    const form = new FormData();
    form.set("mode", "store");
    form.set("file", new Blob([readFileSync("tests/fixtures/catalog/good-upload.yaml")], { type: "application/yaml" }), "good-upload.yaml");
    const forged: { what: string; who: CookieClient; path: string; method: string; headers?: Record<string, string>; body?: BodyInit }[] = [
      { what: "JSON POST", who: admin, path: "/api/sites", method: "POST", ...json(siteBody("Forged site"), { origin: EVIL }) },
      { what: "JSON PATCH", who: admin, path: `/api/sites/${siteId}`, method: "PATCH", ...json({ name: "Forged rename" }, { origin: EVIL }) },
      { what: "JSON PUT", who: admin, path: `/api/layouts/${layoutId}`, method: "PUT", ...json({ version: 1, document: {}, note: "forged" }, { origin: EVIL }) },
      { what: "body-less DELETE", who: admin, path: `/api/layouts/${layoutId}`, method: "DELETE", headers: { origin: EVIL } },
      { what: "multipart POST", who: engineer, path: "/api/catalog/uploads", method: "POST", headers: { origin: EVIL }, body: form },
      { what: "body-less POST, Referer only", who: engineer, path: `/api/layouts/${layoutId}/commissioning/complete`, method: "POST", headers: { referer: `${EVIL}/page` } },
      { what: 'Origin "null" (a sandboxed frame)', who: admin, path: "/api/sites", method: "POST", ...json(siteBody("Forged site"), { origin: "null" }) },
      { what: "another port of the same host", who: admin, path: "/api/sites", method: "POST", ...json(siteBody("Forged site"), { origin: base.replace(/:(\d+)$/, (_, p) => `:${Number(p) + 1}`) }) },
      { what: "Origin of another site with our Referer", who: admin, path: `/api/sites/${siteId}`, method: "PATCH", ...json({ name: "Forged rename" }, { origin: EVIL, referer: `${base}/sites` }) },
      { what: "signed out", who: null as unknown as CookieClient, path: "/api/invitations/accept", method: "POST", ...json({ token: "x".repeat(43), name: "Forged", password: "wire-and-meter-77" }, { origin: EVIL }) },
    ];
    for (const f of forged) {
      const res = await call(f.who, f.path, { method: f.method, headers: f.headers, body: f.body });
      const text = await res.text();
      expect(res.status, `${f.what}: ${text.slice(0, 200)}`).toBe(403);
      expect(JSON.parse(text).error, f.what).toMatch(/came from another site/);
    }
    expect(await sitesNamed("Forged site")).toBe(0);
    expect((await admin.request(`/api/sites/${siteId}`)).json.name).toBe("Edge target");
    expect((await admin.request(`/api/layouts/${layoutId}`)).status).toBe(200); // not deleted
  });

  it("accepts the app's own Origin, its own Referer, and clients that send neither", async () => {
    for (const [what, headers] of [
      ["own Origin", { origin: base }],
      ["own Referer", { referer: `${base}/sites` }],
      ["neither", {}],
    ] as const) {
      const res = await call(admin, "/api/sites", { method: "POST", ...json(siteBody(`Same-origin ${what}`), headers) });
      expect(res.status, `${what}: ${(await res.text()).slice(0, 200)}`).toBe(200);
      expect(await sitesNamed(`Same-origin ${what}`)).toBe(1);
    }
    // reads are never refused for their Origin
    expect((await call(admin, "/api/sites", { headers: { origin: EVIL } })).status).toBe(200);
  });
});

/**
 * Sends a chunked body (no Content-Length) over real HTTP, writing until the server answers; returns the
 * status and how many bytes had been written by then. A server that reads to the end never answers.
 */
function sendEndless(path: string, headers: Record<string, string>, chunk: Buffer, prefix = Buffer.alloc(0)): Promise<{ status: number; written: number; body: string }> {
  const u = new URL(base + path);
  return new Promise((resolve, reject) => {
    let written = 0;
    let answered = false;
    const req = httpRequest({ host: u.hostname, port: u.port, path: u.pathname, method: "POST", headers: { ...headers, "transfer-encoding": "chunked" } }, (res) => {
      answered = true;
      let body = "";
      res.on("data", (d) => (body += d));
      res.on("end", () => {
        req.destroy();
        resolve({ status: res.statusCode ?? 0, written, body });
      });
    });
    req.on("error", (e) => (answered ? undefined : reject(e)));
    const limit = 256 * 1024 * 1024; // give up (and fail) after 256 MiB
    const pump = () => {
      while (!answered && written < limit) {
        const piece = written === 0 && prefix.length ? prefix : chunk;
        written += piece.length;
        if (!req.write(piece)) return void req.once("drain", pump);
      }
      if (!answered) req.end();
    };
    pump();
  });
}

describe("bodies are limited while they stream", () => {
  it("stops reading a chunked JSON body at the limit with 413", async () => {
    const r = await sendEndless("/api/sites", { "content-type": "application/json", cookie: admin.cookieHeader() }, Buffer.alloc(64 * 1024, 0x20), Buffer.from('{"name":"'));
    expect(r.status, r.body.slice(0, 200)).toBe(413);
    expect(JSON.parse(r.body).error).toMatch(/too large/);
    expect(r.written).toBeLessThan(64 * 1024 * 1024); // the 2 MiB limit, plus what the sockets buffered
  }, 120_000);

  it("stops reading a chunked photo upload at the limit with 413", async () => {
    const boundary = "edgeboundary";
    const head = Buffer.from(`--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="p.jpg"\r\nContent-Type: image/jpeg\r\n\r\n`);
    const r = await sendEndless("/api/layouts/1/photos", { "content-type": `multipart/form-data; boundary=${boundary}`, cookie: engineer.cookieHeader() }, Buffer.alloc(256 * 1024, 0xff), head);
    expect(r.status, r.body.slice(0, 200)).toBe(413);
    expect(r.written).toBeLessThan(128 * 1024 * 1024);
  }, 120_000);

  it("stops reading a chunked catalog upload at the limit with 413", async () => {
    const boundary = "edgeboundary";
    const head = Buffer.from(`--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="c.yaml"\r\nContent-Type: application/yaml\r\n\r\n`);
    const r = await sendEndless("/api/catalog/uploads", { "content-type": `multipart/form-data; boundary=${boundary}`, cookie: engineer.cookieHeader() }, Buffer.alloc(256 * 1024, 0x20), head);
    expect(r.status, r.body.slice(0, 200)).toBe(413);
    expect(r.written).toBeLessThan(128 * 1024 * 1024);
  }, 120_000);
});

describe("text that is not Unicode", () => {
  it("answers a lone surrogate in a text field with 422 naming the field, and stores nothing", async () => {
    // JSON text may escape half of a surrogate pair; JSON.parse then yields a string no database column can hold
    const bodies: [string, string][] = [
      ['{"name":"Depot \\ud800","address":"","description":"","areas":[]}', "name"],
      ['{"name":"Depot","address":"\\udfff 1 Row","description":"","areas":[]}', "address"],
      ['{"name":"Depot","address":"","description":"","areas":[{"name":"G","rooms":["Hall \\ud83d"]}]}', "areas.0.rooms.0"],
    ];
    for (const [body, field] of bodies) {
      const res = await call(admin, "/api/sites", { method: "POST", headers: { "content-type": "application/json" }, body });
      const text = await res.text();
      expect(res.status, text.slice(0, 300)).toBe(422);
      expect(JSON.parse(text).issues, text).toEqual([{ path: field, message: expect.stringMatching(/invalid Unicode/) }]);
    }
    // a well-formed pair is ordinary text
    const ok = await call(admin, "/api/sites", { method: "POST", headers: { "content-type": "application/json" }, body: '{"name":"Depot \\ud83d\\udd25 edge","address":"","description":"","areas":[]}' });
    expect(ok.status, await ok.text()).toBe(200);
    expect(await sitesNamed("Depot \u{1F525} edge")).toBe(1);
  });

  it("answers bytes that are not UTF-8 with 400", async () => {
    const body = Buffer.concat([Buffer.from('{"name":"Depot '), Buffer.from([0xc3, 0x28, 0xed, 0xa0, 0x80]), Buffer.from('","address":"","description":"","areas":[]}')]);
    const res = await call(admin, "/api/sites", { method: "POST", headers: { "content-type": "application/json" }, body });
    expect(res.status).toBe(400);
    expect((await res.json()).error).toMatch(/UTF-8/);
  });
});

describe("headers", () => {
  it("marks authenticated API answers private, no-store (refusals too)", async () => {
    expect((await call(admin, "/api/sites")).headers.get("cache-control")).toBe("private, no-store");
    expect((await call(null, "/api/sites")).headers.get("cache-control")).toBe("private, no-store");
  });

  it("sends pages with a per-request CSP nonce on every script, no 'unsafe-inline' scripts, and no caching", async () => {
    const [a, b] = [await call(null, "/sign-in"), await call(null, "/sign-in")];
    const csp = a.headers.get("content-security-policy")!;
    const scriptSrc = csp.split(";").map((d) => d.trim()).find((d) => d.startsWith("script-src "))!;
    const nonce = /'nonce-([A-Za-z0-9+/=]+)'/.exec(scriptSrc)?.[1];
    expect(nonce, csp).toBeTruthy();
    expect(scriptSrc).not.toContain("'unsafe-inline'");
    expect(b.headers.get("content-security-policy")).not.toContain(nonce); // fresh per request
    expect(a.headers.get("cache-control")).toMatch(/private/);
    expect(a.headers.get("cache-control")).toMatch(/no-store/);
    const html = await a.text();
    const scripts = [...html.matchAll(/<script\b[^>]*>/g)].map((m) => m[0]);
    expect(scripts.length).toBeGreaterThan(0);
    for (const s of scripts) expect(s, s).toContain(`nonce="${nonce}"`);
  });

  it("adds HSTS only when the request reached the proxy over https", async () => {
    expect((await call(null, "/sign-in")).headers.get("strict-transport-security")).toBeNull();
    const https = await call(null, "/sign-in", { headers: { "x-forwarded-proto": "https" } });
    expect(https.headers.get("strict-transport-security")).toMatch(/^max-age=\d{8,}/);
  });
});

describe("redirects after sign-in stay on the app's origin", () => {
  for (const target of ["/%5Cevil.example", "//evil.example", "https://evil.example/", "/%09/evil.example", "javascript:alert(1)"])
    it(`the sign-in page of a signed-in member sends ${target} home`, async () => {
      const res = await call(admin, `/sign-in?callbackUrl=${encodeURIComponent(decodeURIComponent(target))}`);
      expect([303, 307, 308]).toContain(res.status);
      const location = res.headers.get("location")!;
      expect(new URL(location, base).origin, location).toBe(new URL(base).origin);
    });

  it("next-auth's own redirect after the credentials sign-in keeps the origin", async () => {
    const c = new CookieClient(base);
    const csrf = await c.request("/api/auth/csrf");
    const res = await c.request("/api/auth/callback/credentials", { method: "POST", form: { csrfToken: csrf.json.csrfToken, email: "nobody@test.example", password: "x", json: "true", callbackUrl: "https://evil.example/" } });
    expect(new URL(res.json.url, base).origin).toBe(new URL(base).origin);
  });
});

describe("the development outbox", () => {
  it("is a 404 in the production build, signed out and as an admin, even with LOOPWRIGHT_DEV_OUTBOX=1", async () => {
    for (const who of [null, admin])
      for (const path of ["/dev/outbox", "/dev/outbox/1/attachments/0"]) {
        const res = await call(who, path);
        expect(res.status, `${path} ${who ? "as admin" : "signed out"}`).toBe(404);
        expect(await res.text()).not.toMatch(/Development outbox/);
      }
  });
});
