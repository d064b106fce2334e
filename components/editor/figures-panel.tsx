"use client";

import { useEditor } from "@/components/editor/editor-context";
import { FindingMarker } from "@/components/editor/finding-marker";

const mA = (v: number) => `${Math.round(v * 10) / 10} mA`;
const ah = (v: number) => `${Math.round(v * 100) / 100} Ah`;

function Bar({ value, max, label, warnNearFull = true }: { value: number; max: number; label: string; warnNearFull?: boolean }) {
  const share = max > 0 ? Math.min(1, value / max) : value > 0 ? 1 : 0;
  const over = value > max;
  return (
    <span className="mt-0.5 block h-1.5 w-full overflow-hidden rounded bg-slate-100" role="img" aria-label={label}>
      <span className={`block h-full ${over ? "bg-fault" : warnNearFull && share > 0.85 ? "bg-warn" : "bg-signal"}`} style={{ width: `${share * 100}%` }} />
    </span>
  );
}

/** Capacity, bus, power and supervision figures of the live solve. */
export function FiguresPanel() {
  const { result, findingsAt, highlighted } = useEditor();
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
          {result.shared.inputsSaved ? ` (${result.shared.inputsSaved} inputs saved)` : ""}
        </dd>
        <dt>Supervision coverage</dt>
        <dd data-testid="figure-coverage">{result.coverage.share === null ? "no inputs used" : `${result.coverage.covered} of ${result.coverage.used} inputs (${Math.round(result.coverage.share * 100)} %)`}</dd>
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
              <Bar warnNearFull={false} value={b.inputsUsed} max={b.inputsTotal} label={`${b.name}: ${b.inputsUsed} of ${b.inputsTotal} inputs used`} />
            </li>
          ))}
      </ul>
      {result.bus ? (
        <>
          <h3 className="mt-3 font-semibold">Data bus</h3>
          <p>
            {result.bus.devices} of {result.bus.maxDevices} devices · addresses {result.bus.addressMin}–{result.bus.addressMax} · cable {result.bus.cableM} m of {result.bus.maxCableM} m
          </p>
          {result.bus.duplicateAddresses.length ? <p className="text-fault">Address used twice: {result.bus.duplicateAddresses.join(", ")}</p> : null}
        </>
      ) : null}
      <h3 className="mt-3 font-semibold">Power</h3>
      {result.battery ? (
        <p className="text-slate-600">
          {result.battery.standbyH} h standby then {result.battery.alarmMin} min alarm, × {result.battery.safetyFactor.toFixed(2)}
          {result.battery.source ? ` (${result.battery.source})` : ""}
        </p>
      ) : null}
      <ul className="mt-1 flex flex-col gap-2">
        {result.supplies.map((s) => {
          const domId = `supply-${s.supplyKey}`;
          return (
            <li key={s.supplyKey} id={domId} data-testid={domId} className={highlighted === domId ? "rounded ring-4 ring-warn" : ""}>
              <span className="flex items-center gap-1 font-medium">
                {s.name} <FindingMarker domId={domId} findings={findingsAt.get(domId)} />
              </span>
              <span className="flex justify-between">
                <span>At rest</span>
                <span>
                  {mA(s.loadRestMa)} of {mA(s.ratingMa)}
                </span>
              </span>
              <Bar value={s.loadRestMa} max={s.ratingMa} label={`${s.name}: ${mA(s.loadRestMa)} at rest of ${mA(s.ratingMa)}`} />
              <span className="flex justify-between">
                <span>In alarm</span>
                <span>
                  {mA(s.loadAlarmMa)} of {mA(s.ratingMa)}
                </span>
              </span>
              <Bar value={s.loadAlarmMa} max={s.ratingMa} label={`${s.name}: ${mA(s.loadAlarmMa)} in alarm of ${mA(s.ratingMa)}`} />
              <span className="flex justify-between">
                <span>Battery needed</span>
                <span className={s.batteryNeededAh > s.maxBatteryAh ? "font-semibold text-fault" : ""}>
                  {ah(s.batteryNeededAh)} of {ah(s.maxBatteryAh)} max
                </span>
              </span>
              <Bar value={s.batteryNeededAh} max={s.maxBatteryAh} label={`${s.name}: battery ${ah(s.batteryNeededAh)} needed of ${ah(s.maxBatteryAh)}`} />
            </li>
          );
        })}
      </ul>
    </section>
  );
}
