import { readFileSync } from "node:fs";
import { createHash } from "node:crypto";
import { beforeAll, describe, expect, it } from "vitest";
import { testDb, makeOrganisation } from "./support";
import { checkUploadFile, effectiveCatalogFor, effectiveCatalogInfo, findCatalogEntry, listUploads, previewUpload, storeUpload, uploadText, type UploadFile } from "@/lib/server/catalogs";
import { shippedCatalog } from "@/lib/catalog/shipped";
import { AuditEntry, OrganisationCatalog } from "@/models";

const fixture = (name: string) => readFileSync(`tests/fixtures/catalog/${name}`, "utf8");
const asUpload = (fileName: string, text = fixture(fileName)): UploadFile => checkUploadFile({ name: fileName, type: "application/yaml", bytes: new TextEncoder().encode(text) });

const counts = async (organisationId: number) => ({
  versions: await OrganisationCatalog.count({ where: { organisationId } }),
  audits: await AuditEntry.count({ where: { organisationId, action: "catalog.upload" } }),
});

beforeAll(() => {
  testDb();
});

describe("previewUpload", () => {
  it("shows the diff against the shipped catalog and stores nothing", async () => {
    const { org } = await makeOrganisation();
    const preview = await previewUpload(org.id, asUpload("good-upload.yaml"));
    expect(preview.ok).toBe(true);
    expect(preview.errors).toEqual([]);
    expect(preview.baseVersion).toBe(0);
    expect(preview.diff?.added).toEqual([{ kind: "detectors", id: "custom-beam-outdoor" }]);
    expect(preview.diff?.changed).toEqual([{ kind: "detectors", id: "contact-door-surface", paths: ["listPrice"] }]);
    expect(preview.diff?.removed).toEqual([]);
    expect(preview.overridden).toEqual([{ kind: "detectors", id: "contact-door-surface" }]);
    expect(preview.sha256).toBe(createHash("sha256").update(fixture("good-upload.yaml")).digest("hex"));
    expect(await counts(org.id)).toEqual({ versions: 0, audits: 0 });
  });

  it("refuses a bad file with the loader's line-numbered errors", async () => {
    const { org } = await makeOrganisation();
    const preview = await previewUpload(org.id, asUpload("bad-upload.yaml"));
    expect(preview.ok).toBe(false);
    expect(preview.diff).toBeNull();
    // the two mistakes written into the fixture, at the lines its comment names
    expect(preview.errors.map((e) => [e.file, e.line, e.path])).toEqual([
      ["bad-upload.yaml", 3, "detectors.0.mounting"],
      ["bad-upload.yaml", 12, "detectors.0.power.standbyMa"],
    ]);
  });
});

describe("storeUpload", () => {
  it("stores nothing for a bad file: no version row, no audit entry", async () => {
    const { org, actors } = await makeOrganisation();
    const totalBefore = await OrganisationCatalog.count();
    await expect(storeUpload(actors.engineer, asUpload("bad-upload.yaml"))).rejects.toMatchObject({ status: 422, extra: { errors: expect.arrayContaining([expect.objectContaining({ line: 12 })]) } });
    // an upload that parses alone but breaks the merged catalog: an id the shipped catalog uses for another kind
    const clash = fixture("good-upload.yaml").replace("id: custom-beam-outdoor", "id: input-2k2");
    await expect(storeUpload(actors.engineer, asUpload("clash.yaml", clash))).rejects.toMatchObject({ status: 422 });
    expect(await counts(org.id)).toEqual({ versions: 0, audits: 0 });
    expect(await OrganisationCatalog.count()).toBe(totalBefore);
    expect(await effectiveCatalogFor(org.id)).toBe(shippedCatalog().catalog);
  });

  it("numbers versions 1, 2, ... and keeps the older ones downloadable, with an audit entry each", async () => {
    const { org, actors } = await makeOrganisation();
    const first = await storeUpload(actors.engineer, asUpload("good-upload.yaml"));
    expect(first.upload).toMatchObject({ version: 1, fileName: "good-upload.yaml", uploadedBy: { userId: actors.engineer.userId, name: actors.engineer.name } });
    const second = await storeUpload(actors.admin, asUpload("second-upload.yaml"), { baseVersion: 1 });
    expect(second.upload.version).toBe(2);
    // the second file's diff is against the first upload, not the shipped catalog
    expect(second.diff.added).toEqual([{ kind: "inputTypes", id: "custom-input-6k8" }]);
    expect(second.diff.removed).toEqual([{ kind: "detectors", id: "custom-beam-outdoor" }]);
    expect(second.diff.changed).toEqual([{ kind: "detectors", id: "contact-door-surface", paths: ["listPrice"] }]);

    const list = await listUploads(org.id);
    expect(list.map((u) => u.version)).toEqual([2, 1]);
    expect((await uploadText(org.id, first.upload.id)).text).toBe(fixture("good-upload.yaml"));
    expect((await uploadText(org.id, second.upload.id)).text).toBe(fixture("second-upload.yaml"));

    const audits = await AuditEntry.findAll({ where: { organisationId: org.id, action: "catalog.upload" }, order: [["id", "ASC"]] });
    expect(audits.map((a) => [a.entityId, (a.detail as { version: number }).version, a.userId])).toEqual([
      [String(first.upload.id), 1, actors.engineer.userId],
      [String(second.upload.id), 2, actors.admin.userId],
    ]);
  });

  it("refuses a store made against a stale preview (409) and stores nothing", async () => {
    const { org, actors } = await makeOrganisation();
    await storeUpload(actors.engineer, asUpload("good-upload.yaml"), { baseVersion: 0 });
    await expect(storeUpload(actors.admin, asUpload("second-upload.yaml"), { baseVersion: 0 })).rejects.toMatchObject({ status: 409 });
    expect(await counts(org.id)).toEqual({ versions: 1, audits: 1 });
  });

  it("gives concurrent uploads consecutive versions (the organisation row is locked)", async () => {
    const { org, actors } = await makeOrganisation();
    const texts = ["a", "b", "c", "d"].map((s) => fixture("good-upload.yaml").replace("listPrice: 96", `listPrice: 96 # ${s}`));
    const stored = await Promise.all(texts.map((t, i) => storeUpload(actors.engineer, asUpload(`v${i}.yaml`, t))));
    expect(stored.map((s) => s.upload.version).sort()).toEqual([1, 2, 3, 4]);
    expect(await counts(org.id)).toEqual({ versions: 4, audits: 4 });
  });
});

describe("the effective catalog of an organisation", () => {
  it("uses the organisation's latest upload, for that organisation alone", async () => {
    const a = await makeOrganisation("A");
    const b = await makeOrganisation("B");
    const shipped = shippedCatalog().catalog;
    const door = (c: { detectors: { id: string; listPrice: number }[] }) => c.detectors.find((d) => d.id === "contact-door-surface")?.listPrice;

    await storeUpload(a.actors.engineer, asUpload("good-upload.yaml"));
    const afterFirst = await effectiveCatalogFor(a.org.id);
    expect(afterFirst.detectors.map((d) => d.id)).toContain("custom-beam-outdoor");
    expect(door(afterFirst)).toBe(11);
    expect(afterFirst.detectors).toHaveLength(shipped.detectors.length + 1);
    // B still has the shipped catalog
    const other = await effectiveCatalogFor(b.org.id);
    expect(other.detectors.map((d) => d.id)).not.toContain("custom-beam-outdoor");
    expect(door(other)).toBe(door(shipped));

    // a cached result is reused until a new version is stored, then replaced
    expect(await effectiveCatalogFor(a.org.id)).toBe(afterFirst);
    await storeUpload(a.actors.admin, asUpload("second-upload.yaml"));
    const afterSecond = await effectiveCatalogFor(a.org.id);
    expect(afterSecond).not.toBe(afterFirst);
    expect(afterSecond.detectors.map((d) => d.id)).not.toContain("custom-beam-outdoor");
    expect(afterSecond.inputTypes.map((t) => t.id)).toContain("custom-input-6k8");
    expect(door(afterSecond)).toBe(12);

    const info = await effectiveCatalogInfo(a.org.id);
    expect(info.upload?.version).toBe(2);
    expect(info.added).toEqual([{ kind: "inputTypes", id: "custom-input-6k8" }]);
    expect((await findCatalogEntry(a.org.id, "contact-door-surface")).origin).toBe("overridden");
    expect((await findCatalogEntry(b.org.id, "contact-door-surface")).origin).toBe("shipped");
    await expect(findCatalogEntry(b.org.id, "custom-input-6k8")).rejects.toMatchObject({ status: 404 });
  });

  it("never gives one organisation's versions to another: 404, as for a missing id", async () => {
    const a = await makeOrganisation("A");
    const b = await makeOrganisation("B");
    const { upload } = await storeUpload(a.actors.engineer, asUpload("good-upload.yaml"));
    await expect(uploadText(b.org.id, upload.id)).rejects.toMatchObject({ status: 404 });
    await expect(uploadText(b.org.id, 2 ** 31 - 1)).rejects.toMatchObject({ status: 404 });
    expect(await listUploads(b.org.id)).toEqual([]);
    expect((await uploadText(a.org.id, upload.id)).fileName).toBe("good-upload.yaml");
  });

  it("falls back to the shipped catalog when a stored version no longer validates, and says so", async () => {
    const { org } = await makeOrganisation();
    // written directly, as if the shipped files had changed under a version stored earlier
    const text = fixture("good-upload.yaml").replace("id: custom-beam-outdoor", "id: panel-compact-8");
    await OrganisationCatalog.create({ organisationId: org.id, version: 1, fileName: "old.yaml", yamlText: text, sizeBytes: text.length, sha256: "0".repeat(64), uploadedBy: null });
    const info = await effectiveCatalogInfo(org.id);
    expect(info.catalog).toBe(shippedCatalog().catalog);
    expect(info.problem?.version).toBe(1);
    expect(info.problem?.errors[0]).toMatchObject({ file: "old.yaml", line: 4, path: "detectors.0.id" });
  });
});
