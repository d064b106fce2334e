import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { can, roles, type Role } from "@/lib/auth/permissions";
import { availableActions, REVIEW_ACTIONS, REVIEW_STATES, secondReview, transition, type ReviewAction, type ReviewState, type TransitionContext } from "@/lib/review/state-machine";

const as = (role: Role, extra: Partial<TransitionContext> = {}): TransitionContext => ({ can: (p) => can(role, p), ...extra });
const allPassed = { loops: 3, passed: 3 };

describe("legal transitions", () => {
  const legal: [ReviewState, ReviewAction, Role, ReviewState, boolean, Partial<TransitionContext>?][] = [
    ["draft", "edit", "designer", "draft", false],
    ["draft", "submit", "designer", "in-review", false],
    ["in-review", "withdraw", "designer", "draft", false],
    ["in-review", "approve", "engineer", "approved", false],
    ["in-review", "reject", "engineer", "draft", false, { reason: "Input 3 needs double end-of-line" }],
    ["approved", "commission", "installer", "commissioned", false, { commissioning: allPassed }],
    ["approved", "commission", "engineer", "commissioned", false, { commissioning: allPassed }],
    ["approved", "edit", "designer", "draft", true],
    ["commissioned", "edit", "engineer", "draft", true],
  ];
  for (const [from, action, role, to, newDraft, extra] of legal)
    it(`${from} --${action} (${role})--> ${to}${newDraft ? " as a new draft" : ""}`, () => {
      expect(transition(from, action, as(role, extra))).toMatchObject({ ok: true, from, to, newDraft });
    });
});

describe("illegal transitions are refused with a reason", () => {
  it("refuses every action from a state it does not start from, whoever asks", () => {
    const allowedFrom: Record<ReviewAction, ReviewState[]> = {
      edit: ["draft", "approved", "commissioned"],
      submit: ["draft"],
      withdraw: ["in-review"],
      approve: ["in-review"],
      reject: ["in-review"],
      commission: ["approved"],
    };
    let refused = 0;
    for (const from of REVIEW_STATES)
      for (const action of REVIEW_ACTIONS) {
        if (allowedFrom[action].includes(from)) continue;
        const r = transition(from, action, { can: () => true, reason: "x", commissioning: allPassed });
        expect(r, `${from} ${action}`).toMatchObject({ ok: false, code: "wrong-state" });
        if (!r.ok) expect(r.reason.length).toBeGreaterThan(10);
        refused++;
      }
    expect(refused).toBe(6 * 4 - 8); // 8 (state, action) pairs are legal
  });
  it("says why editing a layout in review is refused", () => {
    const r = transition("in-review", "edit", as("designer"));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.reason).toMatch(/take it back to draft/);
  });
  it("lets only engineers approve or send back (layout:approve)", () => {
    for (const role of ["admin", "designer", "installer"] as Role[]) {
      expect(transition("in-review", "approve", as(role))).toMatchObject({ ok: false, code: "permission", permission: "layout:approve" });
      expect(transition("in-review", "reject", as(role, { reason: "r" }))).toMatchObject({ ok: false, code: "permission" });
    }
  });
  it("does not let an installer submit (layout:submit)", () => {
    expect(transition("draft", "submit", as("installer"))).toMatchObject({ ok: false, code: "permission", permission: "layout:submit" });
  });
  it("needs a reason to send a layout back", () => {
    expect(transition("in-review", "reject", as("engineer"))).toMatchObject({ ok: false, code: "reason-required" });
    expect(transition("in-review", "reject", as("engineer", { reason: "   " }))).toMatchObject({ ok: false, code: "reason-required" });
  });
  it("commissions only when every loop has passed", () => {
    expect(transition("approved", "commission", as("engineer"))).toMatchObject({ ok: false, code: "commissioning-incomplete" });
    expect(transition("approved", "commission", as("engineer", { commissioning: { loops: 0, passed: 0 } }))).toMatchObject({ ok: false, code: "commissioning-incomplete" });
    const r = transition("approved", "commission", as("engineer", { commissioning: { loops: 5, passed: 4 } }));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.reason).toBe("1 of 5 loops has not passed commissioning yet.");
    expect(transition("approved", "commission", as("designer", { commissioning: allPassed }))).toMatchObject({ ok: false, code: "permission" });
  });
  it("lists the actions a role can take now, with reasons for the rest", () => {
    const list = availableActions("in-review", as("engineer"));
    expect(list.filter((a) => a.allowed).map((a) => a.action)).toEqual(["withdraw", "approve", "reject"]);
    expect(list.find((a) => a.action === "commission")?.reason).toMatch(/still in review/);
  });
});

describe("random sequences of actions", () => {
  const step = fc.record({
    action: fc.constantFrom(...REVIEW_ACTIONS),
    role: fc.constantFrom(...roles),
    reason: fc.option(fc.string({ maxLength: 5 }), { nil: undefined }),
    loops: fc.nat(4),
    passed: fc.nat(4),
  });
  it("always stays in one of the four states; commissioned only comes straight after approved, approved only after in-review", () => {
    fc.assert(
      fc.property(fc.array(step, { maxLength: 40 }), (steps) => {
        let state: ReviewState = "draft";
        for (const s of steps) {
          const r = transition(state, s.action, as(s.role, { reason: s.reason, commissioning: { loops: s.loops, passed: Math.min(s.passed, s.loops) } }));
          if (!r.ok) {
            expect(r.reason.length).toBeGreaterThan(0);
            continue;
          }
          if (r.to === "commissioned") {
            expect(state).toBe("approved");
            expect(s.loops).toBeGreaterThan(0);
            expect(Math.min(s.passed, s.loops)).toBe(s.loops);
          }
          if (r.to === "approved") {
            expect(state).toBe("in-review");
            expect(s.role).toBe("engineer");
          }
          // A change to a frozen layout makes a new draft; follow that draft.
          state = r.to;
          expect(REVIEW_STATES).toContain(state);
        }
      }),
      { numRuns: 500 },
    );
  });
});

describe("a second pair of eyes", () => {
  const people = fc.option(fc.integer({ min: 1, max: 4 }), { nil: null });
  it("lets the approver through only when they neither sent nor made the revision, unless solo approval is allowed (then labelled solo)", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 4 }), people, people, fc.boolean(), (actorId, submittedBy, lastChangedBy, allowSolo) => {
        const own = submittedBy === actorId || lastChangedBy === actorId;
        const r = secondReview({ actorId, submittedBy, lastChangedBy, allowSolo });
        expect(r.ok).toBe(!own || allowSolo);
        if (r.ok) expect(r.solo).toBe(own);
        else expect(r.reason).toMatch(/someone else must approve it/);
      }),
      { numRuns: 500 },
    );
  });
  it("refuses the approval step with its own code, after the state and permission checks", () => {
    const authorship = { actorId: 7, submittedBy: 7, lastChangedBy: 3, allowSolo: false };
    expect(transition("in-review", "approve", as("engineer", { authorship }))).toMatchObject({ ok: false, code: "same-person" });
    expect(transition("in-review", "approve", as("designer", { authorship }))).toMatchObject({ ok: false, code: "permission" });
    expect(transition("draft", "approve", as("engineer", { authorship }))).toMatchObject({ ok: false, code: "wrong-state" });
    expect(transition("in-review", "approve", as("engineer", { authorship: { ...authorship, allowSolo: true } }))).toMatchObject({ ok: true, to: "approved" });
  });
});
