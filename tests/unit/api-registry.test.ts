import { describe, expect, it } from "vitest";
import { permissionTable } from "@/lib/auth/permissions";
import { declaredPermissions, discoverRoutes, discoverServerActionFiles, routePathOf } from "@/tests/api-registry/discover";
import { routes, serverActionFiles } from "@/tests/api-registry/routes";
import { routeKey } from "@/tests/api-registry/types";

// The route registry (tests/api-registry/routes.ts) against the file system as it is now: the browser tests
// call every entry, so a route method without an entry would go untested.

const found = discoverRoutes();
const foundKeys = found.map(routeKey);
const entryKeys = routes.map(routeKey);

describe("the route registry", () => {
  it("finds the route files (the scan itself works)", () => {
    expect(found.length).toBeGreaterThan(20);
    expect(foundKeys).toContain("PUT /api/layouts/[layoutId]");
    expect(foundKeys).toContain("GET /api/auth/[...nextauth]");
    expect(foundKeys).toContain("POST /api/auth/[...nextauth]");
  });

  it("has an entry for every exported method of every route file", () => {
    const missing = foundKeys.filter((k) => !entryKeys.includes(k));
    expect(missing, `add these to tests/api-registry/routes.ts:\n${missing.join("\n")}`).toEqual([]);
  });

  it("names no route method that no longer exists", () => {
    const stale = entryKeys.filter((k) => !foundKeys.includes(k));
    expect(stale, `remove or correct these entries:\n${stale.join("\n")}`).toEqual([]);
  });

  it("has one entry per route method", () => {
    expect(new Set(entryKeys).size).toBe(entryKeys.length);
  });

  it("gives each entry the permission its handler declares, from the permission table", () => {
    const byKey = new Map(found.map((r) => [routeKey(r), r]));
    for (const e of routes) {
      const r = byKey.get(routeKey(e));
      if (!r) continue;
      if (e.access !== "public") expect(Object.keys(permissionTable), routeKey(e)).toContain(e.access);
      // handlers not made with route() (next-auth, health, the dev outbox) check no session: public
      expect(e.access, `${routeKey(e)} in ${r.file}`).toBe(r.declared ?? "public");
    }
  });

  it("fuzzes only entries that say which body keys are required", () => {
    for (const e of routes.filter((x) => x.body === "json")) expect(e.requiredKeys, routeKey(e)).toBeDefined();
    for (const e of routes.filter((x) => x.body !== "json")) expect(e.requiredKeys, routeKey(e)).toBeUndefined();
  });

  it("lists every file with server actions (the policy is route handlers only: there are none)", () => {
    expect(discoverServerActionFiles()).toEqual(serverActionFiles);
  });
});

describe("the scan's parsers", () => {
  it("maps a route file to its path, dropping route groups", () => {
    expect(routePathOf("app/api/sites/[siteId]/route.ts")).toBe("/api/sites/[siteId]");
    expect(routePathOf("app/(app)/x/[id]/route.ts")).toBe("/x/[id]");
    expect(routePathOf("app/api/auth/[...nextauth]/route.ts")).toBe("/api/auth/[...nextauth]");
  });

  it("reads the permission of each route() call, null as public", () => {
    const src = [
      'export const GET = route({ permission: "site:read", params }, async () => 1);',
      "export const POST = route(\n  {\n    permission: null,\n    body: x,\n  },\n  async () => 1,\n);",
      "export async function DELETE() {}",
    ].join("\n");
    const m = declaredPermissions(src);
    expect(m.get("GET")).toBe("site:read");
    expect(m.get("POST")).toBe("public");
    expect(m.has("DELETE")).toBe(false);
  });
});
