"use client";
// Choose a conductor fault: the kind, the core(s) by colour as drawn on the schematic, and the position.
import { CABLE_CORES_WORDS } from "@/lib/loop";
import type { TamperCable } from "./bench-state";
import { Section, Segmented } from "./controls";
import { CONDUCTOR_KIND_WORDS, CORE_INK, coreColoursOf, POSITION_WORDS, toggleCore, withKind, type ConductorKind, type ConductorPosition } from "./conductor-choice";
import type { Bench } from "./use-bench";

export function ConductorFaultControls({ bench }: { bench: Bench }) {
  const { s, update, loop } = bench;
  const c = s.conductor;
  const colours = coreColoursOf(loop);
  return (
    <Section title="Conductor fault">
      <p className="-mt-2 text-xs text-slate-500">
        The cable&apos;s {colours.length} cores, by colour as drawn on the schematic{loop.placement === "loop-back" && loop.scheme !== "none" ? " (four-core: the loop-back pair too)" : ""}.
      </p>
      {s.placement === "at-detector" && s.tamper ? (
        <Segmented<TamperCable | "pair">
          legend="Cable"
          name="cable"
          value={s.cable ?? "pair"}
          columns={1}
          options={[
            { value: "pair", label: "the input pair only (two-core)" },
            ...(["four-core-alarm-tamper", "six-core-alarm-tamper"] as const).map((k) => ({ value: k, label: CABLE_CORES_WORDS[k] })),
          ]}
          onChange={(cable) => update({ cable: cable === "pair" ? null : cable })}
          testId="cable-cores"
        />
      ) : null}
      <Segmented<ConductorKind | "none">
        legend="Fault on the cable's cores"
        name="conductor-kind"
        value={c?.kind ?? "none"}
        columns={1}
        options={(["none", "short", "open", "earth"] as const).map((k) => ({ value: k, label: CONDUCTOR_KIND_WORDS[k] }))}
        onChange={(kind) => update((prev) => ({ ...prev, conductor: withKind(prev.conductor, kind), fault: kind === "none" ? prev.fault : "none" }))}
        testId="conductor-kind"
      />
      {c ? (
        <>
          <fieldset data-testid="conductor-cores">
            <legend className="mb-1 text-sm font-medium">{c.kind === "short" ? "The two cores that touch" : "The core"}</legend>
            <div className="flex flex-wrap gap-1.5">
              {colours.map((colour) => {
                const on = c.cores.includes(colour);
                return (
                  <button
                    key={colour}
                    type="button"
                    aria-pressed={on}
                    onClick={() => update((prev) => ({ ...prev, conductor: prev.conductor && toggleCore(prev.conductor, colour) }))}
                    className={`flex items-center gap-2 rounded-md border px-2.5 py-1.5 text-sm ${on ? "border-signal bg-signal-soft font-medium" : "border-line bg-white hover:bg-slate-50"}`}
                    data-testid={`core-${colour}`}
                  >
                    <span aria-hidden="true" className="inline-block h-3 w-5 rounded-sm border border-slate-400" style={{ background: CORE_INK[colour] }} />
                    {colour}
                  </button>
                );
              })}
            </div>
            {c.kind === "short" && c.cores.length < 2 ? <p className="mt-1 text-xs text-slate-500">Pick two cores.</p> : null}
          </fieldset>
          <Segmented<ConductorPosition>
            legend="Where along the run"
            name="conductor-position"
            value={c.position}
            options={(["panel", "middle", "detector"] as const).map((p) => ({ value: p, label: POSITION_WORDS[p] }))}
            onChange={(position) => update((prev) => ({ ...prev, conductor: prev.conductor && { ...prev.conductor, position } }))}
            testId="conductor-position"
          />
        </>
      ) : null}
    </Section>
  );
}
