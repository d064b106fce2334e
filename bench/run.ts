// Runs every bench/*-bench.ts file's exported run(), in name order. `npm run bench`; `npm run bench -- loop` runs matching files only.
import { readdirSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";

const here = dirname(fileURLToPath(import.meta.url));
const filter = process.argv[2];
const files = readdirSync(here)
  .filter((f) => f.endsWith("-bench.ts") && (!filter || f.includes(filter)))
  .sort();

for (const f of files) {
  const mod = (await import(pathToFileURL(join(here, f)).href)) as { run?: () => unknown };
  if (typeof mod.run !== "function") {
    console.log(`${f}: no exported run(), skipped`);
    continue;
  }
  console.log(`\n== ${f} ==`);
  await mod.run();
}
process.exit(0);
