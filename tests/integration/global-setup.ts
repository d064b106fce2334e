import { execFileSync } from "node:child_process";

// Destructive tests run only against the local test database, which scripts/test.sh creates fresh.
export function assertTestDatabase(url = process.env.DATABASE_URL): string {
  if (!url) throw new Error("DATABASE_URL is not set; run integration tests through `npm test`.");
  const u = new URL(url.replace(/^mariadb:/, "http:"));
  if (!/^\/loopwright_test\w*$/.test(u.pathname) || !["127.0.0.1", "localhost"].includes(u.hostname))
    throw new Error(`Refusing to run destructive tests against ${u.hostname}${u.pathname}: only a local loopwright_test database is allowed.`);
  return url;
}

export default function setup() {
  assertTestDatabase();
  // The migration runner loads .ts migrations, so it runs under tsx rather than in Vitest's loader.
  execFileSync("npx", ["tsx", "scripts/migrate.ts"], { stdio: "inherit", env: process.env });
}
