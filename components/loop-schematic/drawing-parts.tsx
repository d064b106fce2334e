// Drawing pieces the schematic is built from: a plain line, one element on a line, a parallel group.
import type { ContactEl, ParallelEl, ResistorEl, SeriesEl } from "./schematic-model";
import { ContactH, Dot, INK, ResistorH } from "./symbols";

const W_CONTACT = 90;
const W_RESISTOR = 96;
export const BRANCH_GAP = 60;

export const widthOf = (e: SeriesEl): number =>
  e.kind === "contact" ? W_CONTACT : e.kind === "resistor" ? W_RESISTOR : Math.max(...e.branches.map((b) => b.reduce((s, x) => s + widthOf(x), 0))) + 32;

export function Line({ x1, y1, x2, y2, colour = INK, width = 1.5 }: { x1: number; y1: number; x2: number; y2: number; colour?: string; width?: number }) {
  return <line x1={x1} y1={y1} x2={x2} y2={y2} stroke={colour} strokeWidth={width} strokeLinecap="square" />;
}

export function Horizontal({ e, x, y, tol }: { e: ContactEl | ResistorEl; x: number; y: number; tol: number }) {
  return e.kind === "contact" ? <ContactH c={e} x={x} y={y} /> : <ResistorH r={e} x={x} y={y} tolerancePct={tol} />;
}

export function Parallel({ p, x, yA, tol }: { p: ParallelEl; x: number; yA: number; tol: number }) {
  const w = widthOf(p);
  const x0 = x + 6;
  const x1 = x + w - 6;
  const yLast = yA + (p.branches.length - 1) * BRANCH_GAP;
  return (
    <g>
      <Line x1={x0} y1={yA} x2={x0} y2={yLast} />
      <Line x1={x1} y1={yA} x2={x1} y2={yLast} />
      <Dot x={x0} y={yA} />
      <Dot x={x1} y={yA} />
      {p.branches.map((b, k) => {
        const y = yA + k * BRANCH_GAP;
        const bw = b.reduce((s, e) => s + widthOf(e), 0);
        let cx = x + (w - bw) / 2;
        return (
          <g key={k}>
            {k > 0 ? <Line x1={x0} y1={y} x2={x1} y2={y} /> : null}
            {b.map((e) => {
              const ew = widthOf(e);
              const el = <Horizontal key={e.key} e={e as ContactEl | ResistorEl} x={cx + ew / 2} y={y} tol={tol} />;
              cx += ew;
              return el;
            })}
          </g>
        );
      })}
    </g>
  );
}
