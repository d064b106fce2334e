import { execFileSync, spawn } from "node:child_process";
import { existsSync, readdirSync, readFileSync } from "node:fs";
import { createServer } from "node:net";
import { join } from "node:path";

// The production server started from a test or a bench (next start on a free loopback port), and a fetch
// client with one cookie jar that signs in through next-auth's credentials endpoint.

export async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = createServer();
    s.once("error", reject);
    s.listen(0, "127.0.0.1", () => {
      const { port } = s.address() as { port: number };
      s.close(() => resolve(port));
    });
  });
}

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** Builds into `distDir` when it holds no build yet (scripts/test.sh builds before the integration tests). */
export function ensureBuild(root: string, distDir: string) {
  if (!existsSync(join(root, distDir, "BUILD_ID"))) execFileSync("npx", ["next", "build"], { cwd: root, env: { ...process.env, NEXT_DIST_DIR: distDir }, stdio: "inherit", timeout: 900_000 });
}

export interface RunningServer {
  base: string;
  log(): string;
  stop(): void;
  /** CPU time (user + system) the server's processes have used so far, ms; NaN where /proc is not there. */
  cpuMs(): number;
}

// /proc/<pid>/stat counts CPU time in USER_HZ ticks, which the Linux kernel fixes at 100 per second for user
// space on every common architecture (from memory; proc(5), times(2))
const USER_HZ = 100;

/** User + system CPU time of every live process in process group `pgid`, ms (Linux /proc; 10 ms resolution at 100 Hz). */
export function processGroupCpuMs(pgid: number): number {
  try {
    let ticks = 0;
    for (const d of readdirSync("/proc")) {
      if (!/^\d+$/.test(d)) continue;
      let stat: string;
      try {
        stat = readFileSync(`/proc/${d}/stat`, "utf8");
      } catch {
        continue; // ended meanwhile
      }
      // fields after the command name (which may hold spaces): state ppid pgrp ... utime(14) stime(15)
      const f = stat.slice(stat.lastIndexOf(")") + 2).split(" ");
      if (Number(f[2]) === pgid) ticks += Number(f[11]) + Number(f[12]);
    }
    return (ticks * 1000) / USER_HZ;
  } catch {
    return NaN;
  }
}

/**
 * `next start` in its own process group on a free port; resolves once GET /api/health answers 200. With
 * `processes`, the production start's cluster launcher (scripts/serve-every-core.mjs) with that many app processes instead.
 */
export async function startServer(opts: { root: string; distDir: string; databaseUrl: string; secret: string; env?: Record<string, string>; processes?: number }): Promise<RunningServer> {
  const port = await freePort();
  const base = `http://127.0.0.1:${port}`;
  let log = "";
  const listen = ["--hostname", "127.0.0.1", "--port", String(port)];
  const [cmd, args] = opts.processes ? [process.execPath, ["scripts/serve-every-core.mjs", ...listen]] : ["npx", ["next", "start", ...listen]];
  const child = spawn(cmd, args, {
    cwd: opts.root,
    env: {
      ...process.env,
      DATABASE_URL: opts.databaseUrl,
      NEXTAUTH_URL: base,
      NEXTAUTH_SECRET: opts.secret,
      NEXT_DIST_DIR: opts.distDir,
      LOOPWRIGHT_DEV_OUTBOX: "0",
      ...(opts.processes ? { LOOPWRIGHT_APP_PROCESSES: String(opts.processes) } : {}),
      ...opts.env,
    },
    detached: true,
    stdio: ["ignore", "pipe", "pipe"],
  });
  child.stdout?.on("data", (d) => (log += d));
  child.stderr?.on("data", (d) => (log += d));
  const stop = () => {
    if (child.pid && child.exitCode === null)
      try {
        process.kill(-child.pid, "SIGTERM");
      } catch {
        // already gone
      }
  };
  for (let i = 0; i < 240; i++) {
    if (await fetch(`${base}/api/health`).then((r) => r.status === 200, () => false)) return { base, log: () => log, stop, cpuMs: () => processGroupCpuMs(child.pid!) };
    if (child.exitCode !== null) break;
    await sleep(250);
  }
  stop();
  throw new Error(`next start did not answer on ${base}:\n${log.slice(-3000)}`);
}

export interface ClientResponse {
  status: number;
  text: string;
  json: any; // eslint-disable-line @typescript-eslint/no-explicit-any
}

/** fetch with one cookie jar (the next-auth session). */
export class CookieClient {
  private cookies = new Map<string, string>();
  constructor(readonly base: string) {}

  cookieHeader(): string {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join("; ");
  }

  async request(path: string, init: { method?: string; json?: unknown; form?: Record<string, string> } = {}): Promise<ClientResponse> {
    const headers: Record<string, string> = { cookie: this.cookieHeader() };
    let body: string | undefined;
    if (init.json !== undefined) {
      headers["content-type"] = "application/json";
      body = JSON.stringify(init.json);
    } else if (init.form) {
      headers["content-type"] = "application/x-www-form-urlencoded";
      body = new URLSearchParams(init.form).toString();
    }
    const res = await fetch(this.base + path, { method: init.method ?? "GET", headers, body, redirect: "manual" });
    for (const c of res.headers.getSetCookie()) {
      const [pair] = c.split(";");
      const i = pair.indexOf("=");
      this.cookies.set(pair.slice(0, i), pair.slice(i + 1));
    }
    const text = await res.text();
    let json: unknown = null;
    try {
      json = JSON.parse(text);
    } catch {
      json = null;
    }
    return { status: res.status, text, json };
  }

  /** This client presents the other's cookies from now on (another instance, the same session). */
  adoptCookies(other: CookieClient): this {
    this.cookies = new Map(other.cookies);
    return this;
  }

  /** One sign-in attempt through next-auth's credentials endpoint: the error it names, or null when signed in. */
  async attemptSignIn(email: string, password: string): Promise<{ status: number; error: string | null }> {
    const csrf = await this.request("/api/auth/csrf");
    const res = await this.request("/api/auth/callback/credentials", { method: "POST", form: { csrfToken: csrf.json.csrfToken, email, password, json: "true", callbackUrl: "/" } });
    const url = typeof res.json?.url === "string" ? new URL(res.json.url, this.base) : null;
    return { status: res.status, error: url?.searchParams.get("error") ?? (res.status === 200 ? null : res.text.slice(0, 200)) };
  }

  async signIn(email: string, password: string): Promise<void> {
    const res = await this.attemptSignIn(email, password);
    const session = await this.request("/api/auth/session");
    if (res.status !== 200 || res.error || !(session.json?.userId > 0)) throw new Error(`sign-in of ${email} failed: ${res.status} ${res.error ?? ""}`);
  }

  /** next-auth's sign-out (POST /api/auth/signout with its CSRF token). */
  async signOut(): Promise<ClientResponse> {
    const csrf = await this.request("/api/auth/csrf");
    return this.request("/api/auth/signout", { method: "POST", form: { csrfToken: csrf.json.csrfToken, json: "true", callbackUrl: "/" } });
  }
}
