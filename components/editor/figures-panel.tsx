"use client";

import { useEditor } from "@/components/editor/editor-context";
import { FindingMarker } from "@/components/editor/finding-marker";
import { Bar, SupplyFiguresItem } from "@/components/editor/supply-figures";
import { CHECK_EDITION, CUSTOM_PROFILE_ID } from "@/lib/solver/standby-profiles";
import { voltsText } from "@/lib/solver/supply-lines";
import { plural } from "@/lib/vocabulary/plural";

/** Capacity, bus, power and supervision figures of the live solve. */
export function FiguresPanel() {
  const { result, findingsAt, highlighted, detectorsById } = useEditor();
  const t = result.totals;
  return (
    <section id="layout-figures" aria-labelledby="figures-heading" data-testid="figures" className={`rounded-lg border border-line bg-white p-3 text-xs ${highlighted === "layout-figures" ? "ring-4 ring-warn" : ""}`}>
      <h2 id="figures-heading" className="flex items-center gap-2 text-sm font-semibold">
        Figures <FindingMarker domId="layout-figures" findings={findingsAt.get("layout-figures")} />
      </h2>
      <dl className="mt-2 grid grid-cols-[1fr_auto] gap-x-3 gap-y-1">
        <dt>Inputs used</dt>
        <dd data-testid="figure-inputs">
          {t.inputsUsed} of {t.inputsTotal} ({t.inputsFree} free)
        </dd>
        <dt>Zones</dt>
        <dd data-testid="figure-zones" className={t.zonesUsed > t.maxZones ? "font-semibold text-fault" : ""}>
          {t.zonesUsed} of {t.maxZones} the panel reports
        </dd>
        <dt>Detectors placed</dt>
        <dd data-testid="figure-placed" className={t.unplacedIds.length ? "text-warn" : ""}>
          {t.detectorsPlaced}
          {t.unplacedIds.length ? ` (${t.unplacedIds.length} unplaced)` : ""}
        </dd>
        <dt>Shared inputs</dt>
        <dd>
          {result.shared.inputs}
          {result.shared.inputsSaved ? ` (${plural(result.shared.inputsSaved, "input")} saved)` : ""}
        </dd>
        <dt>Supervision coverage</dt>
        <dd data-testid="figure-coverage">{result.coverage.share === null ? "no inputs used" : `${result.coverage.covered} of ${plural(result.coverage.used, "input")} (${Math.round(result.coverage.share * 100)} %)`}</dd>
      </dl>
      <h3 className="mt-3 font-semibold">Per board</h3>
      <ul className="mt-1 flex flex-col gap-1">
        {result.boards
          .filter((b) => b.inputsTotal > 0)
          .map((b) => (
            <li key={b.boardKey}>
              <span className="flex justify-between">
                <span>{b.name}</span>
                <span>
                  {b.inputsUsed}/{b.inputsTotal} used
                </span>
              </span>
              <Bar warnNearFull={false} value={b.inputsUsed} max={b.inputsTotal} label={`${b.name}: ${b.inputsUsed} of ${plural(b.inputsTotal, "input")} used`} />
            </li>
          ))}
      </ul>
      {result.bus ? (
        <>
          <h3 className="mt-3 font-semibold">Data bus</h3>
          <p>
            {result.bus.devices} of {plural(result.bus.maxDevices, "device")} · addresses {result.bus.addressMin}–{result.bus.addressMax} · cable {result.bus.cableM} m of {result.bus.maxCableM} m
          </p>
          {result.bus.duplicateAddresses.length ? <p className="text-fault">Address used twice: {result.bus.duplicateAddresses.join(", ")}</p> : null}
        </>
      ) : null}
      <h3 className="mt-3 font-semibold">Power</h3>
      {result.battery ? (
        <p className="text-slate-600">
          {result.battery.standbyH} h standby then {result.battery.alarmMin} min alarm, × {result.battery.safetyFactor.toFixed(2)}
          {result.battery.source ? ` (${result.battery.source})` : ""}
          {result.battery.profileId !== CUSTOM_PROFILE_ID ? `. ${CHECK_EDITION}` : ""}
        </p>
      ) : null}
      <ul className="mt-1 flex flex-col gap-2">
        {result.supplies.map((s) => (
          <SupplyFiguresItem key={s.supplyKey} s={s} findings={findingsAt.get(`supply-${s.supplyKey}`)} highlighted={highlighted === `supply-${s.supplyKey}`} />
        ))}
      </ul>
      {result.detectors.length ? (
        <details className="mt-3" data-testid="figure-voltages">
          <summary className="cursor-pointer font-semibold">Voltage at powered detectors ({result.detectors.length})</summary>
          <ul className="mt-1 flex flex-col gap-0.5">
            {result.detectors.map((v) => (
              <li key={v.detectorId} className={`flex justify-between gap-2 ${v.ok ? "" : "font-semibold text-fault"}`}>
                <span className="truncate">{detectorsById.get(v.detectorId)?.label ?? "Unknown detector"}</span>
                <span className="shrink-0">{voltsText(v)}</span>
              </li>
            ))}
          </ul>
        </details>
      ) : null}
    </section>
  );
}
