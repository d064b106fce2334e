import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import S3rver from "s3rver";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createStorage, storageConfigFromEnv, type Storage } from "@/lib/server/storage";

// Photo storage through the AWS S3 SDK against a local fake S3 server (s3rver) on a free loopback port.
let server: S3rver;
let store: Storage;
let dir: string;

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), "lw-s3-"));
  server = new S3rver({ port: 0, address: "127.0.0.1", directory: dir, silent: true, configureBuckets: [{ name: "lw-test-photos" }] });
  const { port } = await server.run();
  store = createStorage(storageConfigFromEnv({ S3_ENDPOINT: `http://127.0.0.1:${port}`, S3_BUCKET: "lw-test-photos", S3_ACCESS_KEY: "S3RVER", S3_SECRET_KEY: "S3RVER" }));
});

afterAll(async () => {
  await server?.close();
  rmSync(dir, { recursive: true, force: true });
});

describe("photo storage on a fake S3 server", () => {
  it("stores an object and reads back the same bytes and content type", async () => {
    const bytes = new Uint8Array(300_000);
    for (let i = 0; i < bytes.length; i++) bytes[i] = (i * 7919) % 256;
    bytes.set([0xff, 0xd8, 0xff]);
    await store.putObject("org-1/layout-2/photo-3.jpg", bytes, "image/jpeg");
    const back = await store.getObject("org-1/layout-2/photo-3.jpg");
    expect(back).not.toBeNull();
    expect(back!.contentType).toBe("image/jpeg");
    expect(back!.size).toBe(bytes.length);
    expect(Buffer.compare(back!.body, Buffer.from(bytes))).toBe(0);
  });
  it("gives null for a missing key, and deletes", async () => {
    expect(await store.getObject("org-1/none.jpg")).toBeNull();
    await store.putObject("org-1/gone.png", Uint8Array.from([0x89, 0x50]), "image/png");
    await store.deleteObject("org-1/gone.png");
    expect(await store.getObject("org-1/gone.png")).toBeNull();
  });
  it("refuses keys that are not the server's own", async () => {
    for (const k of ["../x", "/abs", "a//b", "a/../b", "a b"]) await expect(store.putObject(k, new Uint8Array([1]), "image/jpeg")).rejects.toThrow(/not a storage key/);
  });
  it("stops at start-up with the names of missing settings", () => {
    expect(() => storageConfigFromEnv({ S3_BUCKET: "ok-bucket" })).toThrow(/S3_ACCESS_KEY/);
  });
});
