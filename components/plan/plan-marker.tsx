import type { Marker } from "@/lib/plan/marker";

const SIZE = 14;

/** One detector on the plan: shape and text carry the state; the description is its accessible name. */
export function PlanMarker({ x, y, marker }: { x: number; y: number; marker: Marker }) {
  const shape =
    marker.shape === "circle" ? (
      <circle cx={x} cy={y} r={SIZE} className="fill-white stroke-ink" strokeWidth={3} />
    ) : marker.shape === "square" ? (
      <rect x={x - SIZE} y={y - SIZE} width={SIZE * 2} height={SIZE * 2} className="fill-signal stroke-ink" strokeWidth={2} />
    ) : (
      <polygon points={`${x},${y - SIZE * 1.3} ${x + SIZE * 1.3},${y + SIZE} ${x - SIZE * 1.3},${y + SIZE}`} className="fill-warn stroke-ink" strokeWidth={2} />
    );
  return (
    <g role="img" aria-label={marker.description} data-testid="plan-marker" data-shape={marker.shape}>
      <title>{marker.description}</title>
      {shape}
      <text x={x} y={y + 5} textAnchor="middle" fontSize={14} fontWeight={700} className={marker.shape === "circle" ? "fill-ink" : "fill-white"}>
        {marker.text}
      </text>
    </g>
  );
}
