// The pure core of `POST /api/loops/analyze`: validate, resolve the input type, analyse.
import type { InputType } from "@/lib/catalog/schema";
import { analyzeLoop } from "./analyze-loop";
import { analyzeRequestSchema, type AnalyzeRequest } from "./loop-schema";
import { inputTypeProblems } from "./loop-problems";
import type { LoopAnalysis, LoopSpec } from "./types";

export interface RequestIssue {
  /** Dotted path into the request body, e.g. "loop.cable.lengthM". */
  path: string;
  message: string;
}

export type AnalyzeRequestResult =
  | { ok: true; inputType: InputType; loop: LoopSpec; analysis: LoopAnalysis }
  | { ok: false; status: 400 | 404; issues: RequestIssue[] };

export type InputTypeLookup = (id: string) => InputType | undefined | null;

const dotted = (path: readonly PropertyKey[]) => path.map(String).join(".");

function parse(body: unknown): { ok: true; req: AnalyzeRequest } | { ok: false; status: 400; issues: RequestIssue[] } {
  const r = analyzeRequestSchema.safeParse(body);
  if (!r.success) return { ok: false, status: 400, issues: r.error.issues.map((i) => ({ path: dotted(i.path), message: i.message })) };
  return { ok: true, req: r.data };
}

function finish(req: AnalyzeRequest, inputType: InputType | undefined | null, id: string | null): AnalyzeRequestResult {
  if (!inputType) return { ok: false, status: 404, issues: [{ path: "inputType", message: `no input type with id "${id}"` }] };
  const loop = req.loop as LoopSpec;
  if (id !== null) {
    const problems = inputTypeProblems(loop, inputType);
    if (problems.length) return { ok: false, status: 400, issues: problems.map((p) => ({ path: dotted(["loop", ...p.path]), message: p.message })) };
  }
  return { ok: true, inputType, loop, analysis: analyzeLoop(loop, inputType, req.target) };
}

/** Validate the body, look the input type up by id when one is given, and analyse the loop. */
export function analyzeRequest(body: unknown, lookupInputType: InputTypeLookup): AnalyzeRequestResult {
  const p = parse(body);
  if (!p.ok) return p;
  const ref = p.req.inputType;
  return typeof ref === "string" ? finish(p.req, lookupInputType(ref), ref) : finish(p.req, ref, null);
}

/** The same, for a lookup that goes to the database. */
export async function analyzeRequestAsync(body: unknown, lookupInputType: (id: string) => Promise<InputType | undefined | null> | InputType | undefined | null): Promise<AnalyzeRequestResult> {
  const p = parse(body);
  if (!p.ok) return p;
  const ref = p.req.inputType;
  return typeof ref === "string" ? finish(p.req, await lookupInputType(ref), ref) : finish(p.req, ref, null);
}
