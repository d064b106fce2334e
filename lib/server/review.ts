import "server-only";
import { makeFormat } from "@/lib/format/format";
import { Op } from "sequelize";
import { db } from "./db";
import { audit } from "./audit";
import { ApiError, conflict, notFound } from "./errors";
import { findSite } from "./sites";
import { catalogFor, ensureCan, loadSchedule } from "./schedules";
import { findLayoutForReview, isFrozenRevision, type LayoutRef } from "./sheets";
import { progressOf } from "./commissioning";
import type { Actor } from "./session";
import { frozenInputs, takeSnapshot, hasSnapshot } from "./snapshots";
import { Layout, LayoutComment, LayoutDecision, LayoutReview, LayoutRevision, Organisation, User } from "@/models";
import type { Transaction } from "sequelize";
import { can } from "@/lib/auth/permissions";
import { compareLayouts, type LayoutComparison } from "@/lib/compare/compare-layouts";
import { layoutDocumentSchema } from "@/lib/layout/schema";
import { effectiveReview, SOLO_APPROVAL_WORDS, type EffectiveReview } from "@/lib/review/effective-state";
import type { ChooseLayoutInput, CommentInput, ReviewActionInput } from "@/lib/review/review-schema";
import { availableActions, secondReview, transition, type Authorship, type ReviewAction, type TransitionContext } from "@/lib/review/state-machine";

// The review of a layout: send for review, approve or send back with a reason, mark commissioned; comments;
// and the decision log, which also records the choice among compared layouts.

export interface CommentView {
  id: number;
  revision: number;
  author: string | null;
  body: string;
  target: unknown;
  createdAt: string;
}

export interface DecisionView {
  id: number;
  layoutId: number;
  revision: number;
  kind: string;
  reason: string;
  comparedLayoutIds: number[] | null;
  decidedBy: string | null;
  createdAt: string;
}

export interface ReviewView {
  layoutId: number;
  siteId: number;
  name: string;
  review: EffectiveReview;
  /** Every step with whether the actor can take it now and, if not, why. */
  actions: ReturnType<typeof availableActions>;
  comments: CommentView[];
  decisions: DecisionView[];
}

const commentView = (c: LayoutComment & { author?: User | null }): CommentView => ({ id: c.id, revision: c.revision, author: c.author?.name ?? null, body: c.body, target: c.target ?? null, createdAt: c.createdAt.toISOString() });
const decisionView = (d: LayoutDecision & { decider?: User | null }): DecisionView => ({
  id: d.id,
  layoutId: d.layoutId,
  revision: d.revision,
  kind: d.kind,
  reason: d.reason,
  comparedLayoutIds: d.comparedLayoutIds ?? null,
  decidedBy: d.decider?.name ?? null,
  createdAt: d.createdAt.toISOString(),
});

function contextFor(actor: Actor, extra: Partial<TransitionContext> = {}): TransitionContext {
  return { can: (p) => can(actor.role, p), ...extra };
}

/** Who sent the revision in review and who made it, and whether the organisation allows one person to approve their own. */
async function authorshipOf(actor: Actor, ref: LayoutRef, transaction?: Transaction): Promise<Authorship> {
  const [revision, org] = await Promise.all([
    LayoutRevision.findOne({ where: { layoutId: ref.layout.id, revision: ref.layout.currentRevision }, attributes: ["createdBy"], transaction }),
    Organisation.findByPk(actor.organisationId, { attributes: ["id", "soloApproval"], transaction }),
  ]);
  return { actorId: actor.userId, submittedBy: ref.submittedBy, lastChangedBy: revision?.createdBy ?? null, allowSolo: !!org?.soloApproval };
}

export async function getReview(actor: Actor, layoutId: number): Promise<ReviewView> {
  ensureCan(actor, "layout:read");
  const ref = await findLayoutForReview(actor, layoutId);
  return reviewView(actor, ref);
}

async function reviewView(actor: Actor, ref: LayoutRef): Promise<ReviewView> {
  const [comments, decisions, progress, authorship] = await Promise.all([
    LayoutComment.findAll({ where: { layoutId: ref.layout.id }, include: [{ model: User, as: "author", attributes: ["name"] }], order: [["id", "ASC"]] }),
    LayoutDecision.findAll({ where: { layoutId: ref.layout.id }, include: [{ model: User, as: "decider", attributes: ["name"] }], order: [["id", "ASC"]] }),
    ref.review.state === "approved" ? progressOf(actor, ref) : Promise.resolve(null),
    ref.review.state === "in-review" ? authorshipOf(actor, ref) : Promise.resolve(undefined),
  ]);
  return {
    layoutId: ref.layout.id,
    siteId: ref.layout.siteId,
    name: ref.layout.name,
    review: ref.review,
    actions: availableActions(ref.review.state, contextFor(actor, { authorship, ...(progress ? { commissioning: { loops: progress.totals.loops, passed: progress.totals.passed } } : {}) })).filter((a) => a.action !== "edit"),
    comments: comments.map(commentView),
    decisions: decisions.map(decisionView),
  };
}

const STATUS_OF_REFUSAL = { permission: 403, "same-person": 403, "wrong-state": 409, "commissioning-incomplete": 409, "reason-required": 422 } as const;

/** Take one review step, under a lock on the layout so two reviewers cannot both act on one state. */
export async function reviewAction(actor: Actor, layoutId: number, input: ReviewActionInput): Promise<ReviewView> {
  const action: ReviewAction = input.action;
  await db().transaction(async (transaction) => {
    const ref = await findLayoutForReview(actor, layoutId, transaction, true);
    const { layout, review } = ref;
    if (input.revision !== undefined && input.revision !== layout.currentRevision)
      throw conflict(`The layout has changed since you opened it (you looked at revision ${input.revision}, it is now revision ${layout.currentRevision}).`, { currentRevision: layout.currentRevision });
    const extra: Partial<TransitionContext> = { reason: input.reason };
    if (action === "approve") extra.authorship = await authorshipOf(actor, ref, transaction);
    if (action === "commission" && review.state === "approved") {
      const p = await progressOf(actor, ref, transaction);
      extra.commissioning = { loops: p.totals.loops, passed: p.totals.passed };
    }
    const r = transition(review.state, action, contextFor(actor, extra));
    if (!r.ok) throw new ApiError(STATUS_OF_REFUSAL[r.code], r.reason, undefined, { code: r.code, state: review.state });
    const now = new Date();
    const rev = layout.currentRevision;
    const second = action === "approve" && extra.authorship ? secondReview(extra.authorship) : null;
    const solo = !!second?.ok && second.solo;
    // What was reviewed is frozen with the revision: the schedule and catalog it was solved against.
    if (action === "submit" || (action === "approve" && !(await hasSnapshot(layoutId, rev, transaction)))) await takeSnapshot(actor, layoutId, layout.siteId, rev, transaction);
    const stored = await LayoutReview.findByPk(layoutId, { transaction });
    const row = {
      layoutId,
      state: r.to,
      revision: rev,
      approvedRevision: action === "approve" ? rev : (stored?.approvedRevision ?? null),
      commissionedRevision: action === "commission" ? rev : (stored?.commissionedRevision ?? null),
      submittedBy: action === "submit" ? actor.userId : (stored?.submittedBy ?? null),
      submittedAt: action === "submit" ? now : (stored?.submittedAt ?? null),
      approvedBy: action === "approve" ? actor.userId : (stored?.approvedBy ?? null),
      approvedAt: action === "approve" ? now : (stored?.approvedAt ?? null),
      commissionedBy: action === "commission" ? actor.userId : (stored?.commissionedBy ?? null),
      commissionedAt: action === "commission" ? now : (stored?.commissionedAt ?? null),
      approvedSolo: action === "approve" ? solo : (stored?.approvedSolo ?? false),
    };
    if (stored) await stored.update(row, { transaction });
    else await LayoutReview.create(row, { transaction });
    // The layout list shows the state from the layout's own status column.
    await Layout.update({ status: r.to }, { where: { id: layoutId }, transaction, silent: true });
    const soloWords = solo ? `${SOLO_APPROVAL_WORDS[0].toUpperCase()}${SOLO_APPROVAL_WORDS.slice(1)}.` : "";
    const reason = [soloWords, input.reason?.trim() ?? ""].filter(Boolean).join(" ");
    await LayoutDecision.create({ layoutId, revision: rev, kind: action, reason, comparedLayoutIds: null, decidedBy: actor.userId }, { transaction });
    await audit(
      {
        organisationId: actor.organisationId,
        userId: actor.userId,
        action: `layout.review.${action}`,
        entityType: "layout",
        entityId: layoutId,
        detail: { revision: rev, from: review.state, to: r.to, reason: input.reason ?? null, ...(action === "approve" ? { secondReview: !solo, ...(solo ? { note: SOLO_APPROVAL_WORDS } : {}) } : {}) },
      },
      transaction,
    );
  });
  return getReview(actor, layoutId);
}

export async function addComment(actor: Actor, layoutId: number, input: CommentInput): Promise<CommentView> {
  ensureCan(actor, "layout:comment");
  const id = await db().transaction(async (transaction) => {
    const { layout } = await findLayoutForReview(actor, layoutId, transaction);
    const c = await LayoutComment.create({ layoutId, revision: layout.currentRevision, authorId: actor.userId, body: input.body, target: input.target ?? null }, { transaction });
    await audit({ organisationId: actor.organisationId, userId: actor.userId, action: "layout.comment", entityType: "layout", entityId: layoutId, detail: { commentId: c.id, revision: layout.currentRevision } }, transaction);
    return c.id;
  });
  const c = await LayoutComment.findByPk(id, { include: [{ model: User, as: "author", attributes: ["name"] }] });
  return commentView(c!);
}

export async function listComments(actor: Actor, layoutId: number): Promise<CommentView[]> {
  ensureCan(actor, "layout:read");
  await findLayoutForReview(actor, layoutId);
  const rows = await LayoutComment.findAll({ where: { layoutId }, include: [{ model: User, as: "author", attributes: ["name"] }], order: [["id", "ASC"]] });
  return rows.map(commentView);
}

/** Layouts of one site, all of the actor's organisation (404 for any that is not). */
async function siteLayouts(actor: Actor, siteId: number, layoutIds: number[]) {
  await findSite(actor, siteId);
  const rows = await Layout.findAll({ where: { id: { [Op.in]: layoutIds }, siteId } });
  if (rows.length !== new Set(layoutIds).size) throw notFound("One of those layouts");
  return layoutIds.map((id) => rows.find((r) => r.id === id)!);
}

export interface ComparisonView {
  siteId: number;
  layouts: { id: number; name: string; revision: number; status: string }[];
  comparison: LayoutComparison;
}

/** Compare a site's layouts (their current revisions) side by side. */
export async function compareSiteLayouts(actor: Actor, siteId: number, layoutIds: number[]): Promise<ComparisonView> {
  ensureCan(actor, "layout:read");
  const layouts = await siteLayouts(actor, siteId, layoutIds);
  const [revisions, reviews] = await Promise.all([
    LayoutRevision.findAll({ where: { [Op.or]: layouts.map((l) => ({ layoutId: l.id, revision: l.currentRevision })) }, attributes: ["layoutId", "document"] }),
    LayoutReview.findAll({ where: { layoutId: { [Op.in]: layoutIds } } }),
  ]);
  const [schedule, catalog] = await Promise.all([loadSchedule(siteId), catalogFor(actor.organisationId)]);
  // An approved or commissioned current revision is compared as it was approved: against its frozen inputs.
  const frozen = await Promise.all(
    layouts.map((l) => {
      const review = effectiveReview(reviews.find((r) => r.layoutId === l.id) ?? null, l.currentRevision);
      return isFrozenRevision(review, l.currentRevision) ? frozenInputs(l.id, l.currentRevision) : Promise.resolve(null);
    }),
  );
  const candidates = layouts.map((l, i) => {
    const f = frozen[i];
    return { id: l.id, name: l.name, layout: layoutDocumentSchema.parse(revisions.find((r) => r.layoutId === l.id)!.document), ...(f ? { frozen: { schedule: f.schedule, catalog: f.catalog } } : {}) };
  });
  return {
    siteId,
    layouts: layouts.map((l) => ({ id: l.id, name: l.name, revision: l.currentRevision, status: l.status })),
    comparison: compareLayouts(candidates, schedule, catalog, makeFormat(actor.settings).money),
  };
}

/** Record which of the compared layouts was chosen, and why. */
export async function chooseLayout(actor: Actor, siteId: number, input: ChooseLayoutInput): Promise<DecisionView> {
  ensureCan(actor, "layout:write");
  const id = await db().transaction(async (transaction) => {
    const layouts = await siteLayouts(actor, siteId, input.comparedLayoutIds);
    const chosen = layouts.find((l) => l.id === input.chosenLayoutId)!;
    const d = await LayoutDecision.create({ layoutId: chosen.id, revision: chosen.currentRevision, kind: "choose", reason: input.reason, comparedLayoutIds: input.comparedLayoutIds, decidedBy: actor.userId }, { transaction });
    await audit({ organisationId: actor.organisationId, userId: actor.userId, action: "layout.choose", entityType: "layout", entityId: chosen.id, detail: { siteId, revision: chosen.currentRevision, comparedLayoutIds: input.comparedLayoutIds, reason: input.reason } }, transaction);
    return d.id;
  });
  const d = await LayoutDecision.findByPk(id, { include: [{ model: User, as: "decider", attributes: ["name"] }] });
  return decisionView(d!);
}

/** The decision log of a site's layouts: review steps and choices, newest first. */
export async function listSiteDecisions(actor: Actor, siteId: number): Promise<DecisionView[]> {
  ensureCan(actor, "layout:read");
  await findSite(actor, siteId);
  const ids = (await Layout.findAll({ where: { siteId }, attributes: ["id"] })).map((l) => l.id);
  if (!ids.length) return [];
  const rows = await LayoutDecision.findAll({ where: { layoutId: { [Op.in]: ids } }, include: [{ model: User, as: "decider", attributes: ["name"] }], order: [["id", "DESC"]], limit: 500 });
  return rows.map(decisionView);
}
