import type { WirelessDetector } from "@/lib/catalog/schema";
import type { Finding } from "@/lib/findings";
import { documentParts } from "@/lib/layout/schema";
import type { ScheduleDetector } from "@/lib/schedule/schema";
import { plural, pluralWord } from "@/lib/vocabulary/plural";
import type { Resolved, ResolvedBoard } from "@/lib/solver/resolve";
import type { ReceiverFigures } from "@/lib/solver/types";

// Wireless detectors: learnt by a wireless receiver on the data bus, counted as zones and against the receiver's
// limit, with no loop and no current from the system (they run on their own cells).

export interface WirelessPlaced {
  sched: ScheduleDetector;
  cat: WirelessDetector;
  board: ResolvedBoard;
}

export function resolveWireless(r: Resolved, schedule: Map<string, ScheduleDetector>, out: Finding[]): { placed: WirelessPlaced[]; receivers: ReceiverFigures[] } {
  const placed: WirelessPlaced[] = [];
  const receivers: ReceiverFigures[] = [];
  const links = documentParts(r.layout).wireless;
  const seenBoards = new Set<string>();
  for (const link of links) {
    const board = r.byKey.get(link.boardKey);
    const target = { kind: "board" as const, boardKey: link.boardKey };
    if (!board || board.entry?.kind !== "receiver") {
      if (link.detectorIds.length)
        out.push({
          code: "wireless-board-not-receiver",
          severity: "error",
          message: `${plural(link.detectorIds.length, "wireless detector")} ${pluralWord(link.detectorIds.length, "is", "are")} set on ${board?.name ?? "a board not in this layout"}, which is not a wireless receiver`,
          why: "Only a wireless receiver hears wireless detectors; these report nothing.",
          target,
        });
      continue;
    }
    if (seenBoards.has(board.key)) continue; // the schema refuses a receiver listed twice in one document; a hand-made one keeps the first
    seenBoards.add(board.key);
    const learnt: string[] = [];
    for (const id of link.detectorIds) {
      const sched = schedule.get(id);
      if (!sched) {
        out.push({ code: "wireless-detector-unknown", severity: "error", message: `${board.name}: a wireless detector set on it is no longer in the device schedule`, why: "It may have been deleted from the schedule after it was set here.", target });
        continue;
      }
      const dTarget = { kind: "detector" as const, detectorId: id };
      if (r.placed.has(id)) {
        out.push({ code: "detector-placed-twice", severity: "error", message: `${sched.label} is placed twice (again on ${board.name})`, why: "A detector reports through one input or one receiver.", target: dTarget });
        continue;
      }
      const cat = r.ix.wirelessDetectors.get(sched.catalogId);
      if (!cat) {
        const wired = r.ix.detectors.has(sched.catalogId);
        out.push({
          code: "wireless-detector-wired",
          severity: "error",
          message: wired ? `${sched.label} is a wired detector, set on ${board.name}` : `${sched.label}: its detector type is not in the catalog`,
          why: wired ? "A wired detector needs a loop to an input; a receiver hears only wireless detectors." : "Whether it is wireless is unknown, so it is left out.",
          target: dTarget,
        });
        continue;
      }
      r.placed.add(id);
      learnt.push(id);
      placed.push({ sched, cat, board });
    }
    const max = board.entry.entry.maxDevices;
    if (learnt.length > max)
      out.push({
        code: "receiver-over-limit",
        severity: "error",
        message: `${board.name} has ${plural(learnt.length, "wireless detector")}; it learns at most ${max}`,
        why: "A receiver forgets or refuses detectors past its limit, so they would report nothing. Add a second receiver.",
        target,
      });
    receivers.push({ boardKey: board.key, name: board.name, detectorIds: learnt, maxDevices: max });
  }
  for (const b of r.boards)
    if (b.entry?.kind === "receiver" && !seenBoards.has(b.key)) receivers.push({ boardKey: b.key, name: b.name, detectorIds: [], maxDevices: b.entry.entry.maxDevices });
  return { placed, receivers };
}
