import type { Catalog, OutputBlock, WiringScheme } from "@/lib/catalog/schema";
import { outputSlots, panelOutputBlocks, type OutputSlot } from "@/lib/layout/outputs";
import type { LayoutBoard, LayoutDocument, LayoutInput, LayoutOutput, LayoutPower, OutputDevice, WirelessLink } from "@/lib/layout/schema";
import type { Schedule } from "@/lib/schedule/schema";
import { createSolver } from "@/lib/solver";
import type { AreaPlan } from "@/lib/solver/suggest-areas";

export interface BruteExtras {
  /** Sounders and strobes to put on outputs. */
  outputDevices?: OutputDevice[];
  /** Areas and zones every candidate carries (the same plan the suggestion uses). */
  plan?: AreaPlan | null;
}

/**
 * The cheapest layout cheaper than `below`, by trying everything: each panel with up to `perItem` of each board,
 * keypad, supply, output module and wireless receiver of its family, at least one keypad where the family has one,
 * every grouping of wired detectors singly or in pairs (a pair only when `share` allows both, in either order), every
 * way of putting the groups on inputs, every wiring scheme each input type offers, every supply for each powered
 * board, every output for each sounder or strobe, and every receiver for each wireless detector. Each candidate is
 * judged by the full solver: 0 errors and nothing unplaced. Null when nothing below `below` is valid.
 */
export function cheapestByBruteForce(schedule: Schedule, catalog: Catalog, power: LayoutPower, below: number, share: (id: string) => boolean, perItem = 2, extras: BruteExtras = {}): { cost: number; layout: LayoutDocument } | null {
  const solver = createSolver(schedule, catalog);
  const types = new Map(catalog.inputTypes.map((t) => [t.id, t]));
  const wirelessIds = schedule.filter((d) => catalog.wirelessDetectors.some((w) => w.id === d.catalogId)).map((d) => d.id);
  const devices = extras.outputDevices ?? [];
  let best: { cost: number; layout: LayoutDocument } | null = null;
  const groupings: string[][][] = [];
  const group = (rest: string[], acc: string[][]) => {
    if (!rest.length) return void groupings.push(acc);
    const [a, ...others] = rest;
    group(others, [...acc, [a]]);
    if (share(a))
      others.forEach((b, k) => {
        if (!share(b)) return;
        const left = [...others.slice(0, k), ...others.slice(k + 1)];
        group(left, [...acc, [a, b]]);
        group(left, [...acc, [b, a]]);
      });
  };
  group(schedule.filter((d) => !wirelessIds.includes(d.id)).map((d) => d.id), []);
  const beaten = (cost: number) => cost >= Math.min(below, best?.cost ?? Infinity);
  for (const panel of catalog.panels) {
    const none = { inputs: 0, type: "", own: false, outputs: [] as OutputBlock[] };
    const items = [
      ...catalog.expansionBoards.filter((e) => e.families.includes(panel.family)).map((e) => ({ ...none, kind: "expansion" as const, id: e.id, price: e.listPrice, inputs: e.inputs.count, type: e.inputs.inputType, own: !!e.ownSupply, outputs: e.outputs ?? [] })),
      ...catalog.keypads.filter((k) => k.families.includes(panel.family)).map((k) => ({ ...none, kind: "keypad" as const, id: k.id, price: k.listPrice, inputs: k.inputs?.count ?? 0, type: k.inputs?.inputType ?? "" })),
      ...catalog.powerSupplies.filter((s) => s.families.includes(panel.family)).map((s) => ({ ...none, kind: "supply" as const, id: s.id, price: s.listPrice, own: true })),
      ...catalog.outputModules.filter((o) => o.families.includes(panel.family)).map((o) => ({ ...none, kind: "outputs" as const, id: o.id, price: o.listPrice, outputs: o.outputs })),
      ...catalog.wirelessReceivers.filter((w) => w.families.includes(panel.family)).map((w) => ({ ...none, kind: "receiver" as const, id: w.id, price: w.listPrice })),
    ];
    const needKeypad = items.some((it) => it.kind === "keypad");
    const counts = items.map(() => 0);
    const visit = (j: number, cost: number) => {
      if (beaten(cost)) return;
      if (j < items.length) {
        for (let c = 0; c <= perItem; c++) {
          counts[j] = c;
          visit(j + 1, cost + c * items[j].price);
        }
        counts[j] = 0;
        return;
      }
      if (needKeypad && !items.some((it, k) => it.kind === "keypad" && counts[k] > 0)) return;
      const boards: LayoutBoard[] = [];
      const itemOf = new Map<string, (typeof items)[number]>();
      items.forEach((it, k) => {
        for (let n = 0; n < counts[k]; n++) {
          const key = `b${boards.length + 1}`;
          itemOf.set(key, it);
          boards.push({ key, kind: it.kind, catalogId: it.id, busAddress: boards.length + panel.bus.addressMin });
        }
      });
      const hosts = [{ key: "panel", free: panel.onboardInputs.count, type: panel.onboardInputs.inputType }, ...boards.filter((b) => itemOf.get(b.key)!.inputs > 0).map((b) => ({ key: b.key, free: itemOf.get(b.key)!.inputs, type: itemOf.get(b.key)!.type }))];
      const supplies = boards.filter((b) => b.kind === "supply").map((b) => b.key);
      const fed = boards.filter((b) => !itemOf.get(b.key)!.own);
      const slots: OutputSlot[] = [...outputSlots(panelOutputBlocks(panel), "panel"), ...boards.flatMap((b) => outputSlots(itemOf.get(b.key)!.outputs, b.key))];
      const receivers = boards.filter((b) => b.kind === "receiver").map((b) => b.key);
      if (wirelessIds.length && !receivers.length) return;
      for (const groups of groupings) {
        const inputs: LayoutInput[] = [];
        const used = new Map<string, number>();
        const place = (g: number) => {
          if (beaten(cost)) return;
          if (g === groups.length) return feeds(0, boards);
          for (const h of hosts) {
            if (h.free === 0) continue;
            const schemes: WiringScheme[] = groups[g].length === 2 ? ["shared"] : types.get(h.type)!.schemes.filter((s) => s !== "shared");
            h.free--;
            const n = (used.get(h.key) ?? 0) + 1;
            used.set(h.key, n);
            for (const scheme of schemes) {
              inputs.push({ boardKey: h.key, input: n, detectorIds: groups[g], scheme, placement: "at-detector" });
              place(g + 1);
              inputs.pop();
            }
            used.set(h.key, n - 1);
            h.free++;
          }
        };
        const feeds = (k: number, bs: LayoutBoard[]): void => {
          if (beaten(cost)) return;
          if (k === fed.length) return outputsFor(0, bs, new Map());
          for (const s of [null, ...supplies]) feeds(k + 1, bs.map((b) => (b.key === fed[k].key ? (s ? { ...b, poweredBy: s } : b) : b)));
        };
        // every output for each sounder or strobe (several may share one output)
        const outputsFor = (k: number, bs: LayoutBoard[], on: Map<OutputSlot, string[]>): void => {
          if (beaten(cost)) return;
          if (k === devices.length) return receiversFor(0, bs, on, new Map());
          for (const s of slots) {
            on.set(s, [...(on.get(s) ?? []), devices[k].id]);
            outputsFor(k + 1, bs, on);
            const left = on.get(s)!.slice(0, -1);
            if (left.length) on.set(s, left);
            else on.delete(s);
          }
        };
        const receiversFor = (k: number, bs: LayoutBoard[], on: Map<OutputSlot, string[]>, learnt: Map<string, string[]>): void => {
          if (beaten(cost)) return;
          if (k < wirelessIds.length) {
            for (const r of receivers) {
              learnt.set(r, [...(learnt.get(r) ?? []), wirelessIds[k]]);
              receiversFor(k + 1, bs, on, learnt);
              learnt.set(r, learnt.get(r)!.slice(0, -1));
            }
            return;
          }
          const outputs: LayoutOutput[] = [...on].map(([s, ids]) => ({ boardKey: s.boardKey, output: s.output, deviceIds: ids }));
          const wireless: WirelessLink[] = [...learnt].filter(([, ids]) => ids.length).map(([boardKey, detectorIds]) => ({ boardKey, detectorIds }));
          const layout: LayoutDocument = {
            panelId: panel.id,
            boards: bs,
            inputs: inputs.slice(),
            power,
            busCableM: 0,
            ...(extras.plan ? { areas: extras.plan.areas, zones: extras.plan.zones } : {}),
            ...(devices.length ? { outputDevices: devices, outputs } : {}),
            ...(wireless.length ? { wireless } : {}),
          };
          const r = solver.solve(layout);
          if (r.counts.error === 0 && r.totals.unplacedIds.length === 0) best = { cost, layout };
        };
        place(0);
      }
    };
    visit(0, panel.listPrice);
  }
  return best;
}
