// How each report and row status looks on the bench: colours from the app theme, one word each.
import type { Report } from "@/lib/catalog/schema";
import { REPORT_WORDS } from "@/lib/loop";
import type { RowStatus } from "./bench-state";

export const REPORT_CLASS: Record<Report, string> = {
  normal: "bg-signal text-white",
  active: "bg-warn text-white",
  "active-a": "bg-warn text-white",
  "active-b": "bg-warn text-white",
  "active-both": "bg-warn text-white",
  short: "bg-fault text-white",
  open: "bg-fault text-white",
  trouble: "bg-fault-soft text-fault ring-1 ring-inset ring-fault",
};

/** Band fills for the band strip (SVG). */
export const REPORT_FILL: Record<Report, string> = {
  normal: "#0f6e6e",
  active: "#9a5b00",
  "active-a": "#b8741a",
  "active-b": "#8a4f00",
  "active-both": "#6b3d00",
  short: "#b42318",
  open: "#7a1a12",
  trouble: "#f3c2bd",
};

export const reportWord = (r: Report) => REPORT_WORDS[r];

export const STATUS_WORDS: Record<RowStatus, string> = {
  ok: "right",
  uncertain: "uncertain",
  misread: "misread",
  defeat: "defeat",
};

export const STATUS_CLASS: Record<RowStatus, string> = {
  ok: "text-signal",
  uncertain: "text-warn",
  misread: "text-fault",
  defeat: "text-fault font-semibold",
};

export const STATUS_MARK: Record<RowStatus, string> = { ok: "✓", uncertain: "≈", misread: "✗", defeat: "✗" };
