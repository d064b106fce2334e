import type { Catalog, Panel } from "@/lib/catalog/schema";
import { fmt } from "@/lib/solver/format";
import type { PlacedDetector } from "@/lib/solver/resolve";
import { busLimitOf, itemsFor } from "@/lib/solver/suggest-model";
import { areaMisfit, type AreaPlan } from "@/lib/solver/suggest-areas";
import type { UnitTables } from "@/lib/solver/suggest-units";
import { plural } from "@/lib/vocabulary/plural";

// The limit that rules a panel out before any model is solved, in plain words; null when none does.
// Each input type's reach is what the panel holds with its data bus full of the boards with most inputs of that type.

/** Besides wired detectors: the schedule's wireless detectors and the areas it names. */
export interface FitExtras {
  wireless: number;
  plan: AreaPlan | null;
}

export function noFitReason(catalog: Catalog, panel: Panel, units: UnitTables, placed: PlacedDetector[], minKeypads: number, busCableM: number, extras: FitExtras = { wireless: 0, plan: null }): string | null {
  const N = placed.length;
  if (N + extras.wireless > panel.maxZones) return `${panel.name}: ${plural(N + extras.wireless, "zone")} needed; it reports at most ${panel.maxZones}`;
  const areas = areaMisfit(panel, extras.plan);
  if (areas) return areas;
  if (extras.wireless > 0) {
    const receivers = catalog.wirelessReceivers.filter((w) => w.families.includes(panel.family));
    const most = Math.max(0, ...receivers.map((w) => w.maxDevices)) * busLimitOf(panel);
    if (!receivers.length) return `${panel.name}: ${plural(extras.wireless, "wireless detector")} in the schedule; its family has no wireless receiver`;
    if (extras.wireless > most) return `${panel.name}: ${plural(extras.wireless, "wireless detector")} in the schedule; its receivers learn at most ${most} with its data bus full`;
  }
  if (busCableM > panel.bus.maxCableM) return `${panel.name}: ${fmt(busCableM)} m of data bus asked for; it drives at most ${fmt(panel.bus.maxCableM)} m`;
  const items = itemsFor(catalog, panel);
  const busLimit = busLimitOf(panel);
  const onboard = catalog.inputTypes.findIndex((t) => t.id === panel.onboardInputs.inputType);
  const reach = catalog.inputTypes.map((_, t) => {
    const withType = items.filter((it) => it.type === t && it.inputs > 0);
    const perSlot = Math.max(0, ...withType.map((it) => it.inputs));
    const keypadCarries = withType.some((it) => it.kind === "keypad");
    const slots = Math.max(0, busLimit - (keypadCarries ? 0 : minKeypads));
    return (t === onboard ? panel.onboardInputs.count : 0) + slots * perSlot;
  });
  const fits = (c: UnitTables["classes"][number]) => c.single.some((s, t) => s !== null && reach[t] > 0);
  const stranded = units.classes.find((c) => !fits(c));
  if (stranded) return `${panel.name}: ${stranded.members[0].sched.label} fits no input its family offers`;
  // detectors that only one input type takes, against that type's reach (each may share an input with one other)
  for (let t = 0; t < catalog.inputTypes.length; t++) {
    const only = units.classes.filter((c) => c.single.every((s, u) => u === t || s === null || reach[u] === 0));
    const need = only.reduce((n, c) => n + c.members.length, 0);
    const sharing = only.some((c) => c.shareable) ? only.filter((c) => c.shareable).reduce((n, c) => n + c.members.length, 0) : 0;
    const least = need - Math.floor(sharing / 2);
    if (least > reach[t]) return `${panel.name}: ${plural(least, "input")} of the ${catalog.inputTypes[t].name} kind needed; its family reaches ${reach[t]} with its data bus full`;
  }
  // the bus is one: every type's boards share its addresses
  const busKeypad = items.some((it) => it.kind === "keypad" && it.inputs > 0);
  const total = panel.onboardInputs.count + Math.max(0, busLimit - (busKeypad ? 0 : minKeypads)) * Math.max(0, ...items.map((it) => (it.type >= 0 ? it.inputs : 0)));
  const sharable = units.classes.filter((c) => c.shareable).reduce((n, c) => n + c.members.length, 0);
  if (N - Math.floor(sharable / 2) > total) return `${panel.name}: ${plural(N - Math.floor(sharable / 2), "input")} needed; its family reaches ${total} with its data bus full`;
  return null;
}
