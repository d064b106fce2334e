import type { Finding } from "@/lib/findings";
import { fmt } from "@/lib/solver/format";
import { plural } from "@/lib/vocabulary/plural";
import type { Resolved } from "@/lib/solver/resolve";
import type { BusFigures } from "@/lib/solver/types";

// The data bus: device count, addresses, cable length.

export function checkBus(r: Resolved, busCableM: number, out: Finding[]): BusFigures {
  const { bus } = r.panel;
  const devices = r.boards.filter((b) => b.entry?.entry.takesBusAddress);
  const addresses = devices.map((b) => ({ boardKey: b.key, address: b.board?.busAddress ?? null }));
  if (devices.length > bus.maxDevices)
    out.push({
      code: "bus-too-many-devices",
      severity: "error",
      message: `${plural(devices.length, "device")} on the data bus; ${r.panel.name} takes at most ${bus.maxDevices}`,
      why: "The panel stops polling past its device limit, so the extra boards are never heard.",
      target: { kind: "layout" },
    });
  const seen = new Map<number, string>();
  const duplicates = new Set<number>();
  const outOfRange: { boardKey: string; address: number }[] = [];
  for (const d of devices) {
    const a = d.board?.busAddress ?? null;
    const target = { kind: "board" as const, boardKey: d.key };
    if (a === null) {
      out.push({ code: "bus-address-missing", severity: "error", message: `${d.name} has no bus address`, why: "A bus device answers only to its address; without one the panel cannot poll it.", target });
      continue;
    }
    if (a < bus.addressMin || a > bus.addressMax) {
      outOfRange.push({ boardKey: d.key, address: a });
      out.push({
        code: "bus-address-out-of-range",
        severity: "error",
        message: `${d.name} is set to bus address ${a}; ${r.panel.name} polls ${bus.addressMin} to ${bus.addressMax}`,
        why: "The panel never asks for an address outside its range.",
        target,
      });
    }
    const first = seen.get(a);
    if (first !== undefined) {
      duplicates.add(a);
      out.push({
        code: "bus-address-duplicate",
        severity: "error",
        message: `${d.name} and ${r.names.get(first) ?? "another board"} are both at bus address ${a}`,
        why: "Two devices answering to one address garble each other's replies.",
        target,
      });
    } else seen.set(a, d.key);
  }
  for (const b of r.boards)
    if (b.entry && !b.entry.entry.takesBusAddress && b.board?.busAddress != null)
      out.push({
        code: "bus-address-not-used",
        severity: "note",
        message: `${b.name} does not sit on the data bus; its bus address ${b.board.busAddress} is ignored`,
        why: "Only bus devices have an address.",
        target: { kind: "board", boardKey: b.key },
      });
  if (busCableM > bus.maxCableM)
    out.push({
      code: "bus-cable-too-long",
      severity: "error",
      message: `${fmt(busCableM)} m of data bus cable; ${r.panel.name} allows ${fmt(bus.maxCableM)} m`,
      why: "Past its rated length the bus signal degrades and devices drop off intermittently.",
      target: { kind: "layout" },
    });
  return {
    devices: devices.length,
    maxDevices: bus.maxDevices,
    addressMin: bus.addressMin,
    addressMax: bus.addressMax,
    addresses,
    duplicateAddresses: [...duplicates].sort((a, b) => a - b),
    outOfRange,
    cableM: busCableM,
    maxCableM: bus.maxCableM,
  };
}
