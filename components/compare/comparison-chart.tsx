import { chartModel, type ChartInput } from "@/components/compare/chart-model";

const BAR = { spare: "#0f6e6e", coverage: "#17202a" };

/** Spare capacity and supervision coverage of each layout, as bars on one percentage scale. */
export function ComparisonChart({ columns }: { columns: readonly ChartInput[] }) {
  const m = chartModel(columns);
  const barH = 18;
  return (
    <figure className="relative overflow-x-auto" tabIndex={0} aria-label="Comparison chart (scrolls sideways on a narrow screen)">
      <svg viewBox={`0 0 ${m.width} ${m.height}`} role="img" aria-labelledby="cmp-chart-title" className="h-auto w-full min-w-[640px]" data-testid="comparison-chart" style={{ fontFamily: "inherit" }}>
        {/* one string: React renders a <title> with several children as empty on the server, and hydration then fails */}
        <title id="cmp-chart-title">{`Spare inputs and supervision coverage per layout: ${m.rows.map((r) => `${r.name}: ${r.spare.label} spare, coverage ${r.coverage.label}`).join("; ")}`}</title>
        {m.panels.map((p, k) => (
          <g key={p.title}>
            <text x={p.x} y={16} fontSize={13} fontWeight={600} fill="#17202a">
              {p.title}
            </text>
            {m.ticks.map((t) => (
              <g key={t.share}>
                <line x1={p.x + t.share * p.width} x2={p.x + t.share * p.width} y1={30} y2={m.height - 22} stroke="#d9d6cc" strokeDasharray={t.share === 0 ? undefined : "3 3"} />
                <text x={p.x + t.share * p.width} y={m.height - 8} fontSize={11} textAnchor="middle" fill="#5b6470">
                  {t.label}
                </text>
              </g>
            ))}
            {m.rows.map((r, i) => {
              const bar = k === 0 ? r.spare : r.coverage;
              return (
                <g key={i}>
                  <rect x={p.x} y={r.y} width={Math.max(bar.width, 1.5)} height={barH} rx={3} fill={k === 0 ? BAR.spare : BAR.coverage} />
                  <text x={p.x + bar.width + 6} y={r.y + 13} fontSize={12} fill="#17202a">
                    {bar.label}
                  </text>
                </g>
              );
            })}
          </g>
        ))}
        {m.rows.map((r, i) => (
          <text key={i} x={0} y={r.y + (r.nameLines.length > 1 ? 6 : 13)} fontSize={13} fontWeight={600} fill="#17202a">
            {r.nameLines.map((l, k) => (
              <tspan key={k} x={0} dy={k === 0 ? 0 : 15}>
                {k < r.nameLines.length - 1 ? `${l} ` : l}
              </tspan>
            ))}
          </text>
        ))}
      </svg>
      <figcaption className="mt-1 text-xs text-slate-600">
        Spare inputs leave room to add detectors later; supervision coverage is the share of used inputs on which a short and a cut are both reported as themselves.
      </figcaption>
    </figure>
  );
}
