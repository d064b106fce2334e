// The production server on every core: Node's cluster module forks LOOPWRIGHT_APP_PROCESSES app processes
// (default: one per core), each running Next's own `next start`; they share one listening port, and the
// primary hands each new connection to one of them. Used by `npm start` (scripts/start.sh) and by the
// two-instance test. Usage: node scripts/serve-every-core.mjs --hostname 127.0.0.1 --port 3000
//
// An app process that dies after it was serving is started again (at most once a second); one that dies in its first
// STARTUP_MS (a bad setting, a missing build: Next listens before it loads the build, so listening proves nothing)
// stops the whole server with its exit code, rather than looping.
// SIGTERM or SIGINT to the primary ends every app process and then the primary.
//
// The processes also relay one kind of message: "forget this member" (lib/server/actor-cache.ts), so that a
// sign-out, role change or new password in one process clears the cached session check of all of them.
import cluster from "node:cluster";
import { availableParallelism } from "node:os";
import { createRequire } from "node:module";

const require = createRequire(import.meta.url);

function processCount() {
  const raw = process.env.LOOPWRIGHT_APP_PROCESSES;
  if (raw === undefined || raw === "") return availableParallelism();
  const n = Number(raw);
  if (!Number.isInteger(n) || n < 1 || n > 64) {
    console.error(`LOOPWRIGHT_APP_PROCESSES must be a whole number from 1 to 64 (it is "${raw}").`);
    process.exit(2);
  }
  return n;
}

const count = processCount();
const nextBin = require.resolve("next/dist/bin/next");
const args = ["start", ...process.argv.slice(2)];
let stopping = false;
let lastRestart = 0;
const STARTUP_MS = 20_000;
const started = new WeakMap();

cluster.setupPrimary({ exec: nextBin, args });

function fork() {
  const w = cluster.fork({ LOOPWRIGHT_APP_PROCESS: "1" });
  started.set(w, Date.now());
  // relay a cache-clearing message to every other app process
  w.on("message", (msg) => {
    if (!msg || msg.type !== "loopwright:forget-actor") return;
    for (const other of Object.values(cluster.workers ?? {})) if (other && other !== w && other.isConnected()) other.send(msg);
  });
  return w;
}

cluster.on("exit", (w, code, signal) => {
  if (stopping) return; // the handler below ends the primary once the last one is gone
  if (Date.now() - (started.get(w) ?? 0) < STARTUP_MS) {
    console.error(`An app process stopped while starting (exit ${code ?? signal}); stopping the server.`);
    stop(typeof code === "number" && code !== 0 ? code : 1);
    return;
  }
  const wait = Math.max(0, lastRestart + 1000 - Date.now());
  lastRestart = Date.now() + wait;
  console.error(`An app process stopped (exit ${code ?? signal}); starting another.`);
  setTimeout(() => !stopping && fork(), wait);
});

let exitCode = 0;
function stop(code = 0) {
  if (stopping) return;
  stopping = true;
  exitCode = code;
  const left = Object.values(cluster.workers ?? {}).filter(Boolean);
  if (!left.length) process.exit(code);
  for (const w of left) w.process.kill("SIGTERM");
  // an app process that ignores SIGTERM is ended after 10 s
  setTimeout(() => {
    for (const w of Object.values(cluster.workers ?? {})) w?.process.kill("SIGKILL");
    process.exit(exitCode);
  }, 10_000).unref();
}
cluster.on("exit", () => {
  if (stopping && Object.keys(cluster.workers ?? {}).length === 0) process.exit(exitCode);
});

process.on("SIGTERM", () => stop(0));
process.on("SIGINT", () => stop(0));

console.log(`Loopwright: ${count} app process${count === 1 ? "" : "es"} (LOOPWRIGHT_APP_PROCESSES; default one per core).`);
for (let i = 0; i < count; i++) fork();
