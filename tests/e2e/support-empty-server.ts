import { spawn, type ChildProcess } from "node:child_process";
import { closeSync, openSync, readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { port } from "./support";

// A second app server for the specs that start from nothing: its own database (migrated, no demo data), its own
// mail sink and its own port, started by scripts/serve-e2e.sh with E2E_EMPTY=1 from the same build (NEXT_DIST_DIR
// is inherited). Only a spec that asks for it starts it, so the other specs pay nothing. E2E_EMPTY_PORT picks the
// port; by default five above the main server's, so parallel runs on other E2E_PORTs keep apart.

export const emptyPort = Number(process.env.E2E_EMPTY_PORT ?? port + 5);
export const emptyBaseURL = `http://localhost:${emptyPort}`;
/** The empty server's mail page: one above its SMTP sink, which listens 1000 above the app (scripts/serve-e2e.sh). */
export const emptyMailPage = `http://127.0.0.1:${emptyPort + 1001}/`;

const root = fileURLToPath(new URL("../..", import.meta.url));
const logFile = `${root}/.data/serve-e2e-${emptyPort}.log`;

export interface EmptyServer {
  stop(): Promise<void>;
}

async function healthy(): Promise<boolean> {
  try {
    return (await fetch(`${emptyBaseURL}/api/health`)).ok;
  } catch {
    return false;
  }
}

/** Starts the server and waits until its health check answers; throws with the end of its log if it does not. */
export async function startEmptyServer(timeoutMs = 150_000): Promise<EmptyServer> {
  if (await healthy()) throw new Error(`something already answers on ${emptyBaseURL}; set E2E_EMPTY_PORT to a free port`);
  const log = openSync(logFile, "w");
  // detached: its own process group, so stop() reaches the script and the `next start` it runs, as Playwright's webServer does
  const child: ChildProcess = spawn("bash", ["scripts/serve-e2e.sh"], { cwd: root, detached: true, stdio: ["ignore", log, log], env: { ...process.env, E2E_PORT: String(emptyPort), E2E_EMPTY: "1" } });
  closeSync(log);
  const exited = new Promise<void>((resolve) => child.once("exit", () => resolve()));
  let done = false;
  void exited.then(() => (done = true));
  const stop = async () => {
    if (done || child.pid === undefined) return;
    // SIGTERM to the group: serve-e2e.sh stops the app and its mail and S3 sinks (its trap)
    process.kill(-child.pid, "SIGTERM");
    await Promise.race([exited, new Promise((r) => setTimeout(r, 20_000))]);
    if (!done) process.kill(-child.pid, "SIGKILL");
  };
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (await healthy()) return { stop };
    if (done) break;
    await new Promise((r) => setTimeout(r, 500));
  }
  await stop();
  throw new Error(`the empty-database server on ${emptyBaseURL} did not start; its log ends:\n${readFileSync(logFile, "utf8").slice(-3000)}`);
}
