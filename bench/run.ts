// Runs every bench/*-bench.ts file's exported run(), in name order, then the table of every
// figure beside its target (bench/figures.ts). `npm run bench`; `npm run bench -- loop` runs the files
// whose names contain "loop"; a filter naming one file exactly (`loop-bench` or `loop-bench.ts`) runs that file alone.
import { readdirSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";
import { printTable } from "./figures";

const here = dirname(fileURLToPath(import.meta.url));
const filter = process.argv[2];
const all = readdirSync(here)
  .filter((f) => f.endsWith("-bench.ts"))
  .sort();
const exact = all.filter((f) => f === filter || f === `${filter}.ts`);
const files = exact.length ? exact : all.filter((f) => !filter || f.includes(filter));

for (const f of files) {
  const mod = (await import(pathToFileURL(join(here, f)).href)) as { run?: () => unknown };
  if (typeof mod.run !== "function") {
    console.log(`${f}: no exported run(), skipped`);
    continue;
  }
  console.log(`\n== ${f} ==`);
  await mod.run();
}
printTable();
process.exit(0);
