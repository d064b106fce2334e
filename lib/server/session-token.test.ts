import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { decode as nextAuthDecode, encode as nextAuthEncode } from "next-auth/jwt";
import { decodeSessionToken, encodeSessionToken } from "./session-token";

const secret = "test-secret-for-session-tokens-0123456789";

describe("session tokens in next-auth's own format, the derived key kept", () => {
  it("next-auth reads the tokens written here, and this reads next-auth's, for any claims", async () => {
    await fc.assert(
      fc.asyncProperty(fc.integer({ min: 1, max: 2 ** 31 }), fc.integer({ min: 1, max: 2 ** 31 }), fc.nat(1000), fc.constantFrom("", "loopwright.session"), async (userId, organisationId, sessionVersion, salt) => {
        const claims = { userId, organisationId, sessionVersion, role: "designer" };
        const ours = await encodeSessionToken({ token: claims, secret, salt, maxAge: 3600 });
        expect(await nextAuthDecode({ token: ours, secret, salt })).toMatchObject(claims);
        const theirs = await nextAuthEncode({ token: claims, secret, salt, maxAge: 3600 });
        expect(await decodeSessionToken({ token: theirs, secret, salt })).toMatchObject(claims);
      }),
      { numRuns: 25 },
    );
  });

  it("sets an expiry maxAge seconds ahead, a fresh id and the issue time", async () => {
    const before = Math.floor(Date.now() / 1000);
    const a = await decodeSessionToken({ token: await encodeSessionToken({ token: { userId: 1 }, secret, maxAge: 600 }), secret });
    const b = await decodeSessionToken({ token: await encodeSessionToken({ token: { userId: 1 }, secret, maxAge: 600 }), secret });
    expect(a!.exp! - a!.iat!).toBe(600);
    expect(a!.iat!).toBeGreaterThanOrEqual(before);
    expect(a!.jti).not.toBe(b!.jti);
  });

  it("refuses a token under another secret or salt, an altered one and an expired one", async () => {
    const token = await encodeSessionToken({ token: { userId: 7 }, secret, maxAge: 600 });
    await expect(decodeSessionToken({ token, secret: `${secret}-other` })).rejects.toThrow();
    await expect(decodeSessionToken({ token, secret, salt: "other" })).rejects.toThrow();
    const parts = token.split(".");
    parts[3] = parts[3].slice(0, -2) + (parts[3].endsWith("AA") ? "BB" : "AA"); // the ciphertext
    await expect(decodeSessionToken({ token: parts.join("."), secret })).rejects.toThrow();
    // expired past next-auth's 15 s clock tolerance
    const old = await encodeSessionToken({ token: { userId: 7 }, secret, maxAge: -60 });
    await expect(decodeSessionToken({ token: old, secret })).rejects.toThrow();
    expect(await decodeSessionToken({ token: undefined, secret })).toBeNull();
  });
});
