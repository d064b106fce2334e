import type { Permission, Role } from "@/lib/auth/permissions";

// The shape of the route registry: one entry per exported method of every route handler, with what it
// needs to be called for real. Shared by the unit test (entries against the file system) and the browser
// tests (permission matrix, cross-organisation checks, fuzz).

export const methods = ["GET", "POST", "PUT", "PATCH", "DELETE"] as const;
export type Method = (typeof methods)[number];

/** A permission from lib/auth/permissions.ts, or "public" for a route that checks no session. */
export type Access = Permission | "public";

export type FilePart = { name: string; mimeType: string; buffer: Buffer };

/** One HTTP request, described without a client so the registry stays free of Playwright at run time. */
export interface RequestSpec {
  method: Method;
  /** Path and query, e.g. /api/sites/3 */
  url: string;
  /** Sent as application/json. */
  json?: unknown;
  /** Sent as multipart/form-data. */
  multipart?: Record<string, string | FilePart>;
  /** Sent as application/x-www-form-urlencoded. */
  form?: Record<string, string>;
  /** Add next-auth's csrfToken to `form`, fetched first in the same cookie jar. */
  csrf?: boolean;
  /** Send from a new, signed-out cookie jar (the request would change the caller's own session). */
  fresh?: boolean;
  /** Send from a new cookie jar signed in as this account (a throwaway member, for requests that end the caller's other sessions). */
  as?: { email: string; password: string };
}

export type CallerKind = "signed-out" | "demo" | "rival";

/** Who makes the request. */
export interface Caller {
  kind: CallerKind;
  role: Role | null;
  email: string | null;
  password: string | null;
}

/** Objects of the demo organisation found at run time (read-only: the requests never change them). */
export interface DemoObjects {
  organisationId: number;
  siteId: number;
  layoutId: number;
  /** A membership whose role a request may "change" to the role it already has. */
  installerMembershipId: number;
}

/** Fresh objects in the demo organisation, made as its admin, for requests that change or delete what they name. */
export interface Fixtures {
  /** A site of the demo organisation with a small device schedule, made once per run. */
  scratchSite(): Promise<{ siteId: number; detectorIds: string[] }>;
  /** A new site of the demo organisation with one floor, one area and one room, and no schedule. */
  newSite(): Promise<{ siteId: number; areaId: number }>;
  /** A new site as above, archived by the demo admin. */
  archivedSite(): Promise<{ siteId: number }>;
  /** A new detector on the scratch site. */
  newDetector(): Promise<{ siteId: number; detectorId: string }>;
  /** A new layout on the scratch site (revision 1, version 1) and its document. */
  newLayout(): Promise<{ layoutId: number; version: number; document: unknown }>;
  /** A fresh invitation token of the demo organisation (read from the fake SMTP server's outbox). */
  invitationToken(): Promise<string>;
  /** A stored catalog version of the demo organisation; its file adds `addedEntryId`. */
  catalogUpload(): Promise<{ uploadId: number; addedEntryId: string }>;
  /** A mail with one attachment in the development outbox. */
  mailAttachment(): Promise<{ mailId: number; index: number }>;
  /** A new layout on the scratch site (the hardware suggestion), sent for review and approved by the demo engineer; each loop with a passing reading per test. */
  approvedLayout(): Promise<{ layoutId: number; loops: { boardKey: string; input: number; readings: { test: string; reading: string }[] }[] }>;
  /** An approved layout on which the demo engineer recorded a passing reading for every test of every loop. */
  passedLayout(): Promise<{ layoutId: number }>;
  /** A photo on an approved layout, uploaded by the demo engineer. */
  photo(): Promise<{ layoutId: number; photoId: number }>;
  /** A small JPEG photo of terminations. */
  photoFile(): FilePart;
  /** A floor plan image (a PNG header naming 2000 × 1000 pixels). */
  planFile(): FilePart;
  /** A new site with two floors, a calibrated plan on each, a detector placed on the first and the panel on the second. */
  floorPlans(): Promise<{ siteId: number; floorId: number; planIds: [number, number]; detectorId: string; detectorItemId: number; panelItemId: number }>;
  /** A catalog file the shipped catalog accepts. */
  goodCatalogFile(): FilePart;
  /** A unique e-mail address under .example. */
  uniqueEmail(prefix: string): string;
  /** The token of the e-mail confirmation link of a fresh sign-up (read from the outbox). */
  confirmationToken(): Promise<string>;
  /** The token of a password reset link for a fresh throwaway account (read from the outbox). */
  resetToken(): Promise<string>;
  /** A fresh member with the caller's role in the caller's organisation (the demo one for a signed-out or role-less caller). */
  throwawayMember(caller: Caller): Promise<{ email: string; password: string }>;
  /** A fresh invitation to the demo organisation (as installer) for `email`, and its token. */
  invitationFor(email: string): Promise<string>;
  /** The current settings of the caller's organisation, so that saving them changes nothing. */
  organisationSettings(caller: Caller): Promise<Record<string, unknown>>;
}

export interface BuildContext {
  caller: Caller;
  demo: DemoObjects;
  fixtures: Fixtures;
}

export interface RouteEntry {
  method: Method;
  /** The route file's folder under app/, route groups dropped: /api/sites/[siteId]/layouts */
  path: string;
  access: Access;
  /** What the request carries; "json" entries are fuzzed. */
  body: "none" | "json" | "multipart" | "form";
  /** Status of a valid request by a caller the permission allows. */
  success: number;
  /** Names an object of an organisation (path id, or a catalog entry only an upload has): another organisation's member gets 404. */
  orgScoped: boolean;
  /** A valid request; for orgScoped entries it names the demo organisation's objects. */
  build(ctx: BuildContext): Promise<RequestSpec>;
  /** Fuzz: top-level body keys whose absence makes the body invalid. */
  requiredKeys?: string[];
  /** Fuzz: dotted paths of numbers that may be negative (a temperature), left out of the negative-number mutation. */
  negativeAllowed?: string[];
  /** Why the route exists or behaves as it does, when it is not plain. */
  note?: string;
}

/** Registry key of a route method: "PUT /api/layouts/[layoutId]". */
export const routeKey = (e: { method: string; path: string }) => `${e.method} ${e.path}`;
