import { beforeAll, describe, expect, it } from "vitest";
import { testDb, makeOrganisation } from "./support";
import { checkUploadFile, storeUpload } from "@/lib/server/catalogs";
import { analyzeLoopFor, loopInputTypesFor } from "@/lib/server/loop-analysis";
import { shippedCatalog } from "@/lib/catalog/shipped";
import { analyzeRequestSchema } from "@/lib/loop";

// The loop API looks input types up in the caller's effective catalog: shipped plus the organisation's upload.

const upload = `inputTypes:
  - id: input-3k3-bench
    name: 3.3 kΩ input (test)
    description: An uploaded input type for the loop API test.
    schemes: [single-eol]
    eolOhms: 3300
    tolerancePct: 5
    maxLoopOhms: 100
    bands:
      single-eol:
        - { report: short, fromOhms: 0, toOhms: 1200 }
        - { report: trouble, fromOhms: 1200, toOhms: 2400 }
        - { report: normal, fromOhms: 2400, toOhms: 4400 }
        - { report: trouble, fromOhms: 4400, toOhms: 7000 }
        - { report: active, fromOhms: 7000, toOhms: null }
`;

const request = (inputType: string, scheme = "single-eol") =>
  analyzeRequestSchema.parse({
    inputType,
    loop: { scheme, detectors: [{ label: "Rear door", contact: "NC", tamper: true }], tolerancePct: 5, cable: { gauge: { awg: 22 }, lengthM: 80, tempMinC: 0, tempMaxC: 35 } },
  });

beforeAll(() => {
  testDb();
});

describe("loop analysis against the organisation's catalog", () => {
  it("offers the shipped input types to an organisation without an upload", async () => {
    const { org } = await makeOrganisation();
    const ids = (await loopInputTypesFor(org.id)).map((t) => t.id);
    expect(ids).toEqual(shippedCatalog().catalog.inputTypes.map((t) => t.id).sort());
  });

  it("analyses an uploaded input type by id for its organisation only; another organisation gets 404", async () => {
    const a = await makeOrganisation("Loop A");
    const b = await makeOrganisation("Loop B");
    await storeUpload(a.actors.engineer, checkUploadFile({ name: "bench.yaml", type: "application/yaml", bytes: new TextEncoder().encode(upload) }));
    expect((await loopInputTypesFor(a.org.id)).map((t) => t.id)).toContain("input-3k3-bench");
    expect((await loopInputTypesFor(b.org.id)).map((t) => t.id)).not.toContain("input-3k3-bench");

    const analysis = await analyzeLoopFor(a.org.id, request("input-3k3-bench"));
    expect(analysis.rows[0]).toMatchObject({ states: ["rest"], fault: "none", reports: ["normal"] });
    expect(analysis.resistors[0]).toMatchObject({ role: "eol", ohms: 3300, expectedOhms: 3300 });
    expect(analysis.faults["short-detector"]).toBe("detected");

    await expect(analyzeLoopFor(b.org.id, request("input-3k3-bench"))).rejects.toMatchObject({ status: 404, issues: [{ path: "inputType", message: 'no input type with id "input-3k3-bench"' }] });
  });

  it("refuses a scheme the input type does not support with 422 and the field's path", async () => {
    const { org } = await makeOrganisation();
    await expect(analyzeLoopFor(org.id, request("input-2k2-6k8", "single-eol"))).rejects.toMatchObject({
      status: 422,
      issues: expect.arrayContaining([{ path: "loop.scheme", message: expect.stringContaining("does not take single end-of-line wiring") }]),
    });
  });

  it("takes a six-core cable's conductor faults and answers each with its rows; a supply core on a two-core cable is a 422", async () => {
    const { org } = await makeOrganisation();
    const loop = { scheme: "single-eol", detectors: [{ label: "Rear door", contact: "NC", tamper: true }], tolerancePct: 5, cable: { gauge: { awg: 22 }, lengthM: 80, tempMinC: 0, tempMaxC: 35 } };
    const body = analyzeRequestSchema.parse({ inputType: "input-2k2", loop: { ...loop, cores: "six-core-alarm-tamper", conductorFaults: [{ kind: "open", core: "black", atM: 80 }, { kind: "short", cores: ["blue", "black"], atM: 0 }] } });
    const analysis = await analyzeLoopFor(org.id, body);
    expect(analysis.conductors!.colours).toEqual(["yellow", "blue", "green", "white", "red", "black"]);
    expect(analysis.conductors!.faults.map((f) => [f.label, f.verdict])).toEqual([
      ["the black core open at the detector end, cutting the detectors' supply", "mistaken"],
      ["a short between the blue and black cores at the panel end", "defeat"],
    ]);
    // as the request arrives, unparsed: the check runs inside
    const twoCore = { inputType: "input-2k2", loop: { ...loop, conductorFaults: [{ kind: "open", core: "red", atM: 10 }] } } as unknown as Parameters<typeof analyzeLoopFor>[1];
    await expect(analyzeLoopFor(org.id, twoCore)).rejects.toMatchObject({
      status: 422,
      issues: expect.arrayContaining([{ path: "loop.conductorFaults.0.core", message: expect.stringContaining("there is no red core in a two-core cable") }]),
    });
  });
});
