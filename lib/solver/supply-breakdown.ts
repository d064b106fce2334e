import { PANEL_KEY } from "@/lib/layout/schema";
import type { OutputLoad } from "@/lib/solver/output-rules";
import type { Resolved } from "@/lib/solver/resolve";
import type { PowerDraw, SupplyFigures } from "@/lib/solver/types";

// Where each supply's current goes: its own draw, each board and keypad it powers, each powered detector it feeds,
// each sounder and strobe on its outputs.
// Built from the same catalog figures as the supply's load, so the lines add up to what its battery carries.

/** The supply's own draw, as its line in the breakdown reads. */
const ownName = (s: SupplyFigures) => (s.kind === "panel" ? "Control panel's own draw" : s.kind === "own-supply" ? `${s.name.replace(/ own supply$/, "")}'s own draw` : `${s.name}'s own draw`);

/** `only`: the supplies to work out (a patched solve keeps the others' breakdowns); all when absent. */
export function attachBreakdown(r: Resolved, supplies: SupplyFigures[], feedOf: Map<string, SupplyFigures>, loads: OutputLoad[] = [], only?: Set<string>): void {
  const lines = new Map<string, PowerDraw[]>();
  for (const s of supplies) {
    if (only && !only.has(s.supplyKey)) continue;
    const list: PowerDraw[] = [{ kind: "own", key: s.supplyKey, name: ownName(s), restMa: s.ownRestMa, alarmMa: s.ownAlarmMa }];
    for (const key of s.powers) {
      const b = r.byKey.get(key);
      if (!b?.entry) continue;
      list.push({ kind: b.entry.kind === "keypad" ? "keypad" : "board", key, name: b.name, restMa: b.entry.entry.standbyMa, alarmMa: b.entry.entry.alarmMa });
    }
    lines.set(s.supplyKey, list);
  }
  for (const ri of r.inputs) {
    const feed = feedOf.get(ri.board.key);
    const list = feed && lines.get(feed.supplyKey);
    if (!list) continue;
    for (const d of ri.detectors)
      if (d.cat.power) list.push({ kind: "detector", key: d.sched.id, name: d.sched.label, restMa: d.cat.power.standbyMa, alarmMa: d.cat.power.alarmMa });
  }
  for (const l of loads) {
    const feed = l.boardKey === PANEL_KEY ? supplies[0] : (feedOf.get(l.boardKey) ?? supplies[0]);
    lines.get(feed.supplyKey)?.push({ kind: "sounder", key: l.device.id, name: l.device.label, restMa: l.restMa, alarmMa: l.alarmMa });
  }
  for (const s of supplies) if (!only || only.has(s.supplyKey)) s.breakdown = lines.get(s.supplyKey) ?? [];
}
