import "server-only";
import { ApiError } from "./errors";
import { checkRequestOrigin } from "@/lib/http/same-origin";

/**
 * The app's own origin: NEXTAUTH_URL (the public origin, always set in a configured app). Only without it,
 * the request's own Host — never alongside it, since a rebinding attacker's page sends its own name as Host.
 */
export function appOrigin(headers: Headers): string {
  const configured = process.env.NEXTAUTH_URL;
  if (configured) {
    try {
      return new URL(configured).origin;
    } catch {
      // a malformed setting is reported by env(); fall through to the Host
    }
  }
  const proto = headers.get("x-forwarded-proto")?.split(",")[0].trim() === "https" ? "https" : "http";
  return `${proto}://${headers.get("host") ?? "localhost"}`;
}

/** 403 for a state-changing request whose Origin (or Referer) names another site: a forged request. */
export function refuseForeignOrigin(req: { method: string; headers: Headers }): void {
  const verdict = checkRequestOrigin(req.method, req.headers, appOrigin(req.headers));
  if (!verdict.ok)
    throw new ApiError(403, `This request came from another site (${verdict.reason}) and was refused: changes are accepted only from Loopwright's own pages.`);
}
