import type { ContactType, InputType, Report, WiringScheme } from "./schema";

/** One reading an input type expects under a scheme, with the spread from part tolerance and loop resistance. */
export interface ExpectedReading {
  /** What a correctly wired loop is in: at rest, detector active, detector A / B / both active (shared). */
  state: "rest" | "active" | "active-a" | "active-b" | "active-both";
  report: Report;
  nominalOhms: number;
  minOhms: number;
  maxOhms: number;
}

/**
 * The readings an input type's own resistor values give on a sound loop. The spread is the part
 * tolerance either way plus up to `maxLoopOhms` of cable (cable only ever adds). Returns null when a
 * scheme lacks the values it needs.
 *
 * `contact` matters for double end-of-line only: with NC contacts the alarm resistor is shorted at rest
 * (rest = eol, active = eol + alarm); with NO contacts it is in circuit at rest (rest = eol + alarm,
 * active = eol), the usual way round for a fire zone. Single end-of-line is checked at rest only; shared
 * inputs assume NC contacts.
 */
export function expectedReadings(it: InputType, scheme: WiringScheme, contact: ContactType = "NC"): ExpectedReading[] | null {
  const tol = it.tolerancePct / 100;
  const at = (state: ExpectedReading["state"], report: Report, ohms: number): ExpectedReading => ({
    state,
    report,
    nominalOhms: ohms,
    minOhms: ohms * (1 - tol),
    maxOhms: ohms * (1 + tol) + it.maxLoopOhms,
  });
  switch (scheme) {
    case "none":
      return [{ state: "rest", report: "normal", nominalOhms: 0, minOhms: 0, maxOhms: it.maxLoopOhms }];
    case "single-eol":
      return it.eolOhms === undefined ? null : [at("rest", "normal", it.eolOhms)];
    case "double-eol":
      return it.eolOhms === undefined || it.alarmOhms === undefined
        ? null
        : contact === "NC"
          ? [at("rest", "normal", it.eolOhms), at("active", "active", it.eolOhms + it.alarmOhms)]
          : [at("rest", "normal", it.eolOhms + it.alarmOhms), at("active", "active", it.eolOhms)];
    case "shared": {
      if (it.eolOhms === undefined || !it.sharedOhms) return null;
      const [a, b] = it.sharedOhms;
      return [
        at("rest", "normal", it.eolOhms),
        at("active-a", "active-a", it.eolOhms + a),
        at("active-b", "active-b", it.eolOhms + b),
        at("active-both", "active-both", it.eolOhms + a + b),
      ];
    }
  }
}
