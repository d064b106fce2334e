// Rules of the house that lint does not express: screens stay small enough to change safely, the browser reaches
// the API only through the one shared client (lib/client/fetcher.ts), and phone layouts never grow past the screen.
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
const screens = [...components, ...sourceFiles(join(root, "app"))];

/** Class lists of grids that change their columns at a breakpoint but leave the phone column implicit. */
function implicitPhoneGrids(source: string): string[] {
  const classLists = source.match(/className="[^"]*"/g) ?? [];
  return classLists.filter((c) => /["\s]grid["\s]/.test(c) && /\b(sm|md|lg|xl|2xl):grid-cols-/.test(c) && !/["\s]grid-cols-/.test(c));
}

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

  // An implicit grid column is sized to its widest content, so one wide table pushes the whole page past a
  // phone's screen; grid-cols-1 is minmax(0, 1fr) and lets the table scroll inside its card instead.
  it("starts every responsive grid from grid-cols-1 on a phone", () => {
    expect(implicitPhoneGrids('<div className="grid gap-6 lg:grid-cols-3">')).toHaveLength(1);
    expect(implicitPhoneGrids('<div className="grid grid-cols-1 gap-6 lg:grid-cols-3">')).toEqual([]);
    const offenders = screens.flatMap((f) => implicitPhoneGrids(readFileSync(f, "utf8")).map((c) => `${relative(root, f)}: ${c}`));
    expect(offenders).toEqual([]);
  });

  // Visually hidden text (sr-only) is absolutely positioned: inside a scroll box that is not its containing block
  // it escapes the box and stretches the page on a phone.
  it("makes every sideways scroll box the containing block of what it holds", () => {
    const loose = screens.flatMap((f) =>
      (readFileSync(f, "utf8").match(/className="[^"]*overflow-x-auto[^"]*"/g) ?? []).filter((c) => !/["\s]relative["\s]/.test(c)).map((c) => `${relative(root, f)}: ${c}`),
    );
    expect(loose).toEqual([]);
  });
});
