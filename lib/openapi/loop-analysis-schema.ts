// The JSON form of a LoopAnalysis as `POST /api/loops/analyze` sends it: an open loop's ohms travel as the
// string "Infinity" (loopJsonReplacer). Strict objects, so a field added to the engine's types without a
// description here fails the schema test.
import { z } from "zod";
import { reportSchema } from "@/lib/catalog/schema";
import { findingTargetSchema } from "@/lib/loop";

export const ohmsJsonSchema = z
  .union([z.number().nonnegative(), z.literal("Infinity")])
  .meta({ description: 'Ohms; the string "Infinity" for an open circuit (JSON has no infinity).' });

export const detectorStateSchema = z.enum(["rest", "active", "tamper"]);
export const faultSchema = z.enum(["none", "short-panel", "short-detector", "cut"]);
const verdictSchema = z.enum(["detected", "mistaken", "defeat"]);

export const readingJsonSchema = z
  .strictObject({
    states: z.array(detectorStateSchema).meta({ description: "One state per detector, in the order of loop.detectors." }),
    fault: faultSchema,
    minOhms: ohmsJsonSchema,
    maxOhms: ohmsJsonSchema,
    reports: z.array(reportSchema).min(1).meta({ description: "Every report the interval touches, lowest band first." }),
    uncertain: z.boolean().meta({ description: "The interval straddles a band edge: the panel may report either side." }),
    marginOhms: ohmsJsonSchema.meta({ description: "Distance from the interval to the nearest band edge, ohms (0 when uncertain)." }),
    expected: reportSchema.meta({ description: "What a correctly supervised loop reports here." }),
    nominalOhms: ohmsJsonSchema.optional().meta({ description: "Parts at their marked values, cable at mid temperature." }),
    label: z.string().optional().meta({ description: 'Plain description, e.g. "a short across the pair at the detector end (all at rest)".' }),
  })
  .meta({ description: "One state × fault combination: the reading interval over part tolerance and cable temperature, and its report." });

export const findingSchema = z
  .strictObject({
    code: z.string().meta({ description: "Stable kebab-case code, e.g. short-reads-normal." }),
    severity: z.enum(["error", "warning", "note"]),
    message: z.string().meta({ description: "What is wrong, with the figures." }),
    why: z.string().meta({ description: "Why it matters, in plain words." }),
    target: findingTargetSchema,
  })
  .meta({ description: "Anything the loop engine or the solver reports." });

export const resistorUseSchema = z
  .strictObject({
    role: z.enum(["eol", "alarm", "shared-a", "shared-b"]),
    ohms: z.number().positive(),
    expectedOhms: z.number().positive().nullable().meta({ description: "What the input type expects, or null." }),
    preferred: z.strictObject({
      series: z.enum(["E12", "E24"]).nullable().meta({ description: "IEC 60063 series the value belongs to (E12 values are also E24), or null." }),
      nearest: z.array(z.number().positive()).meta({ description: "Nearest E24 values (the value itself when preferred)." }),
    }),
    bands: z.array(z.string()).meta({ description: "IEC 60062 colour bands, e.g. [yellow, violet, red, gold]; empty when the value has no colour code." }),
  })
  .meta({ description: "A resistor the loop carries: value, what the input type expects, preferred series and colour code." });

const coreSchema = z.enum(["yellow", "blue", "green", "white", "red", "black"]);
const conductorFaultJsonSchema = z
  .discriminatedUnion("kind", [
    z.strictObject({ kind: z.literal("short"), cores: z.tuple([coreSchema, coreSchema]), atM: z.number().nonnegative() }),
    z.strictObject({ kind: z.literal("open"), core: coreSchema, atM: z.number().nonnegative() }),
    z.strictObject({ kind: z.literal("earth"), core: coreSchema, atM: z.number().nonnegative() }),
    z.strictObject({ kind: z.literal("part-short"), part: z.enum(["contact", "tamper", "eol", "alarm", "shared-a", "shared-b"]), detector: z.number().int().nonnegative().optional() }),
  ])
  .meta({ description: "A conductor fault; atM is metres from the panel end (0) to the detector end." });
const conductorReadingJsonSchema = readingJsonSchema.omit({ fault: true });

export const conductorAnalysisJsonSchema = z
  .strictObject({
    cores: z.enum(["two-core", "four-core-loop-back", "four-core-alarm-tamper", "six-core-alarm-tamper"]),
    colours: z.array(coreSchema).meta({ description: "The cable's cores by colour (common practice, no published source)." }),
    faults: z.array(
      z.strictObject({
        fault: conductorFaultJsonSchema,
        label: z.string(),
        verdict: z.enum(["detected", "mistaken", "defeat", "not-supervised", "no-effect"]),
        rows: z.array(conductorReadingJsonSchema).meta({ description: "One reading per detector-state combination." }),
      }),
    ),
  })
  .meta({ description: "Conductor faults: a short between two cores, one core open, a core to earth, a short across one part." });

export const classAJsonSchema = z
  .strictObject({
    everyDeviceReported: z.boolean().meta({ description: "NFPA 72 Class A: each single open is reported and every detector still reports its alarm." }),
    opens: z.array(
      z.strictObject({
        core: coreSchema,
        atM: z.number().nonnegative().meta({ description: "Metres along the route out and back." }),
        label: z.string(),
        rest: conductorReadingJsonSchema,
        openReported: z.boolean().meta({ description: "The open reads as open or trouble at rest, so the panel knows to feed from both ends." }),
        devices: z.array(
          z.strictObject({
            detector: z.number().int().nonnegative(),
            side: z.enum(["out", "return"]).nullable().meta({ description: "The end the panel reaches the detector from; null when neither reports it." }),
            reading: conductorReadingJsonSchema,
            reported: z.boolean(),
          }),
        ),
      }),
    ),
  })
  .meta({ description: "Class A loops only: every single open and what is still reported." });

export const loopAnalysisJsonSchema = z
  .strictObject({
    rows: z.array(readingJsonSchema),
    findings: z.array(findingSchema),
    resistors: z.array(resistorUseSchema),
    faults: z
      .strictObject({ "short-panel": verdictSchema, "short-detector": verdictSchema, cut: verdictSchema })
      .meta({ description: "Per fault: detected as itself, mistaken for another report, or read as normal (defeat)." }),
    indistinguishable: z
      .array(z.tuple([z.number().int().nonnegative(), z.number().int().nonnegative()]))
      .meta({ description: "Pairs of row indices the panel can't tell apart." }),
    maxCableM: z.number().nonnegative().nullable().meta({ description: "Longest one-way run, metres, before any reading leaves its band (null: unlimited)." }),
    decode: z
      .array(
        z.strictObject({
          states: z.array(detectorStateSchema),
          minOhms: ohmsJsonSchema,
          maxOhms: ohmsJsonSchema,
          report: reportSchema,
          unique: z.boolean(),
        }),
      )
      .optional()
      .meta({ description: "Shared inputs only: the four state combinations and whether each decodes uniquely." }),
    valid: z.boolean().optional(),
    conductorOhms: z
      .strictObject({ minOhms: z.number().nonnegative(), maxOhms: z.number().nonnegative() })
      .optional()
      .meta({ description: "Resistance of the conductors in the loop path over the temperature range (four conductors for a loop-back resistor)." }),
    maxCableByLoopOhmsM: z.number().nonnegative().nullable().optional().meta({ description: "Longest one-way run, metres, within the input type's loop-resistance limit at the hottest temperature." }),
    sharedLost: z.array(z.string()).optional().meta({ description: "Shared inputs only: what is lost against one detector per input." }),
    conductors: conductorAnalysisJsonSchema.optional(),
    classA: classAJsonSchema.optional(),
  })
  .meta({ description: "Every state × fault reading of the loop, the verdicts, the findings and the resistors." });
