// Schematic symbols: resistors with their IEC 60062 colour bands, contacts drawn open or closed.
import { colourBands, formatOhms } from "@/lib/loop";
import type { ContactEl, ResistorEl } from "./schematic-model";

export const INK = "#17202a";
export const WARN = "#9a5b00";
export const FAULT = "#b42318";
export const MUTED = "#5b6470";
export const BG = "#ffffff";

/** IEC 60062 band colours as drawn. */
export const BAND_FILL: Record<string, string> = {
  black: "#1b1b1b",
  brown: "#7a4a21",
  red: "#d0271d",
  orange: "#f08a12",
  yellow: "#f5d31c",
  green: "#2f9a3f",
  blue: "#2a63c9",
  violet: "#7d3fb8",
  grey: "#8d8d8d",
  white: "#fafafa",
  gold: "#c8a23a",
  silver: "#c4c7cc",
};

const BODY = "#ecdcb8";
const BODY_EDGE = "#8a6d3b";

function bandOffsets(n: number): number[] {
  // digits grouped at one end, the tolerance band apart at the other, as on the part
  if (n === 3) return [-14, -8, -2];
  if (n === 4) return [-14, -8, -2, 12];
  return [-15, -10, -5, 0, 12];
}

export function Stripes({ ohms, tolerancePct, x, y, vertical = false }: { ohms: number; tolerancePct: number; x: number; y: number; vertical?: boolean }) {
  const bands = colourBands(ohms, tolerancePct) ?? [];
  const offs = bandOffsets(bands.length);
  return (
    <g>
      {vertical ? (
        <rect x={x - 7} y={y - 22} width={14} height={44} rx={5} fill={BODY} stroke={BODY_EDGE} strokeWidth={1} />
      ) : (
        <rect x={x - 22} y={y - 7} width={44} height={14} rx={5} fill={BODY} stroke={BODY_EDGE} strokeWidth={1} />
      )}
      {bands.map((b, i) =>
        vertical ? (
          <rect key={i} x={x - 7} y={y + offs[i] - 1.75} width={14} height={3.5} fill={BAND_FILL[b] ?? "#000"} stroke={b === "white" ? "#999" : "none"} strokeWidth={0.5} />
        ) : (
          <rect key={i} x={x + offs[i] - 1.75} y={y - 7} width={3.5} height={14} fill={BAND_FILL[b] ?? "#000"} stroke={b === "white" ? "#999" : "none"} strokeWidth={0.5} />
        ),
      )}
    </g>
  );
}

const valueText = (r: ResistorEl) => (Number.isFinite(r.ohms) ? formatOhms(r.ohms) : "? Ω");

export function ResistorH({ r, x, y, tolerancePct, highlight }: { r: ResistorEl; x: number; y: number; tolerancePct: number; highlight?: string }) {
  return (
    <g data-part={`resistor-${r.role}`}>
      <rect x={x - 26} y={y - 5} width={52} height={10} fill={BG} />
      <line x1={x - 26} y1={y} x2={x + 26} y2={y} stroke={INK} strokeWidth={1.5} />
      <Stripes ohms={r.ohms} tolerancePct={tolerancePct} x={x} y={y} />
      <text x={x} y={y - 13} textAnchor="middle" fontSize={12.5} fontWeight={600} fill={highlight ?? INK}>
        {valueText(r)}
      </text>
      <text x={x} y={y + 22} textAnchor="middle" fontSize={11.5} fill={highlight ?? MUTED}>
        {r.label}
      </text>
    </g>
  );
}

export function ResistorV({ r, x, y, tolerancePct, highlight, labelSide = "right" }: { r: ResistorEl; x: number; y: number; tolerancePct: number; highlight?: string; labelSide?: "left" | "right" }) {
  const tx = labelSide === "right" ? x + 13 : x - 13;
  const anchor = labelSide === "right" ? "start" : "end";
  return (
    <g data-part={`resistor-${r.role}`}>
      <rect x={x - 5} y={y - 26} width={10} height={52} fill={BG} />
      <line x1={x} y1={y - 26} x2={x} y2={y + 26} stroke={INK} strokeWidth={1.5} />
      <Stripes ohms={r.ohms} tolerancePct={tolerancePct} x={x} y={y} vertical />
      <text x={tx} y={y - 2} textAnchor={anchor} fontSize={12.5} fontWeight={600} fill={highlight ?? INK}>
        {valueText(r)}
      </text>
      <text x={tx} y={y + 11} textAnchor={anchor} fontSize={11.5} fill={highlight ?? MUTED}>
        {r.label}
      </text>
    </g>
  );
}

function contactColour(c: ContactEl): string {
  if (!c.operated) return INK;
  return c.role === "tamper" ? FAULT : WARN;
}

const stateText = (c: ContactEl) => `${c.type}, ${c.closed ? "closed" : "open"}`;

export function ContactH({ c, x, y }: { c: ContactEl; x: number; y: number }) {
  const col = contactColour(c);
  return (
    <g data-part={`contact-${c.key}`} data-closed={c.closed}>
      <rect x={x - 20} y={y - 16} width={40} height={21} fill={BG} />
      <circle cx={x - 18} cy={y} r={2.5} fill={col} />
      <circle cx={x + 18} cy={y} r={2.5} fill={col} />
      {/* NC: a stop on the fixed contact that the blade rests against */}
      {c.type === "NC" ? <line x1={x + 18} y1={y} x2={x + 18} y2={y - 9} stroke={col} strokeWidth={1.5} /> : null}
      {c.closed ? (
        <line x1={x - 18} y1={y} x2={x + 18} y2={y - 1} stroke={col} strokeWidth={2.5} strokeLinecap="round" />
      ) : (
        <line x1={x - 18} y1={y} x2={x + 14} y2={y - 15} stroke={col} strokeWidth={2.5} strokeLinecap="round" />
      )}
      <text x={x} y={y - 21} textAnchor="middle" fontSize={12} fontWeight={600} fill={col}>
        {c.label}
      </text>
      <text x={x} y={y + 16} textAnchor="middle" fontSize={11.5} fill={c.operated ? col : MUTED}>
        {stateText(c)}
      </text>
    </g>
  );
}

export function ContactV({ c, x, y }: { c: ContactEl; x: number; y: number }) {
  const col = contactColour(c);
  return (
    <g data-part={`contact-${c.key}`} data-closed={c.closed}>
      <rect x={x - 16} y={y - 20} width={21} height={40} fill={BG} />
      <circle cx={x} cy={y - 18} r={2.5} fill={col} />
      <circle cx={x} cy={y + 18} r={2.5} fill={col} />
      {c.type === "NC" ? <line x1={x} y1={y - 18} x2={x - 9} y2={y - 18} stroke={col} strokeWidth={1.5} /> : null}
      {c.closed ? (
        <line x1={x} y1={y + 18} x2={x - 1} y2={y - 18} stroke={col} strokeWidth={2.5} strokeLinecap="round" />
      ) : (
        <line x1={x} y1={y + 18} x2={x - 15} y2={y - 14} stroke={col} strokeWidth={2.5} strokeLinecap="round" />
      )}
      <text x={x + 9} y={y - 2} fontSize={12} fontWeight={600} fill={col}>
        {c.label}
      </text>
      <text x={x + 9} y={y + 11} fontSize={11.5} fill={c.operated ? col : MUTED}>
        {stateText(c)}
      </text>
    </g>
  );
}

export function Dot({ x, y }: { x: number; y: number }) {
  return <circle cx={x} cy={y} r={3} fill={INK} />;
}
