// Request schema for `POST /api/loops/analyze`: { inputType: InputType | inputTypeId, loop: LoopSpec, target? }.
// Shapes and types are checked here; every cross-field rule lives in loop-problems.ts so the engine and the
// API give the same words.
import { z } from "zod";
import { contactTypeSchema, idSchema, inputTypeSchema, wiringSchemeSchema, type InputType } from "@/lib/catalog/schema";
import type { FindingTarget } from "@/lib/findings";
import { cableGaugeSchema } from "./cable-gauge";
import { inputTypeProblems, loopShapeProblems } from "./loop-problems";
import { wiringProblems } from "./wiring-analysis";
import type { LoopSpec } from "./types";

export const placementSchema = z.enum(["at-detector", "at-panel", "loop-back"], {
  error: 'placement is "at-detector", "at-panel" or "loop-back"',
});

const num = (what: string) => z.number({ error: `${what} must be a number` });

export const cableSpecSchema = z.strictObject({
  gauge: cableGaugeSchema,
  lengthM: num("cable length"),
  tempMinC: num("minimum temperature"),
  tempMaxC: num("maximum temperature"),
});

export const loopDetectorSchema = z.strictObject({
  label: z.string().trim().min(1, "each detector needs a label").max(80, "a detector label is at most 80 characters"),
  contact: contactTypeSchema,
  tamper: z.boolean().default(false),
  lifeSafety: z.boolean().default(false),
});

const ohmsField = (what: string) => num(what).optional();

export const cableCoresSchema = z.enum(["two-core", "four-core-loop-back", "four-core-alarm-tamper", "six-core-alarm-tamper"], {
  error: 'cores is "two-core", "four-core-loop-back", "four-core-alarm-tamper" or "six-core-alarm-tamper"',
});
export const coreColourSchema = z.enum(["yellow", "blue", "green", "white", "red", "black"], { error: "a core is yellow, blue, green, white, red or black" });
export const loopPartSchema = z.enum(["contact", "tamper", "eol", "alarm", "shared-a", "shared-b"], {
  error: 'part is "contact", "tamper", "eol", "alarm", "shared-a" or "shared-b"',
});
const atM = num("the fault's position (metres from the panel)");
export const conductorFaultSchema = z.discriminatedUnion(
  "kind",
  [
    z.strictObject({ kind: z.literal("short"), cores: z.tuple([coreColourSchema, coreColourSchema]), atM }),
    z.strictObject({ kind: z.literal("open"), core: coreColourSchema, atM }),
    z.strictObject({ kind: z.literal("earth"), core: coreColourSchema, atM }),
    z.strictObject({ kind: z.literal("part-short"), part: loopPartSchema, detector: z.number().int("a detector index is a whole number").optional() }),
  ],
  { error: 'a conductor fault\'s kind is "short", "open", "earth" or "part-short"' },
);
const faultListSchema = z.array(conductorFaultSchema).max(200, "at most 200 conductor faults in one request");
/** "all", or a list of conductor faults; errors point into the list rather than at the union. */
export const conductorFaultsSchema = z.unknown().transform((v, ctx): "all" | z.output<typeof faultListSchema> => {
  if (v === "all") return "all";
  if (!Array.isArray(v)) {
    ctx.addIssue({ code: "custom", message: 'conductorFaults is "all" or a list of conductor faults' });
    return z.NEVER;
  }
  const r = faultListSchema.safeParse(v);
  if (!r.success) {
    for (const i of r.error.issues) ctx.addIssue({ code: "custom", path: i.path as (string | number)[], message: i.message });
    return z.NEVER;
  }
  return r.data;
});
export const pathwaySchema = z.enum(["class-b", "class-a"], { error: 'pathway is "class-b" or "class-a"' });

export const loopSpecSchema = z
  .strictObject({
    scheme: wiringSchemeSchema,
    placement: placementSchema.default("at-detector"),
    detectors: z.array(loopDetectorSchema),
    eolOhms: ohmsField("end-of-line resistor"),
    alarmOhms: ohmsField("alarm resistor"),
    sharedOhms: z.tuple([num("detector A's resistor"), num("detector B's resistor")]).optional(),
    tolerancePct: num("part tolerance"),
    cable: cableSpecSchema,
    contactOhms: num("contact resistance").default(0.05),
    shortOhms: num("short resistance").optional(),
    cores: cableCoresSchema.optional(),
    conductorFaults: conductorFaultsSchema.optional(),
    pathway: pathwaySchema.optional(),
  })
  .superRefine((loop, ctx) => {
    for (const p of loopShapeProblems(loop as LoopSpec)) ctx.addIssue({ code: "custom", path: p.path, message: p.message });
    for (const p of wiringProblems(loop as LoopSpec)) ctx.addIssue({ code: "custom", path: p.path, message: p.message });
  });

// The schema's output is exactly the engine's LoopSpec.
const _loopSpecCompatible: (x: z.output<typeof loopSpecSchema>) => LoopSpec = (x) => x;
void _loopSpecCompatible;

export const findingTargetSchema: z.ZodType<FindingTarget> = z.discriminatedUnion("kind", [
  z.strictObject({ kind: z.literal("layout") }),
  z.strictObject({ kind: z.literal("board"), boardKey: z.string().min(1) }),
  z.strictObject({ kind: z.literal("input"), boardKey: z.string().min(1), input: z.number().int().nonnegative() }),
  z.strictObject({ kind: z.literal("detector"), detectorId: z.string().min(1) }),
  z.strictObject({ kind: z.literal("supply"), supplyKey: z.string().min(1) }),
]);

/** An input type id, or a whole input type; the messages come from whichever was meant. */
export const inputTypeRefSchema = z.unknown().transform((v, ctx): string | InputType => {
  if (typeof v !== "string" && (typeof v !== "object" || v === null || Array.isArray(v))) {
    ctx.addIssue({ code: "custom", message: "inputType is required: an input type id (string) or a whole input type (object)" });
    return z.NEVER;
  }
  const r = typeof v === "string" ? idSchema.safeParse(v) : inputTypeSchema.safeParse(v);
  if (!r.success) {
    for (const i of r.error.issues) ctx.addIssue({ code: "custom", path: i.path as (string | number)[], message: i.message });
    return z.NEVER;
  }
  return r.data;
});

export const analyzeRequestSchema = z
  .strictObject({
    inputType: inputTypeRefSchema,
    loop: loopSpecSchema,
    target: findingTargetSchema.optional(),
  })
  .superRefine((body, ctx) => {
    if (typeof body.inputType !== "object" || body.inputType === null || !body.loop) return;
    for (const p of inputTypeProblems(body.loop as LoopSpec, body.inputType)) ctx.addIssue({ code: "custom", path: ["loop", ...p.path], message: p.message });
  });

export type AnalyzeRequest = z.output<typeof analyzeRequestSchema>;
