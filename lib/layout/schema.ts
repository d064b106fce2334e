import { z } from "zod";
import { idSchema, wiringSchemeSchema, zoneTypeSchema } from "@/lib/catalog/schema";
import { cableGaugeSchema, scheduleGaugeRange } from "@/lib/loop/cable-gauge";
import { cableMSchema, scheduleDetectorIdSchema } from "@/lib/schedule/schema";

// The layout document: what is saved as a revision. Hardware chosen, detectors assigned to inputs.

/** The board key of the control panel's own inputs. */
export const PANEL_KEY = "panel";

export const boardKindSchema = z.enum(["expansion", "keypad", "supply", "outputs", "receiver"]);
export type BoardKind = z.infer<typeof boardKindSchema>;

export const boardKeySchema = z
  .string()
  .regex(/^[A-Za-z0-9_-]{1,40}$/, "board keys are 1–40 letters, digits, dashes or underscores")
  .refine((k) => k !== PANEL_KEY, `"${PANEL_KEY}" is reserved for the control panel`);

export const layoutBoardSchema = z.strictObject({
  key: boardKeySchema,
  kind: boardKindSchema,
  catalogId: idSchema,
  busAddress: z.number().int().nonnegative().nullable(),
  label: z.string().trim().min(1).max(80).optional(),
  /** Key of the supply board that powers this board; absent means the panel's auxiliary output. Ignored for a board with its own supply. */
  poweredBy: boardKeySchema.optional(),
});
export type LayoutBoard = z.infer<typeof layoutBoardSchema>;

export const placementSchema = z.enum(["at-detector", "at-panel", "loop-back"]);
/** NFPA 72 pathway class: "class-a" wires the loop out past every detector and back to the input's return terminals. */
export const pathwaySchema = z.enum(["class-b", "class-a"]);

const ohms = z.number().positive().finite();

export const layoutInputSchema = z.strictObject({
  /** `panel` for the panel's on-board inputs, else a board key. */
  boardKey: z.string().min(1).max(40),
  /** 1-based terminal pair number. */
  input: z.number().int().min(1).max(256),
  /** 0, 1, or 2 on a shared input. */
  detectorIds: z.array(scheduleDetectorIdSchema).max(2),
  scheme: wiringSchemeSchema,
  placement: placementSchema,
  /** Fitted values; absent means the input type's expected value. */
  eolOhms: ohms.optional(),
  alarmOhms: ohms.optional(),
  sharedOhms: z.tuple([ohms, ohms]).optional(),
  /** Absent means Class B (the loop ends at the last detector). */
  pathway: pathwaySchema.optional(),
});
export type LayoutInput = z.infer<typeof layoutInputSchema>;

export const safetyFactorSchema = z.number().min(1).max(2);

export const layoutPowerSchema = z.strictObject({
  standbyProfileId: z.string().min(1).max(64),
  /** Used by the `custom` profile. */
  customStandbyH: z.number().positive().max(240).optional(),
  customAlarmMin: z.number().nonnegative().max(240).optional(),
  /** 1.25 or 1.2 in the usual cases (see standby-profiles), any number from 1 to 2. */
  safetyFactor: safetyFactorSchema,
});
export type LayoutPower = z.infer<typeof layoutPowerSchema>;

/** EN 50131-1 security grade, 1 (low risk) to 4 (high risk). */
export const securityGradeSchema = z.number().int().min(1, "the security grade is 1 to 4").max(4, "the security grade is 1 to 4");
export type SecurityGrade = 1 | 2 | 3 | 4;

const itemKeySchema = z.string().regex(/^[A-Za-z0-9_-]{1,40}$/, "keys are 1–40 letters, digits, dashes or underscores");

/** An area: part of the site set and unset on its own, with the keypads that set it. */
export const layoutAreaSchema = z.strictObject({
  key: itemKeySchema,
  name: z.string().trim().min(1, "an area needs a name").max(80),
  keypadKeys: z.array(z.string().min(1).max(40)).max(64).optional(),
});
export type LayoutArea = z.infer<typeof layoutAreaSchema>;

/** Entry and exit times, seconds; the grade's limits are checked by the solver, this is only the field's range. */
const secondsSchema = z.number().int().min(0).max(600);

/** How one zone is programmed. A placed detector without an entry is an instant zone in the first area. */
export const zoneProgramSchema = z.strictObject({
  detectorId: scheduleDetectorIdSchema,
  type: zoneTypeSchema,
  areaKey: itemKeySchema.optional(),
  /** Set with the area's part-set (e.g. at night). */
  partSet: z.boolean().optional(),
  /** Entry/exit zones only. */
  entryS: secondsSchema.optional(),
  exitS: secondsSchema.optional(),
  /** Instant zones only: may open during the entry time without starting an alarm. */
  entryRoute: z.boolean().optional(),
  chime: z.boolean().optional(),
  /** The name keyed into the panel; absent means the detector's label. */
  keypadLabel: z.string().trim().min(1).max(64).optional(),
});
export type ZoneProgram = z.infer<typeof zoneProgramSchema>;

/** A sounder or strobe of this layout, with its cable run to the board whose output drives it. */
export const outputDeviceSchema = z.strictObject({
  id: itemKeySchema,
  kind: z.enum(["sounder", "strobe"]),
  catalogId: idSchema,
  label: z.string().trim().min(1, "a label is needed").max(80),
  cableM: cableMSchema,
  gauge: cableGaugeSchema.superRefine(scheduleGaugeRange),
});
export type OutputDevice = z.infer<typeof outputDeviceSchema>;

/** What one output drives: `output` numbers the board's outputs from 1, siren outputs first. */
export const layoutOutputSchema = z.strictObject({
  boardKey: z.string().min(1).max(40),
  output: z.number().int().min(1).max(256),
  deviceIds: z.array(itemKeySchema).max(16),
});
export type LayoutOutput = z.infer<typeof layoutOutputSchema>;

/** Wireless detectors of the schedule learnt by one wireless receiver (a board of kind "receiver"). */
export const wirelessLinkSchema = z.strictObject({
  boardKey: z.string().min(1).max(40),
  detectorIds: z.array(scheduleDetectorIdSchema).max(256),
});
export type WirelessLink = z.infer<typeof wirelessLinkSchema>;

export const layoutDocumentSchema = z
  .strictObject({
    panelId: idSchema,
    boards: z.array(layoutBoardSchema).max(256),
    inputs: z.array(layoutInputSchema).max(5000),
    power: layoutPowerSchema,
    /** Total data bus cable length, metres. */
    busCableM: z.number().nonnegative().max(100000),
    /** Absent: no grade chosen, and no grade rule applies. */
    grade: securityGradeSchema.optional(),
    areas: z.array(layoutAreaSchema).max(64).optional(),
    zones: z.array(zoneProgramSchema).max(5000).optional(),
    outputDevices: z.array(outputDeviceSchema).max(500).optional(),
    outputs: z.array(layoutOutputSchema).max(1000).optional(),
    wireless: z.array(wirelessLinkSchema).max(64).optional(),
  })
  .superRefine((doc, ctx) => {
    const keys = new Set<string>();
    doc.boards.forEach((b, i) => {
      if (keys.has(b.key)) ctx.addIssue({ code: "custom", path: ["boards", i, "key"], message: `board key ${b.key} is used twice` });
      keys.add(b.key);
    });
    const slots = new Set<string>();
    const placed = new Set<string>();
    doc.inputs.forEach((inp, i) => {
      if (inp.boardKey !== PANEL_KEY && !keys.has(inp.boardKey))
        ctx.addIssue({ code: "custom", path: ["inputs", i, "boardKey"], message: `no board with key ${inp.boardKey}` });
      const slot = `${inp.boardKey}#${inp.input}`;
      if (slots.has(slot)) ctx.addIssue({ code: "custom", path: ["inputs", i, "input"], message: `input ${inp.input} of ${inp.boardKey} appears twice` });
      slots.add(slot);
      inp.detectorIds.forEach((d, j) => {
        if (placed.has(d)) ctx.addIssue({ code: "custom", path: ["inputs", i, "detectorIds", j], message: `detector ${d} is placed twice` });
        placed.add(d);
      });
    });
    // The document is only self-consistent here; references to the catalog and the schedule are the solver's findings.
    const unique = (list: { key?: string; id?: string; detectorId?: string }[] | undefined, path: string, what: string) => {
      const seen = new Set<string>();
      list?.forEach((x, i) => {
        const k = x.key ?? x.id ?? x.detectorId ?? "";
        if (seen.has(k)) ctx.addIssue({ code: "custom", path: [path, i], message: `${what} ${k} appears twice` });
        seen.add(k);
      });
    };
    unique(doc.areas, "areas", "area");
    unique(doc.zones, "zones", "the zone of detector");
    unique(doc.outputDevices, "outputDevices", "sounder or strobe");
    const outputSlots = new Set<string>();
    doc.outputs?.forEach((o, i) => {
      const slot = `${o.boardKey}#${o.output}`;
      if (outputSlots.has(slot)) ctx.addIssue({ code: "custom", path: ["outputs", i, "output"], message: `output ${o.output} of ${o.boardKey} appears twice` });
      outputSlots.add(slot);
    });
  });
export type LayoutDocument = z.infer<typeof layoutDocumentSchema>;

/** The defaults of every optional part, for code that reads them. */
export function documentParts(doc: LayoutDocument): Required<Pick<LayoutDocument, "areas" | "zones" | "outputDevices" | "outputs" | "wireless">> {
  return { areas: doc.areas ?? [], zones: doc.zones ?? [], outputDevices: doc.outputDevices ?? [], outputs: doc.outputs ?? [], wireless: doc.wireless ?? [] };
}

export interface OutputRef {
  boardKey: string;
  output: number;
}

export interface InputRef {
  boardKey: string;
  input: number;
}
