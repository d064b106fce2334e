import { PANEL_KEY, type LayoutBoard, type LayoutInput } from "@/lib/layout/schema";
import { isLifeSafety, type PlacedDetector } from "@/lib/solver/resolve";
import type { PanelModel } from "@/lib/solver/suggest-model";
import type { UnitTables } from "@/lib/solver/suggest-units";

// The concrete layout from a solution of the model: boards bought in catalog order with bus addresses in turn,
// each powered board on the feed the model chose, and the detectors of each class handed out to hosts in area
// and room order, so an area's detectors land on as few boards as the counts allow.

export function buildFromSolution(m: PanelModel, units: UnitTables, value: (name: string) => number, classA: boolean): { boards: LayoutBoard[]; inputs: LayoutInput[]; counts: number[] } {
  const on = (v: string) => value(v) > 0.5;
  const boards: LayoutBoard[] = [];
  const keyOf = new Map<string, string>();
  const counts = m.items.map(() => 0);
  let address = m.panel.bus.addressMin;
  m.items.forEach((it, j) => {
    for (let k = 0; k < m.caps[j]; k++) {
      const y = `y_${j}_${k}`;
      if (!on(y)) continue;
      counts[j]++;
      const key = `b${boards.length + 1}`;
      keyOf.set(y, key);
      boards.push({ key, kind: it.kind, catalogId: it.id, busAddress: it.takesBus ? address++ : null });
    }
  });
  for (const y of m.fedBoards) {
    if (!keyOf.has(y)) continue;
    const f = m.feeds.find((f) => on(`w_${y}_${f}`));
    if (f && f !== "aux") boards.find((b) => b.key === keyOf.get(y))!.poweredBy = keyOf.get(f);
  }
  const byPlace = (a: PlacedDetector, b: PlacedDetector) => a.sched.area.localeCompare(b.sched.area) || a.sched.room.localeCompare(b.sched.room);
  const pools = units.classes.map((c) => [...c.members].sort(byPlace));
  const pathway = (dets: PlacedDetector[]): Pick<LayoutInput, "pathway"> => (classA && dets.some((d) => isLifeSafety(d.cat)) ? { pathway: "class-a" } : {});
  const inputs: LayoutInput[] = [];
  m.hosts.forEach((h, hi) => {
    const key = h.y === null ? PANEL_KEY : keyOf.get(h.y);
    if (!key) return;
    let next = 1;
    const put = (dets: PlacedDetector[], scheme: LayoutInput["scheme"]) => inputs.push({ boardKey: key, input: next++, detectorIds: dets.map((d) => d.sched.id), scheme, placement: "at-detector", ...pathway(dets) });
    const units_: { dets: PlacedDetector[]; scheme: LayoutInput["scheme"] }[] = [];
    units.classes.forEach((c, ci) => {
      const n = Math.round(value(`x_${ci}_${hi}`));
      for (let k = 0; k < n; k++) units_.push({ dets: [pools[ci].shift()!], scheme: c.single[h.type]!.scheme });
    });
    m.pairs.forEach(([a, b], p) => {
      const n = Math.round(value(`q_${p}_${hi}`));
      for (let k = 0; k < n; k++) {
        const x = pools[a].shift()!;
        const y = pools[b].shift()!;
        units_.push({ dets: units.swapped(x, y, h.type) ? [y, x] : [x, y], scheme: "shared" });
      }
    });
    units_.sort((u, v) => byPlace(u.dets[0], v.dets[0]));
    for (const u of units_) put(u.dets, u.scheme);
  });
  return { boards, inputs, counts };
}
