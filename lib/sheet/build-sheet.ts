import type { Band, Catalog, InputType, WiringScheme } from "@/lib/catalog/schema";
import { boardEntry, boardInputs, indexCatalog } from "@/lib/layout/catalog-index";
import { PANEL_KEY, type LayoutDocument, type LayoutInput } from "@/lib/layout/schema";
import { formatOhms } from "@/lib/resistors/format-ohms";
import { formatGauge, type Schedule, type ScheduleDetector } from "@/lib/schedule/schema";
import { createSolver } from "@/lib/solver";
import { isLifeSafety } from "@/lib/solver/resolve";
import { PANEL_AUX_NAME } from "@/lib/solver/power-rules";
import { SHEET_LIFE_SAFETY_CAUTION } from "@/lib/sheet/caution";
import { coreMap, usesLoopBack } from "@/lib/sheet/core-map";
import { sheetResistors } from "@/lib/sheet/sheet-resistors";
import type { SheetBoard, SheetDetector, SheetInput, SpareInput, TerminalSheet } from "@/lib/sheet/sheet-types";
import { expectedReadings, zoneReports } from "@/lib/sheet/test-readings";
import { buildZoneList } from "@/lib/sheet/zone-list";
import { PLACEMENT_WORDS, SCHEME_WORDS } from "@/lib/vocabulary/words";

// The terminal sheet of a layout: per board, every input with its zones, detectors, resistors, cores and the
// meter reading expected in each commissioning test (the loop engine's rows, through the solver).

export const MEASURING_NOTE =
  "Readings are taken across the input's terminal pair at the panel end, with the pair lifted off the input together with anything fitted at its terminals, and the meter on its resistance range. A cut reads open: the meter shows OL. Ranges cover part tolerance and the cable from 10 °C to 40 °C (common practice, no published source).";

export const SIGN_OFF_LINES = ["Tested by (name): ____________________", "Signature: ____________________", "Date: ____________"];

export const terminalsText = (input: number) => `${input}+ / ${input}−`;

/** The resting value that keeps an unused input at normal: the first of the input type's resistor values whose reading is normal. */
export function spareValue(type: InputType): { ohms: number; text: string } | null {
  const normalAt = (bands: Band[] | undefined, ohms: number) => !!bands?.some((b) => b.report === "normal" && ohms >= b.fromOhms && (b.toOhms === null || ohms < b.toOhms));
  const candidates: [WiringScheme, number | undefined][] = [
    ["single-eol", type.eolOhms],
    ["double-eol", type.eolOhms],
    ["double-eol", type.eolOhms !== undefined && type.alarmOhms !== undefined ? type.eolOhms + type.alarmOhms : undefined],
    ["shared", type.eolOhms],
  ];
  for (const [scheme, ohms] of candidates) {
    if (ohms === undefined || !type.schemes.includes(scheme) || !normalAt(type.bands[scheme], ohms)) continue;
    const parts = scheme === "double-eol" && ohms !== type.eolOhms ? `${formatOhms(type.eolOhms!)} and ${formatOhms(type.alarmOhms!)} in series` : formatOhms(ohms);
    return { ohms, text: parts };
  }
  if (type.schemes.includes("none") && normalAt(type.bands.none, 0)) return { ohms: 0, text: "a wire link" };
  return null;
}

function spareNote(type: InputType | undefined): string {
  const v = type ? spareValue(type) : null;
  return v
    ? `Spare: not wired. Fit ${v.text} across the terminals (or disable the input) so it reads normal, not open (common practice, no published source).`
    : "Spare: not wired. Disable the input so it does not report open (common practice, no published source).";
}

function fittedValues(inp: LayoutInput, type: InputType | undefined) {
  return { eolOhms: inp.eolOhms ?? type?.eolOhms, alarmOhms: inp.alarmOhms ?? type?.alarmOhms, sharedOhms: inp.sharedOhms ?? type?.sharedOhms };
}

export function buildTerminalSheet(layout: LayoutDocument, schedule: Schedule, catalog: Catalog): TerminalSheet {
  const ix = indexCatalog(catalog);
  const solver = createSolver(schedule, catalog);
  const result = solver.solve(layout);
  const byId = new Map<string, ScheduleDetector>(schedule.map((d) => [d.id, d]));
  const layoutInputs = new Map<string, LayoutInput>();
  for (const inp of layout.inputs) if (!layoutInputs.has(`${inp.boardKey}#${inp.input}`)) layoutInputs.set(`${inp.boardKey}#${inp.input}`, inp);
  // a detector is wired to the panel's auxiliary output, whatever else the panel's battery figures carry
  const supplyName = new Map(result.supplies.map((s) => [s.supplyKey, s.supplyKey === PANEL_KEY ? PANEL_AUX_NAME : s.name]));
  const feedOf = new Map(result.detectors.map((d) => [d.detectorId, supplyName.get(d.supplyKey) ?? d.supplyKey]));
  const panel = ix.panels.get(layout.panelId) ?? null;
  const problems = result.findings.filter((f) => f.severity === "error" && f.target.kind === "layout").map((f) => f.message);

  const figuresByBoard = new Map<string, typeof result.inputs>();
  for (const fig of result.inputs) {
    const list = figuresByBoard.get(fig.boardKey) ?? [];
    list.push(fig);
    figuresByBoard.set(fig.boardKey, list);
  }

  let zone = 0;
  let lifeSafety = false;
  const boards: SheetBoard[] = [];
  for (const bf of result.boards) {
    if (bf.inputsTotal === 0) continue;
    const lb = layout.boards.find((b) => b.key === bf.boardKey);
    const entry = lb ? boardEntry(ix, lb.kind, lb.catalogId) : null;
    const typeId = bf.boardKey === PANEL_KEY ? (panel?.onboardInputs.inputType ?? null) : entry ? (boardInputs(entry)?.inputType ?? null) : null;
    const type = typeId ? ix.inputTypes.get(typeId) : undefined;
    const deviceName = bf.boardKey === PANEL_KEY ? (panel?.name ?? bf.catalogId) : (entry?.entry.name ?? bf.catalogId);
    const used = new Map((figuresByBoard.get(bf.boardKey) ?? []).map((f) => [f.input, f]));
    const rows: (SheetInput | SpareInput)[] = [];
    for (let n = 1; n <= bf.inputsTotal; n++) {
      const fig = used.get(n);
      const inp = layoutInputs.get(`${bf.boardKey}#${n}`);
      if (!fig || !inp) {
        rows.push({ spare: true, boardKey: bf.boardKey, input: n, terminals: terminalsText(n), note: spareNote(type) });
        continue;
      }
      const placed = fig.detectorIds.map((id) => ({ sched: byId.get(id)!, cat: ix.detectors.get(byId.get(id)!.catalogId)! }));
      const analysis = solver.analysisFor({ boardKey: bf.boardKey, input: n });
      const expected = analysis && analysis.valid !== false ? expectedReadings(analysis, placed.map((d) => ({ label: d.sched.label, category: d.cat.category, tamper: d.cat.tamper }))) : [];
      const shared = inp.scheme === "shared";
      const detectors: SheetDetector[] = placed.map((d, i) => {
        const ls = isLifeSafety(d.cat);
        if (ls) lifeSafety = true;
        return {
          id: d.sched.id,
          zone: ++zone,
          label: d.sched.label,
          area: d.sched.area,
          room: d.sched.room,
          catalogId: d.cat.id,
          deviceType: d.cat.name,
          category: d.cat.category,
          contact: d.cat.contact,
          tamper: d.cat.tamper,
          lifeSafety: ls,
          powered: d.cat.power !== null,
          poweredFrom: d.cat.power ? (feedOf.get(d.sched.id) ?? null) : null,
          cableM: d.sched.cableM,
          gauge: d.sched.gauge,
          gaugeText: formatGauge(d.sched.gauge),
          reports: zoneReports(expected, i, shared),
        };
      });
      const longest = placed.reduce((a, b) => (b.sched.cableM > a.sched.cableM ? b : a));
      const contact = placed[0].cat.contact;
      const powered = detectors.find((d) => d.powered);
      const findings = result.findings
        .filter((f) => f.severity !== "note" && f.target.kind === "input" && f.target.boardKey === bf.boardKey && f.target.input === n)
        .map((f) => ({ code: f.code, severity: f.severity as "error" | "warning", message: f.message, why: f.why }));
      rows.push({
        spare: false,
        boardKey: bf.boardKey,
        input: n,
        terminals: terminalsText(n),
        zones: detectors.map((d) => d.zone),
        detectors,
        scheme: inp.scheme,
        schemeText: SCHEME_WORDS[inp.scheme],
        placement: inp.placement,
        placementText: inp.scheme === "none" ? SCHEME_WORDS.none : PLACEMENT_WORDS[inp.placement],
        resistors: sheetResistors({ scheme: inp.scheme, placement: inp.placement, contact, labels: detectors.map((d) => d.label), ...fittedValues(inp, type), tolerancePct: type?.tolerancePct ?? 5 }),
        loopConductors: usesLoopBack(inp.scheme, inp.placement) ? 4 : 2,
        cores: coreMap({ scheme: inp.scheme, placement: inp.placement, contact, tamper: placed.some((d) => d.cat.tamper), powered: !!powered, input: n, powerFrom: powered?.poweredFrom }),
        cable: { gauge: longest.sched.gauge, gaugeText: formatGauge(longest.sched.gauge), lengthM: longest.sched.cableM, conductorOhms: analysis?.conductorOhms ?? null },
        expected,
        noReadingsReason: expected.length ? null : (findings.find((f) => f.severity === "error")?.message ?? "The loop cannot be analysed on this input."),
        findings,
      });
    }
    boards.push({
      boardKey: bf.boardKey,
      name: bf.name,
      kind: bf.kind,
      catalogId: bf.catalogId,
      deviceName,
      busAddress: lb?.busAddress ?? null,
      inputType: type ? { id: type.id, name: type.name, tolerancePct: type.tolerancePct } : null,
      rows,
      signOff: SIGN_OFF_LINES,
    });
  }
  const unplaced = result.totals.unplacedIds.map((id) => ({ id, label: byId.get(id)?.label ?? id }));
  return {
    panel: panel ? { id: panel.id, name: panel.name } : null,
    boards,
    zoneCount: zone,
    lifeSafety,
    caution: lifeSafety ? SHEET_LIFE_SAFETY_CAUTION : null,
    measuringNote: MEASURING_NOTE,
    unplaced,
    problems,
    supplies: result.supplies,
    zoneList: buildZoneList(result.zones, boards, panel?.zoneLabelLength),
  };
}
