// An input-pair row whose plain description is built only when read: a layout has thousands of rows and the
// findings quote a handful, so building every label up front was most of the cost of a cold analysis.
import type { Report } from "@/lib/catalog/schema";
import { rowLabel } from "./row-labels";
import type { DetectorState, Fault, LoopDetector, Reading } from "./types";

export class ReadingRow implements Reading {
  // private: not an own property, so JSON, spreads and equality see the same fields as a plain row
  readonly #detectors: readonly LoopDetector[];
  #label: string | undefined;
  constructor(
    public states: DetectorState[],
    public fault: Fault,
    public minOhms: number,
    public maxOhms: number,
    public reports: Report[],
    public uncertain: boolean,
    public marginOhms: number,
    public expected: Report,
    public nominalOhms: number,
    detectors: readonly LoopDetector[],
  ) {
    this.#detectors = detectors;
  }

  get label(): string {
    return (this.#label ??= rowLabel(this.#detectors, this.states, this.fault));
  }

  /** The row as plain data, label included, in the field order of a plain row. */
  toJSON(): Reading {
    const { states, fault, minOhms, maxOhms, reports, uncertain, marginOhms, expected, nominalOhms } = this;
    return { states, fault, minOhms, maxOhms, reports, uncertain, marginOhms, expected, nominalOhms, label: this.label };
  }
}

/** A row as plain data with its label as an own field (for equality with a row that came back from JSON). */
export function plainRow(r: Reading): Reading {
  return r instanceof ReadingRow ? r.toJSON() : r;
}
