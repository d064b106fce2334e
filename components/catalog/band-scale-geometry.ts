import { expectedReadings, type ExpectedReading } from "@/lib/catalog/expected-readings";
import type { Band, ContactType, InputType, Report, WiringScheme } from "@/lib/catalog/schema";
import { formatOhms } from "@/lib/resistors/format-ohms";

// Geometry of the band scale: a log scale in ohms from 10 Ω to 100 kΩ, then a separate segment for
// readings above 100 kΩ up to infinity (an open loop). A detail frame zooms the same log scale onto the
// expected readings, without the ∞ segment. Pure, so it is tested without a browser.

export const SCALE_MIN_OHMS = 10;
export const SCALE_MAX_OHMS = 100_000;

export interface ScaleFrame {
  width: number;
  /** The log scale's ends in ohms. */
  minOhms: number;
  maxOhms: number;
  /** x of `minOhms` (and of anything below: a short reads near 0 Ω, which no log scale reaches). */
  logLeft: number;
  /** x of `maxOhms`. */
  logRight: number;
  /** The ∞ segment (readings above `maxOhms`), or null for a detail frame, where they stop at the right edge. */
  inf: { left: number; right: number } | null;
}

export const defaultFrame: ScaleFrame = { width: 760, minOhms: SCALE_MIN_OHMS, maxOhms: SCALE_MAX_OHMS, logLeft: 24, logRight: 650, inf: { left: 680, right: 736 } };

/** The right end of the drawing: the end of the ∞ segment, or of the log scale in a detail frame. */
export const rightEnd = (f: ScaleFrame) => f.inf?.right ?? f.logRight;

/** x of a reading: log10 between the frame's ends; at or below its start at the left edge; above its end in the ∞ segment (∞ at its end). */
export function ohmsToX(ohms: number, f: ScaleFrame = defaultFrame): number {
  if (ohms === Infinity) return rightEnd(f);
  if (ohms <= f.minOhms) return f.logLeft;
  if (ohms >= f.maxOhms) return ohms === f.maxOhms || !f.inf ? f.logRight : f.inf.left;
  const t = (Math.log10(ohms) - Math.log10(f.minOhms)) / (Math.log10(f.maxOhms) - Math.log10(f.minOhms));
  return f.logLeft + t * (f.logRight - f.logLeft);
}

/**
 * A frame zoomed onto the expected readings (with a margin of a factor 1.6 either side) when they sit
 * within 1.5 decades, where the whole scale crowds their bands together; null when the whole scale suffices.
 */
export function detailFrame(readings: { minOhms: number; maxOhms: number }[], f: ScaleFrame = defaultFrame): ScaleFrame | null {
  const lows = readings.map((r) => r.minOhms).filter((x) => x > 0);
  if (readings.length < 2 || !lows.length) return null;
  const lo = Math.max(SCALE_MIN_OHMS, Math.min(...lows) / 1.6);
  const hi = Math.min(SCALE_MAX_OHMS, Math.max(...readings.map((r) => r.maxOhms)) * 1.6);
  if (!(hi > lo) || Math.log10(hi / lo) > 1.5) return null;
  return { width: f.width, minOhms: lo, maxOhms: hi, logLeft: f.logLeft, logRight: rightEnd(f), inf: null };
}

export interface BandSegment {
  report: Report;
  fromOhms: number;
  toOhms: number | null;
  x0: number;
  x1: number;
}

/** One segment per band within the frame; the last band (to infinity) runs to the right end. */
export function bandSegments(bands: Band[], f: ScaleFrame = defaultFrame): BandSegment[] {
  return bands
    .map((b) => ({ report: b.report, fromOhms: b.fromOhms, toOhms: b.toOhms, x0: ohmsToX(b.fromOhms, f), x1: b.toOhms === null ? rightEnd(f) : ohmsToX(b.toOhms, f) }))
    .filter((s) => s.x1 > s.x0);
}

/** Band edges as people write them: "0 Ω", "800 Ω", "2.5 kΩ", "12 kΩ" (3 significant figures). */
export function formatEdge(ohms: number): string {
  return formatOhms(ohms);
}

export interface PlacedLabel {
  x: number;
  text: string;
  /** 0 is the row nearest the bar; labels that would overlap go to the next row. */
  row: number;
}

/** Width of a label at the scale's 11 px font, near enough to keep labels apart. */
const labelWidth = (text: string) => text.length * 6.4 + 6;

/** Stacks labels into rows so that none overlaps another in its row; returned in the order given. */
export function placeLabels(labels: { x: number; text: string }[], maxRows = 4): PlacedLabel[] {
  const rowsEnd: number[] = [];
  const out: PlacedLabel[] = new Array(labels.length);
  const order = labels.map((_, i) => i).sort((a, b) => labels[a].x - labels[b].x);
  for (const i of order) {
    const l = labels[i];
    const half = labelWidth(l.text) / 2;
    let row = rowsEnd.findIndex((end) => end <= l.x - half);
    if (row < 0) row = rowsEnd.length < maxRows ? rowsEnd.length : rowsEnd.indexOf(Math.min(...rowsEnd));
    rowsEnd[row] = l.x + half;
    out[i] = { ...l, row };
  }
  return out;
}

/** Labels for every band edge within the frame: the start of the first band (whole scale only) and each finite end. */
export function edgeLabels(bands: Band[], f: ScaleFrame = defaultFrame): PlacedLabel[] {
  const ends = bands.map((b) => b.toOhms).filter((x): x is number => x !== null);
  const edges = f.inf ? [bands[0]?.fromOhms ?? 0, ...ends] : ends.filter((x) => x > f.minOhms && x < f.maxOhms);
  return placeLabels(edges.map((ohms) => ({ x: ohmsToX(ohms, f), text: formatEdge(ohms) })), 6);
}

export interface ReadingMark extends ExpectedReading {
  x: number;
  xMin: number;
  xMax: number;
}

const fits = (bands: Band[], r: ExpectedReading) =>
  bands.some((b) => b.report === r.report && b.fromOhms <= r.minOhms && (b.toOhms === null || r.maxOhms < b.toOhms));

/**
 * The resistor values an input type expects under a scheme, as marks on the scale. A double end-of-line
 * table may be laid out for NO contacts (a fire zone: both resistors in circuit at rest); the contact is
 * the one whose readings the table reads right, as the catalog loader checks.
 */
export function readingMarks(it: InputType, scheme: WiringScheme, f: ScaleFrame = defaultFrame): { contact: ContactType; marks: ReadingMark[] } {
  const bands = it.bands[scheme] ?? [];
  let contact: ContactType = "NC";
  let readings = expectedReadings(it, scheme, "NC") ?? [];
  if (scheme === "double-eol" && !readings.every((r) => fits(bands, r))) {
    const no = expectedReadings(it, scheme, "NO") ?? [];
    if (no.length && no.every((r) => fits(bands, r))) {
      contact = "NO";
      readings = no;
    }
  }
  return { contact, marks: readings.map((r) => ({ ...r, x: ohmsToX(r.nominalOhms, f), xMin: ohmsToX(r.minOhms, f), xMax: ohmsToX(r.maxOhms, f) })) };
}

/** Ticks under the scale: decades on the whole scale; 1-2-5 steps within a detail frame. */
export function scaleTicks(f: ScaleFrame = defaultFrame): { ohms: number; text: string }[] {
  const steps = f.inf ? [1] : [1, 2, 5];
  const out: number[] = [];
  for (let e = Math.floor(Math.log10(f.minOhms)); e <= Math.ceil(Math.log10(f.maxOhms)); e++)
    for (const m of steps) {
      const v = m * 10 ** e;
      if (v >= f.minOhms && v <= f.maxOhms) out.push(v);
    }
  return out.map((ohms) => ({ ohms, text: formatOhms(ohms) }));
}

/** Fill and text colours per report (the theme's signal / warn / fault, and blues for the active reports). */
export const reportColour: Record<Report, { fill: string; text: string }> = {
  short: { fill: "#b42318", text: "#ffffff" },
  trouble: { fill: "#e0a526", text: "#17202a" },
  normal: { fill: "#0f6e6e", text: "#ffffff" },
  active: { fill: "#3559a8", text: "#ffffff" },
  "active-a": { fill: "#5b7fd0", text: "#ffffff" },
  "active-b": { fill: "#2b4a8f", text: "#ffffff" },
  "active-both": { fill: "#1c2f5e", text: "#ffffff" },
  open: { fill: "#6b1d12", text: "#ffffff" },
};
