import { z } from "zod";

// Single source of truth for the catalog's types. Units are in the field names:
// Ohms, Ma (milliamps), Volts, Ah, M (metres), Pct (percent).

export const idSchema = z
  .string()
  .regex(/^[a-z0-9][a-z0-9-]{1,62}$/, "ids are lower-case letters, digits and dashes, 2–63 characters");

const ohms = z.number().positive().finite();
const milliamps = z.number().nonnegative().finite();

export const wiringSchemeSchema = z.enum(["none", "single-eol", "double-eol", "shared"]);
export type WiringScheme = z.infer<typeof wiringSchemeSchema>;

/** What the panel makes of a reading. `active-a`/`active-b`/`active-both` only on shared inputs. */
export const reportSchema = z.enum(["short", "normal", "active", "active-a", "active-b", "active-both", "open", "trouble"]);
export type Report = z.infer<typeof reportSchema>;

/** One band: readings from `fromOhms` (inclusive) up to `toOhms` (exclusive) give `report`. `toOhms: null` is infinity. */
export const bandSchema = z.strictObject({
  report: reportSchema,
  fromOhms: z.number().nonnegative().finite(),
  toOhms: z.number().positive().finite().nullable(),
});
export type Band = z.infer<typeof bandSchema>;

/** Bands must start at 0, be contiguous and ascending, and end at infinity. */
export const bandTableSchema = z
  .array(bandSchema)
  .min(2)
  .superRefine((bands, ctx) => {
    if (bands[0] && bands[0].fromOhms !== 0) ctx.addIssue({ code: "custom", path: [0, "fromOhms"], message: "the first band must start at 0 Ω" });
    bands.forEach((b, i) => {
      if (b.toOhms !== null && b.toOhms <= b.fromOhms)
        ctx.addIssue({ code: "custom", path: [i, "toOhms"], message: `band ends (${b.toOhms} Ω) at or below its start (${b.fromOhms} Ω)` });
      const next = bands[i + 1];
      if (next) {
        if (b.toOhms === null) ctx.addIssue({ code: "custom", path: [i, "toOhms"], message: "only the last band may run to infinity (null)" });
        else if (next.fromOhms !== b.toOhms)
          ctx.addIssue({
            code: "custom",
            path: [i + 1, "fromOhms"],
            message: next.fromOhms < b.toOhms ? `bands overlap: starts at ${next.fromOhms} Ω, the band before ends at ${b.toOhms} Ω` : `gap between bands: ${b.toOhms} Ω to ${next.fromOhms} Ω`,
          });
      } else if (b.toOhms !== null) ctx.addIssue({ code: "custom", path: [i, "toOhms"], message: "the last band must run to infinity (null)" });
    });
  });

export const inputTypeSchema = z.strictObject({
  id: idSchema,
  name: z.string().min(1).max(120),
  description: z.string().max(2000),
  schemes: z.array(wiringSchemeSchema).min(1),
  /** Series end-of-line value (single EOL, the series part of double EOL, and the line resistor of a shared input). */
  eolOhms: ohms.optional(),
  /** Double end-of-line: the resistor across the contact. */
  alarmOhms: ohms.optional(),
  /** Shared input: the resistor across detector A's and detector B's contact; must differ. */
  sharedOhms: z.tuple([ohms, ohms]).optional(),
  /** One band table per supported scheme. */
  bands: z.partialRecord(wiringSchemeSchema, bandTableSchema),
  tolerancePct: z.number().positive().max(20),
  maxLoopOhms: ohms,
  /** Whether life-safety (fire) devices may be wired to this input type at all. */
  lifeSafety: z.boolean().default(false),
  /** The input also watches its loop for a core touching earth (reported as trouble). */
  earthFaultMonitor: z.boolean().optional(),
});
export type InputType = z.infer<typeof inputTypeSchema>;

const priced = {
  id: idSchema,
  name: z.string().min(1).max(120),
  description: z.string().max(2000),
  listPrice: z.number().nonnegative().finite(),
};

export const inputBlockSchema = z.strictObject({ count: z.number().int().min(1).max(256), inputType: idSchema });

/** Zone types (trade words): what the panel does when a zone's detector reports. */
export const zoneTypeSchema = z.enum(["instant", "entry-exit", "24-hour", "hold-up", "fire", "tamper", "technical"]);
export type ZoneType = z.infer<typeof zoneTypeSchema>;

/** How an output switches its load: a relay contact or a transistor (open-collector) stage. */
export const outputSwitchingSchema = z.enum(["relay", "transistor"]);
export type OutputSwitching = z.infer<typeof outputSwitchingSchema>;

/** A block of outputs alike: the siren output(s) or programmable outputs, each rated `ratingMa`. */
export const outputBlockSchema = z.strictObject({
  purpose: z.enum(["siren", "programmable"]),
  count: z.number().int().min(1).max(64),
  switching: outputSwitchingSchema,
  ratingMa: milliamps,
});
export type OutputBlock = z.infer<typeof outputBlockSchema>;

export const panelSchema = z.strictObject({
  ...priced,
  family: idSchema,
  onboardInputs: inputBlockSchema,
  maxZones: z.number().int().positive(),
  bus: z.strictObject({
    maxDevices: z.number().int().nonnegative(),
    addressMin: z.number().int().nonnegative(),
    addressMax: z.number().int().nonnegative(),
    maxCableM: z.number().positive(),
  }),
  auxOutputMa: milliamps,
  sirenOutputMa: milliamps,
  ownStandbyMa: milliamps,
  ownAlarmMa: milliamps,
  maxBatteryAh: z.number().positive(),
  supplyVolts: z.number().positive().max(60),
  minDeviceVolts: z.number().positive().max(60),
  /** Battery voltage at the end of the standby period; default `defaultEndOfDischargeVolts(supplyVolts)`. */
  endOfDischargeVolts: z.number().positive().max(60).optional(),
  /** The panel's own outputs, siren first; absent means one relay siren output rated `sirenOutputMa`. */
  outputs: z.array(outputBlockSchema).max(8).optional(),
  /** Areas the panel sets and unsets apart; absent means 1. */
  maxAreas: z.number().int().min(1).max(64).optional(),
  /** Characters of a zone's name the keypad shows; absent means the label is not checked. */
  zoneLabelLength: z.number().int().min(4).max(64).optional(),
  /** Zone types the panel offers; absent means all. */
  zoneTypes: z.array(zoneTypeSchema).min(1).optional(),
});
export type Panel = z.infer<typeof panelSchema>;

/**
 * Lead-acid standby batteries: float at 2.3 V per cell (13.8 V on a 12 V battery), end of discharge at
 * 1.75 V per cell (10.5 V) at the low rates of alarm standby (typical practice, from memory). A supply
 * without its own figure is taken as lead-acid at that ratio of its charging voltage.
 */
export const END_OF_DISCHARGE_RATIO = 1.75 / 2.3;
export function defaultEndOfDischargeVolts(chargingVolts: number): number {
  return chargingVolts * END_OF_DISCHARGE_RATIO;
}

export const ownSupplySchema = z.strictObject({ outputMa: milliamps, maxBatteryAh: z.number().positive() });

export const expansionBoardSchema = z.strictObject({
  ...priced,
  families: z.array(idSchema).min(1),
  inputs: inputBlockSchema,
  standbyMa: milliamps,
  alarmMa: milliamps,
  takesBusAddress: z.boolean(),
  ownSupply: ownSupplySchema.optional(),
  /** Programmable outputs on the board, if any. */
  outputs: z.array(outputBlockSchema).max(8).optional(),
});
export type ExpansionBoard = z.infer<typeof expansionBoardSchema>;

export const keypadSchema = z.strictObject({
  ...priced,
  families: z.array(idSchema).min(1),
  inputs: inputBlockSchema.optional(),
  standbyMa: milliamps,
  alarmMa: milliamps,
  takesBusAddress: z.boolean(),
});
export type Keypad = z.infer<typeof keypadSchema>;

export const powerSupplySchema = z.strictObject({
  ...priced,
  families: z.array(idSchema).min(1),
  outputMa: milliamps,
  maxBatteryAh: z.number().positive(),
  standbyMa: milliamps,
  alarmMa: milliamps,
  takesBusAddress: z.boolean(),
  outputVolts: z.number().positive().max(60),
  /** Battery voltage at the end of the standby period; default `defaultEndOfDischargeVolts(outputVolts)`. */
  endOfDischargeVolts: z.number().positive().max(60).optional(),
});
export type PowerSupply = z.infer<typeof powerSupplySchema>;

export const detectorCategorySchema = z.enum([
  "door-contact",
  "window-contact",
  "motion",
  "glass-break",
  "vibration",
  "panic",
  "water",
  "temperature",
  "smoke",
  "heat",
]);
export type DetectorCategory = z.infer<typeof detectorCategorySchema>;

export const contactTypeSchema = z.enum(["NC", "NO"]);
export type ContactType = z.infer<typeof contactTypeSchema>;

export const detectorSchema = z.strictObject({
  ...priced,
  category: detectorCategorySchema,
  lifeSafety: z.boolean(),
  contact: contactTypeSchema,
  tamper: z.boolean(),
  power: z
    .strictObject({ standbyMa: milliamps, alarmMa: milliamps, minVolts: z.number().positive().max(60) })
    .nullable(),
  mounting: z.string().min(1).max(200),
});
export type Detector = z.infer<typeof detectorSchema>;

const deviceDraw = {
  /** Drawn from the output at rest and in alarm. */
  standbyMa: milliamps,
  alarmMa: milliamps,
  minVolts: z.number().positive().max(60),
};

export const sounderSchema = z.strictObject({
  ...priced,
  placement: z.enum(["internal", "external"]),
  ...deviceDraw,
  /** An external sounder with its own standby battery, charged from the output at rest. */
  ownBattery: z.strictObject({ chargingMa: milliamps }).optional(),
  mounting: z.string().min(1).max(200),
});
export type Sounder = z.infer<typeof sounderSchema>;

export const strobeSchema = z.strictObject({
  ...priced,
  ...deviceDraw,
  mounting: z.string().min(1).max(200),
});
export type Strobe = z.infer<typeof strobeSchema>;

export const outputModuleSchema = z.strictObject({
  ...priced,
  families: z.array(idSchema).min(1),
  outputs: z.array(outputBlockSchema).min(1).max(8),
  standbyMa: milliamps,
  alarmMa: milliamps,
  takesBusAddress: z.boolean(),
});
export type OutputModule = z.infer<typeof outputModuleSchema>;

export const wirelessReceiverSchema = z.strictObject({
  ...priced,
  families: z.array(idSchema).min(1),
  /** Wireless detectors it can learn. */
  maxDevices: z.number().int().min(1).max(256),
  standbyMa: milliamps,
  alarmMa: milliamps,
  takesBusAddress: z.boolean(),
});
export type WirelessReceiver = z.infer<typeof wirelessReceiverSchema>;

/** A battery-powered detector reporting by radio to a wireless receiver: no loop, no current from the system. */
export const wirelessDetectorSchema = z.strictObject({
  ...priced,
  category: detectorCategorySchema,
  lifeSafety: z.boolean(),
  tamper: z.boolean(),
  /** Years on one set of cells, at the maker's stated use. */
  batteryYears: z.number().positive().max(20),
  mounting: z.string().min(1).max(200),
});
export type WirelessDetector = z.infer<typeof wirelessDetectorSchema>;

export const catalogFileSchema = z.strictObject({
  inputTypes: z.array(inputTypeSchema).default([]),
  panels: z.array(panelSchema).default([]),
  expansionBoards: z.array(expansionBoardSchema).default([]),
  keypads: z.array(keypadSchema).default([]),
  powerSupplies: z.array(powerSupplySchema).default([]),
  detectors: z.array(detectorSchema).default([]),
  sounders: z.array(sounderSchema).default([]),
  strobes: z.array(strobeSchema).default([]),
  outputModules: z.array(outputModuleSchema).default([]),
  wirelessReceivers: z.array(wirelessReceiverSchema).default([]),
  wirelessDetectors: z.array(wirelessDetectorSchema).default([]),
});
export type CatalogFile = z.infer<typeof catalogFileSchema>;

/** A whole validated catalog (the shipped files merged, or shipped + an organisation's upload). */
export type Catalog = CatalogFile;
export const catalogKinds = [
  "inputTypes",
  "panels",
  "expansionBoards",
  "keypads",
  "powerSupplies",
  "detectors",
  "sounders",
  "strobes",
  "outputModules",
  "wirelessReceivers",
  "wirelessDetectors",
] as const;
export type CatalogKind = (typeof catalogKinds)[number];

/** A catalog stored before a kind existed (a frozen revision's copy) with every kind's list present. */
export function completeCatalog(c: Partial<Catalog>): Catalog {
  return Object.fromEntries(catalogKinds.map((k) => [k, c[k] ?? []])) as unknown as Catalog;
}
