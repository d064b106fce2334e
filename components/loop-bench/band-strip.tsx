// The input type's bands on a logarithmic ohms scale, with the reading's interval over them.
import type { Band } from "@/lib/catalog/schema";
import { formatOhms } from "@/lib/loop";
import { REPORT_FILL, reportWord } from "./report-style";

const W = 640;
const INF_W = 56;
const LO = 1;

export function BandStrip({ bands, minOhms, maxOhms, nominalOhms }: { bands: readonly Band[]; minOhms?: number; maxOhms?: number; nominalOhms?: number }) {
  const lastEdge = Math.max(...bands.map((b) => b.toOhms ?? b.fromOhms));
  const hi = 10 ** Math.ceil(Math.log10(lastEdge * 4));
  const span = Math.log10(hi / LO);
  const logW = W - INF_W;
  const x = (ohms: number) => (ohms === Infinity ? W - INF_W / 2 : ohms <= LO ? 0 : ohms >= hi ? logW : (Math.log10(ohms / LO) / span) * logW);
  const ticks: number[] = [];
  for (let v = LO; v <= hi; v *= 10) ticks.push(v);
  const y0 = 22;
  const h = 26;
  const has = minOhms !== undefined && maxOhms !== undefined;
  const a = has ? x(minOhms!) : 0;
  const b = has ? x(maxOhms!) : 0;
  return (
    <svg viewBox={`0 0 ${W} 72`} className="w-full" role="img" aria-label={`Report bands over ohms: ${bands.map((band) => `${reportWord(band.report)} ${formatOhms(band.fromOhms)} to ${band.toOhms === null ? "∞" : formatOhms(band.toOhms)}`).join("; ")}${has ? `; the reading ${formatOhms(minOhms!)} to ${formatOhms(maxOhms!)} is marked` : ""}`}>
      {bands.map((band, i) => {
        const x0 = x(Math.max(band.fromOhms, LO));
        const x1 = band.toOhms === null ? W : x(band.toOhms);
        const w = x1 - x0;
        return (
          <g key={i}>
            <rect x={x0} y={y0} width={Math.max(w, 0.5)} height={h} fill={REPORT_FILL[band.report]} stroke="#fff" strokeWidth={1}>
              <title>{`${reportWord(band.report)}: ${formatOhms(band.fromOhms)} to ${band.toOhms === null ? "∞" : formatOhms(band.toOhms)}`}</title>
            </rect>
            {/* a band too narrow for its word carries its first letter, so the colour is never the only sign */}
            {w > 46 ? (
              <text x={x0 + w / 2} y={y0 + h / 2 + 4} textAnchor="middle" fontSize={10.5} fontWeight={600} fill={band.report === "trouble" ? "#7a1a12" : "#fff"}>
                {reportWord(band.report).replace(" (alarm)", "")}
              </text>
            ) : w > 9 ? (
              <text x={x0 + w / 2} y={y0 + h / 2 + 4} textAnchor="middle" fontSize={10} fontWeight={600} fill={band.report === "trouble" ? "#7a1a12" : "#fff"} aria-hidden>
                {reportWord(band.report).charAt(0).toUpperCase()}
              </text>
            ) : null}
          </g>
        );
      })}
      <line x1={logW} y1={y0 - 2} x2={logW} y2={y0 + h + 2} stroke="#fff" strokeWidth={2} strokeDasharray="3 2" />
      {ticks.map((t) => (
        <g key={t}>
          <line x1={x(t)} y1={y0 + h} x2={x(t)} y2={y0 + h + 4} stroke="#5b6470" />
          <text x={x(t)} y={y0 + h + 15} textAnchor={t === LO ? "start" : "middle"} fontSize={10} fill="#5b6470">
            {formatOhms(t)}
          </text>
        </g>
      ))}
      <text x={W - INF_W / 2} y={y0 + h + 15} textAnchor="middle" fontSize={10} fill="#5b6470">
        ∞
      </text>
      {has ? (
        <g data-testid="band-strip-reading">
          <rect x={Math.min(a, b) - 1} y={6} width={Math.max(Math.abs(b - a), 2) + 2} height={8} rx={2} fill="#17202a" />
          <line x1={a} y1={4} x2={a} y2={y0 + h} stroke="#17202a" strokeWidth={1} strokeDasharray="2 2" />
          <line x1={b} y1={4} x2={b} y2={y0 + h} stroke="#17202a" strokeWidth={1} strokeDasharray="2 2" />
          {nominalOhms !== undefined ? <path d={`M ${x(nominalOhms) - 5} ${y0 - 1} L ${x(nominalOhms) + 5} ${y0 - 1} L ${x(nominalOhms)} ${y0 + 6} Z`} fill="#fff" stroke="#17202a" /> : null}
        </g>
      ) : null}
    </svg>
  );
}
