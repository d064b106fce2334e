// App Router file paths → OpenAPI paths, so a test can hold the document against the app/api folder.

/** "app/api/sites/[siteId]/route.ts" → "/api/sites/{siteId}"; route groups vanish; a catch-all is one parameter. */
export function openApiPathOf(routeFile: string): string {
  const parts = routeFile.replace(/\\/g, "/").split("/");
  const start = parts.indexOf("app");
  const segs = parts.slice(start + 1, -1).filter((s) => !/^\(.*\)$/.test(s));
  return (
    "/" +
    segs
      .map((s) => {
        const m = /^\[\[?(?:\.\.\.)?([^\]]+)\]\]?$/.exec(s);
        return m ? `{${m[1]}}` : s;
      })
      .join("/")
  );
}

const METHODS = ["GET", "POST", "PUT", "PATCH", "DELETE"] as const;

/** The HTTP methods a route.ts exports: `export const GET`, `export async function POST`, `export { handler as GET }`. */
export function exportedMethods(source: string): string[] {
  const found = new Set<string>();
  for (const m of source.matchAll(/export\s+(?:const|let|async\s+function|function)\s+(GET|POST|PUT|PATCH|DELETE)\b/g)) found.add(m[1]);
  for (const m of source.matchAll(/export\s*\{([^}]*)\}/g))
    for (const part of m[1].split(",")) {
      const name = part.trim().split(/\s+as\s+/).pop()?.trim();
      if (name && (METHODS as readonly string[]).includes(name)) found.add(name);
    }
  return METHODS.filter((x) => found.has(x));
}
