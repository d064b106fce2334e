import { REPORT_WORDS } from "@/lib/loop/row-labels";
import type { SheetInput } from "@/lib/sheet/sheet-types";
import { LoopSchematic } from "@/components/loop-schematic/loop-schematic";
import { ResistorBands } from "@/components/sheet/resistor-bands";
import { sheetLoopSpec } from "@/components/sheet/loop-spec";
import { TEST_WORDS } from "@/components/sheet/test-words";
import { CARRIES_WORDS, FITTED_WORDS } from "@/components/sheet/sheet-words";


const th = "border border-line bg-slate-50 px-1.5 py-1 text-left font-semibold";
const td = "border border-line px-1.5 py-1 align-top";

/** One used input of the terminal sheet: detectors, resistors, core map, the readings expected in each test. */
export function SheetInputBlock({ row }: { row: SheetInput }) {
  const lifeSafety = row.detectors.some((d) => d.lifeSafety);
  const zones = row.zones.length === 1 ? `zone ${row.zones[0]}` : `zones ${row.zones.join(", ")}`;
  return (
    <section className="sheet-input mb-5 rounded-md border border-line bg-white p-3 print:hidden" data-testid={`sheet-input-${row.boardKey}-${row.input}`} aria-label={`Input ${row.input}`}>
      <header className="flex flex-wrap items-baseline justify-between gap-2 border-b border-line pb-1">
        <h3 className="text-base font-semibold">
          Input {row.input} · terminals {row.terminals} · {zones}
        </h3>
        <p className="text-xs text-slate-700">
          {row.schemeText} · {row.placementText} · {row.loopConductors} conductors for the loop{row.cores.some((c) => c.carries === "power") ? " + 2 for power" : ""}
        </p>
      </header>
      {lifeSafety ? (
        <p className="mt-2 rounded border border-warn bg-warn-soft px-2 py-1 text-xs" role="note">
          <strong className="text-warn">Life-safety device on this loop.</strong> Test it only as its instructions and the local fire code allow; the authority having jurisdiction and
          licensed people decide. These figures are an aid, not an approval.
        </p>
      ) : null}
      <div className="mt-2 flex flex-col gap-3">
        <div className="min-w-0 space-y-2 text-xs">
          <table className="stack-narrow w-full border-collapse">
            <thead>
              <tr>
                <th className={th}>Zone</th>
                <th className={th}>Detector</th>
                <th className={th}>Area / room</th>
                <th className={th}>Device type</th>
                <th className={th}>Contact</th>
                <th className={th}>Cable</th>
              </tr>
            </thead>
            <tbody>
              {row.detectors.map((d) => (
                <tr key={d.id}>
                  <td data-label="Zone" className={`${td} font-semibold tabular-nums`}>{d.zone}</td>
                  <td data-label="Detector" className={`${td} font-medium`}>{d.label}</td>
                  <td data-label="Area / room" className={td}>
                    {d.area} / {d.room}
                  </td>
                  <td data-label="Device type" className={td}>
                    {d.deviceType}
                    {d.powered ? <span className="block text-slate-600">powered from {d.poweredFrom ?? "a supply"}</span> : null}
                  </td>
                  <td data-label="Contact" className={td}>
                    {d.contact === "NC" ? "normally closed (NC)" : "normally open (NO)"}
                    {d.tamper ? ", tamper contact" : ""}
                  </td>
                  <td data-label="Cable" className={`${td} tabular-nums`}>
                    {d.gaugeText}, {d.cableM} m
                  </td>
                </tr>
              ))}
            </tbody>
          </table>

          {row.resistors.length ? (
            <table className="stack-narrow w-full border-collapse">
              <thead>
                <tr>
                  <th className={th}>Resistor</th>
                  <th className={th}>Value</th>
                  <th className={th}>Colour bands (IEC 60062)</th>
                  <th className={th}>Where fitted</th>
                </tr>
              </thead>
              <tbody>
                {row.resistors.map((r) => (
                  <tr key={r.role} data-testid="sheet-resistor">
                    <td data-label="Resistor" className={td}>{r.name}</td>
                    <td data-label="Value" className={`${td} tabular-nums sm:whitespace-nowrap`}>
                      <strong className="text-sm">{r.valueText}</strong> ±{r.tolerancePct} %{r.series ? <span className="block text-slate-600">{r.series} value</span> : <span className="block text-warn">not an E12/E24 value</span>}
                    </td>
                    <td data-label="Colour bands" className={td}>
                      <ResistorBands r={r} />
                    </td>
                    <td data-label="Where fitted" className={td}>
                      <strong>{FITTED_WORDS[r.fittedAt]}</strong>: {r.where}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          ) : (
            <p>No resistor on this loop: the panel sees the contacts only, so a short or a cut is not told apart from normal.</p>
          )}

          <table className="stack-narrow w-full border-collapse">
            <thead>
              <tr>
                <th className={th}>Core</th>
                <th className={th}>Carries</th>
                <th className={th}>Panel end</th>
                <th className={th}>Far end</th>
              </tr>
            </thead>
            <tbody>
              {row.cores.map((c) => (
                <tr key={c.core}>
                  <td data-label="Core" className={`${td} tabular-nums`}>{c.core}</td>
                  <td data-label="Carries" className={td}>{CARRIES_WORDS[c.carries]}</td>
                  <td data-label="Panel end" className={td}>{c.panelEnd}</td>
                  <td data-label="Far end" className={td}>{c.farEnd}</td>
                </tr>
              ))}
            </tbody>
          </table>
          <p className="text-slate-700">
            Cable: {row.cable.gaugeText}, longest run {row.cable.lengthM} m
            {row.cable.conductorOhms ? ` (loop conductors ${row.cable.conductorOhms.minOhms.toFixed(1)}–${row.cable.conductorOhms.maxOhms.toFixed(1)} Ω there and back, 10–40 °C)` : ""}.
          </p>
        </div>
        {/* a wide drawing scrolls inside its box on a phone: focusable so it scrolls by keyboard too */}
        <figure className="min-w-0 max-w-4xl relative overflow-x-auto focus-visible:outline-2 focus-visible:outline-signal print:mx-auto print:max-w-none" tabIndex={0} aria-label={`Schematic of input ${row.input}`}>
          <LoopSchematic loop={sheetLoopSpec(row)} className="w-full" />
          <figcaption className="text-xs text-slate-600">The loop as wired, everything at rest: resistors drawn where they are fitted.</figcaption>
        </figure>
      </div>

      {row.expected.length ? (
        <table className="stack-narrow mt-2 w-full border-collapse text-xs" data-testid="sheet-tests">
          <thead>
            <tr>
              <th className={th}>Test</th>
              <th className={th}>What to do</th>
              <th className={th}>Meter reading expected</th>
              <th className={th}>Panel reports</th>
              <th className={`${th} w-28`}>Measured</th>
              <th className={`${th} w-16`}>Pass / fail</th>
            </tr>
          </thead>
          <tbody>
            {row.expected.map((e) => (
              <tr key={e.test}>
                <td data-label="Test" className={`${td} font-medium`}>{TEST_WORDS[e.test]}</td>
                <td data-label="What to do" className={td}>{e.instruction}</td>
                <td data-label="Meter reading expected" className={`${td} font-semibold tabular-nums sm:whitespace-nowrap`} data-testid="expected-range">
                  {e.rangeText}
                  {e.uncertain ? <span className="block font-normal text-warn">straddles a band edge</span> : null}
                </td>
                <td data-label="Panel reports" className={td}>
                  {e.reports.map((r) => REPORT_WORDS[r]).join(" or ")}
                  {e.reports.length === 1 && e.reports[0] !== e.expectedReport ? <span className="block text-fault">should be {REPORT_WORDS[e.expectedReport]}</span> : null}
                </td>
                <td data-label="Measured" className={`${td} sheet-write h-7`} />
                <td data-label="Pass / fail" className={`${td} sheet-write`} />
              </tr>
            ))}
          </tbody>
        </table>
      ) : (
        <p className="mt-2 text-xs font-medium text-fault">No expected readings: {row.noReadingsReason}</p>
      )}
      {row.findings.length ? (
        <ul className="mt-2 space-y-0.5 text-xs">
          {row.findings.map((f, i) => (
            <li key={i} className={f.severity === "error" ? "text-fault" : "text-warn"}>
              <strong>{f.severity}:</strong> <span className="text-ink">{f.message}</span>
            </li>
          ))}
        </ul>
      ) : null}
    </section>
  );
}
