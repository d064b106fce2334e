"use client";

import { useSortable } from "@dnd-kit/sortable";
import { CSS } from "@dnd-kit/utilities";
import type { ReactNode } from "react";
import { useEditor } from "@/components/editor/editor-context";
import { FindingMarker } from "@/components/editor/finding-marker";
import { InputSlot } from "@/components/editor/input-slot";
import { OutputGrid } from "@/components/editor/output-slot";
import { boardSortId } from "@/components/editor/editor-model";
import { boardEntry, boardInputs } from "@/lib/layout/catalog-index";
import { inputBlockOf, removeBoard, reorderBoards, setBusAddress, setPoweredBy } from "@/lib/layout/operations";
import { boardName } from "@/lib/layout/names";
import { PANEL_KEY, type LayoutBoard } from "@/lib/layout/schema";
import { plural } from "@/lib/vocabulary/plural";

const KIND_WORDS: Record<LayoutBoard["kind"], string> = { expansion: "Expansion board", keypad: "Keypad", supply: "Power supply", outputs: "Output module", receiver: "Wireless receiver" };

function InputGrid({ boardKey }: { boardKey: string }) {
  const { doc, ix } = useEditor();
  const block = inputBlockOf(doc, ix, boardKey);
  if (!block || block.count === 0) return null;
  return (
    <ul className="mt-2 grid grid-cols-[repeat(auto-fill,minmax(10.5rem,1fr))] gap-1.5" aria-label={`Inputs of ${boardName(doc, boardKey)}`}>
      {Array.from({ length: block.count }, (_, i) => (
        <InputSlot key={i + 1} boardKey={boardKey} n={i + 1} type={block.inputType} />
      ))}
    </ul>
  );
}

function Usage({ boardKey }: { boardKey: string }) {
  const { result } = useEditor();
  const f = result.boards.find((b) => b.boardKey === boardKey);
  if (!f || f.inputsTotal === 0) return null;
  return (
    <span className="text-xs text-slate-600" data-testid={`usage-${boardKey}`}>
      {f.inputsUsed} of {plural(f.inputsTotal, "input")} used · {f.inputsFree} free
    </span>
  );
}

function Frame({ domId, title, subtitle, children, actions, handle, style, innerRef, dragging }: { domId: string; title: string; subtitle: ReactNode; children?: ReactNode; actions?: ReactNode; handle?: ReactNode; style?: React.CSSProperties; innerRef?: (el: HTMLElement | null) => void; dragging?: boolean }) {
  const { findingsAt, highlighted } = useEditor();
  return (
    <section
      ref={innerRef}
      style={style}
      id={domId}
      data-testid={domId}
      aria-label={title}
      className={`rounded-lg border border-line bg-white p-3 shadow-sm ${dragging ? "opacity-60 shadow-lg" : ""} ${highlighted === domId ? "ring-4 ring-warn" : ""}`}
    >
      <header className="flex items-start gap-2">
        {handle}
        <div className="min-w-0 flex-1">
          <h3 className="flex items-center gap-2 font-semibold">
            {title}
            <FindingMarker domId={domId} findings={findingsAt.get(domId)} />
          </h3>
          <div className="text-xs text-slate-600">{subtitle}</div>
          {actions ? <div className="mt-2">{actions}</div> : null}
        </div>
      </header>
      {children}
    </section>
  );
}

export function PanelCard() {
  const { doc, ix } = useEditor();
  const panel = ix.panels.get(doc.panelId);
  const type = panel ? ix.inputTypes.get(panel.onboardInputs.inputType) : undefined;
  return (
    <Frame
      domId={`board-${PANEL_KEY}`}
      title="Control panel"
      subtitle={
        <>
          {panel ? `${panel.name} · ${type?.name ?? panel.onboardInputs.inputType} · up to ${plural(panel.maxZones, "zone")} · ` : "control panel not in the catalog · "}
          <Usage boardKey={PANEL_KEY} />
        </>
      }
    >
      <InputGrid boardKey={PANEL_KEY} />
      <OutputGrid boardKey={PANEL_KEY} />
    </Frame>
  );
}

export function BoardCard({ board, index }: { board: LayoutBoard; index: number }) {
  const { doc, ctx, ix, canWrite, apply, result } = useEditor();
  const { attributes, listeners, setNodeRef, setActivatorNodeRef, transform, transition, isDragging } = useSortable({ id: boardSortId(board.key), data: { type: "board", accepts: ["board"] }, disabled: !canWrite });
  const entry = boardEntry(ix, board.kind, board.catalogId);
  const block = entry ? boardInputs(entry) : null;
  const type = block ? ix.inputTypes.get(block.inputType) : undefined;
  const name = boardName(doc, board.key);
  const supplies = doc.boards.filter((b) => b.kind === "supply" && b.key !== board.key);
  const ownSupply = entry?.kind === "expansion" && !!entry.entry.ownSupply;
  const supplyFigures = result.supplies.find((s) => s.supplyKey === board.key);
  const n = doc.boards.length;
  const kindWord = KIND_WORDS[board.kind];
  return (
    <Frame
      domId={`board-${board.key}`}
      innerRef={setNodeRef}
      style={{ transform: CSS.Transform.toString(transform), transition }}
      dragging={isDragging}
      title={name}
      handle={
        canWrite ? (
          <button
            ref={setActivatorNodeRef}
            type="button"
            {...attributes}
            {...listeners}
            aria-label={`Move ${name} in the board order (position ${index + 1} of ${n})`}
            className="cursor-grab touch-none rounded border border-line px-1.5 py-1 text-slate-500 hover:bg-slate-50"
          >
            ⠿
          </button>
        ) : null
      }
      subtitle={
        <>
          {kindWord}: {entry ? entry.entry.name : "not in the catalog"}
          {type ? ` · ${type.name}` : ""}
          {supplyFigures ? ` · output ${supplyFigures.ratingMa} mA at ${supplyFigures.volts} V, battery up to ${supplyFigures.maxBatteryAh} Ah` : ""}
          {ownSupply ? " · its own supply" : ""}
          {block ? " · " : ""}
          <Usage boardKey={board.key} />
        </>
      }
      actions={
        <div className="flex flex-wrap items-center gap-2 text-xs">
          {entry?.entry.takesBusAddress ? (
            <label className="flex items-center gap-1">
              Bus address
              <input
                key={board.busAddress ?? "none"}
                type="number"
                min={0}
                className="w-14 rounded border border-line px-1 py-0.5"
                defaultValue={board.busAddress ?? ""}
                disabled={!canWrite}
                aria-label={`Bus address of ${name}`}
                onBlur={(e) => {
                  const t = e.currentTarget.value.trim();
                  const v = t === "" ? null : Number(t);
                  if (v !== board.busAddress) apply(setBusAddress(doc, ctx, board.key, v));
                }}
              />
            </label>
          ) : null}
          {board.kind !== "supply" && !ownSupply ? (
            <label className="flex items-center gap-1">
              Powered from
              <select className="rounded border border-line px-1 py-0.5" disabled={!canWrite} aria-label={`Power for ${name}`} value={board.poweredBy ?? ""} onChange={(e) => apply(setPoweredBy(doc, ctx, board.key, e.target.value || null))}>
                <option value="">panel auxiliary output</option>
                {supplies.map((s) => (
                  <option key={s.key} value={s.key}>
                    {boardName(doc, s.key)}
                  </option>
                ))}
              </select>
            </label>
          ) : null}
          {canWrite ? (
            <>
              <button type="button" className="rounded border border-line px-1.5 py-0.5 disabled:opacity-40" disabled={index === 0} aria-label={`Move ${name} up`} onClick={() => apply(reorderBoards(doc, ctx, index, index - 1))}>
                ↑
              </button>
              <button type="button" className="rounded border border-line px-1.5 py-0.5 disabled:opacity-40" disabled={index === n - 1} aria-label={`Move ${name} down`} onClick={() => apply(reorderBoards(doc, ctx, index, index + 1))}>
                ↓
              </button>
              <button type="button" className="ml-auto rounded border border-fault px-1.5 py-0.5 text-fault hover:bg-fault-soft" onClick={() => apply(removeBoard(doc, ctx, board.key))}>
                Remove
              </button>
            </>
          ) : null}
        </div>
      }
    >
      {block ? <InputGrid boardKey={board.key} /> : null}
      <OutputGrid boardKey={board.key} />
    </Frame>
  );
}
