// Two rules of the house that lint does not express: screens stay small enough to change safely, and the browser
// reaches the API only through the one shared client (lib/client/fetcher.ts).
import { readdirSync, readFileSync, statSync } from "node:fs";
import { join, relative } from "node:path";
import { describe, expect, it } from "vitest";

const root = join(import.meta.dirname, "..", "..");
const MAX_COMPONENT_LINES = 300;

function sourceFiles(dir: string): string[] {
  const out: string[] = [];
  for (const name of readdirSync(dir)) {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) out.push(...sourceFiles(path));
    else if (/\.(ts|tsx)$/.test(name)) out.push(path);
  }
  return out;
}

const components = sourceFiles(join(root, "components"));

describe("house rules", () => {
  it("finds the component files it checks", () => {
    expect(components.length).toBeGreaterThan(20);
  });

  it(`keeps every file under components/ at ${MAX_COMPONENT_LINES} lines or fewer`, () => {
    const long = components
      .map((f) => ({ file: relative(root, f), lines: readFileSync(f, "utf8").split("\n").length }))
      .filter((f) => f.lines > MAX_COMPONENT_LINES);
    expect(long).toEqual([]);
  });

  it("has no bare fetch( in components: requests go through lib/client/fetcher.ts", () => {
    const bare = components.filter((f) => /\bfetch\(/.test(readFileSync(f, "utf8"))).map((f) => relative(root, f));
    expect(bare).toEqual([]);
  });
});
