// Each resistor the loop carries: value, where it sits, IEC 60062 colour bands, IEC 60063 series and nearest values.
import { formatOhms, nearestPreferred, type Placement, type ResistorUse } from "@/lib/loop";
import type { WiringScheme } from "@/lib/catalog/schema";
import { BAND_FILL, Stripes } from "@/components/loop-schematic/symbols";

const ROLE_WORDS: Record<ResistorUse["role"], string> = {
  eol: "End-of-line resistor",
  alarm: "Alarm resistor (across the contacts)",
  "shared-a": "Detector A's resistor",
  "shared-b": "Detector B's resistor",
};

function where(role: ResistorUse["role"], scheme: WiringScheme, placement: Placement): string {
  if (placement === "at-panel" && (role === "eol" || (role === "alarm" && scheme === "double-eol"))) return "resistor at the panel (input terminals)";
  if (placement === "loop-back" && role === "eol") return "loop-back resistor: at the panel, electrically at the far end";
  return "at the detector";
}

export function ResistorCards({ resistors, tolerancePct, scheme, placement }: { resistors: readonly ResistorUse[]; tolerancePct: number; scheme: WiringScheme; placement: Placement }) {
  if (resistors.length === 0) return <p className="text-sm text-slate-600">This scheme has no resistors: the panel sees only the contacts.</p>;
  return (
    <ul className="grid grid-cols-1 gap-3 md:grid-cols-2" data-testid="resistor-cards">
      {resistors.map((u) => {
        const e12 = nearestPreferred(u.ohms, "E12");
        return (
          <li key={u.role} className="rounded-md border border-line p-3" data-testid={`resistor-${u.role}`}>
            <p className="text-sm font-medium">{ROLE_WORDS[u.role]}</p>
            <div className="mt-2 flex items-center gap-4">
              <svg viewBox="-40 -14 80 28" className="h-10 w-28 shrink-0" role="img" aria-label={u.bands.length ? `Colour bands: ${u.bands.join(", ")}` : "No colour code"}>
                <line x1={-40} y1={0} x2={40} y2={0} stroke="#8d8d8d" strokeWidth={2} />
                <Stripes ohms={u.ohms} tolerancePct={tolerancePct} x={0} y={0} />
              </svg>
              <div>
                <p className="text-2xl font-semibold tabular-nums">{formatOhms(u.ohms)}</p>
                <p className="text-xs text-slate-500">
                  ±{tolerancePct} %, {where(u.role, scheme, placement)}
                </p>
              </div>
            </div>
            <p className="mt-2 flex flex-wrap items-center gap-1.5 text-xs" data-testid="colour-bands">
              {u.bands.length ? (
                u.bands.map((b, i) => (
                  <span key={i} className="inline-flex items-center gap-1 rounded border border-line px-1.5 py-0.5">
                    <span className="inline-block h-3 w-3 rounded-sm border border-slate-400" style={{ background: BAND_FILL[b] }} aria-hidden="true" />
                    {b}
                  </span>
                ))
              ) : (
                <span className="text-slate-500">No IEC 60062 colour code at {tolerancePct} %: check it with a meter before fitting.</span>
              )}
            </p>
            <p className="mt-2 text-sm">
              {u.preferred.series === "E12" ? (
                <span className="text-signal">E12 value (so also E24): easy to find on site.</span>
              ) : u.preferred.series === "E24" ? (
                <span className="text-signal">E24 value (not in E12).</span>
              ) : (
                <span className="text-warn" data-testid="nearest-preferred">
                  Not an E12 or E24 value. Nearest E24: {u.preferred.nearest.map(formatOhms).join(" or ")}; nearest E12: {e12.map(formatOhms).join(" or ")}.
                </span>
              )}
            </p>
            {u.expectedOhms !== null ? (
              <p className={`mt-1 text-xs ${Math.abs(u.ohms - u.expectedOhms) > 0.005 * u.expectedOhms ? "text-warn" : "text-slate-500"}`}>
                The input type expects {formatOhms(u.expectedOhms)}.
              </p>
            ) : null}
          </li>
        );
      })}
    </ul>
  );
}
