import "server-only";
import { createHash } from "node:crypto";
import type { Transaction } from "sequelize";
import { bindModels } from "./db";
import { effectiveCatalogInfo } from "./catalogs";
import { loadSchedule } from "./schedules";
import type { Actor } from "./session";
import { RevisionSnapshot } from "@/models";
import { completeCatalog, type Catalog } from "@/lib/catalog/schema";
import { loopJsonReplacer, loopJsonReviver } from "@/lib/loop/loop-json";
import type { Schedule } from "@/lib/schedule/schema";

// The schedule and catalog a revision was solved against, frozen when it is sent for review (and at approval
// when an older record has none). An approved or commissioned revision is read from this copy from then on:
// later schedule edits and catalog uploads never change what was approved.

export interface FrozenInputs {
  schedule: Schedule;
  catalog: Catalog;
  catalogVersion: number | null;
  takenAt: string;
}

// JSON has no Infinity; the catalog's open-ended values travel as the string "Infinity" (lib/loop/loop-json.ts).
const encode = (v: unknown) => JSON.parse(JSON.stringify(v, loopJsonReplacer)) as unknown;
const decode = <T>(v: unknown): T => JSON.parse(typeof v === "string" ? v : JSON.stringify(v), loopJsonReviver) as T;

/** Freeze the live schedule of the layout's site and the organisation's catalog as this revision's inputs (replacing an earlier copy). */
export async function takeSnapshot(actor: Actor, layoutId: number, siteId: number, revision: number, transaction: Transaction): Promise<void> {
  bindModels();
  const [schedule, info] = await Promise.all([loadSchedule(siteId, transaction), effectiveCatalogInfo(actor.organisationId)]);
  const catalog = encode(info.catalog);
  const catalogSha256 = createHash("sha256").update(JSON.stringify(catalog)).digest("hex");
  await RevisionSnapshot.upsert(
    { layoutId, revision, schedule: encode(schedule), catalog, catalogVersion: info.upload?.version ?? null, catalogSha256, takenAt: new Date(), takenBy: actor.userId },
    { transaction },
  );
}

export async function hasSnapshot(layoutId: number, revision: number, transaction?: Transaction): Promise<boolean> {
  bindModels();
  return (await RevisionSnapshot.count({ where: { layoutId, revision }, transaction })) > 0;
}

/** The frozen inputs of a revision, or null when none were taken (a draft, or an approval older than snapshots). */
export async function frozenInputs(layoutId: number, revision: number, transaction?: Transaction): Promise<FrozenInputs | null> {
  bindModels();
  const row = await RevisionSnapshot.findOne({ where: { layoutId, revision }, transaction });
  if (!row) return null;
  return { schedule: decode<Schedule>(row.schedule), catalog: completeCatalog(decode<Partial<Catalog>>(row.catalog)), catalogVersion: row.catalogVersion, takenAt: row.takenAt.toISOString() };
}
