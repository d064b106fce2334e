import { z } from "zod";
import { idSchema, wiringSchemeSchema } from "@/lib/catalog/schema";
import { scheduleDetectorIdSchema } from "@/lib/schedule/schema";

// The layout document: what is saved as a revision. Hardware chosen, detectors assigned to inputs.

/** The board key of the control panel's own inputs. */
export const PANEL_KEY = "panel";

export const boardKindSchema = z.enum(["expansion", "keypad", "supply"]);
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

export const layoutDocumentSchema = z
  .strictObject({
    panelId: idSchema,
    boards: z.array(layoutBoardSchema).max(256),
    inputs: z.array(layoutInputSchema).max(5000),
    power: layoutPowerSchema,
    /** Total data bus cable length, metres. */
    busCableM: z.number().nonnegative().max(100000),
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
  });
export type LayoutDocument = z.infer<typeof layoutDocumentSchema>;

export interface InputRef {
  boardKey: string;
  input: number;
}
