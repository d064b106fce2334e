// An alarm and tamper cable drawn as wired (lib/loop/README.md, conductor faults): the alarm pair's return (blue)
// linked at the panel to the tamper pair's feed (green); green out to the tamper contacts in series at the
// detector, white back to the input's return. A six-core cable adds the detectors' supply pair: red from the
// supply's +, black from its 0 V, which is the input's return.
import type { ContactEl } from "./schematic-model";
import { Horizontal, Line, widthOf } from "./drawing-parts";
import { Dot, INK, MUTED } from "./symbols";

export interface TamperPairProps {
  tampers: ContactEl[];
  supply: boolean;
  /** The input's return terminal. */
  termX: number;
  /** Where the link between blue and green sits, at the panel. */
  linkX: number;
  /** Where the detector's parts start. */
  farX: number;
  /** Blue (the alarm pair's return), green, white, and with a supply pair black (yE) and red (yF). */
  yB: number;
  yC: number;
  yD: number;
  yE: number;
  yF: number;
  tol: number;
}

export function TamperPair({ tampers, supply, termX, linkX, farX, yB, yC, yD, yE, yF, tol }: TamperPairProps) {
  const comX = termX + 22; // the return terminal's bus: white, and black with a supply pair
  const placed: { t: ContactEl; at: number }[] = [];
  let x = farX;
  for (const t of tampers) {
    placed.push({ t, at: x + widthOf(t) / 2 });
    x += widthOf(t);
  }
  const turnX = x + 14;
  return (
    <g data-part="tamper-pair">
      <Line x1={termX} y1={yB} x2={comX} y2={yB} />
      <Line x1={comX} y1={yB} x2={comX} y2={supply ? yE : yD} />
      <Dot x={comX} y={yB} />
      <Line x1={linkX} y1={yB} x2={linkX} y2={yC} />
      <Dot x={linkX} y={yB} />
      <Dot x={linkX} y={yC} />
      <text x={linkX + 6} y={(yB + yC) / 2 + 4} fontSize={11} fill={MUTED}>
        link
      </text>
      <Line x1={linkX} y1={yC} x2={turnX} y2={yC} />
      <Line x1={comX} y1={yD} x2={turnX} y2={yD} />
      <Line x1={turnX} y1={yC} x2={turnX} y2={yD} />
      {placed.map(({ t, at }) => (
        <Horizontal key={t.key} e={t} x={at} y={yC} tol={tol} />
      ))}
      <text x={farX} y={yD + 16} fontSize={11.5} fill={MUTED}>
        tamper pair, back to COM
      </text>
      {supply ? (
        <g data-part="supply-pair">
          <Dot x={comX} y={yD} />
          <Dot x={comX} y={yE} />
          <rect x={16} y={yE - 14} width={termX - 24} height={yF - yE + 28} rx={6} fill="#fff" stroke="#b9b4a6" />
          <text x={22} y={(yE + yF) / 2 + 4} fontSize={11.5} fill={INK}>
            supply
          </text>
          <text x={termX - 12} y={yE + 4} textAnchor="end" fontSize={11} fill={MUTED}>
            0 V
          </text>
          <text x={termX - 12} y={yF + 4} textAnchor="end" fontSize={11} fill={MUTED}>
            +
          </text>
          <Line x1={termX - 8} y1={yE} x2={farX + 20} y2={yE} />
          <Line x1={termX - 8} y1={yF} x2={farX + 20} y2={yF} />
          <rect x={farX + 20} y={yE - 14} width={150} height={yF - yE + 28} rx={6} fill="#fff" stroke="#b9b4a6" />
          <text x={farX + 28} y={(yE + yF) / 2 + 4} fontSize={11.5} fill={INK}>
            detector supply + / 0 V
          </text>
        </g>
      ) : null}
    </g>
  );
}
