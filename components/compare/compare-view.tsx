"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { Fragment, useState } from "react";
import type { BomLine } from "@/lib/bom/bill-of-materials";
import type { ComparisonColumn } from "@/lib/compare/compare-layouts";
import type { ComparisonView, DecisionView } from "@/lib/server/review";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { ComparisonChart } from "@/components/compare/comparison-chart";
import { HttpError, sendJson } from "@/components/review/http";
import { when } from "@/components/review/review-words";

export interface PickerLayout {
  id: number;
  name: string;
  status: string;
  currentRevision: number;
  inputsUsed: number;
  inputsTotal: number;
  errors: number;
}

export interface CompareViewProps {
  siteId: number;
  layouts: PickerLayout[];
  selected: number[];
  comparison: ComparisonView | null;
  error: string | null;
  findings: Record<number, { severity: "error" | "warning" | "note"; message: string }[]>;
  choices: DecisionView[];
  canChoose: boolean;
  lifeSafety: boolean;
}

const money = (x: number) => x.toLocaleString("en-GB", { minimumFractionDigits: 2, maximumFractionDigits: 2 });
const ma = (x: number) => `${Math.round(x)} mA`;
const pct = (x: number | null) => (x === null ? "no inputs used" : `${Math.round(x * 100)} %`);
const HARDWARE: BomLine["kind"][] = ["panel", "expansion", "keypad", "supply"];
const SEVERITY_STYLE = { error: "text-fault", warning: "text-warn", note: "text-slate-600" } as const;

/** "best" on a measure, unless every layout ties on it. */
function Best({ on }: { on: boolean }) {
  return on ? <span className="ml-1 rounded bg-signal-soft px-1 text-[11px] font-semibold uppercase text-signal">best</span> : null;
}

export function CompareView(props: CompareViewProps) {
  const { siteId, layouts, comparison } = props;
  const router = useRouter();
  const [picked, setPicked] = useState<number[]>(props.selected.length ? props.selected : layouts.slice(0, 2).map((l) => l.id));
  const cols = comparison?.comparison.columns ?? [];
  const best = comparison?.comparison.best;
  const idOf = (c: ComparisonColumn) => Number(c.id);
  const isBest = (list: number[] | undefined, i: number) => !!list && list.length < cols.length && list.includes(i);

  const toggle = (id: number) => setPicked((p) => (p.includes(id) ? p.filter((x) => x !== id) : p.length >= 6 ? p : [...p, id]));

  return (
    <div className="flex flex-col gap-6">
      <Card className="no-print">
        <h2 className="text-lg font-semibold">Pick the layouts to compare</h2>
        {layouts.length < 2 ? <p className="mt-2 text-sm">This site has {layouts.length === 0 ? "no layouts" : "one layout"}: make at least two on the layouts page to compare them.</p> : null}
        <ul className="mt-2 grid gap-2 sm:grid-cols-2 lg:grid-cols-3" data-testid="compare-picker">
          {layouts.map((l) => (
            <li key={l.id}>
              <label className="flex cursor-pointer items-start gap-2 rounded-md border border-line bg-white p-2 text-sm hover:bg-slate-50">
                <input type="checkbox" className="mt-1 h-4 w-4" checked={picked.includes(l.id)} onChange={() => toggle(l.id)} />
                <span>
                  <span className="font-medium">{l.name}</span>
                  <span className="block text-xs text-slate-600">
                    {l.status} · revision {l.currentRevision} · {l.inputsUsed} of {l.inputsTotal} inputs · {l.errors} error{l.errors === 1 ? "" : "s"}
                  </span>
                </span>
              </label>
            </li>
          ))}
        </ul>
        <div className="mt-3 flex items-center gap-3">
          <Button disabled={picked.length < 2} onClick={() => router.push(`/sites/${siteId}/compare?ids=${picked.join(",")}`)}>
            Compare {picked.length} layouts
          </Button>
          <span className="text-xs text-slate-600">Two to six layouts.</span>
        </div>
        {props.error ? (
          <p role="alert" className="mt-2 text-sm font-medium text-fault">
            {props.error}
          </p>
        ) : null}
      </Card>

      {comparison ? (
        <>
          <Card>
            <h2 className="text-lg font-semibold">In short</h2>
            <ul className="mt-2 list-disc space-y-1 pl-5 text-sm" data-testid="compare-summary">
              {comparison.comparison.summary.map((s, i) => (
                // the sharing sentences are listed in full per layout below
                <li key={i}>{s.includes(" by sharing: ") ? `${s.slice(0, s.indexOf(" by sharing: "))} by sharing; what each shared input trades is listed below.` : s}</li>
              ))}
            </ul>
            <div className="mt-4">
              <ComparisonChart columns={cols} />
            </div>
          </Card>

          <Card className="overflow-x-auto">
            <h2 className="text-lg font-semibold">Side by side</h2>
            <p className="mt-1 text-xs text-slate-600">Costs are the catalog&apos;s list prices (in its currency); resistors and batteries carry no price there and are counted apart.</p>
            <table className="mt-3 w-full min-w-[640px] border-collapse text-sm" data-testid="compare-table">
              <thead>
                <tr className="border-b border-line text-left align-bottom">
                  <th className="w-48 py-2 pr-3 text-slate-500">Measure</th>
                  {cols.map((c, i) => (
                    <th key={i} className="px-3 py-2">
                      <Link href={`/sites/${siteId}/layouts/${idOf(c)}`} className="text-signal hover:underline">
                        {c.name}
                      </Link>
                      <span className="block text-xs font-normal text-slate-600">
                        {comparison.layouts[i]?.status} · revision {comparison.layouts[i]?.revision} ·{" "}
                        <Link className="underline" href={`/sites/${siteId}/layouts/${idOf(c)}/review`}>
                          review
                        </Link>
                      </span>
                    </th>
                  ))}
                </tr>
              </thead>
              <tbody className="align-top">
                <Row label="Cost (list prices)">
                  {cols.map((c, i) => (
                    <td key={i} className="px-3 py-2 tabular-nums">
                      <span className="text-lg font-semibold">{money(c.cost)}</span>
                      <Best on={isBest(best?.cost, i)} />
                      {c.unpricedLines ? <span className="block text-xs text-slate-600">+ {c.unpricedLines} unpriced line{c.unpricedLines === 1 ? "" : "s"} (resistors, batteries)</span> : null}
                    </td>
                  ))}
                </Row>
                <Row label="Boards and supplies">
                  {cols.map((c, i) => (
                    <td key={i} className="px-3 py-2">
                      <ul className="space-y-0.5">
                        {c.bom.lines
                          .filter((l) => HARDWARE.includes(l.kind))
                          .map((l) => (
                            <li key={l.key}>
                              {l.quantity} × {l.description} <span className="tabular-nums text-slate-600">{l.total === null ? "(unpriced)" : money(l.total)}</span>
                            </li>
                          ))}
                      </ul>
                    </td>
                  ))}
                </Row>
                <Row label="Inputs used / spare">
                  {cols.map((c, i) => (
                    <td key={i} className="px-3 py-2 tabular-nums">
                      {c.inputs.used} of {c.inputs.total} used, <strong>{c.inputs.spare} spare</strong>
                      <Best on={isBest(best?.spare, i)} />
                      <span className="block text-xs text-slate-600">
                        {c.zones} zones{c.unplaced ? `, ${c.unplaced} detectors not placed` : ""}
                      </span>
                    </td>
                  ))}
                </Row>
                <Row label="Current and battery per supply">
                  {cols.map((c, i) => (
                    <td key={i} className="px-3 py-2">
                      <ul className="space-y-2">
                        {c.supplies.map((s) => (
                          <li key={s.key} className="tabular-nums">
                            <span className="font-medium">{s.name}</span>
                            <span className="block">
                              {ma(s.restMa)} at rest, {ma(s.alarmMa)} in alarm, rated {ma(s.ratingMa)}
                            </span>
                            <span className={`block ${s.alarmLoad > 1 ? "font-semibold text-fault" : s.alarmLoad > 0.8 ? "text-warn" : "text-slate-600"}`}>
                              detector load in alarm {Math.round(s.alarmLoad * 100)} % of the rating
                            </span>
                            <span className="block">
                              standby battery {s.batteryNeededAh.toFixed(1)} Ah needed → {s.batteryAh === null ? <strong className="text-fault">no common size fits</strong> : `${s.batteryAh} Ah`}
                            </span>
                          </li>
                        ))}
                      </ul>
                    </td>
                  ))}
                </Row>
                <Row label="Supervision coverage">
                  {cols.map((c, i) => (
                    <td key={i} className="px-3 py-2 tabular-nums">
                      <span className="text-lg font-semibold">{pct(c.coverage.share)}</span>
                      <Best on={isBest(best?.coverage, i)} />
                      <span className="block text-xs text-slate-600">
                        {c.coverage.covered} of {c.coverage.used} used inputs report both a short and a cut as themselves
                      </span>
                    </td>
                  ))}
                </Row>
                <Row label="Findings">
                  {cols.map((c, i) => (
                    <td key={i} className="px-3 py-2 tabular-nums">
                      <span className="text-fault">{c.findings.error} errors</span>, <span className="text-warn">{c.findings.warning} warnings</span>, {c.findings.note} notes
                      <Best on={isBest(best?.errors, i)} />
                    </td>
                  ))}
                </Row>
                <Row label="Shared inputs">
                  {cols.map((c, i) => (
                    <td key={i} className="px-3 py-2">
                      {c.shared.length === 0 ? <span className="text-slate-600">none: one detector per input</span> : `${c.shared.length} shared input${c.shared.length === 1 ? "" : "s"}, saving ${c.shared.length} input${c.shared.length === 1 ? "" : "s"}`}
                    </td>
                  ))}
                </Row>
              </tbody>
            </table>
          </Card>

          <div className="grid gap-4" style={{ gridTemplateColumns: `repeat(auto-fit, minmax(20rem, 1fr))` }}>
            {cols.map((c, i) => (
              <Card key={i} data-testid={`compare-details-${idOf(c)}`}>
                <h3 className="font-semibold">{c.name}</h3>
                <h4 className="mt-3 text-sm font-semibold">What each shared input trades</h4>
                {c.shared.length === 0 ? (
                  <p className="text-sm text-slate-600">No shared inputs: every detector has its own input, so a cable fault takes out one zone only.</p>
                ) : (
                  <ul className="mt-1 list-disc space-y-1 pl-5 text-sm" data-testid="tradeoffs">
                    {c.shared.map((s) => (
                      <li key={`${s.boardKey}#${s.input}`}>{s.text}</li>
                    ))}
                  </ul>
                )}
                <h4 className="mt-3 text-sm font-semibold">Every finding ({(props.findings[idOf(c)] ?? []).length})</h4>
                <ul className="mt-1 max-h-96 space-y-1 overflow-y-auto pr-1 text-sm" data-testid="compare-findings">
                  {(props.findings[idOf(c)] ?? []).map((f, k) => (
                    <li key={k}>
                      <span className={`font-medium ${SEVERITY_STYLE[f.severity]}`}>{f.severity}:</span> {f.message}
                    </li>
                  ))}
                </ul>
                <details className="mt-3 text-sm">
                  <summary className="cursor-pointer font-semibold">Bill of materials ({c.bom.lines.length} lines)</summary>
                  <table className="mt-2 w-full text-xs">
                    <tbody>
                      {c.bom.lines.map((l) => (
                        <tr key={l.key} className="border-t border-line">
                          <td className="py-1 pr-2 tabular-nums">{l.quantity} ×</td>
                          <td className="py-1 pr-2">{l.description}</td>
                          <td className="py-1 text-right tabular-nums">{l.total === null ? "—" : money(l.total)}</td>
                        </tr>
                      ))}
                    </tbody>
                  </table>
                  {c.bom.notes.map((n, k) => (
                    <p key={k} className="mt-1 text-xs text-slate-600">
                      {n}
                    </p>
                  ))}
                </details>
              </Card>
            ))}
          </div>

          {props.lifeSafety ? (
            <p role="note" data-testid="life-safety-caution" className="rounded-md border border-warn bg-warn-soft px-3 py-2 text-sm">
              <strong className="text-warn">Life safety.</strong> These layouts carry smoke, heat or other life-safety devices. Their design and standby battery sizing must follow the local
              fire code and the authority having jurisdiction, and be installed and certified by licensed people. Loopwright&apos;s figures are an aid, not an approval.
            </p>
          ) : null}

          <ChooseForm siteId={siteId} columns={cols} comparedIds={comparison.layouts.map((l) => l.id)} canChoose={props.canChoose} choices={props.choices} />
        </>
      ) : null}
    </div>
  );
}

function Row({ label, children }: { label: string; children: React.ReactNode }) {
  return (
    <tr className="border-b border-line">
      <th scope="row" className="py-2 pr-3 text-left font-medium text-slate-600">
        {label}
      </th>
      {children}
    </tr>
  );
}

function ChooseForm({ siteId, columns, comparedIds, canChoose, choices: initial }: { siteId: number; columns: ComparisonColumn[]; comparedIds: number[]; canChoose: boolean; choices: DecisionView[] }) {
  const [chosen, setChosen] = useState<number | null>(null);
  const [reason, setReason] = useState("");
  const [choices, setChoices] = useState(initial);
  const [message, setMessage] = useState<{ kind: "ok" | "error"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);
  const nameOf = (id: number) => columns.find((c) => Number(c.id) === id)?.name ?? `layout ${id}`;

  async function submit(e: React.FormEvent) {
    e.preventDefault();
    if (chosen === null) return setMessage({ kind: "error", text: "Pick the layout you chose." });
    setBusy(true);
    try {
      const r = await sendJson<{ decision: DecisionView }>(`/api/sites/${siteId}/decisions`, "POST", { chosenLayoutId: chosen, comparedLayoutIds: comparedIds, reason });
      setChoices((c) => [r.decision, ...c]);
      setMessage({ kind: "ok", text: `Recorded: ${nameOf(chosen)} chosen. Send it for review on its review page.` });
      setReason("");
    } catch (err) {
      setMessage({ kind: "error", text: err instanceof HttpError ? err.message : "The server could not be reached; nothing was recorded." });
    } finally {
      setBusy(false);
    }
  }

  return (
    <Card>
      <h2 className="text-lg font-semibold">Decision</h2>
      {canChoose ? (
        <form onSubmit={submit} className="mt-2 flex flex-col gap-3 text-sm" data-testid="choose-form">
          <fieldset className="flex flex-wrap gap-3">
            <legend className="mb-1 font-medium">The layout chosen</legend>
            {columns.map((c) => (
              <label key={String(c.id)} className="flex items-center gap-2 rounded-md border border-line px-3 py-2">
                <input type="radio" name="chosen" value={String(c.id)} checked={chosen === Number(c.id)} onChange={() => setChosen(Number(c.id))} />
                {c.name}
              </label>
            ))}
          </fieldset>
          <label className="block">
            <span className="font-medium">Why (kept in the decision log)</span>
            <textarea required maxLength={4000} rows={3} className="mt-1 block w-full rounded-md border border-line bg-white px-3 py-2" value={reason} onChange={(e) => setReason(e.target.value)} />
          </label>
          <div>
            <Button type="submit" disabled={busy || chosen === null || !reason.trim()}>
              {busy ? "Recording…" : "Record the decision"}
            </Button>
          </div>
        </form>
      ) : (
        <p className="mt-2 text-sm text-slate-600">Designers, engineers and admins record which layout is chosen.</p>
      )}
      <p aria-live="polite" data-testid="choose-message" className={`mt-2 min-h-5 text-sm ${message?.kind === "error" ? "font-medium text-fault" : "text-signal"}`}>
        {message?.text ?? ""}
      </p>
      {choices.length ? (
        <ol className="mt-2 space-y-2 text-sm" data-testid="choices">
          {choices.map((d) => (
            <Fragment key={d.id}>
              <li className="border-l-2 border-signal pl-3">
                <p>
                  <strong>{nameOf(d.layoutId)}</strong> (revision {d.revision}) chosen{d.comparedLayoutIds ? ` among ${d.comparedLayoutIds.map(nameOf).join(", ")}` : ""}
                  {d.decidedBy ? ` by ${d.decidedBy}` : ""}
                </p>
                <p className="text-slate-700">“{d.reason}”</p>
                <p className="text-xs text-slate-500">{when(d.createdAt)}</p>
              </li>
            </Fragment>
          ))}
        </ol>
      ) : null}
    </Card>
  );
}
