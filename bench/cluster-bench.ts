// The HTTP load through the cluster's balancer (npm run cluster first) with one app instance and with two:
// half the clients read a layout, half save their own layout (no 409s). Prints req/s and p95 side by side, and the
// machine's load average, since the instances and the three database nodes share its cores. A benchmark: nothing
// is asserted. `npm run bench -- cluster-bench`; CLUSTER_BENCH_S and CLUSTER_BENCH_CONNECTIONS change the run.
import { execFileSync } from "node:child_process";
import { availableParallelism, loadavg } from "node:os";
import autocannon, { type AutocannonClient } from "autocannon";
import { CookieClient } from "@/tests/api-registry/http-server";

const BALANCER = "http://127.0.0.1:3345";
const STATS = "http://127.0.0.1:3346/;csv";

function percentile(sorted: number[], p: number): number {
  return sorted.length ? sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)] : NaN;
}

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** Waits until HAProxy sees the given number of app instances up. */
async function instancesUp(n: number) {
  for (let i = 0; i < 120; i++) {
    const csv = await fetch(STATS).then((r) => r.text());
    const up = csv.split("\n").filter((l) => l.startsWith("apps,app") && l.split(",")[17] === "UP").length;
    if (up === n) return;
    await sleep(500);
  }
  throw new Error(`HAProxy did not see ${n} instance(s) up`);
}

interface Figures {
  statuses: Record<string, number>;
  rps: number;
  readP95: number;
  saveP95: number;
  errors: number;
  load: number;
}

async function measure(api: CookieClient, layouts: { id: number; version: number }[], document: unknown, seconds: number, connections: number): Promise<Figures> {
  const headers = { cookie: api.cookieHeader() };
  const readers = Math.ceil(connections / 2);
  const read: number[] = [];
  const save: number[] = [];
  let bad = 0;
  const statuses: Record<string, number> = {};
  const tally = (kind: string, status: number) => (statuses[`${kind} ${status}`] = (statuses[`${kind} ${status}`] ?? 0) + 1);
  let nextReader = 0;
  let nextSaver = readers;
  const common = { url: BALANCER, duration: seconds, timeout: 30 };
  const reading = autocannon({ ...common, connections: readers, setupClient: (c: AutocannonClient) => c.setRequests([{ method: "GET", path: `/api/layouts/${layouts[nextReader++].id}`, headers }]) });
  const saving = autocannon({
    ...common,
    connections: connections - readers,
    setupClient(c: AutocannonClient) {
      const l = layouts[nextSaver++];
      c.setRequests([
        {
          method: "PUT",
          path: `/api/layouts/${l.id}`,
          headers: { ...headers, "content-type": "application/json" },
          setupRequest: (req) => ({ ...req, body: JSON.stringify({ version: l.version, document }) }),
          onResponse: (status, text) => {
            if (status === 200) l.version = (JSON.parse(text) as { layout: { version: number } }).layout.version;
            // a save whose answer was lost moved the version on: carry on from the current one
            if (status === 409) l.version = (JSON.parse(text) as { currentVersion?: number }).currentVersion ?? l.version;
          },
        },
      ]);
    },
  });
  reading.on("response", (_c: unknown, status: number, _b: number, ms: number) => (read.push(ms), tally("read", status), status !== 200 && bad++));
  saving.on("response", (_c: unknown, status: number, _b: number, ms: number) => (save.push(ms), tally("save", status), status !== 200 && bad++));
  const [r, s] = await Promise.all([reading, saving]);
  const sorted = (xs: number[]) => [...xs].sort((a, b) => a - b);
  return { statuses, rps: (read.length + save.length) / seconds, readP95: percentile(sorted(read), 95), saveP95: percentile(sorted(save), 95), errors: bad + r.errors + s.errors + r.timeouts + s.timeouts, load: loadavg()[0] };
}

export async function run(): Promise<void> {
  if (!(await fetch(`${BALANCER}/api/health`).then((r) => r.ok, () => false))) {
    console.log("cluster bench skipped: nothing answers on the balancer (start it with npm run cluster)");
    return;
  }
  const seconds = Number(process.env.CLUSTER_BENCH_S ?? 20);
  const connections = Number(process.env.CLUSTER_BENCH_CONNECTIONS ?? 20);
  const api = new CookieClient(BALANCER);
  await api.signIn("designer@quillfen.example", "loop-demo-2026");
  const sites = (await api.request("/api/sites")).json.sites as { id: number }[];
  const first = await api.request(`/api/sites/${sites[0].id}/layouts`, { method: "POST", json: { name: `Bench layout ${Date.now()}`, suggestion: { allowShared: false } } });
  if (first.status !== 200) throw new Error(`layout: ${first.status} ${first.text.slice(0, 200)}`);
  const document = first.json.document;
  const layouts = [{ id: first.json.layout.id as number, version: 1 }];
  while (layouts.length < connections) {
    const made = await api.request(`/api/sites/${sites[0].id}/layouts`, { method: "POST", json: { name: `Bench layout ${Date.now()} ${layouts.length}`, document } });
    layouts.push({ id: made.json.layout.id, version: made.json.layout.version });
  }
  const cluster = (...args: string[]) => execFileSync("bash", ["scripts/cluster.sh", ...args], { stdio: "pipe", timeout: 300_000 });

  cluster("app-stop", "2");
  await instancesUp(1);
  const one = await measure(api, layouts, document, seconds, connections);
  cluster("app-start", "2");
  await instancesUp(2);
  const two = await measure(api, layouts, document, seconds, connections);

  console.log(`cluster bench: ${connections} clients (half reading a layout, half saving their own) for ${seconds} s per run through ${BALANCER}, three Galera nodes, ${availableParallelism()} cores shared`);
  console.log("");
  console.log("| app instances | req/s | read p95 ms | save p95 ms | errors | load average at the end |");
  console.log("| ---: | ---: | ---: | ---: | ---: | ---: |");
  for (const [n, f] of [
    [1, one],
    [2, two],
  ] as const)
    console.log(`| ${n} | ${f.rps.toFixed(1)} | ${f.readP95.toFixed(0)} | ${f.saveP95.toFixed(0)} | ${f.errors} | ${f.load.toFixed(1)} |`);
  console.log(`answers: one instance ${JSON.stringify(one.statuses)}; two ${JSON.stringify(two.statuses)}`);
}

if (import.meta.url === `file://${process.argv[1]}`) await run();
