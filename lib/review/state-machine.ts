import { permissionTable, roleLabels, type Permission, type Role } from "@/lib/auth/permissions";
import { plural, pluralWord } from "@/lib/vocabulary/plural";

// The review life of a layout: draft → in-review → approved → commissioned.
// An approved (or commissioned) layout is frozen: a change is saved as a new draft, the approved one stays as it was.

export const REVIEW_STATES = ["draft", "in-review", "approved", "commissioned"] as const;
export type ReviewState = (typeof REVIEW_STATES)[number];

export const REVIEW_ACTIONS = ["edit", "submit", "withdraw", "approve", "reject", "commission"] as const;
export type ReviewAction = (typeof REVIEW_ACTIONS)[number];

export const REVIEW_STATE_WORDS: Record<ReviewState, string> = {
  draft: "draft",
  "in-review": "in review",
  approved: "approved",
  commissioned: "commissioned",
};

export const REVIEW_ACTION_WORDS: Record<ReviewAction, string> = {
  edit: "change the layout",
  submit: "send it for review",
  withdraw: "take it back to draft",
  approve: "approve it",
  reject: "send it back to draft with comments",
  commission: "mark it commissioned",
};

interface Rule {
  from: readonly ReviewState[];
  to: ReviewState;
  permission: Permission;
  /** The change is saved as a new draft; the current layout keeps its state. */
  newDraft?: boolean;
}

const RULES: Record<ReviewAction, Rule> = {
  edit: { from: ["draft", "approved", "commissioned"], to: "draft", permission: "layout:write" },
  submit: { from: ["draft"], to: "in-review", permission: "layout:submit" },
  withdraw: { from: ["in-review"], to: "draft", permission: "layout:submit" },
  approve: { from: ["in-review"], to: "approved", permission: "layout:approve" },
  reject: { from: ["in-review"], to: "draft", permission: "layout:approve" },
  commission: { from: ["approved"], to: "commissioned", permission: "commissioning:record" },
};

/** Why an action cannot be taken from a state, in plain words. */
const FROM_REASONS: Partial<Record<ReviewAction, Partial<Record<ReviewState, string>>>> = {
  edit: { "in-review": "The layout is in review: take it back to draft first, or wait for the reviewer's decision." },
  submit: {
    "in-review": "The layout is already in review.",
    approved: "The layout is already approved.",
    commissioned: "The layout is already commissioned.",
  },
  withdraw: { draft: "The layout is a draft already.", approved: "An approved layout cannot be taken back; change it to start a new draft.", commissioned: "A commissioned layout cannot be taken back; change it to start a new draft." },
  approve: { draft: "Only a layout in review can be approved: send it for review first.", approved: "The layout is already approved.", commissioned: "The layout is already commissioned." },
  reject: { draft: "Only a layout in review can be sent back.", approved: "An approved layout is frozen; change it to start a new draft.", commissioned: "A commissioned layout is frozen; change it to start a new draft." },
  commission: {
    draft: "Only an approved layout can be commissioned: it must be reviewed and approved first.",
    "in-review": "Only an approved layout can be commissioned: it is still in review.",
    commissioned: "The layout is already commissioned.",
  },
};

export interface CommissioningProgress {
  /** Used inputs of the layout (loops to test). */
  loops: number;
  /** Loops whose every test reading passed. */
  passed: number;
}

export interface TransitionContext {
  /** Whether the actor holds a permission (normally `(p) => can(actor.role, p)`). */
  can: (permission: Permission) => boolean;
  /** Needed to commission: every loop must have passed. */
  commissioning?: CommissioningProgress;
  /** Sending a layout back to draft needs a reason for its author. */
  reason?: string;
  /** Who sent the revision and who last changed it: the approver must be someone else, unless solo approval is allowed. */
  authorship?: Authorship;
}

export interface Authorship {
  actorId: number;
  submittedBy: number | null;
  /** The author of the revision under review. */
  lastChangedBy: number | null;
  /** The organisation lets one person both send and approve a layout. */
  allowSolo: boolean;
}

export type SecondReview = { ok: true; solo: boolean } | { ok: false; reason: string };

/** A second pair of eyes: the approver is neither the person who sent the revision for review nor the one who last changed it. */
export function secondReview(a: Authorship): SecondReview {
  const sent = a.submittedBy !== null && a.submittedBy === a.actorId;
  const changed = a.lastChangedBy !== null && a.lastChangedBy === a.actorId;
  if (!sent && !changed) return { ok: true, solo: false };
  if (a.allowSolo) return { ok: true, solo: true };
  const what = sent && changed ? "made the last change to this layout and sent it for review" : sent ? "sent this layout for review" : "made the last change to this layout";
  return { ok: false, reason: `You ${what}, so someone else must approve it: every approval needs a second pair of eyes. Ask another engineer to review it (an admin can allow one person to do both in the organisation's settings).` };
}

export type RefusalCode = "wrong-state" | "permission" | "commissioning-incomplete" | "reason-required" | "same-person";

export type TransitionResult =
  | { ok: true; action: ReviewAction; from: ReviewState; to: ReviewState; newDraft: boolean; permission: Permission }
  | { ok: false; action: ReviewAction; from: ReviewState; code: RefusalCode; reason: string; permission: Permission };

export function isReviewState(s: unknown): s is ReviewState {
  return typeof s === "string" && (REVIEW_STATES as readonly string[]).includes(s);
}

/** The required permission of an action. */
export function permissionFor(action: ReviewAction): Permission {
  return RULES[action].permission;
}

/**
 * Decide one action. The state check comes first (an action that makes no sense in a state is refused for
 * that reason whoever asks), then the permission, then the action's own condition.
 */
export function transition(from: ReviewState, action: ReviewAction, ctx: TransitionContext): TransitionResult {
  const rule = RULES[action];
  const permission = rule.permission;
  const refuse = (code: RefusalCode, reason: string): TransitionResult => ({ ok: false, action, from, code, reason, permission });
  if (!rule.from.includes(from))
    return refuse("wrong-state", FROM_REASONS[action]?.[from] ?? `A layout that is ${REVIEW_STATE_WORDS[from]} cannot ${REVIEW_ACTION_WORDS[action]}.`);
  if (!ctx.can(permission)) return refuse("permission", `Your role cannot ${REVIEW_ACTION_WORDS[action]}: only ${(permissionTable[permission] as readonly Role[]).map((r) => roleLabels[r].toLowerCase()).join(" or ")} members can.`);
  if (action === "approve" && ctx.authorship) {
    const second = secondReview(ctx.authorship);
    if (!second.ok) return refuse("same-person", second.reason);
  }
  if (action === "reject" && !(ctx.reason && ctx.reason.trim().length > 0))
    return refuse("reason-required", "Say why it goes back to draft, so its author knows what to change.");
  if (action === "commission") {
    const p = ctx.commissioning;
    if (!p || p.loops === 0) return refuse("commissioning-incomplete", "No loop has been tested yet: every used input needs its commissioning readings first.");
    if (p.passed < p.loops) {
      const left = p.loops - p.passed;
      return refuse("commissioning-incomplete", `${left} of ${plural(p.loops, "loop")} ${pluralWord(left, "has", "have")} not passed commissioning yet.`);
    }
  }
  const newDraft = action === "edit" && from !== "draft";
  return { ok: true, action, from, to: rule.to, newDraft, permission };
}

/** Every action with whether it can be taken now and, if not, why: for the buttons of a review panel. */
export function availableActions(from: ReviewState, ctx: TransitionContext): { action: ReviewAction; allowed: boolean; reason: string | null; newDraft: boolean }[] {
  return REVIEW_ACTIONS.map((action) => {
    // A reason is asked for when the reviewer sends it back, so it does not disable the button.
    const r = transition(from, action, action === "reject" ? { ...ctx, reason: ctx.reason || "(asked on sending)" } : ctx);
    return r.ok ? { action, allowed: true, reason: null, newDraft: r.newDraft } : { action, allowed: false, reason: r.reason, newDraft: false };
  });
}

/** Whether a layout in this state may be changed in place (only a draft may). */
export function isEditableInPlace(state: ReviewState): boolean {
  return state === "draft";
}
