import { formatGauge, type Schedule, type ScheduleDetector } from "@/lib/schedule/schema";

// How the live device schedule differs from the copy an approved revision was solved against. The approved
// sheet keeps reading its copy; this only tells the designer what a new draft would have to take in.

export type DifferenceKind = "changed" | "removed" | "added";

export interface FieldChange {
  field: string;
  was: string;
  now: string;
}

export interface DetectorDifference {
  id: string;
  label: string;
  kind: DifferenceKind;
  /** For a changed detector: each field that differs, in words. */
  changes: FieldChange[];
  /** The detector is on an input of the approved layout. */
  onLayout: boolean;
}

export interface ScheduleDrift {
  differences: DetectorDifference[];
  /** "the schedule has changed since approval: 2 detectors differ", or null when nothing differs. */
  headline: string | null;
}

const FIELDS: { field: string; words: string; text: (d: ScheduleDetector) => string }[] = [
  { field: "label", words: "label", text: (d) => d.label },
  { field: "catalogId", words: "detector type", text: (d) => d.catalogId },
  { field: "area", words: "area", text: (d) => d.area },
  { field: "room", words: "room", text: (d) => d.room },
  { field: "cableM", words: "cable run", text: (d) => `${d.cableM} m` },
  { field: "gauge", words: "cable gauge", text: (d) => formatGauge(d.gauge) },
  { field: "supervision", words: "supervision", text: (d) => d.supervision },
];

export function scheduleDrift(frozen: Schedule, live: Schedule, onLayout: ReadonlySet<string> = new Set()): ScheduleDrift {
  const liveById = new Map(live.map((d) => [d.id, d]));
  const frozenIds = new Set(frozen.map((d) => d.id));
  const differences: DetectorDifference[] = [];
  for (const was of frozen) {
    const now = liveById.get(was.id);
    if (!now) {
      differences.push({ id: was.id, label: was.label, kind: "removed", changes: [], onLayout: onLayout.has(was.id) });
      continue;
    }
    const changes = FIELDS.filter((f) => f.text(was) !== f.text(now)).map((f) => ({ field: f.words, was: f.text(was), now: f.text(now) }));
    if (changes.length) differences.push({ id: was.id, label: was.label, kind: "changed", changes, onLayout: onLayout.has(was.id) });
  }
  for (const now of live) if (!frozenIds.has(now.id)) differences.push({ id: now.id, label: now.label, kind: "added", changes: [], onLayout: false });
  const n = differences.length;
  return { differences, headline: n ? `The schedule has changed since approval: ${n} detector${n === 1 ? "" : "s"} differ${n === 1 ? "s" : ""}.` : null };
}

/** One difference in plain words, for the notice and the audit log. */
export function differenceText(d: DetectorDifference): string {
  if (d.kind === "removed") return `${d.label}: deleted from the schedule${d.onLayout ? " (it is on the approved layout)" : ""}.`;
  if (d.kind === "added") return `${d.label}: added to the schedule, not on the approved layout.`;
  return `${d.label}: ${d.changes.map((c) => `${c.field} ${c.was} → ${c.now}`).join(", ")}.`;
}
