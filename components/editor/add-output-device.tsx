"use client";

import { useState } from "react";
import { useEditor } from "@/components/editor/editor-context";
import { useFormat } from "@/components/format/format-provider";
import { lengthUnit, typedToMetres } from "@/lib/format/length-input";
import { outputDeviceSchema } from "@/lib/layout/schema";
import { addOutputDevice } from "@/lib/layout/zone-output-operations";

const GAUGES = [{ awg: 22 }, { awg: 20 }, { awg: 18 }, { mm2: 0.5 }, { mm2: 0.75 }, { mm2: 1 }] as const;
const gaugeWords = (g: (typeof GAUGES)[number]) => ("awg" in g ? `${g.awg} AWG` : `${g.mm2} mm²`);
const newDeviceSchema = outputDeviceSchema.omit({ id: true });

/** A new sounder or strobe of this layout, from the catalog, with its cable run; checked by the document's own schema. */
export function AddOutputDevice() {
  const { doc, ctx, apply } = useEditor();
  const { units } = useFormat().settings;
  const types = [...(ctx.catalog.sounders ?? []).map((s) => ({ kind: "sounder" as const, id: s.id, name: s.name })), ...(ctx.catalog.strobes ?? []).map((s) => ({ kind: "strobe" as const, id: s.id, name: s.name }))];
  const [type, setType] = useState(types[0] ? `${types[0].kind}:${types[0].id}` : "");
  const [label, setLabel] = useState("");
  const [cable, setCable] = useState("");
  const [gauge, setGauge] = useState(0);
  const [error, setError] = useState<string | null>(null);
  if (!types.length) return null;
  const add = () => {
    const [kind, catalogId] = type.split(":");
    const parsed = newDeviceSchema.safeParse({ kind, catalogId, label, cableM: cable.trim() === "" ? NaN : typedToMetres(Number(cable), units), gauge: GAUGES[gauge] });
    if (!parsed.success) {
      const issue = parsed.error.issues[0];
      setError(issue.path[0] === "cableM" ? `Cable run: ${cable.trim() === "" || !Number.isFinite(Number(cable)) ? "give a length" : issue.message}` : `${issue.path[0] === "label" ? "Label" : "Type"}: ${issue.message}`);
      return;
    }
    const edit = addOutputDevice(doc, ctx, parsed.data);
    apply(edit);
    if (edit.ok) {
      setError(null);
      setLabel("");
      setCable("");
    }
  };
  return (
    <details className="mt-2 text-xs">
      <summary className="cursor-pointer font-medium text-signal">Add a sounder or strobe</summary>
      <div className="mt-1 flex flex-col gap-1 rounded bg-slate-50 p-2">
        <label className="flex flex-col gap-0.5">
          Type
          <select className="rounded border border-line px-1 py-0.5" value={type} onChange={(e) => setType(e.target.value)}>
            {types.map((t) => (
              <option key={`${t.kind}:${t.id}`} value={`${t.kind}:${t.id}`}>
                {t.name}
              </option>
            ))}
          </select>
        </label>
        <label className="flex flex-col gap-0.5">
          Label
          <input className="rounded border border-line px-1 py-0.5" value={label} maxLength={80} onChange={(e) => setLabel(e.target.value)} />
        </label>
        <label className="flex flex-col gap-0.5">
          Cable run ({lengthUnit(units)})
          <input type="number" min={0} step="any" inputMode="decimal" className="rounded border border-line px-1 py-0.5" value={cable} onChange={(e) => setCable(e.target.value)} />
        </label>
        <label className="flex flex-col gap-0.5">
          Cable size
          <select className="rounded border border-line px-1 py-0.5" value={gauge} onChange={(e) => setGauge(Number(e.target.value))}>
            {GAUGES.map((g, i) => (
              <option key={i} value={i}>
                {gaugeWords(g)}
              </option>
            ))}
          </select>
        </label>
        {error ? (
          <p role="alert" className="text-fault" data-testid="add-output-device-error">
            {error}
          </p>
        ) : null}
        <button type="button" className="self-start rounded bg-signal px-2 py-1 font-medium text-white" onClick={add}>
          Add
        </button>
      </div>
    </details>
  );
}
