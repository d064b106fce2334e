import type { ContactType, WiringScheme } from "@/lib/catalog/schema";
import type { Placement } from "@/lib/loop/types";
import { colourBands } from "@/lib/resistors/colour-code";
import { preferredSeriesOf } from "@/lib/resistors/e-series";
import { formatOhms } from "@/lib/resistors/format-ohms";
import type { FittedAt, SheetResistor } from "@/lib/sheet/sheet-types";

// Each resistor of a loop: value, IEC 60062 colour bands, and where it is fitted (as the loop engine wires it).

export interface ResistorInput {
  scheme: WiringScheme;
  placement: Placement;
  contact: ContactType;
  /** Detector labels, in input order (a shared input's A and B). */
  labels: string[];
  /** Fitted values: the layout's, else the input type's. */
  eolOhms?: number;
  alarmOhms?: number;
  sharedOhms?: [number, number];
  tolerancePct: number;
}

function resistor(role: SheetResistor["role"], name: string, ohms: number, tolerancePct: number, fittedAt: FittedAt, where: string): SheetResistor {
  return { role, name, ohms, valueText: formatOhms(ohms), tolerancePct, bands: colourBands(ohms, tolerancePct) ?? [], series: preferredSeriesOf(ohms), fittedAt, where };
}

const AT_PANEL_WARNING = "resistor at the panel: it supervises nothing on the cable";

export function sheetResistors(r: ResistorInput): SheetResistor[] {
  const out: SheetResistor[] = [];
  const tol = r.tolerancePct;
  if (r.scheme === "none") return out;
  const across = r.scheme === "single-eol" && r.contact === "NO";
  if (r.eolOhms !== undefined) {
    const name = r.scheme === "shared" ? "line resistor" : "end-of-line resistor";
    let fittedAt: FittedAt;
    let where: string;
    if (r.placement === "loop-back") {
      fittedAt = "loop-back";
      where = across
        ? "at the panel end across cores 3 and 4, which are joined to the alarm contact at the far end (loop-back resistor)"
        : "at the panel end between cores 3 and 4, in series with the contact chain at the far end (loop-back resistor)";
    } else if (r.placement === "at-panel") {
      fittedAt = "at-panel-terminals";
      where = across ? `across the input terminals (${AT_PANEL_WARNING})` : `at the input terminals, in series with the pair (${AT_PANEL_WARNING})`;
    } else {
      fittedAt = "at-detector";
      const last = r.labels[r.labels.length - 1] ?? "the detector";
      where = across ? `at ${last}, across the alarm contact` : r.scheme === "shared" ? `at ${last}, in series with the line after the last contact` : `at ${last}, in series with the alarm contact`;
    }
    out.push(resistor("eol", name, r.eolOhms, tol, fittedAt, where));
  }
  if (r.scheme === "double-eol" && r.alarmOhms !== undefined) {
    const atPanel = r.placement === "at-panel";
    out.push(
      resistor(
        "alarm",
        "alarm resistor",
        r.alarmOhms,
        tol,
        atPanel ? "at-panel-terminals" : "at-detector",
        atPanel ? `at the input terminals, across the cable pair, with the end-of-line resistor in series toward the input (${AT_PANEL_WARNING})` : `at ${r.labels[0] ?? "the detector"}, across the alarm contact`,
      ),
    );
  }
  if (r.scheme === "shared" && r.sharedOhms) {
    const [a, b] = r.sharedOhms;
    const la = r.labels[0] ?? "detector A";
    const lb = r.labels[1] ?? "detector B";
    out.push(resistor("shared-a", `resistor across ${la}'s contact`, a, tol, "at-detector", `at ${la}, across its alarm contact`));
    out.push(resistor("shared-b", `resistor across ${lb}'s contact`, b, tol, "at-detector", `at ${lb}, across its alarm contact`));
  }
  return out;
}
