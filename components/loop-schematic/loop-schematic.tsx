// The loop as wired, as SVG: panel input terminals on the left, the cable's conductors, the detector(s) on the
// right; resistors drawn where they physically sit, contacts open or closed, an injected fault in red.
// Pure and props-driven (the loop bench and the terminal sheet both draw it).
import { useId } from "react";
import type { InputType } from "@/lib/catalog/schema";
import type { ConductorFault, DetectorState, Fault, LoopSpec } from "@/lib/loop";
import { CABLE_CORES_WORDS, carriesTamperPair, CORE_COLOURS, coresOf, FAULT_WORDS, statesLabel, type CoreColour } from "@/lib/loop";
import { CoreOverlay } from "./core-overlay";
import { PLACEMENT_WORDS, SCHEME_WORDS } from "@/lib/vocabulary/words";
import { BRANCH_GAP, Horizontal, Line, Parallel, widthOf } from "./drawing-parts";
import { schematicModel, type Rung } from "./schematic-model";
import { ContactV, Dot, FAULT, INK, MUTED, ResistorH, ResistorV, WARN } from "./symbols";
import { TamperPair } from "./tamper-pair";
import { plural, pluralWord } from "@/lib/vocabulary/plural";

export interface LoopSchematicProps {
  loop: LoopSpec;
  /** One per detector; missing ones are at rest. */
  states?: readonly DetectorState[];
  fault?: Fault;
  /** Gives the expected resistor values when the loop does not state them. */
  inputType?: InputType;
  /** Shown at the panel's meter, e.g. "2.32 kΩ". */
  readingText?: string;
  className?: string;
  /** Draw the cable's cores by colour, with this conductor fault on them (null: the cores, no fault). */
  conductorFault?: ConductorFault | null;
}

const RUNG_GAP = 92;
const CABLE_W = 220;
const CABLE_BG = "#eef3f6";

function gaugeText(loop: LoopSpec): string {
  const g = loop.cable.gauge;
  return "awg" in g ? `${g.awg} AWG` : `${g.mm2} mm²`;
}

/** The height a core is drawn at: the alarm pair on top, then the second pair, then the supply pair. */
function coreY(colour: CoreColour, tamperPair: boolean, [yA, yB, yC, yD, yE, yF]: number[]): number {
  if (colour === "yellow") return yA;
  if (colour === "blue") return yB;
  if (colour === "green") return tamperPair ? yC : yD;
  if (colour === "white") return tamperPair ? yD : yC;
  return colour === "black" ? yE : yF;
}

function describe(loop: LoopSpec, states: readonly DetectorState[], fault: Fault): string {
  const where = loop.scheme === "none" ? SCHEME_WORDS.none : PLACEMENT_WORDS[loop.placement];
  const f = fault === "none" ? "no fault" : FAULT_WORDS[fault];
  const cores = coresOf(loop);
  const pair = carriesTamperPair(cores) ? `, ${CABLE_CORES_WORDS[cores]}: the tamper contacts on their own pair` : "";
  return `${SCHEME_WORDS[loop.scheme]} loop, ${where}, ${plural(loop.detectors.length, "detector")} (${statesLabel(loop.detectors, states)}), ${f}; cable ${loop.cable.lengthM} m of ${gaugeText(loop)}${pair}.`;
}

export function LoopSchematic({ loop, states: given, fault = "none", inputType, readingText, className, conductorFault }: LoopSchematicProps) {
  const uid = useId();
  const states = loop.detectors.map((_, i) => given?.[i] ?? "rest");
  const m = schematicModel(loop, states, inputType);
  const tol = loop.tolerancePct;

  const maxBranches = Math.max(1, ...m.far.series.map((e) => (e.kind === "parallel" ? e.branches.length : 1)));
  const yA = 90;
  const yB = yA + Math.max(150, (maxBranches - 1) * BRANCH_GAP + 80);
  const loopBack = m.loopBack;
  const pair = m.tamperPair;
  const yC = yB + 44;
  const yD = yC + (pair ? 56 : 96);
  const yE = yD + 44; // a six-core cable's supply pair: black, then red
  const yF = yE + 36;
  const lowest = m.supplyPair ? yF : loopBack || pair ? yD : yB;
  const bottom = lowest + 58;

  const TERM_X = 104;
  const hasPanelSide = !!(m.panel.series || m.panel.across || loopBack || pair);
  const PX = hasPanelSide ? 268 : 140; // cable starts here
  const CX = PX + CABLE_W; // cable ends here
  const FX = CX + 30; // far-end elements start here
  const seriesX: number[] = [];
  let cursor = FX;
  for (const e of m.far.series) {
    seriesX.push(cursor);
    cursor += widthOf(e);
  }
  const firstRungX = cursor + (m.far.rungs[0]?.kind === "wire" ? 14 : 34);
  const rungX = m.far.rungs.map((_, i) => firstRungX + i * RUNG_GAP);
  const endX = rungX.length ? rungX[rungX.length - 1] : cursor + 14;
  const lastRung: Rung | undefined = m.far.rungs[m.far.rungs.length - 1];
  const rightEdge = endX + (loopBack ? 60 : lastRung?.kind === "items" ? 110 : 40);
  const width = Math.max(rightEdge, FX + 220, pair ? FX + pair.reduce((w, t) => w + widthOf(t), 0) + 60 : 0);
  const midY = (yA + yB) / 2;
  const lbX = 200; // loop-back resistor, at the panel

  const shortX = fault === "short-panel" ? PX + 18 : fault === "short-detector" ? CX - 18 : null;
  const cutX = PX + CABLE_W / 2;
  const meterX = 58;
  const atPanelWarning = loop.placement === "at-panel" && loop.scheme !== "none";

  return (
    <svg
      viewBox={`0 0 ${width} ${bottom}`}
      role="img"
      aria-labelledby={`${uid}-t ${uid}-d`}
      className={className}
      // never drawn so small that its labels fall below about 8.5 px; wider loops scroll instead
      style={{ fontFamily: "inherit", width: "100%", minWidth: Math.round(width * 0.72), height: "auto" }}
      data-testid="loop-schematic"
      data-placement={loop.placement}
      data-fault={fault}
    >
      <title id={`${uid}-t`}>Loop schematic</title>
      <desc id={`${uid}-d`}>{describe(loop, states, fault)}</desc>

      {/* regions */}
      <rect x={8} y={yA - 60} width={TERM_X - 8} height={yB - yA + 108} rx={8} fill="#f1efe8" stroke="#b9b4a6" />
      <text x={16} y={yA - 42} fontSize={13} fontWeight={700} fill={INK}>
        Panel input
      </text>
      <text x={TERM_X - 10} y={yA - 8} textAnchor="end" fontSize={12} fill={MUTED}>
        IN
      </text>
      <text x={TERM_X - 10} y={yB + 16} textAnchor="end" fontSize={12} fill={MUTED}>
        COM
      </text>
      {hasPanelSide ? (
        <g>
          <rect x={TERM_X + 8} y={yA - 60} width={PX - TERM_X - 16} height={bottom - yA + 50} rx={8} fill="none" stroke={atPanelWarning ? WARN : "#b9b4a6"} strokeDasharray="5 4" />
          <text x={TERM_X + 16} y={yA - 42} fontSize={12.5} fontWeight={600} fill={atPanelWarning ? WARN : MUTED}>
            {atPanelWarning ? PLACEMENT_WORDS["at-panel"] : "at the panel"}
          </text>
        </g>
      ) : null}
      <rect x={FX - 16} y={yA - 60} width={width - FX + 8} height={(lowest > yB ? bottom - 10 : yB + 48) - (yA - 60)} rx={8} fill="none" stroke="#b9b4a6" strokeDasharray="5 4" />
      <text x={FX - 8} y={yA - 42} fontSize={12.5} fontWeight={600} fill={MUTED}>
        at the {pluralWord(loop.detectors.length, "detector")}
      </text>

      {/* meter across the input terminals */}
      <Line x1={meterX} y1={yA} x2={TERM_X} y2={yA} colour={MUTED} width={1} />
      <Line x1={meterX} y1={yB} x2={TERM_X} y2={yB} colour={MUTED} width={1} />
      <Line x1={meterX} y1={yA} x2={meterX} y2={midY - 16} colour={MUTED} width={1} />
      <Line x1={meterX} y1={midY + 16} x2={meterX} y2={yB} colour={MUTED} width={1} />
      <circle cx={meterX} cy={midY} r={16} fill="#fff" stroke={INK} strokeWidth={1.5} />
      <text x={meterX} y={midY + 5} textAnchor="middle" fontSize={15} fontWeight={700} fill={INK}>
        Ω
      </text>
      {readingText ? (
        <text x={meterX} y={midY + 34} textAnchor="middle" fontSize={12.5} fontWeight={700} fill={INK} data-testid="schematic-reading">
          {readingText}
        </text>
      ) : null}

      <rect x={PX} y={yA - 12} width={CABLE_W} height={lowest - yA + 24} rx={10} fill={CABLE_BG} />

      {/* the two input conductors, terminal to far end */}
      <Line x1={TERM_X} y1={yA} x2={endX} y2={yA} />
      <Line x1={pair ? lbX : TERM_X} y1={yB} x2={endX} y2={yB} />
      <circle cx={TERM_X} cy={yA} r={4.5} fill="#fff" stroke={INK} strokeWidth={1.5} />
      <circle cx={TERM_X} cy={yB} r={4.5} fill="#fff" stroke={INK} strokeWidth={1.5} />

      {/* resistors at the input terminals */}
      {m.panel.series ? <ResistorH r={m.panel.series} x={TERM_X + 56} y={yA} tolerancePct={tol} highlight={atPanelWarning ? WARN : undefined} /> : null}
      {m.panel.across ? (
        <g>
          <Line x1={PX - 40} y1={yA} x2={PX - 40} y2={yB} />
          <Dot x={PX - 40} y={yA} />
          <Dot x={PX - 40} y={yB} />
          <ResistorV r={m.panel.across} x={PX - 40} y={midY} tolerancePct={tol} highlight={atPanelWarning ? WARN : undefined} labelSide="left" />
        </g>
      ) : null}

      {/* cable */}
      <text x={PX + CABLE_W / 2} y={midY - 6} textAnchor="middle" fontSize={13} fontWeight={600} fill={INK}>
        cable {loop.cable.lengthM} m
      </text>
      <text x={PX + CABLE_W / 2} y={midY + 10} textAnchor="middle" fontSize={12} fill={MUTED}>
        {gaugeText(loop)} · {m.conductors} conductors
      </text>
      {conductorFault === undefined
        ? ["c1", "c2", "c3", "c4", "c5", "c6"].slice(0, m.conductors).map((c, i) => (
            <text key={c} x={PX + 6} y={[yA, yB, yC, yD, yE, yF][i] - 4} fontSize={10} fill={MUTED}>
              {c}
            </text>
          ))
        : null}

      {/* the loop-back pair: out to the far end and back to the resistor at the panel */}
      {loopBack && lastRung?.kind === "loop-back" ? (
        <g data-part="loop-back">
          <Line x1={endX} y1={yA} x2={endX + 32} y2={yA} />
          <Line x1={endX + 32} y1={yA} x2={endX + 32} y2={yD} />
          <Line x1={endX} y1={yB} x2={endX} y2={yC} />
          <Line x1={lbX} y1={yC} x2={endX} y2={yC} />
          <Line x1={lbX} y1={yD} x2={endX + 32} y2={yD} />
          <Line x1={lbX} y1={yC} x2={lbX} y2={yD} />
          <ResistorV r={lastRung.resistor} x={lbX} y={(yC + yD) / 2} tolerancePct={tol} labelSide="left" />
          <text x={lbX + 10} y={yD + 18} fontSize={11.5} fill={MUTED}>
            loop-back resistor: at the panel, electrically at the far end
          </text>
        </g>
      ) : null}

      {pair ? <TamperPair tampers={pair} supply={m.supplyPair} termX={TERM_X} linkX={lbX} farX={FX} yB={yB} yC={yC} yD={yD} yE={yE} yF={yF} tol={tol} /> : null}

      {/* far end: series elements along c1, then the rungs across to c2 */}
      {m.far.series.map((e, i) =>
        e.kind === "parallel" ? (
          <Parallel key={e.key} p={e} x={seriesX[i]} yA={yA} tol={tol} />
        ) : (
          <Horizontal key={e.key} e={e} x={seriesX[i] + widthOf(e) / 2} y={yA} tol={tol} />
        ),
      )}
      {m.far.rungs.map((r, i) => {
        const x = rungX[i];
        const last = i === m.far.rungs.length - 1;
        if (r.kind === "loop-back") return null;
        return (
          <g key={i}>
            <Line x1={x} y1={yA} x2={x} y2={yB} />
            {!last || loopBack ? (
              <>
                <Dot x={x} y={yA} />
                <Dot x={x} y={yB} />
              </>
            ) : null}
            {r.kind === "items"
              ? r.items.map((e, k) => {
                  const y = midY + (k - (r.items.length - 1) / 2) * 56;
                  return e.kind === "contact" ? <ContactV key={e.key} c={e} x={x} y={y} /> : <ResistorV key={e.key} r={e} x={x} y={y} tolerancePct={tol} />;
                })
              : null}
          </g>
        );
      })}

      {/* the cores by colour: yellow out, blue back; on a loop-back cable green returns to the resistor, white goes out to
          blue; on an alarm and tamper cable green goes out to the tampers, white back to the return */}
      {conductorFault !== undefined ? (
        <CoreOverlay cores={CORE_COLOURS[coresOf(loop)].map((colour) => ({ colour, y: coreY(colour, !!pair, [yA, yB, yC, yD, yE, yF]) }))} x0={PX} x1={CX} lengthM={loop.cable.lengthM} fault={conductorFault} />
      ) : null}

      {/* injected fault */}
      {shortX !== null ? (
        <g data-part="fault-short">
          <Line x1={shortX} y1={yA} x2={shortX} y2={yB} colour={FAULT} width={4} />
          <circle cx={shortX} cy={yA} r={3.5} fill={FAULT} />
          <circle cx={shortX} cy={yB} r={3.5} fill={FAULT} />
          <text x={shortX + (fault === "short-panel" ? 8 : -8)} y={yB - 10} textAnchor={fault === "short-panel" ? "start" : "end"} fontSize={12.5} fontWeight={700} fill={FAULT}>
            short
          </text>
        </g>
      ) : null}
      {fault === "cut" ? (
        <g data-part="fault-cut">
          <rect x={cutX - 9} y={yA - 4} width={18} height={8} fill={CABLE_BG} />
          <Line x1={cutX - 9} y1={yA - 6} x2={cutX - 5} y2={yA + 6} colour={FAULT} width={2} />
          <Line x1={cutX + 5} y1={yA - 6} x2={cutX + 9} y2={yA + 6} colour={FAULT} width={2} />
          <text x={cutX} y={yA - 12} textAnchor="middle" fontSize={12.5} fontWeight={700} fill={FAULT}>
            cut
          </text>
        </g>
      ) : null}
    </svg>
  );
}
