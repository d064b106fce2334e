import { afterEach, describe, expect, it, vi } from "vitest";
import { readingsUrl, sendReading } from "@/components/commissioning/send-reading";
import type { QueuedReading } from "@/components/commissioning/reading-queue";

// One reading from the waiting list to the server, through the shared browser client: what each answer means for the list.

const q: QueuedReading = { clientId: "c-1", boardKey: "panel", input: 3, test: "cut", reading: "OL", queuedAt: "2026-12-01T09:00:00.000Z", attempts: 0, lastError: null };

function answer(status: number, body: unknown) {
  const calls: { url: string; init: RequestInit }[] = [];
  vi.stubGlobal("fetch", async (url: string, init: RequestInit) => {
    calls.push({ url, init });
    return new Response(typeof body === "string" ? body : JSON.stringify(body), { status, headers: { "content-type": "application/json" } });
  });
  return calls;
}

afterEach(() => vi.unstubAllGlobals());

describe("sending a kept reading", () => {
  it("posts the reading as typed, with its client id, and turns an open reading back into Infinity", async () => {
    const calls = answer(201, { reading: { id: 9, test: "cut", reading: { kind: "open", ohms: "Infinity" } }, verdict: { verdict: "pass" }, created: true });
    const out = await sendReading(7, q);
    expect(calls).toHaveLength(1);
    expect(calls[0].url).toBe(readingsUrl(7));
    expect(calls[0].init.method).toBe("POST");
    expect(JSON.parse(String(calls[0].init.body))).toEqual({ clientId: "c-1", boardKey: "panel", input: 3, test: "cut", reading: "OL" });
    expect(out.kind).toBe("saved");
    expect(out.kind === "saved" && out.result.reading.reading).toEqual({ kind: "open", ohms: Infinity });
  });

  it("takes a refusal (422) as final, with the field issues in the reason", async () => {
    answer(422, { error: "Some fields are not valid.", issues: [{ path: "reading", message: "not a meter reading" }] });
    expect(await sendReading(7, q)).toEqual({ kind: "refused", error: "Some fields are not valid. Reading: not a meter reading" });
  });

  it("takes a closed record (409) as final", async () => {
    answer(409, { error: "Revision 1 is already commissioned; its record is closed." });
    expect(await sendReading(7, q)).toEqual({ kind: "refused", error: "Revision 1 is already commissioned; its record is closed." });
  });

  it("keeps the reading for another try when the database does not answer (503)", async () => {
    answer(503, { error: "The database is not answering." });
    expect(await sendReading(7, q)).toEqual({ kind: "retry", error: "The database is not answering." });
  });

  it("keeps the reading for another try when there is no network", async () => {
    vi.stubGlobal("fetch", async () => {
      throw new TypeError("Failed to fetch");
    });
    expect(await sendReading(7, q)).toEqual({ kind: "retry", error: "no connection to the server" });
  });

  it("keeps the reading when a 2xx answer does not show it stored", async () => {
    answer(200, "<html>a proxy's page</html>");
    expect((await sendReading(7, q)).kind).toBe("retry");
  });
});
