import type { Catalog } from "@/lib/catalog/schema";
import type { LayoutBoard, LayoutDocument, WirelessLink } from "@/lib/layout/schema";
import type { Schedule } from "@/lib/schedule/schema";
import { analyzeLoop } from "@/lib/loop";
import { createSolverWith } from "@/lib/solver/create-solver";
import { withCapacityCheck } from "@/lib/solver/inputs-short-rule";
import type { Suggestion, SuggestionPart } from "@/lib/solver/suggest";

// Wireless detectors take no input: a suggestion is made for the wired detectors, then the cheapest set of one
// wireless receiver type of the panel's family that learns every wireless detector is added on the data bus, and
// the whole layout is checked again with the full schedule. The cheapest over panels and receivers together is
// not searched yet: the panel is the one the wired detectors chose.

export function splitWireless(schedule: Schedule, catalog: Catalog): { wired: Schedule; wireless: Schedule } {
  const wirelessIds = new Set(catalog.wirelessDetectors.map((d) => d.id));
  return { wired: schedule.filter((d) => !wirelessIds.has(d.catalogId)), wireless: schedule.filter((d) => wirelessIds.has(d.catalogId)) };
}

/** The suggestion for the wired detectors with receivers added for the wireless ones; `found: false` with the reason when none fits. */
export function withReceivers<S extends Suggestion>(s: S, schedule: Schedule, wireless: Schedule, catalog: Catalog): S {
  if (!s.found || !wireless.length) return s;
  const notFound = (reason: string) => ({ found: false, reason, candidatesTried: s.candidatesTried, ...("proof" in s ? { proof: s.proof } : {}) }) as unknown as S;
  const panel = catalog.panels.find((p) => p.id === s.layout.panelId);
  const options = catalog.wirelessReceivers
    .filter((r) => panel && r.families.includes(panel.family))
    .map((r) => ({ r, count: Math.ceil(wireless.length / r.maxDevices) }))
    .sort((a, b) => a.count * a.r.listPrice - b.count * b.r.listPrice || a.count - b.count);
  const pick = options[0];
  if (!pick) return notFound(`${panel?.name ?? "The panel"}: no wireless receiver of its family is in the catalog, so the wireless detectors cannot be learnt`);
  const used = s.layout.boards.map((b) => b.busAddress ?? 0);
  let address = Math.max(0, ...used) + 1;
  const boards: LayoutBoard[] = [];
  const links: WirelessLink[] = [];
  for (let i = 0; i < pick.count; i++) {
    const key = `rx${i + 1}`;
    boards.push({ key, kind: "receiver", catalogId: pick.r.id, busAddress: pick.r.takesBusAddress ? address++ : null });
    links.push({ boardKey: key, detectorIds: wireless.slice(i * pick.r.maxDevices, (i + 1) * pick.r.maxDevices).map((d) => d.id) });
  }
  const layout: LayoutDocument = { ...s.layout, boards: [...s.layout.boards, ...boards], wireless: links };
  const result = withCapacityCheck(createSolverWith(analyzeLoop, schedule, catalog).solve(layout));
  if (result.counts.error > 0 || result.totals.unplacedIds.length > 0)
    return notFound(`${panel!.name} with ${pick.count === 1 ? "a wireless receiver" : `${pick.count} wireless receivers`}: ${result.findings.find((f) => f.severity === "error")?.message ?? "detectors left unplaced"}`);
  const parts: SuggestionPart[] = [...s.parts, { kind: "receiver", catalogId: pick.r.id, name: pick.r.name, count: pick.count, unitPrice: pick.r.listPrice }];
  const cost = Math.round((s.cost + pick.count * pick.r.listPrice) * 100) / 100;
  return { ...s, layout, result, parts, cost };
}
