import { describe, expect, it } from "vitest";
import { applyBulkEdit, bulkEditPatchSchema, createDetectorFormSchema, formatGauge, parseGauge, scheduleRowSchema, scheduleSchema, TEXT_LIMITS, updateDetectorFormSchema } from "@/lib/schedule/schema";
import { det } from "@/lib/solver/testing/fixture-schedule";

describe("schedule schemas", () => {
  it("parse gauges written as AWG or mm², and format them back", () => {
    expect(["22 AWG", "22awg", "AWG 24", "0.5 mm2", "0,75 mm²", ".22 mm2"].map(parseGauge)).toEqual([{ awg: 22 }, { awg: 22 }, { awg: 24 }, { mm2: 0.5 }, { mm2: 0.75 }, { mm2: 0.22 }]);
    expect(parseGauge("thick")).toBeNull();
    expect(formatGauge({ awg: 18 })).toBe("18 AWG");
    expect(formatGauge({ mm2: 1.5 })).toBe("1.5 mm2");
  });
  it("take the schedule's gauges only: whole AWG numbers 10 to 30, more than 0 and at most 10 mm²", () => {
    const row = { label: "Door", catalogId: "fx-door", area: "", room: "", cableM: 10, supervision: "single-eol" };
    const gauge = (g: unknown) => createDetectorFormSchema.safeParse({ ...row, gauge: g });
    for (const g of [{ awg: 10 }, { awg: 30 }, { mm2: 0.22 }, { mm2: 10 }]) expect(gauge(g).success, JSON.stringify(g)).toBe(true);
    for (const g of [{ awg: 9 }, { awg: 31 }, { awg: 22.5 }, { mm2: 0 }, { mm2: 10.5 }, { awg: 22, mm2: 0.5 }, { awg: "22" }]) expect(gauge(g).success, JSON.stringify(g)).toBe(false);
    expect(gauge({ awg: 40 }).error?.issues[0]).toMatchObject({ path: ["gauge", "awg"], message: "AWG must be a whole number from 10 to 30 (got 40)" });
  });
  it("limit the cable run to more than 0 m and at most 2000 m", () => {
    const row = { label: "Door", catalogId: "fx-door", area: "", room: "", gauge: { awg: 22 }, supervision: "single-eol" };
    expect(createDetectorFormSchema.safeParse({ ...row, cableM: "12.5" }).data?.cableM).toBe(12.5); // a form's text field
    expect(createDetectorFormSchema.safeParse({ ...row, cableM: 0 }).success).toBe(false);
    expect(createDetectorFormSchema.safeParse({ ...row, cableM: 2000 }).success).toBe(true);
    expect(createDetectorFormSchema.safeParse({ ...row, cableM: 2000.5 }).success).toBe(false);
  });
  it("refuse an empty update and a schedule with a repeated id", () => {
    expect(updateDetectorFormSchema.safeParse({}).success).toBe(false);
    expect(updateDetectorFormSchema.safeParse({ room: "Hall" }).success).toBe(true);
    expect(scheduleSchema.safeParse([det("a", "fx-door"), det("a", "fx-pir")]).error?.issues[0].message).toMatch(/used twice/);
  });
  it("apply a bulk edit to the named rows only", () => {
    const edit = bulkEditPatchSchema.parse({ ids: ["b"], patch: { area: "Upper", cableM: "30" } });
    const out = applyBulkEdit([det("a", "fx-door"), det("b", "fx-door")], edit);
    expect(out.map((d) => [d.id, d.area, d.cableM])).toEqual([["a", "Ground", 20], ["b", "Upper", 30]]);
  });
});

describe("text limits", () => {
  const row = { label: "Front door", catalogId: "contact-door-surface", area: "Ground floor", room: "Hall", cableM: 10, gauge: { awg: 22 }, supervision: "single-eol" as const };

  it("refuses a label, area or room over its limit with its length, and never cuts it", () => {
    for (const [field, max] of Object.entries(TEXT_LIMITS)) {
      const long = "x".repeat(max + 1);
      const r = scheduleRowSchema.safeParse({ ...row, [field]: long });
      expect(r.success, field).toBe(false);
      expect(r.error!.issues[0]).toMatchObject({ path: [field], message: `the ${field} is ${max + 1} characters long; at most ${max} are allowed` });
      const ok = scheduleRowSchema.safeParse({ ...row, [field]: "x".repeat(max) });
      expect(ok.success && ok.data[field as keyof typeof ok.data]).toBe("x".repeat(max));
    }
  });

  it("counts after trimming, as it is stored", () => {
    expect(scheduleRowSchema.safeParse({ ...row, label: `  ${"y".repeat(TEXT_LIMITS.label)}  ` }).success).toBe(true);
  });
});
