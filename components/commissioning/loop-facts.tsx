import type { SheetInput } from "@/lib/sheet/sheet-types";
import { ResistorBands } from "@/components/sheet/resistor-bands";

/** What the terminal sheet says of one loop: detectors, scheme, cable, resistors, cores; the caution on a life-safety loop. */
export function LoopFacts({ row }: { row: SheetInput }) {
  const lifeSafety = row.detectors.some((d) => d.lifeSafety);
  return (
    <div className="rounded-lg border border-line bg-white p-3">
      <h2 className="text-xl font-semibold">
        Input {row.input} ({row.terminals}) · zone {row.zones.join(", ")}
      </h2>
      <p className="font-medium">{row.detectors.map((d) => d.label).join(" + ")}</p>
      <p className="text-sm text-slate-700">{row.detectors.map((d) => `${d.deviceType} (${d.contact}${d.tamper ? ", tamper" : ""}) in ${d.area} / ${d.room}`).join("; ")}</p>
      <p className="mt-1 text-sm">
        {row.schemeText} · {row.placementText} · {row.cable.gaugeText}, {row.cable.lengthM} m
      </p>
      <ul className="mt-2 space-y-1 text-sm">
        {row.resistors.map((r) => (
          <li key={r.role} className="flex flex-wrap items-center gap-2">
            <strong className="tabular-nums">{r.valueText}</strong> {r.name}: <ResistorBands r={r} /> <span className="text-slate-700">{r.where}</span>
          </li>
        ))}
      </ul>
      <details className="mt-2 text-sm">
        <summary className="cursor-pointer font-medium">Core map</summary>
        <ul className="mt-1 space-y-0.5">
          {row.cores.map((c) => (
            <li key={c.core}>
              Core {c.core} ({c.carries}): {c.panelEnd} → {c.farEnd}
            </li>
          ))}
        </ul>
      </details>
      {lifeSafety ? (
        <p role="note" className="mt-2 rounded border border-warn bg-warn-soft px-2 py-1 text-sm" data-testid="loop-caution">
          <strong className="text-warn">Life-safety device.</strong> Test it only as its instructions and the local fire code allow, with the monitoring centre and the building told first;
          the authority having jurisdiction and licensed people decide. Loopwright&apos;s figures are an aid, not an approval.
        </p>
      ) : null}
      <p className="mt-2 text-xs text-slate-600">Measure across the input&apos;s terminal pair at the panel end, with the pair lifted off the input, the meter on its resistance range.</p>
    </div>
  );
}
