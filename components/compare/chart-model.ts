// Geometry of the comparison chart: per layout, the share of its inputs left spare and its supervision coverage,
// both on one 0–100 % scale so the bars of two measures read against each other.

export interface ChartInput {
  name: string;
  inputs: { used: number; total: number; spare: number };
  coverage: { used: number; covered: number; share: number | null };
}

export interface ChartBar {
  /** 0–1 of the scale. */
  share: number;
  /** Bar width in chart units. */
  width: number;
  label: string;
}

export interface ChartRow {
  name: string;
  /** The name in at most two lines of about 22 characters, for the label column. */
  nameLines: string[];
  y: number;
  spare: ChartBar;
  coverage: ChartBar;
}

export interface ChartModel {
  width: number;
  height: number;
  /** Left edge and width of each panel's plot area. */
  panels: { title: string; x: number; width: number }[];
  rows: ChartRow[];
  ticks: { share: number; label: string }[];
  rowHeight: number;
}

export const CHART = { nameWidth: 190, panelWidth: 300, gap: 40, rowHeight: 46, top: 44, bottom: 28, labelRoom: 120 } as const;

const pct = (x: number) => `${Math.round(x * 100)} %`;
const clamp01 = (x: number) => (Number.isFinite(x) ? Math.min(1, Math.max(0, x)) : 0);

/** Splits a name at word boundaries into at most two lines of `width` characters, the second cut short with "…". */
export function nameLines(name: string, width = 22): string[] {
  const words = name.trim().split(/\s+/);
  const lines: string[] = [];
  let line = "";
  for (const w of words) {
    if (line && (line + " " + w).length > width) {
      lines.push(line);
      line = w;
    } else line = line ? `${line} ${w}` : w;
  }
  if (line) lines.push(line);
  if (lines.length <= 2) return lines.map((l) => (l.length > width ? `${l.slice(0, width - 1)}…` : l));
  const second = lines.slice(1).join(" ");
  return [lines[0].length > width ? `${lines[0].slice(0, width - 1)}…` : lines[0], `${second.slice(0, width - 1)}…`];
}

export function chartModel(columns: readonly ChartInput[]): ChartModel {
  const { nameWidth, panelWidth, gap, rowHeight, top, bottom, labelRoom } = CHART;
  const plot = panelWidth - labelRoom;
  const panels = [
    { title: "Spare inputs", x: nameWidth, width: plot },
    { title: "Supervision coverage", x: nameWidth + panelWidth + gap, width: plot },
  ];
  const rows = columns.map((c, i) => {
    const spareShare = c.inputs.total > 0 ? clamp01(c.inputs.spare / c.inputs.total) : 0;
    const cov = c.coverage.share;
    return {
      name: c.name,
      nameLines: nameLines(c.name),
      y: top + i * rowHeight,
      spare: { share: spareShare, width: spareShare * plot, label: c.inputs.total > 0 ? `${c.inputs.spare} of ${c.inputs.total} (${pct(spareShare)})` : "no inputs" },
      coverage: { share: clamp01(cov ?? 0), width: clamp01(cov ?? 0) * plot, label: cov === null ? "no inputs used" : `${c.coverage.covered} of ${c.coverage.used} (${pct(clamp01(cov))})` },
    };
  });
  return {
    width: nameWidth + 2 * panelWidth + gap,
    height: top + columns.length * rowHeight + bottom,
    panels,
    rows,
    ticks: [0, 0.25, 0.5, 0.75, 1].map((share) => ({ share, label: pct(share) })),
    rowHeight,
  };
}
