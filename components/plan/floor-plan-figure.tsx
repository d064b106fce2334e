import type { PlanView, RouteView } from "@/lib/server/plans";
import type { UnitSystem } from "@/lib/organisation/settings-schema";
import { markerOf, type MarkerState } from "@/lib/plan/marker";
import { scaleBar } from "@/lib/plan/scale-bar";
import { PlanMarker } from "./plan-marker";

interface Props {
  siteId: number;
  floorName: string;
  plan: PlanView;
  routes: RouteView[];
  labels: ReadonlyMap<string, string>;
  states: ReadonlyMap<string, MarkerState>;
  units: UnitSystem;
}

/** One floor's drawing with its routes and placed devices over it, the scale bar, and the same devices as a list. */
export function FloorPlanFigure({ siteId, floorName, plan, routes, labels, states, units }: Props) {
  const bar = plan.metresPerPixel === null ? null : scaleBar(plan.metresPerPixel, units, Math.min(300, plan.widthPx / 4));
  const detectors = plan.items.filter((i) => i.kind === "detector" && i.detectorId !== null);
  const others = plan.items.filter((i) => i.kind !== "detector");
  const markers = detectors.map((i) => ({ item: i, marker: markerOf(labels.get(i.detectorId!) ?? "Detector", states.get(i.detectorId!) ?? { kind: "unassigned" }) }));
  return (
    <figure className="mb-8" aria-labelledby={`plan-${plan.id}-caption`}>
      <figcaption id={`plan-${plan.id}-caption`} className="mb-2 text-lg font-semibold">
        {floorName}
      </figcaption>
      {plan.metresPerPixel === null ? (
        <p role="status" className="mb-2 rounded border border-warn px-3 py-2 text-sm">
          This plan has no scale yet: runs cannot be measured on it until two points and the distance between them are given.
        </p>
      ) : null}
      <div className="relative w-full overflow-auto rounded border border-line">
        <svg viewBox={`0 0 ${plan.widthPx} ${plan.heightPx}`} className="block h-auto w-full" role="group" aria-label={`Plan of ${floorName}`}>
          <image href={`/api/sites/${siteId}/plans/${plan.id}/image`} x={0} y={0} width={plan.widthPx} height={plan.heightPx} />
          {routes.flatMap((r) =>
            r.legs
              .filter((l) => l.planId === plan.id)
              .map((l, i) => <polyline key={`${r.id}-${i}`} points={l.points.map((p) => `${p.x},${p.y}`).join(" ")} fill="none" className="stroke-signal" strokeWidth={4} strokeDasharray="12 6" aria-hidden="true" />),
          )}
          {others.map((i) => (
            <g key={i.id} role="img" aria-label={`${i.label || i.kind} (${i.kind})`}>
              <rect x={i.x - 12} y={i.y - 12} width={24} height={24} className="fill-ink" />
            </g>
          ))}
          {markers.map(({ item, marker }) => (
            <PlanMarker key={item.id} x={item.x} y={item.y} marker={marker} />
          ))}
          {bar ? (
            <g aria-label={`Scale bar: ${bar.length} ${bar.unit}`} role="img" data-testid="scale-bar">
              <rect x={20} y={plan.heightPx - 40} width={bar.px} height={8} className="fill-ink" />
              <text x={20} y={plan.heightPx - 48} fontSize={18} className="fill-ink">
                {bar.length} {bar.unit}
              </text>
            </g>
          ) : null}
        </svg>
      </div>
      <ul className="mt-2 text-sm" aria-label={`Detectors on ${floorName}`}>
        {markers.map(({ item, marker }) => (
          <li key={item.id}>{marker.description}</li>
        ))}
      </ul>
    </figure>
  );
}
