// components.schemas of the OpenAPI document, generated from the zod schemas the handlers parse with
// (zod 4's z.toJSONSchema over a registry, so shared schemas become $refs instead of copies).
import { z } from "zod";
import { catalogFileSchema, idSchema, inputTypeSchema, reportSchema } from "@/lib/catalog/schema";
import { analyzeRequestSchema, inputTypeRefSchema, loopSpecSchema } from "@/lib/loop";
import { addRoomSchema, siteCopySchema, siteInputSchema, siteStructureSchema, siteUpdateSchema } from "@/lib/sites/site-schema";
import { duplicateLayoutSchema } from "@/lib/layout/duplicate-schema";
import { calibrateSchema, moveItemSchema, placeItemSchema, saveRouteSchema } from "@/lib/plan/plan-schema";
import { acceptSchema, inviteSchema, joinSchema, roleChangeSchema } from "@/lib/members/member-schema";
import { changePasswordSchema, confirmEmailSchema, emailOnlySchema, resetPasswordSchema, signUpSchema } from "@/lib/auth/sign-up-schema";
import { organisationSettingsSchema } from "@/lib/organisation/settings-schema";
import { roles } from "@/lib/auth/permissions";
import { layoutDocumentSchema } from "@/lib/layout/schema";
import { bulkEditPatchSchema, createDetectorFormSchema, updateDetectorFormSchema } from "@/lib/schedule/schema";
import { archiveLayoutSchema, createLayoutSchema, restoreSchema, saveLayoutSchema, suggestRequestSchema } from "@/lib/layout/layout-request-schema";
import { deleteDetectorsSchema, importRequestSchema } from "@/lib/schedule/schedule-request-schema";
import { catalogUploadFormSchema, MAX_UPLOAD_BYTES, uploadFileFieldSchema } from "@/lib/catalog/upload-schema";
import { chooseLayoutSchema, commentSchema, reviewActionSchema } from "@/lib/review/review-schema";
import { sendSheetSchema } from "@/lib/sheet/sheet-request-schema";
import { recordReadingSchema } from "@/lib/commissioning/commissioning-schema";
import { findingSchema, loopAnalysisJsonSchema, readingJsonSchema, resistorUseSchema } from "./loop-analysis-schema";

export type JsonSchema = Record<string, unknown>;

export const REF = (id: string) => ({ $ref: `#/components/schemas/${id}` });

export const errorBodySchema = z
  .object({
    error: z.string().meta({ description: "One plain sentence saying what went wrong." }),
    issues: z
      .array(
        z.strictObject({
          path: z.string().meta({ description: 'Dotted path into the request body, e.g. "loop.cable.lengthM"; "(body)" for the body as a whole.' }),
          message: z.string(),
        }),
      )
      .optional()
      .meta({ description: "One entry per invalid field (422)." }),
  })
  .meta({ description: "The one error shape of every route." });

const siteSummarySchema = z.strictObject({
  id: z.number().int(),
  name: z.string(),
  address: z.string(),
  description: z.string(),
  archivedAt: z.iso.datetime().nullable(),
  updatedAt: z.iso.datetime(),
});
const namedNode = { id: z.number().int(), name: z.string() };
const siteAreaSchema = z.strictObject({ ...namedNode, floorId: z.number().int(), rooms: z.array(z.strictObject(namedNode)) });
const siteDetailSchema = siteSummarySchema.extend({
  contactName: z.string(),
  contactPhone: z.string(),
  contactEmail: z.string(),
  notes: z.string(),
  installers: z.array(z.strictObject({ userId: z.number().int(), name: z.string(), email: z.string() })).meta({ description: "Assigned members who still have the installer role." }),
  floors: z.array(z.strictObject({ ...namedNode, areas: z.array(siteAreaSchema) })).meta({ description: "The floors in order, each with its areas and rooms in order." }),
  areas: z.array(siteAreaSchema).meta({ description: "Every area of every floor, in floor order: what a detector's area and room are chosen from." }),
});
const memberListSchema = z.strictObject({
  members: z.array(z.strictObject({ membershipId: z.number().int(), userId: z.number().int(), name: z.string(), email: z.string(), role: z.enum(roles) })),
  invitations: z.array(z.strictObject({ id: z.number().int(), email: z.string(), role: z.enum(roles), expiresAt: z.iso.datetime() })),
});
const healthSchema = z.strictObject({
  status: z.enum(["ok", "degraded"]),
  database: z.strictObject({ state: z.enum(["up", "down"]), latencyMs: z.number().nonnegative().optional() }),
});
const inputTypeListSchema = z.strictObject({
  inputTypes: z.array(inputTypeSchema),
});

/** Component name → zod schema. Every name here becomes `#/components/schemas/<name>`. */
export const namedSchemas: Record<string, z.ZodType> = {
  Id: idSchema,
  Report: reportSchema,
  InputType: inputTypeSchema,
  InputTypeList: inputTypeListSchema,
  LoopSpec: loopSpecSchema,
  AnalyzeRequest: analyzeRequestSchema,
  Reading: readingJsonSchema,
  Finding: findingSchema,
  ResistorUse: resistorUseSchema,
  LoopAnalysis: loopAnalysisJsonSchema,
  Error: errorBodySchema,
  SiteInput: siteInputSchema,
  SiteUpdate: siteUpdateSchema,
  SiteSummary: siteSummarySchema,
  SiteDetail: siteDetailSchema,
  SiteStructure: siteStructureSchema,
  PlanCalibration: calibrateSchema,
  PlanItemPlacement: placeItemSchema,
  PlanItemMove: moveItemSchema,
  PlanRoute: saveRouteSchema,
  RoomAdd: addRoomSchema,
  SiteCopy: siteCopySchema,
  LayoutDuplicate: duplicateLayoutSchema,
  Invitation: inviteSchema,
  InvitationAcceptance: acceptSchema,
  RoleChange: roleChangeSchema,
  InvitationJoin: joinSchema,
  SignUp: signUpSchema,
  EmailConfirmation: confirmEmailSchema,
  EmailOnly: emailOnlySchema,
  PasswordReset: resetPasswordSchema,
  PasswordChange: changePasswordSchema,
  OrganisationSettings: organisationSettingsSchema,
  MemberList: memberListSchema,
  Health: healthSchema,
  Catalog: catalogFileSchema,
  LayoutDocument: layoutDocumentSchema,
  LayoutCreate: createLayoutSchema,
  LayoutSave: saveLayoutSchema,
  LayoutRestore: restoreSchema,
  SuggestionRequest: suggestRequestSchema,
  DetectorCreate: createDetectorFormSchema,
  DetectorUpdate: updateDetectorFormSchema,
  ScheduleBulkEdit: bulkEditPatchSchema,
  ScheduleDelete: deleteDetectorsSchema,
  ScheduleImport: importRequestSchema,
  CatalogUploadForm: catalogUploadFormSchema,
  Comment: commentSchema,
  ReviewStep: reviewActionSchema,
  LayoutChoice: chooseLayoutSchema,
  SheetSend: sendSheetSchema,
  LayoutArchive: archiveLayoutSchema,
  ReadingRecord: recordReadingSchema,
};

/** Replaces what zod wrote for a schema with a hand-written description (for what JSON Schema can't say). */
function replace(target: JsonSchema, by: JsonSchema) {
  for (const k of Object.keys(target)) delete target[k];
  Object.assign(target, by);
}

export function componentSchemas(): Record<string, JsonSchema> {
  const registry = z.registry<{ id: string }>();
  for (const [id, schema] of Object.entries(namedSchemas)) registry.add(schema, { id });
  const { schemas } = z.toJSONSchema(registry, {
    // Requests are described as a client writes them (defaults optional); responses have no defaults.
    io: "input",
    target: "draft-2020-12",
    // Refinements (cross-field rules) can't be written in JSON Schema; the 422 issues name them.
    unrepresentable: "any",
    uri: (id) => `#/components/schemas/${id}`,
    override: (ctx) => {
      // inputType is parsed by a transform: an id, or a whole input type.
      if (ctx.zodSchema === inputTypeRefSchema)
        replace(ctx.jsonSchema as JsonSchema, {
          description: "An input type id from the caller's catalog (shipped plus the organisation's upload), or a whole input type.",
          oneOf: [REF("Id"), REF("InputType")],
        });
      // The upload's file part: a File-like check in zod, a YAML text part on the wire.
      if (ctx.zodSchema === uploadFileFieldSchema) replace(ctx.jsonSchema as JsonSchema, { type: "string", contentMediaType: "text/yaml", description: `The .yaml file, at most ${MAX_UPLOAD_BYTES / 1024} KiB.` });
    },
  });
  const out: Record<string, JsonSchema> = {};
  for (const [id, s] of Object.entries(schemas)) {
    const { $schema: _s, $id: _i, ...rest } = s as JsonSchema;
    out[id] = rest;
  }
  return out;
}
