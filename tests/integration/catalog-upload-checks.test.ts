import { readFileSync } from "node:fs";
import { beforeAll, describe, expect, it } from "vitest";
import { testDb, makeOrganisation } from "./support";
import { cleanFileName, previewUpload, readCatalogUploadForm } from "@/lib/server/catalogs";
import { MAX_UPLOAD_BYTES } from "@/lib/catalog/upload-schema";

const good = readFileSync("tests/fixtures/catalog/good-upload.yaml");

/** A real multipart request, as a browser's FormData would send it. */
function uploadRequest(bytes: Uint8Array | string, name: string, type = "application/yaml", fields: Record<string, string> = {}) {
  const form = new FormData();
  for (const [k, v] of Object.entries(fields)) form.append(k, v);
  form.append("file", new File([typeof bytes === "string" ? bytes : new Uint8Array(bytes)], name, { type }));
  return new Request("http://localhost/api/catalog/uploads", { method: "POST", body: form });
}

const refusal = (p: Promise<unknown>, status: number, message: RegExp) => expect(p).rejects.toMatchObject({ status, message: expect.stringMatching(message) });

beforeAll(() => {
  testDb();
});

describe("the upload form", () => {
  it("reads a good file with its mode, size and text", async () => {
    const form = await readCatalogUploadForm(uploadRequest(good, "good-upload.yaml", "application/yaml", { mode: "store", baseVersion: "3" }));
    expect(form.mode).toBe("store");
    expect(form.baseVersion).toBe(3);
    expect(form.file.fileName).toBe("good-upload.yaml");
    expect(form.file.sizeBytes).toBe(good.length);
    expect(form.file.text).toBe(good.toString("utf8"));
    // ?preview=1 wins over the form field, and a form without mode previews
    expect((await readCatalogUploadForm(uploadRequest(good, "a.yaml", "text/yaml", { mode: "store" }), { preview: "1" })).mode).toBe("preview");
    expect((await readCatalogUploadForm(uploadRequest(good, "a.yml", "text/plain"))).mode).toBe("preview");
  });

  it("previews through the form end to end, against the organisation in the database", async () => {
    const { org } = await makeOrganisation();
    const form = await readCatalogUploadForm(uploadRequest(good, "good-upload.yaml", ""));
    const preview = await previewUpload(org.id, form.file);
    expect(preview.diff?.added).toEqual([{ kind: "detectors", id: "custom-beam-outdoor" }]);
  });

  it("refuses a form without a file, or with an unknown mode (422)", async () => {
    const empty = new FormData();
    empty.append("mode", "preview");
    await refusal(readCatalogUploadForm(new Request("http://localhost/x", { method: "POST", body: empty })), 422, /not valid/);
    await refusal(readCatalogUploadForm(uploadRequest(good, "a.yaml", "application/yaml", { mode: "replace-all" })), 422, /not valid/);
  });

  it("refuses a body that is not multipart (415)", async () => {
    const req = new Request("http://localhost/x", { method: "POST", body: good.toString("utf8"), headers: { "content-type": "application/yaml" } });
    await refusal(readCatalogUploadForm(req), 415, /multipart/);
  });
});

describe("content checks", () => {
  it("refuses NUL bytes (415)", async () => {
    const bytes = new Uint8Array([...good.subarray(0, 40), 0, ...good.subarray(40)]);
    await refusal(readCatalogUploadForm(uploadRequest(bytes, "nul.yaml")), 415, /NUL byte \(at byte 41\)/);
  });

  it("refuses ZIP, PDF, PNG and gzip files by their magic numbers, whatever the name says (415)", async () => {
    // leading bytes: ZIP local file header "PK\x03\x04" (PKWARE APPNOTE), "%PDF" (ISO 32000), PNG signature (RFC 2083), gzip 1f 8b (RFC 1952)
    const cases: [number[], RegExp][] = [
      [[0x50, 0x4b, 0x03, 0x04, 0x14, 0x00], /ZIP/],
      [[0x25, 0x50, 0x44, 0x46, 0x2d, 0x31, 0x2e, 0x37], /PDF/],
      [[0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a], /PNG/],
      [[0x1f, 0x8b, 0x08, 0x00], /gzip/],
    ];
    for (const [magic, what] of cases) {
      const bytes = new Uint8Array([...magic, ...new TextEncoder().encode("detectors: []\n")]);
      await refusal(readCatalogUploadForm(uploadRequest(bytes, "catalog.yaml", "application/octet-stream")), 415, what);
    }
  });

  it("refuses bytes that are not UTF-8 (415) and drops a UTF-8 byte-order mark", async () => {
    await refusal(readCatalogUploadForm(uploadRequest(new Uint8Array([0x64, 0x3a, 0x20, 0xc3, 0x28, 0x0a]), "latin.yaml")), 415, /UTF-8/); // C3 28 is an invalid 2-byte sequence (RFC 3629)
    const withBom = await readCatalogUploadForm(uploadRequest(new Uint8Array([0xef, 0xbb, 0xbf, ...good]), "bom.yaml"));
    expect(withBom.file.text).toBe(good.toString("utf8"));
  });

  it("refuses other declared types and names that are not .yaml (415)", async () => {
    await refusal(readCatalogUploadForm(uploadRequest(good, "good.yaml", "image/png")), 415, /image\/png/);
    await refusal(readCatalogUploadForm(uploadRequest(good, "good.yaml", "text/yaml; charset=utf-16")), 415, /UTF-8/);
    await refusal(readCatalogUploadForm(uploadRequest(good, "good.txt", "text/plain")), 415, /\.yaml or \.yml/);
    await refusal(readCatalogUploadForm(uploadRequest(good, "good.yaml.exe", "application/octet-stream")), 415, /\.yaml or \.yml/);
  });

  it(`refuses files over ${MAX_UPLOAD_BYTES / 1024} KiB (413), whether the body or the file is over`, async () => {
    const padded = (n: number) => new TextEncoder().encode(`${good.toString("utf8")}${"#".repeat(n - good.length - 1)}\n`);
    const atLimit = await readCatalogUploadForm(uploadRequest(padded(MAX_UPLOAD_BYTES), "big.yaml"));
    expect(atLimit.file.sizeBytes).toBe(MAX_UPLOAD_BYTES);
    await refusal(readCatalogUploadForm(uploadRequest(padded(MAX_UPLOAD_BYTES + 1), "big.yaml")), 413, /at most 256 KiB/);
    await refusal(readCatalogUploadForm(uploadRequest(padded(4 * MAX_UPLOAD_BYTES), "huge.yaml")), 413, /at most 256 KiB/);
    const declared = new Request("http://localhost/x", { method: "POST", body: "x", headers: { "content-type": "multipart/form-data; boundary=b", "content-length": String(10 * MAX_UPLOAD_BYTES) } });
    await refusal(readCatalogUploadForm(declared), 413, /too large/);
  });

  it("strips directory parts from the file name and refuses names that stay unsafe", async () => {
    for (const [raw, clean] of [
      ["../../etc/catalog.yaml", "catalog.yaml"],
      ["/var/lib/catalog.yml", "catalog.yml"],
      ["C:\\fakepath\\Our profiles.yaml", "Our profiles.yaml"],
      ["..\\..\\boot.yaml", "boot.yaml"],
    ])
      expect(cleanFileName(raw)).toBe(clean);
    expect((await readCatalogUploadForm(uploadRequest(good, "../../../tmp/good-upload.yaml"))).file.fileName).toBe("good-upload.yaml");
    expect(() => cleanFileName("../")).toThrow(/no name/);
    expect(() => cleanFileName("..")).toThrow(/not a YAML file/);
    expect(() => cleanFileName(".hidden.yaml")).toThrow(/Rename the file/);
    expect(() => cleanFileName('say"hi".yaml')).toThrow(/Rename the file/);
    expect(() => cleanFileName("tab\there.yaml")).toThrow(/control characters/);
    expect(() => cleanFileName(`${"x".repeat(200)}.yaml`)).toThrow(/at most 120/);
  });
});
