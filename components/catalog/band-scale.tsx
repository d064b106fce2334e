import type { Band, InputType, Report, WiringScheme } from "@/lib/catalog/schema";
import { formatOhms, formatOhmsRange } from "@/lib/resistors/format-ohms";
import { bandSegments, defaultFrame, detailFrame, edgeLabels, ohmsToX, placeLabels, readingMarks, reportColour, scaleTicks, type ReadingMark, type ScaleFrame } from "./band-scale-geometry";
import { reportLabel, schemeLabel, stateLabel } from "./catalog-words";

const ROW = 14;
const BAR = 30;

function ScaleSvg({ id, title, bands, marks, f }: { id: string; title: string; bands: Band[]; marks: ReadingMark[]; f: ScaleFrame }) {
  const segments = bandSegments(bands, f);
  const edges = edgeLabels(bands, f);
  const placed = marks.map((m) => ({ ...m, x: ohmsToX(m.nominalOhms, f), xMin: ohmsToX(m.minOhms, f), xMax: ohmsToX(m.maxOhms, f) }));
  const markLabels = placeLabels(placed.map((m) => ({ x: m.x, text: `${formatOhms(m.nominalOhms)} ${stateLabel[m.state]}` })), 4);
  const edgeRows = Math.max(1, ...edges.map((e) => e.row + 1));
  const markRows = Math.max(0, ...markLabels.map((m) => m.row + 1));
  const barTop = 6 + edgeRows * ROW + 4;
  const barBottom = barTop + BAR;
  const tickY = barBottom + 14;
  const markTop = tickY + 10;
  const height = markTop + 12 + markRows * ROW + 6;
  const right = f.inf?.right ?? f.logRight;

  return (
    <svg viewBox={`0 0 ${f.width} ${height}`} className="w-full max-w-4xl" role="img" aria-labelledby={`${id}-title ${id}-desc`} fontSize={11} fontFamily="inherit">
      <title id={`${id}-title`}>{title}</title>
      <desc id={`${id}-desc`}>
        {bands.map((b) => `${reportLabel[b.report]} from ${formatOhms(b.fromOhms)} to ${b.toOhms === null ? "infinity" : formatOhms(b.toOhms)}`).join("; ")}
        {marks.length ? `. Expected: ${marks.map((m) => `${stateLabel[m.state]} ${formatOhmsRange(m.minOhms, m.maxOhms)}`).join("; ")}.` : ""}
      </desc>

      {segments.map((s, i) => {
        // the name goes in the part of the band before the break, if it fits there
        const end = f.inf && s.x1 > f.logRight ? f.logRight : s.x1;
        return (
          <g key={i} data-report={s.report}>
            <rect x={s.x0} y={barTop} width={s.x1 - s.x0} height={BAR} fill={reportColour[s.report].fill} />
            {end - s.x0 > reportLabel[s.report].length * 6.2 + 6 ? (
              <text x={(s.x0 + end) / 2} y={barTop + BAR / 2 + 4} textAnchor="middle" fill={reportColour[s.report].text}>
                {reportLabel[s.report]}
              </text>
            ) : end - s.x0 > 10 ? (
              // too narrow for its word: its first letter, so the colour is never the only sign
              <text x={(s.x0 + end) / 2} y={barTop + BAR / 2 + 4} textAnchor="middle" fill={reportColour[s.report].text} aria-hidden>
                {reportLabel[s.report].charAt(0).toUpperCase()}
              </text>
            ) : null}
          </g>
        );
      })}
      {f.inf ? (
        <>
          {/* the break between the log scale and the ∞ segment */}
          <rect x={f.logRight + 6} y={barTop - 3} width={f.inf.left - f.logRight - 12} height={BAR + 6} fill="#f7f6f2" />
          <path d={`M${f.logRight + 3} ${barBottom + 3} l8 ${-BAR - 6} M${f.inf.left - 11} ${barBottom + 3} l8 ${-BAR - 6}`} stroke="#17202a" strokeWidth={1} />
          <text x={(f.inf.left + f.inf.right) / 2} y={tickY} textAnchor="middle" fill="#5b6470">
            ∞
          </text>
        </>
      ) : null}
      <rect x={f.logLeft} y={barTop} width={right - f.logLeft} height={BAR} fill="none" stroke="#17202a" strokeOpacity={0.35} />

      {edges.map((e, i) => {
        const y = barTop - 6 - e.row * ROW;
        return (
          <g key={i} data-testid="band-edge">
            <line x1={e.x} x2={e.x} y1={y + 2} y2={barTop} stroke="#17202a" strokeOpacity={0.5} />
            <text x={e.x} y={y} textAnchor="middle" fill="#17202a">
              {e.text}
            </text>
          </g>
        );
      })}

      {scaleTicks(f).map((t) => (
        <g key={t.ohms}>
          <line x1={ohmsToX(t.ohms, f)} x2={ohmsToX(t.ohms, f)} y1={barBottom} y2={barBottom + 4} stroke="#17202a" />
          <text x={ohmsToX(t.ohms, f)} y={tickY} textAnchor="middle" fill="#5b6470">
            {t.text}
          </text>
        </g>
      ))}

      {placed.map((m, i) => {
        const y = markTop + 12 + markLabels[i].row * ROW;
        return (
          <g key={i} data-testid="expected-reading" data-state={m.state}>
            <line x1={m.xMin} x2={Math.max(m.xMax, m.xMin + 2)} y1={markTop} y2={markTop} stroke="#17202a" strokeWidth={3} />
            <line x1={m.x} x2={m.x} y1={barTop} y2={barBottom} stroke="#ffffff" strokeWidth={2} />
            <path d={`M${m.x} ${barBottom - 2} l-5 -8 h10 z`} fill="#ffffff" stroke="#17202a" />
            <line x1={m.x} x2={m.x} y1={markTop} y2={y - 10} stroke="#17202a" strokeOpacity={0.4} />
            <text x={m.x} y={y} textAnchor="middle" fill="#17202a" fontWeight={600}>
              {markLabels[i].text}
            </text>
          </g>
        );
      })}
    </svg>
  );
}

/**
 * An input type's bands under one scheme on a log scale in ohms (10 Ω to 100 kΩ, then ∞), each band in
 * its report's colour, band edges labelled above, the expected readings marked below with their spread
 * (part tolerance and loop resistance). Where the readings crowd together, a detail scale follows.
 * The tables beside it carry the same figures as text.
 */
export function BandScale({ inputType, scheme }: { inputType: InputType; scheme: WiringScheme }) {
  const bands = inputType.bands[scheme] ?? [];
  const { contact, marks } = readingMarks(inputType, scheme);
  const detail = detailFrame(marks);
  const id = `scale-${inputType.id}-${scheme}`;
  const reports = [...new Set(bands.map((b) => b.report))] as Report[];

  return (
    <figure className="my-3">
      <div data-testid="band-scale" data-scheme={scheme}>
        <ScaleSvg id={id} title={`${schemeLabel[scheme]} bands of ${inputType.name}`} bands={bands} marks={marks} f={defaultFrame} />
      </div>
      {detail ? (
        <div data-testid="band-scale-detail" className="mt-2">
          <p className="text-xs font-medium text-slate-500">
            Detail, {formatOhms(detail.minOhms)} to {formatOhms(detail.maxOhms)}
          </p>
          <ScaleSvg id={`${id}-detail`} title={`${schemeLabel[scheme]} bands of ${inputType.name}, ${formatOhms(detail.minOhms)} to ${formatOhms(detail.maxOhms)}`} bands={bands} marks={marks} f={detail} />
        </div>
      ) : null}
      <figcaption className="mt-1 flex flex-wrap gap-x-4 gap-y-1 text-xs text-slate-600">
        {reports.map((r) => (
          <span key={r} className="inline-flex items-center gap-1">
            <span aria-hidden className="inline-block h-3 w-3 rounded-sm" style={{ background: reportColour[r].fill }} />
            {reportLabel[r]}
          </span>
        ))}
        <span>
          Log scale in ohms; ▽ marks the expected readings, the bar under it their spread with {inputType.tolerancePct}% parts and up to {formatOhms(inputType.maxLoopOhms)} of loop
          {scheme === "double-eol" ? `; laid out for ${contact === "NO" ? "normally open (NO)" : "normally closed (NC)"} contacts` : ""}.
        </span>
      </figcaption>
    </figure>
  );
}
