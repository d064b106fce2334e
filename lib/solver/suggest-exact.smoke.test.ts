import { it } from "vitest";
import { shippedCatalog } from "@/lib/catalog/shipped";
import { det } from "@/lib/solver/testing/fixture-schedule";
import { highsSolver } from "@/lib/solver/highs-loader";
import { suggestExact } from "@/lib/solver/suggest-exact";
import { suggestHardware } from "@/lib/solver/suggest";
it("smoke", async () => {
  const cat = shippedCatalog().catalog;
  const highs = await highsSolver();
  const kinds = ["contact-door-surface", "motion-wall", "panic-button-no", "water-probe-no", "smoke-4wire-no", "glass-break-acoustic"];
  for (const n of [5, 20, 60, 120]) {
    const sched = Array.from({ length: n }, (_, i) => det(`d${i}`, kinds[i % kinds.length], { area: `A${i % 3}`, supervision: (["none", "shared-ok", "double-eol", "single-eol"] as const)[i % 4] }));
    for (const allowShared of [false, true]) {
      let t = performance.now();
      const e = suggestExact(highs, sched, cat, { allowShared });
      const te = performance.now() - t;
      t = performance.now();
      const o = suggestHardware(sched, cat, { allowShared });
      const to = performance.now() - t;
      console.log(n, allowShared, e.found ? e.cost : e.reason, e.proof, te.toFixed(0), "old", o.found ? o.cost : o.reason, to.toFixed(0));
    }
  }
}, 300_000);
