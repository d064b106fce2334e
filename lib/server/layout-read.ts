import "server-only";
import { QueryTypes } from "sequelize";
import { db } from "./db";
import { notFound } from "./errors";
import type { Actor } from "./session";

// GET /api/layouts/:id, the editor's most frequent request: one query, and the current revision's document sent
// as the text the database holds (no model objects, no JSON parse and stringify of a 50 KiB document). The body is
// the same JSON getLayout() answers with. The ETag names what can change the answer: the version (every save),
// the review status and the archive time (both change without a new version).

interface Row {
  id: number;
  siteId: number;
  name: string;
  status: string;
  version: number;
  currentRevision: number;
  createdAt: Date;
  updatedAt: Date;
  archivedAt: Date | null;
  summary: string;
  document: string;
}

export interface StoredLayoutRead {
  etag: string;
  /** The JSON body: { layout, document }, the document spliced in as stored. */
  body: string;
}

export function layoutEtag(r: { id: number; version: number; status: string; archivedAt: Date | null }): string {
  return `"L${r.id}-v${r.version}-${r.status}-${r.archivedAt ? r.archivedAt.getTime() : 0}"`;
}

/** Whether an If-None-Match header names this ETag (a list, weak forms and * included: RFC 9110 13.1.2). */
export function etagMatches(ifNoneMatch: string | null, etag: string): boolean {
  if (!ifNoneMatch) return false;
  if (ifNoneMatch.trim() === "*") return true;
  return ifNoneMatch.split(",").some((t) => t.trim().replace(/^W\//, "") === etag);
}

const SQL = `SELECT l.id, l.site_id AS siteId, l.name, l.status, l.version, l.current_revision AS currentRevision, l.created_at AS createdAt,
  l.updated_at AS updatedAt, l.archived_at AS archivedAt, CAST(r.summary AS CHAR) AS summary, CAST(r.document AS CHAR) AS document
  FROM layouts l
  JOIN sites s ON s.id = l.site_id AND s.organisation_id = ?
  JOIN layout_revisions r ON r.layout_id = l.id AND r.revision = l.current_revision
  WHERE l.id = ?`;

/** The layout (only if its site is the actor's organisation's) and its current revision, as the response body. */
export async function readStoredLayout(actor: Actor, layoutId: number): Promise<StoredLayoutRead> {
  const rows = await db().query<Row>(SQL, { replacements: [actor.organisationId, layoutId], type: QueryTypes.SELECT });
  const r = rows[0];
  if (!r) throw notFound("That layout");
  const meta = {
    id: r.id,
    siteId: r.siteId,
    name: r.name,
    status: r.status,
    version: r.version,
    currentRevision: r.currentRevision,
    createdAt: r.createdAt.toISOString(),
    updatedAt: r.updatedAt.toISOString(),
    archivedAt: r.archivedAt ? r.archivedAt.toISOString() : null,
    hasApproval: false,
  };
  // summary goes in the meta's place getLayout() gives it (after updatedAt); JSON key order is not significant,
  // but one shape for both keeps answers comparable byte for byte in tests
  const { archivedAt, hasApproval, ...head } = meta;
  const layout = `${JSON.stringify(head).slice(0, -1)},"summary":${r.summary},"archivedAt":${JSON.stringify(archivedAt)},"hasApproval":${hasApproval}}`;
  return { etag: layoutEtag(r), body: `{"layout":${layout},"document":${r.document}}` };
}
