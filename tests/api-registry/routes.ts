import { randomUUID } from "node:crypto";
import type { BuildContext, RouteEntry } from "./types";

// Every exported method of every route handler under app/, with a valid request built from ids found at run
// time. tests/unit/api-registry.test.ts fails when a route method has no entry here, when an entry names a
// route that is gone, and when an entry's permission differs from the one the handler declares.
// Adding a route: add its entry here (a valid request, the success status, whether it names an organisation's object).

/** Server actions: none. The policy is route handlers only (lib/server/route.ts); a file with the server-action
 *  directive must be listed here, and the unit test fails until it is. */
export const serverActionFiles: string[] = [];

const loopBody = {
  inputType: "input-2k2",
  loop: {
    scheme: "single-eol",
    placement: "at-detector",
    detectors: [{ label: "Front door", contact: "NC", tamper: true }],
    tolerancePct: 5,
    cable: { gauge: { mm2: 0.22 }, lengthM: 30, tempMinC: -10, tempMaxC: 40 },
  },
};

const detectorBody = { label: "Matrix door", catalogId: "contact-door-surface", area: "Ground floor", room: "Hall", cableM: 12, gauge: { awg: 22 }, supervision: "single-eol" };

export const scheduleCsv = ["label,type,area,room,cable_m,gauge,supervision", "Matrix front door,contact-door-surface,Ground floor,Hall,12,22 AWG,shared-ok", "Matrix hall motion,motion-wall,Ground floor,Hall,18,22 AWG,single-eol"].join("\n");

/** The credentials a fresh sign-in uses: the caller's own, or the demo designer's for a signed-out caller. */
const credentialsOf = (ctx: BuildContext) => ({ email: ctx.caller.email ?? "designer@quillfen.example", password: ctx.caller.password ?? "loop-demo-2026" });

export const routes: RouteEntry[] = [
  // next-auth
  {
    method: "GET",
    path: "/api/auth/[...nextauth]",
    access: "public",
    body: "none",
    success: 200,
    orgScoped: false,
    build: async () => ({ method: "GET", url: "/api/auth/session" }),
    note: "next-auth's own endpoints (session, csrf, providers); the session is {} when signed out",
  },
  {
    method: "POST",
    path: "/api/auth/[...nextauth]",
    access: "public",
    body: "form",
    success: 200,
    orgScoped: false,
    build: async (ctx) => ({ method: "POST", url: "/api/auth/callback/credentials", form: { ...credentialsOf(ctx), json: "true", callbackUrl: "/" }, csrf: true, fresh: true }),
    note: "sign-in with e-mail and password (form, CSRF token); sent from a new cookie jar so the caller's own session is kept",
  },

  // catalog
  { method: "GET", path: "/api/catalog", access: "catalog:read", body: "none", success: 200, orgScoped: false, build: async () => ({ method: "GET", url: "/api/catalog" }) },
  {
    method: "GET",
    path: "/api/catalog/[entryId]",
    access: "catalog:read",
    body: "none",
    success: 200,
    orgScoped: true,
    build: async (ctx) => ({ method: "GET", url: `/api/catalog/${(await ctx.fixtures.catalogUpload()).addedEntryId}` }),
    note: "an entry only the demo organisation's upload adds, so another organisation's member gets 404",
  },
  { method: "GET", path: "/api/catalog/uploads", access: "catalog:read", body: "none", success: 200, orgScoped: false, build: async () => ({ method: "GET", url: "/api/catalog/uploads" }) },
  {
    method: "POST",
    path: "/api/catalog/uploads",
    access: "catalog:upload",
    body: "multipart",
    success: 200,
    orgScoped: false,
    build: async (ctx) => ({ method: "POST", url: "/api/catalog/uploads", multipart: { mode: "preview", file: ctx.fixtures.goodCatalogFile() } }),
    note: "preview mode (stores nothing); storing answers 201",
  },
  {
    method: "GET",
    path: "/api/catalog/uploads/[uploadId]",
    access: "catalog:read",
    body: "none",
    success: 200,
    orgScoped: true,
    build: async (ctx) => ({ method: "GET", url: `/api/catalog/uploads/${(await ctx.fixtures.catalogUpload()).uploadId}` }),
  },

  // health, OpenAPI
  { method: "GET", path: "/api/health", access: "public", body: "none", success: 200, orgScoped: false, build: async () => ({ method: "GET", url: "/api/health" }) },
  { method: "GET", path: "/api/openapi.json", access: "public", body: "none", success: 200, orgScoped: false, build: async () => ({ method: "GET", url: "/api/openapi.json" }) },

  // invitations and members
  {
    method: "POST",
    path: "/api/invitations/accept",
    access: "public",
    body: "json",
    success: 200,
    orgScoped: false,
    build: async (ctx) => ({ method: "POST", url: "/api/invitations/accept", json: { token: await ctx.fixtures.invitationToken(), name: "Matrix Invitee", password: "wire-and-meter-77" } }),
    requiredKeys: ["token", "name", "password"],
    note: "public: the e-mailed token is the credential",
  },
  {
    method: "POST",
    path: "/api/invitations/join",
    access: "account:manage",
    body: "json",
    success: 200,
    orgScoped: false,
    build: async (ctx) => {
      if (ctx.caller.kind === "signed-out") return { method: "POST", url: "/api/invitations/join", json: { token: "x".repeat(32) } };
      const member = await ctx.fixtures.throwawayMember(ctx.caller);
      return { method: "POST", url: "/api/invitations/join", json: { token: await ctx.fixtures.invitationFor(member.email) }, as: member };
    },
    requiredKeys: ["token"],
    note: "sent as a throwaway member with the caller's role (joining moves and may end that account's sessions)",
  },

  // sign-up, passwords, the organisation's settings
  {
    method: "POST",
    path: "/api/sign-up",
    access: "public",
    body: "json",
    success: 200,
    orgScoped: false,
    build: async (ctx) => ({ method: "POST", url: "/api/sign-up", json: { organisationName: "Matrix sign-up org", name: "Matrix Founder", email: ctx.fixtures.uniqueEmail("founder"), password: "spare-probe-meter-61" } }),
    requiredKeys: ["organisationName", "name", "email", "password"],
  },
  {
    method: "POST",
    path: "/api/sign-up/confirm",
    access: "public",
    body: "json",
    success: 200,
    orgScoped: false,
    build: async (ctx) => ({ method: "POST", url: "/api/sign-up/confirm", json: { token: await ctx.fixtures.confirmationToken() } }),
    requiredKeys: ["token"],
    note: "public: the e-mailed token is the credential",
  },
  { method: "POST", path: "/api/sign-up/resend", access: "public", body: "json", success: 200, orgScoped: false, build: async (ctx) => ({ method: "POST", url: "/api/sign-up/resend", json: { email: ctx.fixtures.uniqueEmail("waiting") } }), requiredKeys: ["email"] },
  { method: "POST", path: "/api/password/forgot", access: "public", body: "json", success: 200, orgScoped: false, build: async (ctx) => ({ method: "POST", url: "/api/password/forgot", json: { email: ctx.fixtures.uniqueEmail("forgetful") } }), requiredKeys: ["email"] },
  {
    method: "POST",
    path: "/api/password/reset",
    access: "public",
    body: "json",
    success: 200,
    orgScoped: false,
    build: async (ctx) => ({ method: "POST", url: "/api/password/reset", json: { token: await ctx.fixtures.resetToken(), password: "fresh-lamp-circuit-84" } }),
    requiredKeys: ["token", "password"],
    note: "public: the e-mailed token is the credential",
  },
  {
    method: "POST",
    path: "/api/account/password",
    access: "account:manage",
    body: "json",
    success: 200,
    orgScoped: false,
    build: async (ctx) => {
      const json = { currentPassword: "spare-probe-meter-61", newPassword: "fresh-lamp-circuit-84" };
      if (ctx.caller.kind === "signed-out") return { method: "POST", url: "/api/account/password", json };
      return { method: "POST", url: "/api/account/password", json, as: await ctx.fixtures.throwawayMember(ctx.caller) };
    },
    requiredKeys: ["currentPassword", "newPassword"],
    note: "sent as a throwaway member with the caller's role: a new password ends the account's other sessions",
  },
  { method: "GET", path: "/api/organisation", access: "organisation:manage", body: "none", success: 200, orgScoped: false, build: async () => ({ method: "GET", url: "/api/organisation" }) },
  {
    method: "PATCH",
    path: "/api/organisation",
    access: "organisation:manage",
    body: "json",
    success: 200,
    orgScoped: false,
    build: async (ctx) => ({ method: "PATCH", url: "/api/organisation", json: await ctx.fixtures.organisationSettings(ctx.caller) }),
    requiredKeys: ["name", "currency", "locale", "timeZone", "paper", "units", "soloApproval"],
    note: "the caller's organisation's settings saved as they are, so nothing changes",
  },
  { method: "GET", path: "/api/members", access: "members:read", body: "none", success: 200, orgScoped: false, build: async () => ({ method: "GET", url: "/api/members" }) },
  {
    method: "POST",
    path: "/api/members",
    access: "members:manage",
    body: "json",
    success: 200,
    orgScoped: false,
    build: async (ctx) => ({ method: "POST", url: "/api/members", json: { email: ctx.fixtures.uniqueEmail("invitee"), role: "installer" } }),
    requiredKeys: ["email", "role"],
  },
  {
    method: "PATCH",
    path: "/api/members/[membershipId]",
    access: "members:manage",
    body: "json",
    success: 200,
    orgScoped: true,
    build: async (ctx) => ({ method: "PATCH", url: `/api/members/${ctx.demo.installerMembershipId}`, json: { role: "installer" } }),
    requiredKeys: ["role"],
    note: "the demo installer's role set to the role it has, so the demo data stays as it is",
  },

  // layouts
  {
    method: "GET",
    path: "/api/layouts/[layoutId]",
    access: "layout:read",
    body: "none",
    success: 200,
    orgScoped: true,
    build: async (ctx) => ({ method: "GET", url: `/api/layouts/${ctx.demo.layoutId}` }),
  },
  {
    method: "PUT",
    path: "/api/layouts/[layoutId]",
    access: "layout:write",
    body: "json",
    success: 200,
    orgScoped: true,
    build: async (ctx) => {
      const l = await ctx.fixtures.newLayout();
      return { method: "PUT", url: `/api/layouts/${l.layoutId}`, json: { version: l.version, document: l.document, note: "saved by the API matrix" } };
    },
    requiredKeys: ["version", "document"],
  },
  {
    method: "DELETE",
    path: "/api/layouts/[layoutId]",
    access: "layout:write",
    body: "none",
    success: 200,
    orgScoped: true,
    build: async (ctx) => ({ method: "DELETE", url: `/api/layouts/${(await ctx.fixtures.newLayout()).layoutId}` }),
  },
  {
    method: "POST",
    path: "/api/layouts/[layoutId]/redraft",
    access: "layout:write",
    body: "json",
    success: 200,
    orgScoped: true,
    build: async (ctx) => ({ method: "POST", url: `/api/layouts/${(await ctx.fixtures.approvedLayout()).layoutId}/redraft`, json: {} }),
    requiredKeys: [],
  },
  {
    method: "POST",
    path: "/api/layouts/[layoutId]/archive",
    access: "layout:write",
    body: "json",
    success: 200,
    orgScoped: true,
    build: async (ctx) => ({ method: "POST", url: `/api/layouts/${(await ctx.fixtures.newLayout()).layoutId}/archive`, json: { archived: true } }),
    requiredKeys: ["archived"],
  },
  {
    method: "POST",
    path: "/api/layouts/[layoutId]/duplicate",
    access: "layout:write",
    body: "json",
    success: 200,
    orgScoped: true,
    build: async (ctx) => ({ method: "POST", url: `/api/layouts/${(await ctx.fixtures.newLayout()).layoutId}/duplicate`, json: { name: "Matrix copy" } }),
    requiredKeys: [],
  },
  {
    method: "GET",
    path: "/api/layouts/[layoutId]/revisions",
    access: "layout:read",
    body: "none",
    success: 200,
    orgScoped: true,
    build: async (ctx) => ({ method: "GET", url: `/api/layouts/${ctx.demo.layoutId}/revisions` }),
  },
  {
    method: "GET",
    path: "/api/layouts/[layoutId]/revisions/[rev]",
    access: "layout:read",
    body: "none",
    success: 200,
    orgScoped: true,
    build: async (ctx) => ({ method: "GET", url: `/api/layouts/${ctx.demo.layoutId}/revisions/1` }),
  },
  {
    method: "POST",
    path: "/api/layouts/[layoutId]/revisions/[rev]/restore",
    access: "layout:write",
    body: "json",
    success: 200,
    orgScoped: true,
    build: async (ctx) => {
      const l = await ctx.fixtures.newLayout();
      return { method: "POST", url: `/api/layouts/${l.layoutId}/revisions/1/restore`, json: { version: l.version } };
    },
    requiredKeys: [],
  },

  // review, terminal sheet, commissioning
  { method: "GET", path: "/api/layouts/[layoutId]/review", access: "layout:read", body: "none", success: 200, orgScoped: true, build: async (ctx) => ({ method: "GET", url: `/api/layouts/${ctx.demo.layoutId}/review` }) },
  {
    method: "POST",
    path: "/api/layouts/[layoutId]/review",
    access: "layout:submit",
    body: "json",
    success: 200,
    orgScoped: true,
    build: async (ctx) => ({ method: "POST", url: `/api/layouts/${(await ctx.fixtures.newLayout()).layoutId}/review`, json: { action: "submit" } }),
    requiredKeys: ["action"],
    note: "a fresh draft sent for review; approve and reject also need layout:approve (engineers), checked by the review state machine",
  },
  { method: "GET", path: "/api/layouts/[layoutId]/comments", access: "layout:read", body: "none", success: 200, orgScoped: true, build: async (ctx) => ({ method: "GET", url: `/api/layouts/${ctx.demo.layoutId}/comments` }) },
  {
    method: "POST",
    path: "/api/layouts/[layoutId]/comments",
    access: "layout:comment",
    body: "json",
    success: 201,
    orgScoped: true,
    build: async (ctx) => ({ method: "POST", url: `/api/layouts/${(await ctx.fixtures.newLayout()).layoutId}/comments`, json: { body: "Input 3 could take the stair door.", target: { kind: "input", boardKey: "panel", input: 3 } } }),
    requiredKeys: ["body"],
  },
  { method: "GET", path: "/api/layouts/[layoutId]/sheet", access: "sheet:read", body: "none", success: 200, orgScoped: true, build: async (ctx) => ({ method: "GET", url: `/api/layouts/${ctx.demo.layoutId}/sheet` }) },
  {
    method: "GET",
    path: "/api/layouts/[layoutId]/sheet/pdf",
    access: "sheet:read",
    body: "none",
    success: 200,
    orgScoped: true,
    build: async (ctx) => ({ method: "GET", url: `/api/layouts/${(await ctx.fixtures.approvedLayout()).layoutId}/sheet/pdf?size=LETTER` }),
    note: "a small approved layout: the demo layout's 41 loops take pdfkit over a second to lay out",
  },
  {
    method: "GET",
    path: "/api/layouts/[layoutId]/zones/pdf",
    access: "sheet:read",
    body: "none",
    success: 200,
    orgScoped: true,
    build: async (ctx) => ({ method: "GET", url: `/api/layouts/${ctx.demo.layoutId}/zones/pdf?size=A4` }),
  },
  { method: "GET", path: "/api/layouts/[layoutId]/zones/csv", access: "sheet:read", body: "none", success: 200, orgScoped: true, build: async (ctx) => ({ method: "GET", url: `/api/layouts/${ctx.demo.layoutId}/zones/csv` }) },
  {
    method: "POST",
    path: "/api/layouts/[layoutId]/sheet/send",
    access: "sheet:send",
    body: "json",
    success: 200,
    orgScoped: true,
    build: async (ctx) => ({ method: "POST", url: `/api/layouts/${ctx.demo.layoutId}/sheet/send`, json: { size: "A4", confirmUnapproved: true } }),
    requiredKeys: [],
    note: "mails the demo layout's sheet to the demo site's installer (the fake SMTP server keeps it); the layout itself is not changed",
  },
  { method: "GET", path: "/api/layouts/[layoutId]/commissioning", access: "sheet:read", body: "none", success: 200, orgScoped: true, build: async (ctx) => ({ method: "GET", url: `/api/layouts/${ctx.demo.layoutId}/commissioning` }) },
  {
    method: "POST",
    path: "/api/layouts/[layoutId]/commissioning/readings",
    access: "commissioning:record",
    body: "json",
    success: 201,
    orgScoped: true,
    build: async (ctx) => {
      const { layoutId, loops } = await ctx.fixtures.approvedLayout();
      const l = loops[0];
      return { method: "POST", url: `/api/layouts/${layoutId}/commissioning/readings`, json: { clientId: randomUUID(), boardKey: l.boardKey, input: l.input, test: l.readings[0].test, reading: l.readings[0].reading } };
    },
    requiredKeys: ["clientId", "boardKey", "input", "test", "reading"],
  },
  {
    method: "GET",
    path: "/api/layouts/[layoutId]/commissioning/report",
    access: "sheet:read",
    body: "none",
    success: 200,
    orgScoped: true,
    build: async (ctx) => ({ method: "GET", url: `/api/layouts/${(await ctx.fixtures.passedLayout()).layoutId}/commissioning/report?size=A4` }),
    note: "409 until every loop of the approved revision has passed",
  },
  {
    method: "POST",
    path: "/api/layouts/[layoutId]/commissioning/complete",
    access: "commissioning:record",
    body: "none",
    success: 200,
    orgScoped: true,
    build: async (ctx) => ({ method: "POST", url: `/api/layouts/${(await ctx.fixtures.passedLayout()).layoutId}/commissioning/complete` }),
  },
  {
    method: "POST",
    path: "/api/layouts/[layoutId]/photos",
    access: "commissioning:record",
    body: "multipart",
    success: 201,
    orgScoped: true,
    build: async (ctx) => {
      const { layoutId, loops } = await ctx.fixtures.approvedLayout();
      return { method: "POST", url: `/api/layouts/${layoutId}/photos`, multipart: { file: ctx.fixtures.photoFile(), boardKey: loops[0].boardKey, input: String(loops[0].input) } };
    },
  },
  {
    method: "GET",
    path: "/api/layouts/[layoutId]/photos/[photoId]",
    access: "sheet:read",
    body: "none",
    success: 200,
    orgScoped: true,
    build: async (ctx) => {
      const p = await ctx.fixtures.photo();
      return { method: "GET", url: `/api/layouts/${p.layoutId}/photos/${p.photoId}` };
    },
  },

  // loop bench
  {
    method: "POST",
    path: "/api/loops/analyze",
    access: "loop:analyze",
    body: "json",
    success: 200,
    orgScoped: false,
    build: async () => ({ method: "POST", url: "/api/loops/analyze", json: loopBody }),
    requiredKeys: ["inputType", "loop"],
    negativeAllowed: ["loop.cable.tempMinC", "loop.cable.tempMaxC"],
  },
  { method: "GET", path: "/api/loops/input-types", access: "loop:analyze", body: "none", success: 200, orgScoped: false, build: async () => ({ method: "GET", url: "/api/loops/input-types" }) },

  // floor plans
  { method: "GET", path: "/api/sites/[siteId]/plans", access: "site:read", body: "none", success: 200, orgScoped: true, build: async (ctx) => ({ method: "GET", url: `/api/sites/${ctx.demo.siteId}/plans` }) },
  {
    method: "PUT",
    path: "/api/sites/[siteId]/floors/[floorId]/plan",
    access: "schedule:write",
    body: "multipart",
    success: 200,
    orgScoped: true,
    build: async (ctx) => {
      const p = await ctx.fixtures.floorPlans();
      return { method: "PUT", url: `/api/sites/${p.siteId}/floors/${p.floorId}/plan`, multipart: { file: ctx.fixtures.planFile() } };
    },
    note: "Replaces the fixture's plan (200); a first upload answers 201.",
  },
  {
    method: "GET",
    path: "/api/sites/[siteId]/plans/[planId]/image",
    access: "site:read",
    body: "none",
    success: 200,
    orgScoped: true,
    build: async (ctx) => {
      const p = await ctx.fixtures.floorPlans();
      return { method: "GET", url: `/api/sites/${p.siteId}/plans/${p.planIds[0]}/image` };
    },
  },
  {
    method: "PUT",
    path: "/api/sites/[siteId]/plans/[planId]/calibration",
    access: "schedule:write",
    body: "json",
    success: 200,
    orgScoped: true,
    build: async (ctx) => {
      const p = await ctx.fixtures.floorPlans();
      return { method: "PUT", url: `/api/sites/${p.siteId}/plans/${p.planIds[0]}/calibration`, json: { a: { x: 10, y: 10 }, b: { x: 10, y: 410 }, distance: 8 } };
    },
    requiredKeys: ["a", "b", "distance"],
  },
  {
    method: "POST",
    path: "/api/sites/[siteId]/plans/[planId]/items",
    access: "schedule:write",
    body: "json",
    success: 201,
    orgScoped: true,
    build: async (ctx) => {
      const p = await ctx.fixtures.floorPlans();
      return { method: "POST", url: `/api/sites/${p.siteId}/plans/${p.planIds[0]}/items`, json: { kind: "keypad", label: "Hall keypad", x: 300, y: 120 } };
    },
    requiredKeys: ["kind", "x", "y"],
  },
  {
    method: "PATCH",
    path: "/api/sites/[siteId]/plan-items/[itemId]",
    access: "schedule:write",
    body: "json",
    success: 200,
    orgScoped: true,
    build: async (ctx) => {
      const p = await ctx.fixtures.floorPlans();
      return { method: "PATCH", url: `/api/sites/${p.siteId}/plan-items/${p.detectorItemId}`, json: { x: 140, y: 90 } };
    },
    requiredKeys: ["x", "y"],
  },
  {
    method: "PUT",
    path: "/api/sites/[siteId]/plan-routes",
    access: "schedule:write",
    body: "json",
    success: 200,
    orgScoped: true,
    build: async (ctx) => {
      const p = await ctx.fixtures.floorPlans();
      const legs = [
        { planId: p.planIds[0], points: [{ x: 100, y: 100 }, { x: 100, y: 600 }] },
        { planId: p.planIds[1], points: [{ x: 100, y: 600 }, { x: 200, y: 200 }] },
      ];
      return { method: "PUT", url: `/api/sites/${p.siteId}/plan-routes`, json: { fromItemId: p.detectorItemId, toItemId: p.panelItemId, legs } };
    },
    requiredKeys: ["fromItemId", "toItemId", "legs"],
  },

  // sites
  { method: "GET", path: "/api/sites", access: "site:read", body: "none", success: 200, orgScoped: false, build: async () => ({ method: "GET", url: "/api/sites" }) },
  {
    method: "POST",
    path: "/api/sites",
    access: "site:write",
    body: "json",
    success: 200,
    orgScoped: false,
    build: async () => ({ method: "POST", url: "/api/sites", json: { name: "API matrix site", address: "1 Test Row", description: "Made by the API permission matrix.", areas: [{ name: "Ground floor", rooms: ["Hall"] }] } }),
    requiredKeys: ["name"],
  },
  { method: "GET", path: "/api/sites/[siteId]", access: "site:read", body: "none", success: 200, orgScoped: true, build: async (ctx) => ({ method: "GET", url: `/api/sites/${ctx.demo.siteId}` }) },
  {
    method: "PATCH",
    path: "/api/sites/[siteId]",
    access: "site:write",
    body: "json",
    success: 200,
    orgScoped: true,
    build: async (ctx) => ({ method: "PATCH", url: `/api/sites/${(await ctx.fixtures.scratchSite()).siteId}`, json: { description: "Checked by the API matrix.", address: "2 Test Row" } }),
    requiredKeys: [],
  },
  {
    method: "PUT",
    path: "/api/sites/[siteId]/structure",
    access: "site:write",
    body: "json",
    success: 200,
    orgScoped: true,
    build: async (ctx) => ({ method: "PUT", url: `/api/sites/${(await ctx.fixtures.newSite()).siteId}/structure`, json: { floors: [{ name: "Basement", areas: [{ name: "Plant", rooms: [{ name: "Boiler room" }] }] }, { name: "Ground floor", areas: [] }] } }),
    requiredKeys: ["floors"],
  },
  {
    method: "POST",
    path: "/api/sites/[siteId]/rooms",
    access: "site:write",
    body: "json",
    success: 200,
    orgScoped: true,
    build: async (ctx) => {
      const s = await ctx.fixtures.newSite();
      return { method: "POST", url: `/api/sites/${s.siteId}/rooms`, json: { areaId: s.areaId, name: "Matrix room" } };
    },
    requiredKeys: ["areaId", "name"],
  },
  { method: "POST", path: "/api/sites/[siteId]/archive", access: "site:archive", body: "none", success: 200, orgScoped: true, build: async (ctx) => ({ method: "POST", url: `/api/sites/${(await ctx.fixtures.newSite()).siteId}/archive` }) },
  { method: "POST", path: "/api/sites/[siteId]/restore", access: "site:archive", body: "none", success: 200, orgScoped: true, build: async (ctx) => ({ method: "POST", url: `/api/sites/${(await ctx.fixtures.archivedSite()).siteId}/restore` }) },
  {
    method: "POST",
    path: "/api/sites/[siteId]/copy",
    access: "schedule:write",
    body: "json",
    success: 200,
    orgScoped: true,
    build: async (ctx) => ({ method: "POST", url: `/api/sites/${(await ctx.fixtures.scratchSite()).siteId}/copy`, json: { name: "API matrix copy" } }),
    requiredKeys: ["name"],
    note: "the new site carries the scratch prefix, so the suite removes it afterwards",
  },
  {
    method: "GET",
    path: "/api/sites/[siteId]/layouts",
    access: "layout:read",
    body: "none",
    success: 200,
    orgScoped: true,
    build: async (ctx) => ({ method: "GET", url: `/api/sites/${ctx.demo.siteId}/layouts` }),
  },
  {
    method: "POST",
    path: "/api/sites/[siteId]/layouts",
    access: "layout:write",
    body: "json",
    success: 200,
    orgScoped: true,
    build: async (ctx) => ({ method: "POST", url: `/api/sites/${(await ctx.fixtures.scratchSite()).siteId}/layouts`, json: { name: "API matrix layout", panelId: "panel-large-32" } }),
    requiredKeys: ["name", "panelId"],
  },
  {
    method: "GET",
    path: "/api/sites/[siteId]/schedule",
    access: "site:read",
    body: "none",
    success: 200,
    orgScoped: true,
    build: async (ctx) => ({ method: "GET", url: `/api/sites/${ctx.demo.siteId}/schedule` }),
  },
  {
    method: "POST",
    path: "/api/sites/[siteId]/schedule",
    access: "schedule:write",
    body: "json",
    success: 200,
    orgScoped: true,
    build: async (ctx) => ({ method: "POST", url: `/api/sites/${(await ctx.fixtures.scratchSite()).siteId}/schedule`, json: detectorBody }),
    requiredKeys: ["label", "catalogId", "area", "room", "cableM", "gauge", "supervision"],
  },
  {
    method: "PATCH",
    path: "/api/sites/[siteId]/schedule",
    access: "schedule:write",
    body: "json",
    success: 200,
    orgScoped: true,
    build: async (ctx) => {
      const d = await ctx.fixtures.newDetector();
      return { method: "PATCH", url: `/api/sites/${d.siteId}/schedule`, json: { ids: [d.detectorId], patch: { cableM: 15, room: "Hall" } } };
    },
    requiredKeys: ["ids", "patch"],
  },
  {
    method: "DELETE",
    path: "/api/sites/[siteId]/schedule",
    access: "schedule:write",
    body: "json",
    success: 200,
    orgScoped: true,
    build: async (ctx) => {
      const d = await ctx.fixtures.newDetector();
      // an approved fixture layout may place the new detector: confirm, as the schedule page does after the warning
      return { method: "DELETE", url: `/api/sites/${d.siteId}/schedule`, json: { ids: [d.detectorId], confirmApproved: true } };
    },
    requiredKeys: ["ids"],
  },
  {
    method: "PATCH",
    path: "/api/sites/[siteId]/schedule/[detectorId]",
    access: "schedule:write",
    body: "json",
    success: 200,
    orgScoped: true,
    build: async (ctx) => {
      const d = await ctx.fixtures.newDetector();
      return { method: "PATCH", url: `/api/sites/${d.siteId}/schedule/${d.detectorId}`, json: { label: "Matrix door, renamed", cableM: 14 } };
    },
    requiredKeys: [],
  },
  {
    method: "DELETE",
    path: "/api/sites/[siteId]/schedule/[detectorId]",
    access: "schedule:write",
    body: "none",
    success: 200,
    orgScoped: true,
    build: async (ctx) => {
      const d = await ctx.fixtures.newDetector();
      return { method: "DELETE", url: `/api/sites/${d.siteId}/schedule/${d.detectorId}?confirmApproved=1` };
    },
  },
  {
    method: "GET",
    path: "/api/sites/[siteId]/schedule/export.csv",
    access: "site:read",
    body: "none",
    success: 200,
    orgScoped: true,
    build: async (ctx) => ({ method: "GET", url: `/api/sites/${ctx.demo.siteId}/schedule/export.csv` }),
  },
  {
    method: "POST",
    path: "/api/sites/[siteId]/schedule/import",
    access: "schedule:write",
    body: "json",
    success: 200,
    orgScoped: true,
    build: async (ctx) => ({ method: "POST", url: `/api/sites/${(await ctx.fixtures.scratchSite()).siteId}/schedule/import`, json: { mode: "preview", csv: scheduleCsv, fileName: "matrix.csv" } }),
    requiredKeys: ["mode", "csv"],
    note: "preview mode stores nothing; confirm stores the rows in one transaction",
  },
  {
    method: "POST",
    path: "/api/sites/[siteId]/suggestions",
    access: "layout:read",
    body: "json",
    success: 200,
    orgScoped: true,
    build: async (ctx) => ({ method: "POST", url: `/api/sites/${(await ctx.fixtures.scratchSite()).siteId}/suggestions`, json: { busCableM: 50 } }),
    requiredKeys: [],
  },

  // comparison, decisions, exports
  {
    method: "GET",
    path: "/api/sites/[siteId]/compare",
    access: "layout:read",
    body: "none",
    success: 200,
    orgScoped: true,
    build: async (ctx) => {
      const [a, b] = [await ctx.fixtures.newLayout(), await ctx.fixtures.newLayout()];
      return { method: "GET", url: `/api/sites/${(await ctx.fixtures.scratchSite()).siteId}/compare?ids=${a.layoutId},${b.layoutId}` };
    },
  },
  { method: "GET", path: "/api/sites/[siteId]/decisions", access: "layout:read", body: "none", success: 200, orgScoped: true, build: async (ctx) => ({ method: "GET", url: `/api/sites/${ctx.demo.siteId}/decisions` }) },
  {
    method: "POST",
    path: "/api/sites/[siteId]/decisions",
    access: "layout:write",
    body: "json",
    success: 201,
    orgScoped: true,
    build: async (ctx) => {
      const [a, b] = [await ctx.fixtures.newLayout(), await ctx.fixtures.newLayout()];
      return { method: "POST", url: `/api/sites/${(await ctx.fixtures.scratchSite()).siteId}/decisions`, json: { chosenLayoutId: b.layoutId, comparedLayoutIds: [a.layoutId, b.layoutId], reason: "More spare inputs for the extension." } };
    },
    requiredKeys: ["chosenLayoutId", "comparedLayoutIds", "reason"],
  },
  { method: "GET", path: "/api/sites/[siteId]/exports/zones.csv", access: "sheet:read", body: "none", success: 200, orgScoped: true, build: async (ctx) => ({ method: "GET", url: `/api/sites/${ctx.demo.siteId}/exports/zones.csv?layoutId=${ctx.demo.layoutId}` }) },
  { method: "GET", path: "/api/sites/[siteId]/exports/bom.csv", access: "sheet:read", body: "none", success: 200, orgScoped: true, build: async (ctx) => ({ method: "GET", url: `/api/sites/${ctx.demo.siteId}/exports/bom.csv?layoutId=${ctx.demo.layoutId}` }) },

  // development outbox
  {
    method: "GET",
    path: "/dev/outbox/[mailId]/attachments/[index]",
    access: "public",
    body: "none",
    // absent from the production build the browser tests run against: 404 for everyone, admins included
    success: 404,
    orgScoped: false,
    build: async (ctx) => {
      const a = await ctx.fixtures.mailAttachment();
      return { method: "GET", url: `/dev/outbox/${a.mailId}/attachments/${a.index}` };
    },
    note: "development only: a 404 in a production build; elsewhere too unless LOOPWRIGHT_DEV_OUTBOX=1 and the caller is a signed-in admin",
  },
];
