import type { DetectorCategory, Report, WiringScheme } from "@/lib/catalog/schema";
import type { Placement } from "@/lib/loop/types";
import type { SupervisionPreference } from "@/lib/schedule/schema";

// The one vocabulary for the words a user reads (GLOSSARY.md): the screens, the terminal sheet, its PDF, the
// CSV exports and the findings all take them from here. Lower case, to sit inside a sentence; `sentence()` when
// one starts a label.

export const SCHEME_WORDS: Record<WiringScheme, string> = {
  none: "no resistor",
  "single-eol": "single end-of-line",
  "double-eol": "double end-of-line",
  shared: "shared input",
};

/** Where the supervision resistors sit. */
export const PLACEMENT_WORDS: Record<Placement, string> = {
  "at-detector": "resistor at the detector",
  "at-panel": "resistor at the panel",
  "loop-back": "loop-back resistor",
};

/** What the panel makes of a reading. */
export const REPORT_WORDS: Record<Report, string> = {
  short: "short",
  normal: "normal",
  active: "active (alarm)",
  "active-a": "detector A active",
  "active-b": "detector B active",
  "active-both": "both detectors active",
  open: "open / cut",
  trouble: "trouble",
};

export const CATEGORY_WORDS: Record<DetectorCategory, string> = {
  "door-contact": "door contact",
  "window-contact": "window contact",
  motion: "motion detector",
  "glass-break": "glass-break detector",
  vibration: "vibration detector",
  panic: "hold-up button",
  water: "flood detector",
  temperature: "temperature detector",
  smoke: "smoke detector",
  heat: "heat detector",
};

/** The supervision a designer asks for on a schedule row: a scheme, or leave to share. */
export const SUPERVISION_WORDS: Record<SupervisionPreference, string> = {
  "double-eol": SCHEME_WORDS["double-eol"],
  "single-eol": SCHEME_WORDS["single-eol"],
  "shared-ok": "may share an input",
  none: SCHEME_WORDS.none,
};

/** The word with a capital first letter, to start a label or a sentence. */
export function sentence(word: string): string {
  return word.charAt(0).toUpperCase() + word.slice(1);
}

/** A word map with every word capitalised, for screens whose labels stand alone. */
export function sentenceWords<K extends string>(words: Record<K, string>): Record<K, string> {
  return Object.fromEntries(Object.entries<string>(words).map(([k, w]) => [k, sentence(w)])) as Record<K, string>;
}

/** How an input is wired, to follow "is": "wired single end-of-line", "wired as a shared input", "wired with no resistor". */
export function wiredWords(scheme: WiringScheme): string {
  if (scheme === "shared") return "wired as a shared input";
  if (scheme === "none") return "wired with no resistor";
  return `wired ${SCHEME_WORDS[scheme]}`;
}

/** The wiring faults the engine injects, in words. */
export const FAULT_WORDS: Record<"short-panel" | "short-detector" | "cut", string> = {
  "short-panel": "a short at the panel end",
  "short-detector": "a short at the detector end",
  cut: "a cut conductor",
};

/** The kinds of board a layout holds, in words. */
export const BOARD_KIND_WORDS: Record<"expansion" | "keypad" | "supply" | "outputs" | "receiver", string> = {
  expansion: "expansion board",
  keypad: "keypad",
  supply: "power supply",
  outputs: "output module",
  receiver: "wireless receiver",
};

/** What an audit entry records, as the audit log shows it. */
export const AUDIT_ACTION_WORDS: Record<string, string> = {
  "catalog.upload": "catalog uploaded",
  "commissioning.photo": "commissioning photo added",
  "commissioning.reading": "commissioning reading recorded",
  "demo.seed": "demo data added",
  "layout.choose": "layout chosen",
  "layout.comment": "comment on a layout",
  "layout.create": "layout created",
  "layout.delete": "layout deleted",
  "layout.restore": "earlier revision restored",
  "layout.save": "layout saved",
  "layout.review.submit": "layout sent for review",
  "layout.review.withdraw": "layout withdrawn from review",
  "layout.review.approve": "layout approved",
  "layout.review.reject": "layout sent back",
  "layout.review.edit": "approved layout reopened as a draft",
  "layout.review.commission": "layout marked commissioned",
  "member.invite": "member invited",
  "member.join": "member joined",
  "member.role": "member's role changed",
  "schedule.create": "detector added to the schedule",
  "schedule.delete": "detectors deleted from the schedule",
  "schedule.import": "device schedule imported",
  "schedule.update": "device schedule changed",
  "sheet.send": "terminal sheet sent",
  "site.create": "site created",
  "site.update": "site changed",
};

/** The kind of thing an audit entry is about. */
export const AUDIT_ENTITY_WORDS: Record<string, string> = { invitation: "invitation", layout: "layout", membership: "member", organisation: "organisation", organisation_catalog: "catalog", schedule_detector: "detector", site: "site" };

/** Zone types in the trade's words. */
export const ZONE_TYPE_WORDS: Record<"instant" | "entry-exit" | "24-hour" | "hold-up" | "fire" | "tamper" | "technical", string> = {
  instant: "instant",
  "entry-exit": "entry/exit",
  "24-hour": "24-hour",
  "hold-up": "hold-up",
  fire: "fire",
  tamper: "tamper",
  technical: "technical",
};

/** Output purposes and switching in words: "siren output", "programmable output"; "relay", "transistor". */
export const OUTPUT_PURPOSE_WORDS: Record<"siren" | "programmable", string> = { siren: "siren output", programmable: "programmable output" };
