import { readdirSync, readFileSync, statSync } from "node:fs";
import { join, relative, sep } from "node:path";
import { exportedMethods } from "@/lib/openapi/route-paths";
import type { Access, Method } from "./types";

// What the file system holds at test time: every route handler under app/ and every file with server actions.

export interface DiscoveredRoute {
  /** Repository-relative file, e.g. app/api/sites/[siteId]/route.ts */
  file: string;
  /** Folder path under app/ with route groups dropped, e.g. /api/sites/[siteId] */
  path: string;
  method: Method;
  /** The permission named in `route({ permission: ... })` for this method, "public" for `permission: null`,
   *  null when the method is not made with route() (then the registry's entry says what it is). */
  declared: Access | null;
}

function walk(dir: string, keep: (name: string) => boolean, out: string[] = []): string[] {
  for (const name of readdirSync(dir)) {
    if (name === "node_modules" || name.startsWith(".")) continue;
    const p = join(dir, name);
    if (statSync(p).isDirectory()) walk(p, keep, out);
    else if (keep(name)) out.push(p);
  }
  return out;
}

/** app/api/sites/[siteId]/route.ts → /api/sites/[siteId] (route groups such as (app) vanish). */
export function routePathOf(file: string): string {
  const parts = file.split(/[\\/]/);
  const segs = parts.slice(parts.indexOf("app") + 1, -1).filter((s) => !/^\(.*\)$/.test(s));
  return "/" + segs.join("/");
}

/** The permission each method's route() call declares: `export const PUT = route({ permission: "layout:write", ...`. */
export function declaredPermissions(source: string): Map<string, Access> {
  const out = new Map<string, Access>();
  for (const m of source.matchAll(/export\s+const\s+(GET|POST|PUT|PATCH|DELETE)\s*=\s*route\(\s*\{\s*permission:\s*(null|"([^"]+)")/g)) out.set(m[1], m[2] === "null" ? "public" : (m[3] as Access));
  return out;
}

export function discoverRoutes(root = process.cwd()): DiscoveredRoute[] {
  const files = walk(join(root, "app"), (n) => /^route\.(ts|tsx|js|mjs)$/.test(n));
  return files
    .flatMap((abs) => {
      const file = relative(root, abs).split(sep).join("/");
      const source = readFileSync(abs, "utf8");
      const declared = declaredPermissions(source);
      return exportedMethods(source).map((method) => ({ file, path: routePathOf(file), method: method as Method, declared: declared.get(method) ?? null }));
    })
    .sort((a, b) => (a.path + a.method).localeCompare(b.path + b.method));
}

// Built from parts so that this file does not list itself.
const directive = new RegExp(`["']use ${"server"}["']`);

/** Source files with a server-action directive, anywhere under app/, components/ and lib/. */
export function discoverServerActionFiles(root = process.cwd()): string[] {
  return ["app", "components", "lib"]
    .flatMap((d) => walk(join(root, d), (n) => /\.(ts|tsx|js|mjs)$/.test(n)))
    .filter((abs) => directive.test(readFileSync(abs, "utf8")))
    .map((abs) => relative(root, abs).split(sep).join("/"))
    .sort();
}
