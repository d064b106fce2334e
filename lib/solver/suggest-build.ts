import { PANEL_KEY, type LayoutBoard, type LayoutInput, type LayoutOutput, type OutputDevice, type WirelessLink } from "@/lib/layout/schema";
import type { ScheduleDetector } from "@/lib/schedule/schema";
import { isLifeSafety, type PlacedDetector } from "@/lib/solver/resolve";
import type { PanelModel } from "@/lib/solver/suggest-model";
import type { DeviceClass } from "@/lib/solver/suggest-outputs";
import type { UnitTables } from "@/lib/solver/suggest-units";

// The concrete layout from a solution of the model: boards bought in catalog order with bus addresses in turn,
// each pool's boards powered by the feed the model chose, and the detectors of each host handed out in area and
// room order, filling one board before the next, so an area's detectors land on as few boards as the counts allow.
// Sounders and strobes go on each host's outputs pattern by pattern, board after board; wireless detectors fill the
// receivers in schedule order.

interface Unit {
  dets: PlacedDetector[];
  scheme: LayoutInput["scheme"];
}

export interface BuildExtras {
  devices: DeviceClass[];
  wireless: ScheduleDetector[];
}

export function buildFromSolution(
  m: PanelModel,
  units: UnitTables,
  value: (name: string) => number,
  classA: boolean,
  extras: BuildExtras = { devices: [], wireless: [] },
): { boards: LayoutBoard[]; inputs: LayoutInput[]; counts: number[]; outputs: LayoutOutput[]; wireless: WirelessLink[] } {
  const count = (v: string | null) => (v === null ? 1 : Math.round(value(v)));
  const boards: LayoutBoard[] = [];
  const counts = m.items.map(() => 0);
  let address = m.panel.bus.addressMin;
  const add = (j: number, poweredBy?: string): string => {
    const it = m.items[j];
    const key = `b${boards.length + 1}`;
    counts[j]++;
    boards.push({ key, kind: it.kind, catalogId: it.id, busAddress: it.takesBus ? address++ : null, ...(poweredBy ? { poweredBy } : {}) });
    return key;
  };
  // supplies first, so the boards they feed can name them
  const supplyKey = new Map<string, string>();
  m.feeds.forEach((f) => {
    if (f === "aux" || count(f) < 1) return;
    supplyKey.set(f, add(Number(f.split("_")[1])));
  });
  const byPlace = (a: PlacedDetector, b: PlacedDetector) => a.sched.area.localeCompare(b.sched.area) || a.sched.room.localeCompare(b.sched.room);
  const pools = units.classes.map((c) => [...c.members].sort(byPlace));
  const pathway = (dets: PlacedDetector[]): Pick<LayoutInput, "pathway"> => (classA && dets.some((d) => isLifeSafety(d.cat)) ? { pathway: "class-a" } : {});
  const inputs: LayoutInput[] = [];
  const outputs: LayoutOutput[] = [];
  const wireless: WirelessLink[] = [];
  const devicePools: OutputDevice[][] = extras.devices.map((c) => [...c.members]);
  const unheard = [...extras.wireless];
  m.hosts.forEach((h, hi) => {
    const n = count(h.count);
    if (n < 1) return;
    const keys = h.kind === "onboard" ? [PANEL_KEY] : Array.from({ length: n }, () => add(h.itemIndex, h.feed && h.feed !== "aux" ? supplyKey.get(h.feed) : undefined));
    let first = 0; // the number of this block's first output on its board: siren outputs first, as outputSlots numbers them
    h.outputs.forEach((block, b) => {
      let slot = 0;
      m.outputPatterns[hi][b].forEach((p, pi) => {
        for (let k = Math.round(value(`z_${hi}_${b}_${pi}`)); k > 0; k--, slot++) {
          const deviceIds = p.counts.flatMap((c, ci) => devicePools[ci].splice(0, c).map((d) => d.id));
          outputs.push({ boardKey: keys[Math.floor(slot / block.count)], output: first + (slot % block.count) + 1, deviceIds });
        }
      });
      first += block.count;
    });
    if (h.item?.learns) for (const key of keys) wireless.push({ boardKey: key, detectorIds: unheard.splice(0, h.item.learns).map((d) => d.id) });
    const mine: Unit[] = [];
    units.classes.forEach((c, ci) => {
      for (let k = Math.round(value(`x_${ci}_${hi}`)); k > 0; k--) mine.push({ dets: [pools[ci].shift()!], scheme: c.single[h.type]!.scheme });
    });
    m.pairs.forEach(([a, b], p) => {
      for (let k = Math.round(value(`q_${p}_${hi}`)); k > 0; k--) {
        const x = pools[a].shift()!;
        const y = pools[b].shift()!;
        mine.push({ dets: units.swapped(x, y, h.type) ? [y, x] : [x, y], scheme: "shared" });
      }
    });
    mine.sort((u, v) => byPlace(u.dets[0], v.dets[0]));
    mine.forEach((u, i) => {
      const key = keys[Math.floor(i / h.inputs)];
      inputs.push({ boardKey: key, input: (i % h.inputs) + 1, detectorIds: u.dets.map((d) => d.sched.id), scheme: u.scheme, placement: "at-detector", ...pathway(u.dets) });
    });
  });
  return { boards, inputs, counts, outputs, wireless };
}
