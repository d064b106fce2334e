import type { DiagnosisCode, ReadingVerdict } from "@/lib/commissioning/diagnose";

// What the installer does after a reading: the verdict in one line, the likely cause, and the next thing to check.
// Pure, so the phone computes it without the server (offline too) and the commissioning record prints the same words.
// The checks are trade rules of thumb: common practice, no published source.

export interface ReadingAdvice {
  verdict: "pass" | "fail";
  /** "FAIL: 2.2 kΩ, expected 4.3 kΩ – 4.9 kΩ" */
  headline: string;
  /** The first diagnosis, in plain words; null on a pass. */
  likelyCause: string | null;
  nextCheck: string;
}

export const NEXT_CHECK: Record<DiagnosisCode, string> = {
  "resistor-not-at-end": "Open the detector: the end-of-line resistor belongs there, at the far end. If it is at the panel terminals or part-way along, move it, then repeat the short and cut tests.",
  "open-at-rest": "Check the detector is at rest (door shut, cover on, nobody in view), then measure each core end to end to find the break and re-seat loose terminals.",
  "open-at-rest-across": "At the detector, check that the resistor across the contact is fitted and tight; then measure each core end to end.",
  "resistor-across-contact-missing": "At the detector, fit the resistor across the contact as the core map shows, then repeat the active test.",
  "open-on-short-test": "Make the short again right across cores 1 and 2 at the far end; if it still reads open, measure each core end to end.",
  "open-unexpected": "Check every terminal on this loop is tight, and measure each core end to end against the core map.",
  "near-zero-at-rest": "Disconnect the loop at the panel and measure it alone: still near 0 Ω means a pinched or damaged cable; otherwise check that the resistor is fitted.",
  "reads-as-other-test": "Check the detector is in the state the test asks for and that its contact type matches the sheet (NC or NO), then measure again.",
  "double-value": "At the detector, check how the two resistors are wired: one in series with the contact and one across it, as the core map shows.",
  "slightly-high": "Remake the joints and terminals on this loop and measure again; if it stays high, measure the cable run and the resistor on its own.",
  "wrong-resistor": "Take the resistor out, read its colour bands or measure it alone, and fit the value the sheet gives.",
  "closed-when-open-expected": "Look for a link or a resistor across the pair at the terminals, or a damaged cable; disconnect at the panel and measure again.",
};

const PASS_NEXT = "Nothing to put right: go on to the next test on the sheet.";

export function adviceOf(v: ReadingVerdict): ReadingAdvice {
  const headline = `${v.verdict === "pass" ? "PASS" : "FAIL"}: ${v.readingText}, expected ${v.expectedText}`;
  if (v.verdict === "pass") return { verdict: "pass", headline, likelyCause: null, nextCheck: PASS_NEXT };
  const first = v.diagnoses[0];
  return {
    verdict: "fail",
    headline,
    likelyCause: first?.text ?? "The reading is outside the expected range.",
    nextCheck: first ? NEXT_CHECK[first.code] : NEXT_CHECK["open-unexpected"],
  };
}

/** The advice as one paragraph, for the commissioning record. */
export function adviceText(a: ReadingAdvice): string {
  return a.likelyCause ? `${a.headline}. Likely cause: ${a.likelyCause} Next check: ${a.nextCheck}` : `${a.headline}.`;
}
