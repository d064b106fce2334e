"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import type { LayoutMeta, LayoutView, SuggestionView } from "@/lib/server/layouts";
import { describeError, sendJson } from "@/lib/client/fetcher";
import { useLayouts } from "@/lib/client/use-layouts";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { Field } from "@/components/ui/field";
import { LayoutCard } from "@/components/editor/layout-card";
import { SuggestionCard } from "@/components/editor/suggestion-card";
import { SuggestChoiceControl, type ChoiceDraft, choiceFromDraft } from "@/components/editor/suggest-choice-control";
import { useFormat } from "@/components/format/format-provider";
import { plural } from "@/lib/vocabulary/plural";

interface PanelChoice {
  id: string;
  name: string;
  inputs: number;
  maxZones: number;
  listPrice: number;
}


/** A site's layouts: open one, start a blank one on a panel, or take a hardware suggestion. */
export function LayoutsOverview({ siteId, initial, panels, detectorCount, canWrite }: { siteId: number; initial: LayoutMeta[]; panels: PanelChoice[]; detectorCount: number; canWrite: boolean }) {
  const { money } = useFormat();
  const router = useRouter();
  const { layouts, mutate } = useLayouts(siteId, initial);
  const [message, setMessage] = useState<{ kind: "ok" | "error"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);
  const [suggestions, setSuggestions] = useState<SuggestionView[] | null>(null);
  const [classA, setClassA] = useState(false);
  const [choice, setChoice] = useState<ChoiceDraft>({ kind: "cheapest", withinPct: "10" });

  async function create(body: unknown) {
    setBusy(true);
    try {
      const r = await sendJson<LayoutView>(`/api/sites/${siteId}/layouts`, "POST", body);
      await mutate();
      router.push(`/sites/${siteId}/layouts/${r.layout.id}`);
    } catch (e) {
      setMessage({ kind: "error", text: describeError(e) });
      setBusy(false);
    }
  }

  async function suggest() {
    const picked = choiceFromDraft(choice);
    if (!picked.ok) return setMessage({ kind: "error", text: picked.message });
    setBusy(true);
    setMessage(null);
    try {
      const r = await sendJson<{ suggestions: SuggestionView[] }>(`/api/sites/${siteId}/suggestions`, "POST", { ...(classA ? { pathway: "class-a" } : {}), choice: picked.choice });
      setSuggestions(r.suggestions);
    } catch (e) {
      setMessage({ kind: "error", text: describeError(e) });
    } finally {
      setBusy(false);
    }
  }

  async function archive(l: LayoutMeta, archived: boolean) {
    try {
      await sendJson(`/api/layouts/${l.id}/archive`, "POST", { archived });
      setMessage({ kind: "ok", text: archived ? `Layout "${l.name}" archived: it stays readable, with its sheet and commissioning record.` : `Layout "${l.name}" is back from the archive.` });
      await mutate();
    } catch (e) {
      setMessage({ kind: "error", text: describeError(e) });
    }
  }

  /** Called once the card's confirmation naming the layout was accepted. */
  async function remove(l: LayoutMeta) {
    try {
      await sendJson(`/api/layouts/${l.id}`, "DELETE");
      setMessage({ kind: "ok", text: `Layout "${l.name}" deleted.` });
      await mutate();
    } catch (e) {
      setMessage({ kind: "error", text: describeError(e) });
    }
  }

  return (
    <div className="flex flex-col gap-6">
      {message ? (
        <p role={message.kind === "error" ? "alert" : "status"} className={`text-sm ${message.kind === "error" ? "text-fault" : "text-signal"}`}>
          {message.text}
        </p>
      ) : null}
      <section>
        <h2 className="mb-3 text-lg font-semibold">Layouts</h2>
        {layouts.length === 0 ? <p className="text-sm text-slate-600">No layouts yet.</p> : null}
        <ul className="grid grid-cols-1 gap-3 md:grid-cols-2" data-testid="layout-list">
          {layouts.map((l) => (
            <li key={l.id}>
              <LayoutCard siteId={siteId} layout={l} canWrite={canWrite} onDelete={remove} onArchive={archive} />
            </li>
          ))}
        </ul>
      </section>

      {canWrite ? (
        <section className="grid grid-cols-1 gap-4 lg:grid-cols-3">
          <Card>
            <h2 className="font-semibold">New layout</h2>
            <form
              className="mt-2 flex flex-col gap-3"
              onSubmit={(e) => {
                e.preventDefault();
                const f = new FormData(e.currentTarget);
                void create({ name: String(f.get("name") ?? ""), panelId: String(f.get("panelId") ?? "") });
              }}
            >
              <Field label="Name" name="name" id="new-layout-name" required maxLength={200} placeholder="e.g. Option B" />
              <label className="block text-sm">
                <span className="font-medium">Control panel</span>
                <select name="panelId" className="mt-1 block w-full rounded-md border border-line bg-white px-3 py-2">
                  {panels.map((p) => (
                    <option key={p.id} value={p.id}>
                      {p.name} — {plural(p.inputs, "input")}, {plural(p.maxZones, "zone")}, {money(p.listPrice)}
                    </option>
                  ))}
                </select>
              </label>
              <Button type="submit" disabled={busy}>
                Create layout
              </Button>
            </form>
          </Card>
          <Card className="lg:col-span-2">
            <h2 className="font-semibold">Suggest hardware</h2>
            <p className="mt-1 text-sm text-slate-600">
              The cheapest catalog hardware that carries {detectorCount === 1 ? "the one detector" : `all ${plural(detectorCount, "detector")}`} of the device schedule without errors: once with one detector per input, once letting detectors that allow it share an input.
            </p>
            <label className="mt-2 flex items-center gap-2 text-sm">
              <input type="checkbox" checked={classA} onChange={(e) => setClassA(e.target.checked)} />
              Return each fire detector&apos;s loop to the panel (Class A)
            </label>
            <SuggestChoiceControl value={choice} onChange={setChoice} />
            <Button className="mt-3" variant="secondary" disabled={busy || detectorCount === 0} onClick={suggest}>
              {busy && !suggestions ? "Working…" : "Suggest hardware"}
            </Button>
            {suggestions ? (
              <>
              {suggestions.length === 2 && suggestions.every((s) => s.found) && JSON.stringify(suggestions[0].document) === JSON.stringify(suggestions[1].document) ? (
                <p className="mt-3 text-sm text-slate-700" data-testid="suggestions-same">
                  Sharing inputs saves nothing here: the cheapest hardware is the same both ways (its inputs may not take two detectors, or there are inputs enough).
                </p>
              ) : null}
              <div className="mt-4 grid grid-cols-1 gap-3 md:grid-cols-2">
                {suggestions.map((s) => (
                  <SuggestionCard
                    key={String(s.allowShared)}
                    s={s}
                    busy={busy}
                    canWrite={canWrite}
                    onAccept={() => s.document && void create({ name: `Suggested: ${s.allowShared ? "shared inputs allowed" : "one detector per input"}`, document: s.document, note: "Accepted hardware suggestion" })}
                  />
                ))}
              </div>
              </>
            ) : null}
          </Card>
        </section>
      ) : null}
    </div>
  );
}
