// The OpenAPI 3.1 description of Loopwright's HTTP API, served at GET /api/openapi.json.
// tests/unit/openapi-document.test.ts holds it against every route.ts under app/api.
import type { Permission } from "@/lib/auth/permissions";
import { permissionLabels, permissionTable } from "@/lib/auth/permissions";
import { componentSchemas, REF, type JsonSchema } from "./components";

type Method = "get" | "post" | "put" | "patch" | "delete";

interface OperationSpec {
  summary: string;
  description?: string;
  tag: string;
  /** null: public. */
  permission: Permission | null;
  pathParams?: { name: string; description: string; schema?: JsonSchema }[];
  query?: { name: string; description: string; schema: JsonSchema; required?: boolean }[];
  /** Component name of the JSON body. */
  body?: string;
  /** A body that is not JSON (e.g. a multipart upload). */
  bodyContent?: { contentType: string; schema: JsonSchema };
  ok: { status?: number; description: string; schema?: JsonSchema; contentType?: string };
  /** Error statuses beyond the ones every route gives (401/403 for signed-in routes, 422 with a body, 500). */
  errors?: number[];
}

const ERROR_WORDS: Record<number, string> = {
  400: "The body is not valid JSON.",
  401: "Not signed in.",
  403: "Signed in, but the role lacks the permission (the message names who has it).",
  404: "Nothing with that id in the caller's organisation (another organisation's ids read as missing).",
  409: "Conflicts with what exists.",
  413: "The body is too large for this route.",
  415: "The body is not sent as application/json.",
  422: "Some fields are not valid: `issues` lists each with its dotted path.",
  429: "Too many attempts; wait before trying again.",
  500: "Something went wrong on the server; details are logged, never sent.",
  503: "The database is not answering; a change may or may not have been stored.",
};

const errorResponse = (status: number) => ({ description: ERROR_WORDS[status] ?? "Refused.", content: { "application/json": { schema: REF("Error") } } });

function rolesOf(p: Permission): string {
  return (permissionTable[p] as readonly string[]).join(", ");
}

function operation(id: string, spec: OperationSpec): Record<string, unknown> {
  const statuses = new Set<number>(spec.errors ?? []);
  if (spec.permission) {
    statuses.add(401);
    statuses.add(403);
  }
  if (spec.body || spec.bodyContent) [400, 413, 415, 422].forEach((s) => statuses.add(s));
  if (spec.query) statuses.add(422);
  if (spec.pathParams?.length) statuses.add(404);
  statuses.add(500);
  const responses: Record<string, unknown> = {
    [String(spec.ok.status ?? 200)]: {
      description: spec.ok.description,
      ...(spec.ok.schema ? { content: { [spec.ok.contentType ?? "application/json"]: { schema: spec.ok.schema } } } : {}),
    },
  };
  for (const s of [...statuses].sort((a, b) => a - b)) responses[String(s)] = errorResponse(s);
  const access = spec.permission
    ? `Permission \`${spec.permission}\` (${permissionLabels[spec.permission]}): roles ${rolesOf(spec.permission)}.`
    : "Public: no session needed.";
  return {
    operationId: id,
    summary: spec.summary,
    description: [spec.description, access].filter(Boolean).join("\n\n"),
    tags: [spec.tag],
    ...(spec.permission ? { "x-permission": spec.permission } : { security: [] }),
    ...(spec.pathParams || spec.query
      ? {
          parameters: [
            ...(spec.pathParams ?? []).map((p) => ({ name: p.name, in: "path", required: true, description: p.description, schema: p.schema ?? { type: "integer", minimum: 1 } })),
            ...(spec.query ?? []).map((q) => ({ name: q.name, in: "query", required: q.required ?? false, description: q.description, schema: q.schema })),
          ],
        }
      : {}),
    ...(spec.body ? { requestBody: { required: true, content: { "application/json": { schema: REF(spec.body) } } } } : {}),
    ...(spec.bodyContent ? { requestBody: { required: true, content: { [spec.bodyContent.contentType]: { schema: spec.bodyContent.schema } } } } : {}),
    responses,
  };
}

const siteId = { name: "siteId", description: "A site of the caller's organisation." };
const membershipId = { name: "membershipId", description: "A membership of the caller's organisation." };
const layoutId = { name: "layoutId", description: "A layout of one of the caller's organisation's sites." };
const rev = { name: "rev", description: "A revision number of the layout (1 is the first)." };
const detectorId = { name: "detectorId", description: "A detector of the site's device schedule." };
const uploadId = { name: "uploadId", description: "A stored version of the organisation's catalog file." };
const entryId = { name: "entryId", description: "The id of a catalog entry (any kind).", schema: REF("Id") };
const floorId = { name: "floorId", description: "A floor of the site." };
const planId = { name: "planId", description: "A floor plan of the site." };
const itemId = { name: "itemId", description: "A device placed on one of the site's plans." };
const photoId = { name: "photoId", description: "A photo of the layout's commissioning record." };
const object = (description: string) => ({ description, schema: { type: "object" } });
const pdf = (description: string) => ({ description, schema: { type: "string", contentMediaType: "application/pdf" }, contentType: "application/pdf" });
const csv = (description: string) => ({ description, schema: { type: "string" }, contentType: "text/csv" });
const sizeQuery = { name: "size", description: "Paper size.", schema: { type: "string", enum: ["A4", "LETTER"] } };
const revisionQuery = { name: "revision", description: "A revision number; default: the approved revision (else the current one).", schema: { type: "integer", minimum: 1 } };
const layoutQuery = { name: "layoutId", description: "Which of the site's layouts.", schema: { type: "integer", minimum: 1 }, required: true };


/** Path → method → operation. Every route.ts under app/api must appear here. */
const PATHS: Record<string, Partial<Record<Method, [string, OperationSpec]>>> = {
  "/api/health": {
    get: ["getHealth", { tag: "service", summary: "The app answers; whether the database does", permission: null, ok: { description: "App and database up.", schema: REF("Health") }, errors: [503] }],
  },
  "/api/openapi.json": {
    get: ["getOpenApi", { tag: "service", summary: "This description of the API (OpenAPI 3.1)", permission: null, ok: { description: "The OpenAPI document.", schema: { type: "object" } } }],
  },
  "/api/auth/{nextauth}": {
    get: [
      "authGet",
      {
        tag: "session",
        summary: "Session endpoints of the sign-in library: session, csrf, providers, signout page",
        description: "The path after /api/auth/ may hold more than one segment (e.g. callback/credentials); browsers use these through the sign-in page.",
        permission: null,
        pathParams: [{ name: "nextauth", description: "session, csrf, providers, signin, signout, callback/credentials …", schema: { type: "string" } }],
        ok: { description: "Session JSON, or a redirect." },
      },
    ],
    post: [
      "authPost",
      {
        tag: "session",
        summary: "Sign in with e-mail and password, sign out (form posts with the CSRF token)",
        permission: null,
        pathParams: [{ name: "nextauth", description: "signin/credentials, callback/credentials, signout …", schema: { type: "string" } }],
        ok: { description: "A redirect, or JSON with the next URL." },
        errors: [429],
      },
    ],
  },
  "/api/sites": {
    get: ["listSites", { tag: "sites", summary: "The caller's organisation's sites; archived ones only when asked", permission: "site:read", query: [{ name: "archived", description: "exclude (default), include or only", schema: { type: "string", enum: ["exclude", "include", "only"] } }], ok: { description: "The sites, by name.", schema: { type: "object", properties: { sites: { type: "array", items: REF("SiteSummary") } }, required: ["sites"] } } }],
    post: ["createSite", { tag: "sites", summary: "Create a site with its details and its floors, areas and rooms", permission: "site:write", body: "SiteInput", ok: { description: "The new site.", schema: REF("SiteDetail") } }],
  },
  "/api/sites/{siteId}": {
    get: ["getSite", { tag: "sites", summary: "One site with its floors, areas, rooms and installers", permission: "site:read", pathParams: [siteId], ok: { description: "The site.", schema: REF("SiteDetail") } }],
    patch: ["updateSite", { tag: "sites", summary: "Change the site's details or its assigned installers", description: "installerUserIds replaces the assignment; each must be a member with the installer role (422 otherwise).", permission: "site:write", pathParams: [siteId], body: "SiteUpdate", ok: { description: "The site as saved.", schema: REF("SiteDetail") } }],
  },
  "/api/sites/{siteId}/plans": {
    get: ["listPlans", { tag: "plans", summary: "The site's floor plans with their scale and placed devices, and the cable routes with their runs", permission: "site:read", pathParams: [siteId], ok: object("{ plans, routes }.") }],
  },
  "/api/sites/{siteId}/floors/{floorId}/plan": {
    put: [
      "uploadPlan",
      {
        tag: "plans",
        summary: "Upload or replace the floor's plan",
        description: "PNG or JPEG by its bytes, at most 20 MiB and 100 million pixels; 201 when new, 200 when replaced. A replacement keeps the placed devices, and the scale only when the size in pixels is unchanged.",
        permission: "schedule:write",
        pathParams: [siteId, floorId],
        bodyContent: { contentType: "multipart/form-data", schema: { type: "object", properties: { file: { type: "string", contentMediaType: "image/*" } }, required: ["file"] } },
        ok: { status: 201, ...object("{ plan, replaced, scaleKept }.") },
      },
    ],
  },
  "/api/sites/{siteId}/plans/{planId}/image": {
    get: ["getPlanImage", { tag: "plans", summary: "The plan's drawing, as stored", permission: "site:read", pathParams: [siteId, planId], ok: { description: "The image.", schema: { type: "string" }, contentType: "image/*" } }],
  },
  "/api/sites/{siteId}/plans/{planId}/calibration": {
    put: ["calibratePlan", { tag: "plans", summary: "Set the plan's scale from two points and the real distance between them", description: "The distance is in the organisation's length unit (metres or feet). Routes crossing the plan are re-measured and their detectors' cable runs updated.", permission: "schedule:write", pathParams: [siteId, planId], body: "PlanCalibration", ok: object("{ plan, remeasured }.") }],
  },
  "/api/sites/{siteId}/plans/{planId}/items": {
    post: ["placePlanItem", { tag: "plans", summary: "Place a scheduled detector or another device on the plan", description: "A detector is placed once per site (409 when it already is).", permission: "schedule:write", pathParams: [siteId, planId], body: "PlanItemPlacement", ok: { status: 201, ...object("The placed device.") }, errors: [409] }],
  },
  "/api/sites/{siteId}/plan-items/{itemId}": {
    patch: ["movePlanItem", { tag: "plans", summary: "Move a placed device on its plan", permission: "schedule:write", pathParams: [siteId, itemId], body: "PlanItemMove", ok: object("The placed device.") }],
  },
  "/api/sites/{siteId}/plan-routes": {
    put: ["savePlanRoute", { tag: "plans", summary: "Save a device's cable route to its board, one leg per floor", description: "Replaces the device's earlier route. The run (plan length × each floor's scale + slack at each end + rise) becomes the detector's cable length, marked as measured on plan.", permission: "schedule:write", pathParams: [siteId], body: "PlanRoute", ok: object("The route and its run.") }],
  },
  "/api/sites/{siteId}/structure": {
    put: [
      "saveSiteStructure",
      {
        tag: "sites",
        summary: "Replace the ordered floors, areas and rooms",
        description: "A node with an id keeps it (renamed or moved, its detectors follow); without an id it is added; a node left out is removed. Removing a room or area detectors still name is refused (409 naming how many); ids of another site give 422.",
        permission: "site:write",
        pathParams: [siteId],
        body: "SiteStructure",
        ok: { description: "The site as saved.", schema: REF("SiteDetail") },
        errors: [409],
      },
    ],
  },
  "/api/sites/{siteId}/rooms": {
    post: ["addSiteRoom", { tag: "sites", summary: "Add one room to an area (the detector form's add a new room)", permission: "site:write", pathParams: [siteId], body: "RoomAdd", ok: { description: "The site as saved.", schema: REF("SiteDetail") }, errors: [409] }],
  },
  "/api/sites/{siteId}/archive": {
    post: ["archiveSite", { tag: "sites", summary: "Archive the site: hidden from the list, everything kept", permission: "site:archive", pathParams: [siteId], ok: { description: "The site as saved.", schema: REF("SiteDetail") }, errors: [409] }],
  },
  "/api/sites/{siteId}/restore": {
    post: ["restoreSite", { tag: "sites", summary: "Bring an archived site back into the list", permission: "site:archive", pathParams: [siteId], ok: { description: "The site as saved.", schema: REF("SiteDetail") }, errors: [409] }],
  },
  "/api/sites/{siteId}/copy": {
    post: ["copySite", { tag: "sites", summary: "A new site with this site's details, structure and device schedule (not its layouts)", permission: "schedule:write", pathParams: [siteId], body: "SiteCopy", ok: { description: "The new site.", schema: REF("SiteDetail") } }],
  },
  "/api/members": {
    get: ["listMembers", { tag: "members", summary: "Members and open invitations of the caller's organisation", permission: "members:read", ok: { description: "Members and invitations.", schema: REF("MemberList") } }],
    post: [
      "inviteMember",
      {
        tag: "members",
        summary: "Invite someone by e-mail with a role",
        permission: "members:manage",
        body: "Invitation",
        ok: { description: "The invitation was sent.", schema: { type: "object", properties: { email: { type: "string" }, role: { type: "string" } }, required: ["email", "role"] } },
        errors: [409],
      },
    ],
  },
  "/api/members/{membershipId}": {
    patch: ["changeRole", { tag: "members", summary: "Change a member's role", permission: "members:manage", pathParams: [membershipId], body: "RoleChange", ok: { description: "The role was changed.", schema: { type: "object" } }, errors: [409] }],
  },
  "/api/invitations/accept": {
    post: [
      "acceptInvitation",
      { tag: "members", summary: "The invitee sets a name and password with the e-mailed token", permission: null, body: "InvitationAcceptance", ok: { description: "Joined; the invitee can now sign in.", schema: { type: "object" } }, errors: [404, 409] },
    ],
  },
  "/api/invitations/join": {
    post: [
      "joinInvitation",
      { tag: "members", summary: "The signed-in account accepts an invitation to its own address; its password never changes, a changed role takes effect now", permission: "account:manage", body: "InvitationJoin", ok: { description: "Joined (or the role changed); the session moves to that organisation.", schema: { type: "object" } }, errors: [404, 409] },
    ],
  },
  "/api/sign-up": {
    post: ["signUp", { tag: "account", summary: "A new organisation and its first admin; the e-mail is confirmed through a mailed single-use link", permission: null, body: "SignUp", ok: { description: "The same answer whether or not the address has an account.", schema: { type: "object" } } }],
  },
  "/api/sign-up/confirm": {
    post: ["confirmEmail", { tag: "account", summary: "Confirms the e-mail address with the mailed token (once)", permission: null, body: "EmailConfirmation", ok: { description: "Confirmed; the account can sign in.", schema: { type: "object" } }, errors: [404] }],
  },
  "/api/sign-up/resend": {
    post: ["resendConfirmation", { tag: "account", summary: "A new confirmation link for an account waiting for it", permission: null, body: "EmailOnly", ok: { description: "The same answer for any address.", schema: { type: "object" } } }],
  },
  "/api/password/forgot": {
    post: ["forgotPassword", { tag: "account", summary: "Mails a single-use link to choose a new password, valid for one hour", permission: null, body: "EmailOnly", ok: { description: "The same answer for any address.", schema: { type: "object" } } }],
  },
  "/api/password/reset": {
    post: ["resetPassword", { tag: "account", summary: "Sets a new password with the mailed token; every session of the account ends", permission: null, body: "PasswordReset", ok: { description: "The password is set.", schema: { type: "object" } }, errors: [404] }],
  },
  "/api/account/password": {
    post: ["changePassword", { tag: "account", summary: "Changes the signed-in user's password; their other sessions end, this one is renewed", permission: "account:manage", body: "PasswordChange", ok: { description: "Changed; a renewed session cookie is set.", schema: { type: "object" } } }],
  },
  "/api/organisation": {
    get: ["getOrganisationSettings", { tag: "account", summary: "The organisation's settings", permission: "organisation:manage", ok: { description: "The settings.", schema: REF("OrganisationSettings") } }],
    patch: ["saveOrganisationSettings", { tag: "account", summary: "Saves the organisation's settings; one audit entry per changed setting", permission: "organisation:manage", body: "OrganisationSettings", ok: { description: "The saved settings.", schema: REF("OrganisationSettings") } }],
  },
  "/api/loops/analyze": {
    post: [
      "analyzeLoop",
      {
        tag: "loops",
        summary: "Analyse a loop: every state × fault reading, its report, the verdicts and the findings",
        description:
          "The body names an input type (an id from the caller's catalog, or a whole input type) and describes the loop as wired. " +
          "Impossible loops are refused with 422 and one issue per problem (e.g. `loop.cable.lengthM`: cable length can't be negative; " +
          "`loop.detectors`: a shared input takes exactly two detectors; `loop.scheme`: the input type does not support the scheme). " +
          'An unknown input type id gives 404. Open-loop readings are sent as the string "Infinity". ' +
          "Findings on smoke, heat and other life-safety devices carry the caution: local fire code, the authority having jurisdiction and licensed practice decide; Loopwright is an aid, not an approval.",
        permission: "loop:analyze",
        body: "AnalyzeRequest",
        ok: { description: "The analysis.", schema: REF("LoopAnalysis") },
        errors: [404],
      },
    ],
  },
  "/api/loops/input-types": {
    get: [
      "listLoopInputTypes",
      { tag: "loops", summary: "The input types a loop can be analysed against: the shipped catalog plus the organisation's upload", permission: "loop:analyze", ok: { description: "Input types, by id.", schema: REF("InputTypeList") } },
    ],
  },
  "/api/catalog": {
    get: [
      "getCatalog",
      {
        tag: "catalog",
        summary: "The organisation's effective catalog (shipped plus its latest upload) and where entries come from",
        permission: "catalog:read",
        ok: {
          description: "The catalog in use, the upload it comes from, entries added and overridden, and any problem with the latest upload.",
          schema: { type: "object", properties: { catalog: REF("Catalog"), upload: { type: ["object", "null"] }, added: { type: "array" }, overridden: { type: "array" }, problem: { type: ["object", "null"] } }, required: ["catalog"] },
        },
      },
    ],
  },
  "/api/catalog/{entryId}": {
    get: ["getCatalogEntry", { tag: "catalog", summary: "One entry of the effective catalog with its kind and origin", permission: "catalog:read", pathParams: [entryId], ok: object("The entry, its kind and whether it is shipped, added or overridden.") }],
  },
  "/api/catalog/uploads": {
    get: ["listCatalogUploads", { tag: "catalog", summary: "The stored versions of the organisation's catalog file, newest first", permission: "catalog:read", ok: object("{ uploads }: version, file name, size, SHA-256, who uploaded it, when.") }],
    post: [
      "uploadCatalog",
      {
        tag: "catalog",
        summary: "Upload a YAML catalog file: preview the changes, or store it as the next version",
        description: "`mode=preview` (or `?preview=1`) validates the file and shows the diff without storing; `mode=store` keeps it as the next version. A file that does not validate is refused with 422 and located errors; a store after another version came in gives 409.",
        permission: "catalog:upload",
        query: [{ name: "preview", description: "1 or true: preview whatever the form says.", schema: { type: "string", enum: ["0", "1", "true", "false"] } }],
        bodyContent: { contentType: "multipart/form-data", schema: REF("CatalogUploadForm") },
        ok: object("The preview (errors, diff) or the stored version with its diff."),
        errors: [409],
      },
    ],
  },
  "/api/catalog/uploads/{uploadId}": {
    get: ["downloadCatalogUpload", { tag: "catalog", summary: "Download one stored version as YAML", permission: "catalog:read", pathParams: [uploadId], ok: { description: "The file as uploaded.", schema: { type: "string" }, contentType: "text/yaml" } }],
  },
  "/api/sites/{siteId}/schedule": {
    get: ["listSchedule", { tag: "schedule", summary: "The site's device schedule in schedule order", permission: "site:read", pathParams: [siteId], ok: object("{ detectors }.") }],
    post: ["createDetector", { tag: "schedule", summary: "Add one detector (its catalog id checked against the organisation's catalog)", permission: "schedule:write", pathParams: [siteId], body: "DetectorCreate", ok: object("The new detector.") }],
    patch: ["bulkEditSchedule", { tag: "schedule", summary: "Bulk edit: one patch for many detectors, all or nothing", permission: "schedule:write", pathParams: [siteId], body: "ScheduleBulkEdit", ok: object("{ updated }.") }],
    delete: ["deleteScheduleDetectors", { tag: "schedule", summary: "Delete the detectors named in { ids }, all or nothing", permission: "schedule:write", pathParams: [siteId], body: "ScheduleDelete", ok: object("{ deleted }.") }],
  },
  "/api/sites/{siteId}/schedule/{detectorId}": {
    patch: ["updateDetector", { tag: "schedule", summary: "Change one detector", permission: "schedule:write", pathParams: [siteId, detectorId], body: "DetectorUpdate", ok: object("The detector as saved.") }],
    delete: ["deleteDetector", { tag: "schedule", summary: "Delete one detector", permission: "schedule:write", pathParams: [siteId, detectorId], ok: object("{ deleted }.") }],
  },
  "/api/sites/{siteId}/schedule/export.csv": {
    get: ["exportSchedule", { tag: "schedule", summary: "The device schedule as RFC 4180 CSV, in the import's columns", permission: "site:read", pathParams: [siteId], ok: { description: "CSV, one detector a row.", schema: { type: "string" }, contentType: "text/csv" } }],
  },
  "/api/sites/{siteId}/schedule/import": {
    post: [
      "importSchedule",
      { tag: "schedule", summary: "Import a CSV: preview checks it and stores nothing; confirm stores it in one transaction", description: "Any bad row refuses the whole file (422, nothing stored) with its row number, among them a life-safety detector marked shared-ok. The preview lists `unknownPlaces`, areas and rooms the site lacks; confirm refuses them (409 listing them) unless `addUnknownPlaces` is true, which adds them in the same transaction.", permission: "schedule:write", pathParams: [siteId], body: "ScheduleImport", ok: object("The preview (rows, errors, unknownPlaces) or what was stored (imported, detectors, addedPlaces)."), errors: [409] },
    ],
  },
  "/api/sites/{siteId}/layouts": {
    get: ["listLayouts", { tag: "layouts", summary: "The site's layouts with their current revision's findings summary", permission: "layout:read", pathParams: [siteId], ok: object("{ layouts }.") }],
    post: ["createLayout", { tag: "layouts", summary: "Create a layout from a document, a blank panel, or a hardware suggestion (revision 1)", permission: "layout:write", pathParams: [siteId], body: "LayoutCreate", ok: object("The new layout.") }],
  },
  "/api/sites/{siteId}/suggestions": {
    post: ["suggestHardware", { tag: "layouts", summary: "The cheapest catalog hardware for the schedule, one detector per input and with shared inputs", permission: "layout:read", pathParams: [siteId], body: "SuggestionRequest", ok: object("Both suggestions with their costs and findings.") }],
  },
  "/api/layouts/{layoutId}": {
    get: ["getLayout", { tag: "layouts", summary: "The layout and its current revision's document", permission: "layout:read", pathParams: [layoutId], ok: object("The layout with its document (see LayoutDocument).") }],
    put: ["saveLayout", { tag: "layouts", summary: "Save a revision", description: "409 `{ error, currentVersion }` when `version` is stale; 422 on references to hardware or detectors that do not exist.", permission: "layout:write", pathParams: [layoutId], body: "LayoutSave", ok: object("The saved revision with its findings summary."), errors: [409] }],
    delete: ["deleteLayout", { tag: "layouts", summary: "Delete a draft layout and its revisions", description: "409 for a layout with an approved or commissioned revision or commissioning records: archive it instead.", permission: "layout:write", pathParams: [layoutId], ok: object("Deleted."), errors: [409] }],
  },
  "/api/layouts/{layoutId}/redraft": {
    post: ["redraftLayout", { tag: "layouts", summary: "Start a new draft revision from the schedule as it is now", description: "For a layout whose schedule changed since approval; detectors deleted from the schedule leave their inputs. 409 without an approved revision.", permission: "layout:write", pathParams: [layoutId], body: "LayoutRestore", ok: object("The new draft with its document and the detectors dropped."), errors: [409] }],
  },
  "/api/layouts/{layoutId}/archive": {
    post: ["archiveLayout", { tag: "layouts", summary: "Archive a layout or bring it back", description: "An archived layout stays readable (sheet, commissioning record, history) and is not changed.", permission: "layout:write", pathParams: [layoutId], body: "LayoutArchive", ok: object("{ layout }.") }],
  },
  "/api/layouts/{layoutId}/duplicate": {
    post: ["duplicateLayout", { tag: "layouts", summary: "The layout's current design as a new draft layout with its own history", description: "422 when it names detectors or hardware that no longer exist.", permission: "layout:write", pathParams: [layoutId], body: "LayoutDuplicate", ok: object("{ layout: { id, siteId, name, from } }.") }],
  },
  "/api/layouts/{layoutId}/revisions": {
    get: ["listRevisions", { tag: "layouts", summary: "Every revision, newest first, with who saved it and its findings summary", permission: "layout:read", pathParams: [layoutId], ok: object("{ revisions }.") }],
  },
  "/api/layouts/{layoutId}/revisions/{rev}": {
    get: ["getRevision", { tag: "layouts", summary: "One revision's document", permission: "layout:read", pathParams: [layoutId, rev], ok: object("The revision and its document.") }],
  },
  "/api/layouts/{layoutId}/comments": {
    get: ["listComments", { tag: "review", summary: "The layout's comment thread, oldest first", permission: "layout:read", pathParams: [layoutId], ok: object("{ comments }.") }],
    post: ["addComment", { tag: "review", summary: "Comment on the layout, a board, an input or a detector", permission: "layout:comment", pathParams: [layoutId], body: "Comment", ok: { status: 201, ...object("The comment.") } }],
  },
  "/api/layouts/{layoutId}/review": {
    get: ["getReview", { tag: "review", summary: "The review state, the steps the caller may take (with reasons for the others), comments and decisions", permission: "layout:read", pathParams: [layoutId], ok: object("The review.") }],
    post: [
      "reviewStep",
      { tag: "review", summary: "One review step: submit, withdraw, approve or reject", description: "Approve and reject are the engineer's; 409 from the wrong state or when a newer revision was saved.", permission: "layout:submit", pathParams: [layoutId], body: "ReviewStep", ok: object("The review after the step."), errors: [409] },
    ],
  },
  "/api/layouts/{layoutId}/sheet": {
    get: ["getSheet", { tag: "sheets", summary: "The terminal sheet as data: the approved revision, else the current one", description: 'Open readings are sent as "Infinity".', permission: "sheet:read", pathParams: [layoutId], query: [revisionQuery], ok: object("The terminal sheet.") }],
  },
  "/api/layouts/{layoutId}/sheet/pdf": {
    get: ["getSheetPdf", { tag: "sheets", summary: "The terminal sheet as a PDF", permission: "sheet:read", pathParams: [layoutId], query: [sizeQuery, revisionQuery], ok: pdf("The terminal sheet.") }],
  },
  "/api/layouts/{layoutId}/zones/pdf": {
    get: ["getZoneListPdf", { tag: "sheets", summary: "The zone list for programming as a PDF: every zone with its keypad label, type, area, part-set, options, input and resistors", permission: "sheet:read", pathParams: [layoutId], query: [sizeQuery, revisionQuery], ok: pdf("The zone list.") }],
  },
  "/api/layouts/{layoutId}/zones/csv": {
    get: ["getZoneListCsv", { tag: "sheets", summary: "The zone list for programming as RFC 4180 CSV", permission: "sheet:read", pathParams: [layoutId], query: [revisionQuery], ok: csv("Zone, keypad label, the part cut off, full label, zone type, area, part-set, options, wireless, input, resistors.") }],
  },
  "/api/layouts/{layoutId}/sheet/send": {
    post: ["sendSheet", { tag: "sheets", summary: "E-mail the terminal sheet PDF to the site's assigned installer", description: "409 when the site has no installer, or when the revision is not approved and `confirmUnapproved` is not true (the e-mail and every PDF page then say NOT APPROVED — FOR REVIEW ONLY).", permission: "sheet:send", pathParams: [layoutId], body: "SheetSend", ok: object("{ sent }."), errors: [409] }],
  },
  "/api/layouts/{layoutId}/commissioning": {
    get: ["getCommissioning", { tag: "commissioning", summary: "Progress per loop on the approved revision, the readings and the photos", description: 'Open readings are sent as "Infinity".', permission: "sheet:read", pathParams: [layoutId], ok: object("The commissioning record so far.") }],
  },
  "/api/layouts/{layoutId}/commissioning/readings": {
    post: [
      "recordReading",
      { tag: "commissioning", summary: "Record one meter reading, judged against the approved sheet", description: "201; 200 with the stored reading when the clientId was seen before.", permission: "commissioning:record", pathParams: [layoutId], body: "ReadingRecord", ok: { status: 201, ...object("The reading and its verdict.") } },
    ],
  },
  "/api/layouts/{layoutId}/commissioning/complete": {
    post: ["completeCommissioning", { tag: "commissioning", summary: "Mark the approved layout commissioned, once every loop has passed", permission: "commissioning:record", pathParams: [layoutId], ok: object("The review after the step."), errors: [409] }],
  },
  "/api/layouts/{layoutId}/commissioning/report": {
    get: ["getCommissioningReport", { tag: "commissioning", summary: "The commissioning record PDF, once every loop of the approved revision has passed", permission: "sheet:read", pathParams: [layoutId], query: [sizeQuery], ok: pdf("The commissioning record."), errors: [409] }],
  },
  "/api/layouts/{layoutId}/photos": {
    post: [
      "uploadPhoto",
      {
        tag: "commissioning",
        summary: "A photo of the terminations for a loop or the whole layout",
        description: "JPEG, PNG or WebP by its bytes, at most 8 MiB; 201 (200 when the clientId was seen before).",
        permission: "commissioning:record",
        pathParams: [layoutId],
        bodyContent: { contentType: "multipart/form-data", schema: { type: "object", properties: { file: { type: "string", contentMediaType: "image/*" }, boardKey: { type: "string" }, input: { type: "integer" }, clientId: { type: "string" } }, required: ["file"] } },
        ok: { status: 201, ...object("The stored photo.") },
      },
    ],
  },
  "/api/layouts/{layoutId}/photos/{photoId}": {
    get: ["getPhoto", { tag: "commissioning", summary: "One commissioning photo, as stored", permission: "sheet:read", pathParams: [layoutId, photoId], ok: { description: "The image.", schema: { type: "string" }, contentType: "image/*" } }],
  },
  "/api/sites/{siteId}/compare": {
    get: [
      "compareLayouts",
      { tag: "layouts", summary: "Two to six of the site's layouts side by side: cost, inputs, supplies, supervision coverage, findings, shared-input trade-offs", permission: "layout:read", pathParams: [siteId], query: [{ name: "ids", description: "Layout ids, comma-separated (2 to 6).", schema: { type: "string" }, required: true }], ok: object("The comparison.") },
    ],
  },
  "/api/sites/{siteId}/decisions": {
    get: ["listDecisions", { tag: "review", summary: "The decision log of the site's layouts (review steps and choices with reasons), newest first", permission: "layout:read", pathParams: [siteId], ok: object("{ decisions }.") }],
    post: ["chooseLayout", { tag: "review", summary: "Record which of the compared layouts was chosen, and why", permission: "layout:write", pathParams: [siteId], body: "LayoutChoice", ok: { status: 201, ...object("The decision.") } }],
  },
  "/api/sites/{siteId}/exports/bom.csv": {
    get: ["exportBom", { tag: "sheets", summary: "The bill of materials (catalog list prices, resistors by value, batteries) as RFC 4180 CSV", permission: "sheet:read", pathParams: [siteId], query: [layoutQuery, revisionQuery], ok: csv("One line per part.") }],
  },
  "/api/sites/{siteId}/exports/zones.csv": {
    get: ["exportZones", { tag: "sheets", summary: "The zone list for the monitoring centre as RFC 4180 CSV", permission: "sheet:read", pathParams: [siteId], query: [layoutQuery, revisionQuery], ok: csv("Zone, label, area, room, device type, board, input, report types.") }],
  },
  "/api/layouts/{layoutId}/revisions/{rev}/restore": {
    post: ["restoreRevision", { tag: "layouts", summary: "A new revision with the old document", description: "409 when `version` is stale.", permission: "layout:write", pathParams: [layoutId, rev], body: "LayoutRestore", ok: object("The new revision."), errors: [409] }],
  },
};

export interface OpenApiDocument {
  openapi: "3.1.0";
  info: Record<string, unknown>;
  paths: Record<string, Partial<Record<Method, Record<string, unknown>>>>;
  components: Record<string, unknown>;
  [key: string]: unknown;
}

let cached: OpenApiDocument | undefined;

export function openApiDocument(): OpenApiDocument {
  if (cached) return cached;
  const paths: OpenApiDocument["paths"] = {};
  for (const [path, methods] of Object.entries(PATHS)) {
    paths[path] = {};
    for (const [method, entry] of Object.entries(methods) as [Method, [string, OperationSpec]][]) paths[path][method] = operation(entry[0], entry[1]);
  }
  cached = {
    openapi: "3.1.0",
    jsonSchemaDialect: "https://spec.openapis.org/oas/3.1/dialect/base",
    info: {
      title: "Loopwright API",
      version: "0.1.0",
      description:
        "Design aid for intruder and fire alarm systems. Every route answers JSON; errors have one shape, `{ error, issues? }`. " +
        "Signed-in routes use the session cookie set by signing in; objects of another organisation read as missing (404). " +
        "Loopwright's figures are an aid, not an approval: fire and other life-safety systems follow local codes, the authority having jurisdiction and licensed practice.",
    },
    servers: [{ url: "/" }],
    security: [{ session: [] }],
    tags: [
      { name: "loops", description: "Loop supervision: readings, reports, faults and findings." },
      { name: "sites", description: "Buildings the organisation designs for." },
      { name: "schedule", description: "A site's device schedule: the list of its detectors." },
      { name: "layouts", description: "Designs of a site's system: hardware chosen and detectors assigned, in revisions." },
      { name: "catalog", description: "The shipped catalog and the organisation's uploaded catalog file." },
      { name: "review", description: "Comments, review steps and decisions on layouts." },
      { name: "sheets", description: "Terminal sheets and exports for installers and monitoring centres." },
      { name: "plans", description: "Floor plans, devices placed on them and cable routes measured on them." },
      { name: "commissioning", description: "Meter readings and photos proving each loop." },
      { name: "members", description: "Who works on the organisation's designs, and in which role." },
      { name: "session", description: "Signing in and out." },
      { name: "account", description: "Sign-up, e-mail confirmation, passwords and the organisation's settings." },
      { name: "service", description: "Health and this description." },
    ],
    paths,
    components: {
      securitySchemes: { session: { type: "apiKey", in: "cookie", name: "loopwright.session", description: "Set by signing in through /api/auth." } },
      schemas: componentSchemas(),
    },
  };
  return cached;
}
