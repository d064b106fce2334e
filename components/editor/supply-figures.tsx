"use client";

import type { ReactNode } from "react";
import { FindingMarker } from "@/components/editor/finding-marker";
import type { Finding } from "@/lib/findings";
import { breakdownSummary, mA, supplyLines } from "@/lib/solver/supply-lines";
import type { SupplyFigures } from "@/lib/solver/types";

export function Bar({ value, max, label, warnNearFull = true }: { value: number; max: number; label: string; warnNearFull?: boolean }) {
  const share = max > 0 ? Math.min(1, value / max) : value > 0 ? 1 : 0;
  const over = value > max;
  return (
    <span className="mt-0.5 block h-1.5 w-full overflow-hidden rounded bg-slate-100" role="img" aria-label={label}>
      <span className={`block h-full ${over ? "bg-fault" : warnNearFull && share > 0.85 ? "bg-warn" : "bg-signal"}`} style={{ width: `${share * 100}%` }} />
    </span>
  );
}

const Row = ({ label, children, testId, tone = "" }: { label: string; children: ReactNode; testId: string; tone?: string }) => (
  <span className="flex justify-between gap-2">
    <span>{label}</span>
    <span className={`text-right ${tone}`} data-testid={testId}>
      {children}
    </span>
  </span>
);

/** One supply: its output against its rating, what its battery carries and where that current goes, the battery to fit. */
export function SupplyFiguresItem({ s, findings, highlighted }: { s: SupplyFigures; findings: Finding[] | undefined; highlighted: boolean }) {
  const domId = `supply-${s.supplyKey}`;
  const lines = Object.fromEntries(supplyLines(s).map((l) => [l.key, l]));
  const parts = breakdownSummary(s);
  return (
    <li id={domId} data-testid={domId} className={highlighted ? "rounded ring-4 ring-warn" : ""}>
      <span className="flex items-center gap-1 font-medium">
        {s.name} <FindingMarker domId={domId} findings={findings} />
      </span>
      <Row label={lines.outputRest.label} testId={`${domId}-output-rest`}>
        {lines.outputRest.value}
      </Row>
      <Bar value={s.loadRestMa} max={s.ratingMa} label={`${s.name}: ${lines.outputRest.label.toLowerCase()} ${lines.outputRest.value}`} />
      <Row label={lines.outputAlarm.label} testId={`${domId}-output-alarm`}>
        {lines.outputAlarm.value}
      </Row>
      <Bar value={s.loadAlarmMa} max={s.ratingMa} label={`${s.name}: ${lines.outputAlarm.label.toLowerCase()} ${lines.outputAlarm.value}`} />
      <Row label={lines.batteryRest.label} testId={`${domId}-battery-rest`}>
        {lines.batteryRest.value}
      </Row>
      <Row label={lines.batteryAlarm.label} testId={`${domId}-battery-alarm`}>
        {lines.batteryAlarm.value}
      </Row>
      <details className="ml-2 text-slate-600">
        <summary className="cursor-pointer">Where the current goes (at rest / in alarm)</summary>
        <ul data-testid={`${domId}-breakdown`}>
          {parts.lines.map((l) => (
            <li key={`${l.kind}-${l.key}`} className="flex justify-between gap-2">
              <span>{l.name}</span>
              <span>
                {mA(l.restMa)} / {mA(l.alarmMa)}
              </span>
            </li>
          ))}
          {parts.detectors.length ? (
            <li>
              <details>
                <summary className="flex cursor-pointer justify-between gap-2">
                  <span>Powered detectors ({parts.detectors.length})</span>
                  <span>
                    {mA(parts.detectorRestMa)} / {mA(parts.detectorAlarmMa)}
                  </span>
                </summary>
                <ul className="ml-2">
                  {parts.detectors.map((l) => (
                    <li key={l.key} className="flex justify-between gap-2">
                      <span className="truncate">{l.name}</span>
                      <span className="shrink-0">
                        {mA(l.restMa)} / {mA(l.alarmMa)}
                      </span>
                    </li>
                  ))}
                </ul>
              </details>
            </li>
          ) : null}
        </ul>
      </details>
      <Row label={lines.battery.label} testId={`${domId}-battery`} tone={s.batteryNeededAh > s.maxBatteryAh ? "font-semibold text-fault" : ""}>
        {lines.battery.value}
      </Row>
      <Bar value={s.batteryNeededAh} max={s.maxBatteryAh} label={`${s.name}: standby battery ${lines.battery.value}, the charger takes up to ${s.maxBatteryAh} Ah`} />
    </li>
  );
}
