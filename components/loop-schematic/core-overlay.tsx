// The cable's cores drawn by colour over the schematic's cable span, and a conductor fault on them in red:
// a short as a link between the two cores, an open as a gap, a core to earth as a stub to the earth symbol.
import type { ConductorFault, CoreColour } from "@/lib/loop";
import { FAULT, MUTED } from "./symbols";

/** Colours drawn for each core (white with a grey edge so it shows on a light background). */
const INK: Record<CoreColour, string> = { yellow: "#c99a06", blue: "#1f5fbf", green: "#2e8b57", white: "#ffffff", red: "#c62828", black: "#1c1c1c" };

export interface CoreOverlayProps {
  /** Each core's colour and the height of its line on the drawing. */
  cores: { colour: CoreColour; y: number }[];
  /** The cable span, panel end to detector end. */
  x0: number;
  x1: number;
  lengthM: number;
  fault?: ConductorFault | null;
}

export function CoreOverlay({ cores, x0, x1, lengthM, fault }: CoreOverlayProps) {
  const yOf = (c: CoreColour) => cores.find((k) => k.colour === c)?.y;
  // a short across one part alone is not on the cable: nothing to draw here
  const f = fault && fault.kind !== "part-short" ? fault : null;
  const fx = f ? x0 + 14 + (x1 - x0 - 28) * (lengthM > 0 ? f.atM / lengthM : 0) : 0;
  const faultCores = f === null ? [] : f.kind === "short" ? f.cores : [f.core];
  return (
    <g data-part="cores">
      {cores.map(({ colour, y }) => (
        <g key={colour} data-core={colour}>
          <line x1={x0} y1={y} x2={x1} y2={y} stroke={MUTED} strokeWidth={5} />
          <line x1={x0} y1={y} x2={x1} y2={y} stroke={INK[colour]} strokeWidth={3.5} />
          <text x={x0 + 6} y={y - 5} fontSize={10} fill={MUTED}>
            {colour}
          </text>
        </g>
      ))}
      {f && faultCores.every((c) => yOf(c) !== undefined) ? (
        <g data-part="conductor-fault" data-kind={f.kind} data-cores={faultCores.join(" ")}>
          {f.kind === "short" ? (
            <>
              <line x1={fx} y1={yOf(f.cores[0])} x2={fx} y2={yOf(f.cores[1])} stroke={FAULT} strokeWidth={4} />
              <circle cx={fx} cy={yOf(f.cores[0])} r={4} fill={FAULT} />
              <circle cx={fx} cy={yOf(f.cores[1])} r={4} fill={FAULT} />
              <text x={fx + 7} y={(yOf(f.cores[0])! + yOf(f.cores[1])!) / 2} fontSize={12.5} fontWeight={700} fill={FAULT}>
                short
              </text>
            </>
          ) : f.kind === "open" ? (
            <>
              <rect x={fx - 8} y={yOf(f.core)! - 5} width={16} height={10} fill="#eef3f6" />
              <line x1={fx - 8} y1={yOf(f.core)! - 7} x2={fx - 4} y2={yOf(f.core)! + 7} stroke={FAULT} strokeWidth={2} />
              <line x1={fx + 4} y1={yOf(f.core)! - 7} x2={fx + 8} y2={yOf(f.core)! + 7} stroke={FAULT} strokeWidth={2} />
              <text x={fx} y={yOf(f.core)! - 11} textAnchor="middle" fontSize={12.5} fontWeight={700} fill={FAULT}>
                open
              </text>
            </>
          ) : (
            <>
              <line x1={fx} y1={yOf(f.core)} x2={fx} y2={yOf(f.core)! + 22} stroke={FAULT} strokeWidth={2.5} />
              <line x1={fx - 9} y1={yOf(f.core)! + 22} x2={fx + 9} y2={yOf(f.core)! + 22} stroke={FAULT} strokeWidth={2} />
              <line x1={fx - 6} y1={yOf(f.core)! + 26} x2={fx + 6} y2={yOf(f.core)! + 26} stroke={FAULT} strokeWidth={2} />
              <line x1={fx - 3} y1={yOf(f.core)! + 30} x2={fx + 3} y2={yOf(f.core)! + 30} stroke={FAULT} strokeWidth={2} />
              <text x={fx + 12} y={yOf(f.core)! + 28} fontSize={12} fontWeight={700} fill={FAULT}>
                earth
              </text>
            </>
          )}
        </g>
      ) : null}
    </g>
  );
}
