// Runs once when a server instance starts: a missing or malformed secret stops it here, with its name.
export async function register() {
  if (process.env.NEXT_RUNTIME === "nodejs") {
    const { env } = await import("@/lib/server/env");
    env();
  }
}
