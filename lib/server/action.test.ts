import { defaultOrganisationSettings } from "@/lib/organisation/settings-schema";
import { beforeEach, describe, expect, it, vi } from "vitest";
import { z } from "zod";

// Server actions get the route wrapper's origin check: a call whose Origin (or Referer) is another site is
// refused before the session is read or the input parsed.
const state = vi.hoisted(() => ({ headers: new Headers(), actorCalls: 0 }));
vi.mock("next/headers", () => ({ headers: async () => state.headers }));
vi.mock("./session", () => ({
  requireActor: async () => {
    state.actorCalls++;
    return { userId: 1, organisationId: 1, organisationName: "Test", role: "admin", name: "Test", email: "t@test.example", settings: defaultOrganisationSettings };
  },
}));

const { action } = await import("./action");
const rename = action("site:write", z.object({ name: z.string() }), async (input) => input.name.toUpperCase());

describe("action()", () => {
  beforeEach(() => {
    vi.stubEnv("NEXTAUTH_URL", "http://localhost:3000");
    state.actorCalls = 0;
  });

  it("refuses a call from another origin with 403, before the session is read", async () => {
    for (const h of [{ origin: "https://evil.example" }, { origin: "null" }, { referer: "https://evil.example/x" }] as Record<string, string>[]) {
      state.headers = new Headers(h);
      const r = await rename({ name: "depot" });
      expect(r).toMatchObject({ ok: false, status: 403, error: expect.stringMatching(/another site/) });
    }
    expect(state.actorCalls).toBe(0);
  });

  it("runs a call from the app's own origin, and one with neither header", async () => {
    for (const h of [{ origin: "http://localhost:3000" }, {}] as Record<string, string>[]) {
      state.headers = new Headers(h);
      expect(await rename({ name: "depot" })).toEqual({ ok: true, data: "DEPOT" });
    }
  });
});
