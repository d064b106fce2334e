import { BAND_FILL, Stripes } from "@/components/loop-schematic/symbols";
import type { SheetResistor } from "@/lib/sheet/sheet-types";

/** A resistor's IEC 60062 colour bands: drawn on a resistor body, then named. */
export function ResistorBands({ r }: { r: SheetResistor }) {
  if (!r.bands.length) return <span className="text-xs text-warn">no IEC 60062 colour code at ±{r.tolerancePct} %: check it with the meter before fitting</span>;
  return (
    <span className="inline-flex flex-wrap items-center gap-2" data-testid="colour-bands">
      <svg viewBox="-30 -10 60 20" className="h-5 w-14 shrink-0" role="img" aria-label={`Colour bands: ${r.bands.join(", ")}`}>
        <line x1={-30} y1={0} x2={30} y2={0} stroke="#8d8d8d" strokeWidth={2} />
        <Stripes ohms={r.ohms} tolerancePct={r.tolerancePct} x={0} y={0} />
      </svg>
      <span className="inline-flex flex-wrap gap-1">
        {r.bands.map((b, i) => (
          <span key={i} className="inline-flex items-center gap-1 rounded border border-line px-1 text-[11px] leading-5">
            <span className="inline-block h-2.5 w-2.5 rounded-sm border border-slate-400" style={{ background: BAND_FILL[b] }} aria-hidden="true" />
            {b}
          </span>
        ))}
      </span>
    </span>
  );
}
