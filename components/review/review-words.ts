import type { ReviewStep } from "@/lib/review/review-schema";

// Button labels and what each review step does, in plain words.
export const STEP_LABELS: Record<ReviewStep, string> = {
  submit: "Send for review",
  withdraw: "Take back to draft",
  approve: "Approve",
  reject: "Send back to draft",
  commission: "Mark commissioned",
};

export const STEP_HINTS: Record<ReviewStep, string> = {
  submit: "The layout is frozen while an engineer reviews it.",
  withdraw: "Back to draft so it can be changed; send it again afterwards.",
  approve: "Freezes this revision: it is the one to wire and commission. Later changes make a new draft.",
  reject: "Back to draft with your reason, so its author knows what to change.",
  commission: "Closes the commissioning record; needs every loop passed.",
};

export const DECISION_WORDS: Record<string, string> = {
  submit: "sent for review",
  withdraw: "taken back to draft",
  approve: "approved",
  reject: "sent back to draft",
  commission: "marked commissioned",
  choose: "chosen among compared layouts",
};


export function targetText(t: unknown, boardName: (key: string) => string): string | null {
  const x = t as { kind?: string; boardKey?: string; input?: number; detectorId?: string } | null;
  if (!x || x.kind === "layout" || !x.kind) return null;
  if (x.kind === "board") return boardName(x.boardKey ?? "");
  if (x.kind === "input") return `${boardName(x.boardKey ?? "")}, input ${x.input}`;
  if (x.kind === "detector") return `detector ${x.detectorId}`;
  return null;
}
