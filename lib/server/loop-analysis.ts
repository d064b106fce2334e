import "server-only";
import type { InputType } from "@/lib/catalog/schema";
import { analyzeRequest, type AnalyzeRequest, type LoopAnalysis } from "@/lib/loop";
import { effectiveCatalogFor } from "./catalogs";
import { ApiError } from "./errors";

// The loop bench and POST /api/loops/analyze: input types come from the organisation's effective catalog
// (shipped plus its upload), so an uploaded input type can be analysed by id.

/** The input types of the organisation's catalog, by id. */
export async function loopInputTypesFor(organisationId: number): Promise<InputType[]> {
  const catalog = await effectiveCatalogFor(organisationId);
  return [...catalog.inputTypes].sort((a, b) => a.id.localeCompare(b.id));
}

/** Analyse a parsed request; 404 for an input type id the organisation's catalog lacks, 422 for a loop it can't take. */
export async function analyzeLoopFor(organisationId: number, body: AnalyzeRequest): Promise<LoopAnalysis> {
  const inputTypes = typeof body.inputType === "string" ? (await effectiveCatalogFor(organisationId)).inputTypes : [];
  const r = analyzeRequest(body, (id) => inputTypes.find((t) => t.id === id));
  if (r.ok) return r.analysis;
  if (r.status === 404) throw new ApiError(404, `No input type "${String(body.inputType)}" in your organisation's catalog.`, r.issues);
  throw new ApiError(422, "This loop can't be analysed as described.", r.issues);
}
