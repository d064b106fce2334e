"use client";

import { useDroppable } from "@dnd-kit/core";
import { memo } from "react";
import type { Finding } from "@/lib/findings";
import { useEditorStable } from "@/components/editor/editor-stable-context";
import { samePropsWithLists } from "@/components/editor/memo-compare";
import { inputAtKey } from "@/components/editor/use-editor-lookups";
import type { InputType, WiringScheme } from "@/lib/catalog/schema";
import { useEditor } from "@/components/editor/editor-context";
import { DetectorChip } from "@/components/editor/detector-chip";
import { ZoneProgramDetails } from "@/components/editor/zone-program-form";
import { FindingMarker } from "@/components/editor/finding-marker";
import { dropEdit, inputDropId, placementLabels, resistorLines, resistorText, schemeLabels } from "@/components/editor/editor-model";
import { classAAllowed, setInputWiring, type WiringPatch } from "@/lib/layout/operations";
import type { LayoutInput } from "@/lib/layout/schema";
import { inputName } from "@/lib/layout/names";

function OhmsField({ label, value, expected, onCommit }: { label: string; value: number | undefined; expected: number | undefined; onCommit: (v: number | null) => void }) {
  return (
    <label className="flex items-center justify-between gap-2">
      <span>{label}</span>
      <span className="flex items-center gap-1">
        <input
          key={value ?? "expected"}
          type="number"
          min={1}
          step="any"
          inputMode="decimal"
          defaultValue={value ?? ""}
          placeholder={expected !== undefined ? String(expected) : ""}
          className="w-20 rounded border border-line px-1 py-0.5 text-right"
          onBlur={(e) => {
            const t = e.currentTarget.value.trim();
            const n = Number(t);
            if (t === "") {
              if (value !== undefined) onCommit(null);
            } else if (Number.isFinite(n) && n > 0 && n !== value) onCommit(n);
          }}
          onKeyDown={(e) => {
            if (e.key === "Enter") e.currentTarget.blur();
          }}
        />
        <span>Ω</span>
      </span>
    </label>
  );
}

function WiringControls({ entry, type, where }: { entry: LayoutInput; type: InputType | undefined; where: string }) {
  const { ctx, applyTo } = useEditorStable();
  const at = { boardKey: entry.boardKey, input: entry.input };
  const set = (patch: WiringPatch) => applyTo((doc) => setInputWiring(doc, ctx, at, patch));
  const schemes: WiringScheme[] = type?.schemes ?? [entry.scheme];
  return (
    <details className="mt-1 text-[11px]">
      <summary className="cursor-pointer text-signal">Wiring</summary>
      <div className="mt-1 flex flex-col gap-1 rounded bg-slate-50 p-1">
        <label className="flex flex-col gap-0.5">
          <span>Scheme</span>
          <select aria-label={`Scheme of ${where}`} className="w-full rounded border border-line px-1 py-0.5" value={entry.scheme} onChange={(e) => set({ scheme: e.target.value as WiringScheme })}>
            {[...new Set([...schemes, entry.scheme])].map((s) => (
              <option key={s} value={s} disabled={!schemes.includes(s)}>
                {schemeLabels[s] ?? s}
              </option>
            ))}
          </select>
        </label>
        <label className="flex flex-col gap-0.5">
          <span>Placement</span>
          <select aria-label={`Resistor placement of ${where}`} className="w-full rounded border border-line px-1 py-0.5" value={entry.placement} onChange={(e) => set({ placement: e.target.value as LayoutInput["placement"] })}>
            {Object.entries(placementLabels).map(([v, l]) => (
              <option key={v} value={v}>
                {l}
              </option>
            ))}
          </select>
        </label>
        {entry.scheme !== "none" ? <OhmsField label={entry.scheme === "shared" ? "Line EOL" : "EOL"} value={entry.eolOhms} expected={type?.eolOhms} onCommit={(v) => set({ eolOhms: v })} /> : null}
        {entry.scheme === "double-eol" ? <OhmsField label="Alarm" value={entry.alarmOhms} expected={type?.alarmOhms} onCommit={(v) => set({ alarmOhms: v })} /> : null}
        {entry.scheme === "shared"
          ? ([0, 1] as const).map((k) => (
              <OhmsField
                key={k}
                label={k === 0 ? "Detector A" : "Detector B"}
                value={entry.sharedOhms?.[k]}
                expected={type?.sharedOhms?.[k]}
                onCommit={(v) => {
                  const base: [number, number] = entry.sharedOhms ?? [type?.sharedOhms?.[0] ?? 2700, type?.sharedOhms?.[1] ?? 5600];
                  if (v === null) set({ sharedOhms: null });
                  else set({ sharedOhms: k === 0 ? [v, base[1]] : [base[0], v] });
                }}
              />
            ))
          : null}
        {classAAllowed(type, entry.scheme) || entry.pathway === "class-a" ? (
          <label className="flex items-center gap-1">
            <input type="checkbox" aria-label={`Return path to the panel (Class A) on ${where}`} checked={entry.pathway === "class-a"} onChange={(e) => set({ pathway: e.target.checked ? "class-a" : "class-b" })} />
            <span>Return path to the panel (Class A)</span>
          </label>
        ) : null}
        <p className="text-slate-500">Blank fields use the input type&apos;s expected values.</p>
      </div>
    </details>
  );
}

/** One terminal pair: its number, zones, wiring and detectors; a drop target, with a "place here" button for the selected detector. */
export function InputSlot({ boardKey, n, type }: { boardKey: string; n: number; type: InputType | undefined }) {
  const { doc, ctx, canWrite, selected, zones, findingsAt, highlighted, detectorsById, inputAt } = useEditor();
  const entry = inputAt.get(inputAtKey(boardKey, n));
  const domId = `input-${boardKey}-${n}`;
  const zoneList = entry?.detectorIds.map((d) => zones.get(d)).filter((z): z is number => z !== undefined) ?? [];
  // "place here" on a free input; "share" only where sharing would be accepted (the drag path says why not)
  const canPlace = !!(canWrite && selected && !entry?.detectorIds.includes(selected) && (!entry || dropEdit(doc, ctx, { type: "detector", detectorId: selected }, { type: "input", boardKey, input: n })?.ok));
  return (
    <InputSlotView
      boardKey={boardKey}
      n={n}
      type={type}
      entry={entry}
      where={inputName(doc, { boardKey, input: n })}
      zoneText={zoneList.join(", ")}
      findings={findingsAt.get(domId)}
      placing={canPlace ? (detectorsById.get(selected!)?.label ?? "the selected detector") : null}
      selected={canPlace ? selected : null}
      isHighlighted={highlighted === domId}
    />
  );
}

interface SlotViewProps {
  boardKey: string;
  n: number;
  type: InputType | undefined;
  entry: LayoutInput | undefined;
  where: string;
  zoneText: string;
  findings: Finding[] | undefined;
  /** The label of the selected detector when it may be placed here, else null. */
  placing: string | null;
  selected: string | null;
  isHighlighted: boolean;
}

/** The slot itself, re-rendered only when its own props change: a move elsewhere leaves it alone. */
const InputSlotView = memo(function InputSlotView({ boardKey, n, type, entry, where, zoneText, findings, placing, selected, isHighlighted }: SlotViewProps) {
  const { ctx, canWrite, select, applyTo, detectorsById } = useEditorStable();
  const { setNodeRef, isOver } = useDroppable({ id: inputDropId(boardKey, n), data: { accepts: ["detector"] }, disabled: !canWrite });
  const domId = `input-${boardKey}-${n}`;
  const worst = findings?.some((f) => f.severity === "error") ? "border-fault" : findings?.some((f) => f.severity === "warning") ? "border-warn" : entry ? "border-line" : "border-dashed border-line";
  return (
    <li
      ref={setNodeRef}
      id={domId}
      data-testid={domId}
      aria-label={`${where}${entry ? `: ${entry.detectorIds.map((d) => detectorsById.get(d)?.label ?? d).join(" and ")}` : ", free"}`}
      className={`flex min-h-24 flex-col rounded-md border-2 p-1.5 text-xs ${worst} ${isOver ? "bg-signal-soft" : entry ? "bg-white" : "bg-slate-50"} ${isHighlighted ? "ring-4 ring-warn" : ""}`}
    >
      <div className="mb-1 flex items-center gap-1">
        <span className="font-mono font-semibold">IN {n}</span>
        {zoneText ? <span className="text-slate-500">zone {zoneText}</span> : <span className="text-slate-400">free</span>}
        <span className="ml-auto">
          <FindingMarker domId={domId} findings={findings} />
        </span>
      </div>
      {entry ? (
        <p className="mb-1 text-[11px] text-slate-600">
          <span className="font-medium text-ink">{schemeLabels[entry.scheme] ?? entry.scheme}</span>
          {entry.placement !== "at-detector" ? <span className="text-warn"> · {placementLabels[entry.placement]}</span> : null}
          {entry.pathway === "class-a" ? <span> · Class A</span> : null}
          <br />
          {resistorText(resistorLines(entry, type))}
        </p>
      ) : null}
      <div className="flex flex-col gap-1">
        {entry?.detectorIds.map((d, i) => (
          <DetectorChip key={d} detectorId={d} onInput sharedAs={entry.scheme === "shared" ? (i === 0 ? "A" : "B") : undefined} />
        ))}
      </div>
      {placing !== null && selected ? (
        <button
          type="button"
          className="mt-auto rounded border border-signal px-1 py-0.5 text-[11px] font-medium text-signal hover:bg-signal-soft"
          aria-label={`Place ${placing} on ${where}${entry ? " (shared input)" : ""}`}
          onClick={() =>
            applyTo((doc) => {
              const edit = dropEdit(doc, ctx, { type: "detector", detectorId: selected }, { type: "input", boardKey, input: n });
              if (edit?.ok) select(null);
              return edit;
            })
          }
        >
          {entry ? "Share this input" : "Place here"}
        </button>
      ) : null}
      {entry?.detectorIds.map((d) => <ZoneProgramDetails key={d} detectorId={d} />)}
      {entry && canWrite ? <WiringControls entry={entry} type={type} where={where} /> : null}
    </li>
  );
}, samePropsWithLists<SlotViewProps>(["findings"]));
