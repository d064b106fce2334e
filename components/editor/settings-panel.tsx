"use client";

import { useState } from "react";
import { useEditor } from "@/components/editor/editor-context";
import { changePanel } from "@/components/editor/editor-model";
import { addBoard } from "@/lib/layout/operations";
import type { BoardKind, LayoutPower } from "@/lib/layout/schema";
import { CUSTOM_PROFILE_ID, safetyFactors, standbyProfile, standbyProfiles } from "@/lib/solver";
import { plural } from "@/lib/vocabulary/plural";
import { useFormat } from "@/components/format/format-provider";
import { fieldToMetres, lengthCell, lengthUnit, metresToTyped, typedToMetres } from "@/lib/format/length-input";

/** Hardware choices that are not drag and drop: the panel, adding boards, power and bus settings. */
export function SettingsPanel() {
  const { doc, ctx, ix, canWrite, apply } = useEditor();
  const panel = ix.panels.get(doc.panelId);
  const family = panel?.family;
  const choices: { kind: BoardKind; id: string; name: string; detail: string; onBus: boolean }[] = family
    ? [
        ...ctx.catalog.expansionBoards.filter((b) => b.families.includes(family)).map((b) => ({ kind: "expansion" as const, id: b.id, name: b.name, detail: plural(b.inputs.count, "input"), onBus: b.takesBusAddress })),
        ...ctx.catalog.keypads.filter((b) => b.families.includes(family)).map((b) => ({ kind: "keypad" as const, id: b.id, name: b.name, detail: b.inputs ? `keypad, ${plural(b.inputs.count, "input")}` : "keypad", onBus: b.takesBusAddress })),
        ...ctx.catalog.powerSupplies.filter((b) => b.families.includes(family)).map((b) => ({ kind: "supply" as const, id: b.id, name: b.name, detail: `${b.outputMa} mA supply`, onBus: b.takesBusAddress })),
        ...(ctx.catalog.outputModules ?? []).filter((b) => b.families.includes(family)).map((b) => ({ kind: "outputs" as const, id: b.id, name: b.name, detail: plural(b.outputs.reduce((n, o) => n + o.count, 0), "output"), onBus: b.takesBusAddress })),
      ]
    : [];
  const [choice, setChoice] = useState(choices[0] ? `${choices[0].kind}:${choices[0].id}` : "");
  const [busRun, setBusRun] = useState("");
  // bus cable typed in the organisation's unit, kept in metres in the layout
  const { units } = useFormat().settings;
  const setPower = (patch: Partial<LayoutPower>) => {
    const power = { ...doc.power, ...patch };
    apply({ ok: true, layout: { ...doc, power }, message: `Power settings: ${standbyProfile(power.standbyProfileId)?.label ?? power.standbyProfileId}, safety factor ${power.safetyFactor.toFixed(2)}` });
  };
  const profile = standbyProfile(doc.power.standbyProfileId);
  const selectedChoice = choices.find((c) => `${c.kind}:${c.id}` === choice) ?? choices[0];
  return (
    <section aria-labelledby="settings-heading" className="rounded-lg border border-line bg-white p-3 text-xs">
      <h2 id="settings-heading" className="text-sm font-semibold">
        Hardware and power
      </h2>
      <label className="mt-2 block">
        <span className="font-medium">Control panel</span>
        <select className="mt-1 block w-full rounded border border-line px-2 py-1" value={doc.panelId} disabled={!canWrite} onChange={(e) => apply(changePanel(doc, ctx, e.target.value))}>
          {ctx.catalog.panels.map((p) => (
            <option key={p.id} value={p.id}>
              {p.name} ({plural(p.onboardInputs.count, "input")}, {plural(p.maxZones, "zone")})
            </option>
          ))}
        </select>
      </label>
      {canWrite && choices.length ? (
        <div className="mt-3">
          <label htmlFor="add-board-choice" className="font-medium">
            Add a board
          </label>
          <div className="mt-1 flex gap-1">
            <select id="add-board-choice" className="min-w-0 flex-1 rounded border border-line px-2 py-1" value={selectedChoice ? `${selectedChoice.kind}:${selectedChoice.id}` : ""} onChange={(e) => setChoice(e.target.value)}>
              {choices.map((c) => (
                <option key={`${c.kind}:${c.id}`} value={`${c.kind}:${c.id}`}>
                  {c.name} ({c.detail})
                </option>
              ))}
            </select>
            <button
              type="button"
              className="rounded bg-signal px-2 py-1 font-medium text-white"
              onClick={() => {
                if (!selectedChoice) return;
                // a bus device asks for its run of bus cable; addBoard refuses a blank or 0 m with a plain message
                const edit = addBoard(doc, ctx, selectedChoice.kind, selectedChoice.id, undefined, selectedChoice.onBus ? typedToMetres(Number(busRun || "0"), units) : undefined);
                apply(edit);
                if (edit.ok) setBusRun("");
              }}
            >
              Add board
            </button>
          </div>
          {selectedChoice?.onBus ? (
            <label className="mt-1 block">
              Data bus cable to it ({lengthUnit(units)})
              <input type="number" min={0} step="any" inputMode="decimal" required className="mt-1 block w-full rounded border border-line px-2 py-1" value={busRun} onChange={(e) => setBusRun(e.target.value)} data-testid="add-board-bus-run" />
              <span className="text-slate-600">Added to the data bus total ({lengthCell(doc.busCableM, units)} now).</span>
            </label>
          ) : null}
        </div>
      ) : null}
      <label className="mt-3 block">
        <span className="font-medium">Standby profile</span>
        <select
          className="mt-1 block w-full rounded border border-line px-2 py-1"
          value={doc.power.standbyProfileId}
          disabled={!canWrite}
          onChange={(e) => {
            const p = standbyProfile(e.target.value);
            setPower({ standbyProfileId: e.target.value, ...(p ? { safetyFactor: p.defaultSafetyFactor } : {}) });
          }}
        >
          {standbyProfiles.map((p) => (
            <option key={p.id} value={p.id}>
              {p.label}
            </option>
          ))}
        </select>
      </label>
      {profile ? (
        <p className="mt-1 text-slate-600" data-testid="profile-source">
          Source: {profile.source}. {profile.note}
        </p>
      ) : null}
      {doc.power.standbyProfileId === CUSTOM_PROFILE_ID ? (
        <div className="mt-2 grid grid-cols-2 gap-2">
          <label>
            Standby (h)
            <input type="number" min={1} max={240} className="mt-1 block w-full rounded border border-line px-1 py-0.5" defaultValue={doc.power.customStandbyH ?? profile?.standbyH} disabled={!canWrite} onBlur={(e) => Number(e.currentTarget.value) > 0 && setPower({ customStandbyH: Number(e.currentTarget.value) })} />
          </label>
          <label>
            Alarm (min)
            <input type="number" min={0} max={240} className="mt-1 block w-full rounded border border-line px-1 py-0.5" defaultValue={doc.power.customAlarmMin ?? profile?.alarmMin} disabled={!canWrite} onBlur={(e) => e.currentTarget.value !== "" && setPower({ customAlarmMin: Number(e.currentTarget.value) })} />
          </label>
        </div>
      ) : null}
      <fieldset className="mt-3">
        <legend className="font-medium">Battery safety factor</legend>
        {safetyFactors.map((f) => (
          <label key={f.value} className="mt-1 flex items-start gap-2">
            <input type="radio" name="safety-factor" value={f.value} checked={doc.power.safetyFactor === f.value} disabled={!canWrite} onChange={() => setPower({ safetyFactor: f.value })} className="mt-0.5" />
            <span>
              {f.label} <span className="text-slate-500">({f.source})</span>
            </span>
          </label>
        ))}
        {!safetyFactors.some((f) => f.value === doc.power.safetyFactor) ? <p className="mt-1">Custom factor in this layout: {doc.power.safetyFactor}</p> : null}
      </fieldset>
      <label className="mt-3 block">
        <span className="font-medium">Data bus cable, total length ({lengthUnit(units)})</span>
        <input
          key={doc.busCableM}
          type="number"
          min={0}
          step="any"
          className="mt-1 block w-full rounded border border-line px-2 py-1"
          defaultValue={metresToTyped(doc.busCableM, units)}
          disabled={!canWrite}
          onBlur={(e) => {
            const v = fieldToMetres(e.currentTarget.value, units, doc.busCableM);
            if (typeof v === "number" && v >= 0 && v !== doc.busCableM) apply({ ok: true, layout: { ...doc, busCableM: v }, message: `Data bus cable set to ${lengthCell(v, units)}` });
          }}
        />
      </label>
    </section>
  );
}
