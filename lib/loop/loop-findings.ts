// Findings for one analysed loop, each with a plain-words reason a practitioner will recognise.
import type { InputType, Report } from "@/lib/catalog/schema";
import type { Finding, FindingTarget, Severity } from "@/lib/findings";
import { formatOhms, formatOhmsRange } from "@/lib/resistors/format-ohms";
import { combineFromStock } from "@/lib/resistors/stock-combination";
import { nearestPreferred } from "@/lib/resistors/e-series";
import type { PairGroups } from "./indistinguishable";
import { LoopFinding } from "./loop-finding";
import type { LoopModel } from "./loop-model";
import { REPORT_WORDS, reportsWords } from "./row-labels";
import { acceptableFor, REPORT_BIT } from "./loop-bands";
import type { LoopAnalysis, LoopSpec, Reading, ResistorUse } from "./types";
import { plural, pluralWord } from "@/lib/vocabulary/plural";

export const LIFE_SAFETY_CAUTION =
  "Smoke, heat and other life-safety devices are governed by local fire code: follow it, the authority having jurisdiction and licensed practice. Loopwright is an aid, not an approval.";

export interface FindingsInput {
  loop: LoopSpec;
  inputType: InputType;
  model: LoopModel;
  rows: Reading[];
  masks: number[];
  analysis: LoopAnalysis;
  /** The indistinguishable pairs counted by the two situations (SITUATION_ORDER) they mix up. */
  groups: PairGroups;
}

const ROLE_WORDS: Record<ResistorUse["role"], string> = {
  eol: "end-of-line resistor",
  alarm: "alarm resistor",
  "shared-a": "resistor of detector A",
  "shared-b": "resistor of detector B",
};

function reads(r: Reading): string {
  return `${r.label} reads ${formatOhmsRange(r.minOhms, r.maxOhms)} (${reportsWords(r.reports)})`;
}

/** `message` writes the finding's text when it is first read (LoopFinding). */
function push(out: Finding[], target: FindingTarget, code: string, severity: Severity, message: () => string, why: string): void {
  out.push(new LoopFinding(code, severity, message, why, target));
}

/** The first row with fault `f` that is `bad`, else the first row with that fault. */
function worstOf(rows: readonly Reading[], f: Reading["fault"], bad: (r: Reading) => boolean): Reading {
  let first: Reading | undefined;
  for (const r of rows)
    if (r.fault === f) {
      if (bad(r)) return r;
      first ??= r;
    }
  return first!;
}

// Message writers for the findings whose rows are picked in loops: made here so that buildFindings' own
// variables stay out of the closures (a captured variable lives on the heap, and the loops over rows slow).
function readsText(r: Reading): () => string {
  return () => reads(r);
}
function readsNotText(r: Reading, not: string): () => string {
  return () => `${reads(r)}, not ${not}`;
}
function thinText(r: Reading): () => string {
  return () => `${reads(r)}, only ${formatOhms(r.marginOhms)} from a band edge`;
}
function apartText(rows: readonly Reading[], groups: { words: string; count: number; i: number; j: number }[]): () => string {
  return () => `The panel can't tell apart: ${groups.map((g) => `${g.words} (${g.count === 1 ? "" : `${g.count} cases, `}e.g. ${rows[g.i].label} and ${rows[g.j].label})`).join("; ")}`;
}

function isOnly(r: Reading, allowed: readonly Report[]): boolean {
  for (const x of r.reports) if (!allowed.includes(x)) return false;
  return true;
}

export function buildFindings(ctx: FindingsInput, target: FindingTarget): Finding[] {
  const { loop, inputType, rows, masks, analysis } = ctx;
  const out: Finding[] = [];
  const placement = loop.placement;
  const scheme = loop.scheme;
  let lifeSafety = false;
  let nNO = 0;
  for (const d of loop.detectors) {
    if (d.lifeSafety) lifeSafety = true;
    if (d.contact === "NO") nNO++;
  }
  const allNO = nNO === loop.detectors.length;
  // figures the messages quote, taken now: a message is written when first read
  const { tolerancePct } = loop;
  const { lengthM, tempMaxC } = loop.cable;
  const { name: typeName, tolerancePct: typeTolerancePct, maxLoopOhms } = inputType;
  const { maxCableM, maxCableByLoopOhmsM: byLoopOhmsM } = analysis;
  const anyNO = nNO > 0;

  // Rest, alarm and tamper rows without a fault.
  const rest = rows[0];
  const restWrong = masks[0] !== REPORT_BIT.normal;
  const mismatched: ResistorUse[] = [];
  for (const u of analysis.resistors) if (u.expectedOhms !== null && Math.abs(u.ohms - u.expectedOhms) > 0.005 * u.expectedOhms) mismatched.push(u);
  if (restWrong) {
    const never = !rest.reports.includes("normal");
    let why = "The panel must see a loop at rest as normal, or the input can't be set and keeps reporting.";
    if (scheme === "double-eol" && anyNO)
      why =
        "On a double end-of-line loop the alarm resistor sits across the contact. A normally open contact leaves it in circuit at rest, so the loop reads as an alarm before anything happens; use a normally closed contact or a single end-of-line input.";
    else if (scheme === "shared" && anyNO)
      why = "On a shared input each detector's resistor sits across a normally closed contact; a normally open contact leaves its resistor in circuit at rest, which the panel reads as that detector active.";
    else if (mismatched.length) why = "The fitted resistor doesn't match what the input type expects, so the reading at rest falls outside the normal band.";
    else if (analysis.conductorOhms && analysis.conductorOhms.maxOhms > 0.05 * (rest.nominalOhms ?? 0))
      why = "The cable's own resistance moves the reading at rest out of the normal band; use a heavier gauge or a shorter run.";
    push(out, target, "rest-not-normal", never ? "error" : "warning", () => `${never ? "" : "May not read normal at rest: "}${reads(rest)}`, why);
  }

  let activeNormal: Reading | null = null;
  let activeWrong: Reading | null = null;
  let tamperNormal: Reading | null = null;
  let tamperWrong: Reading | null = null;
  for (let i = 4; i < rows.length; i += 4) {
    const r = rows[i];
    const normal = (masks[i] & REPORT_BIT.normal) !== 0;
    const wrong = (masks[i] & ~acceptableFor(r.expected)) !== 0;
    if (r.expected === "open") {
      if (normal) tamperNormal ??= r;
      else if (wrong) tamperWrong ??= r;
    } else {
      if (normal) activeNormal ??= r;
      else if (wrong) activeWrong ??= r;
    }
  }
  if (activeNormal)
    push(out, target, "active-reads-normal", "error", readsText(activeNormal), "A detector going into alarm must change what the panel reads; here the alarm is lost and nothing is reported.");
  const alarmAsFault = activeWrong !== null && activeWrong.reports.some((x) => x === "short" || x === "open" || x === "trouble");
  if (activeWrong)
    push(out, target, "active-misread",
      lifeSafety && alarmAsFault ? "error" : "warning",
      readsNotText(activeWrong, REPORT_WORDS[activeWrong.expected]),
      activeWrong.reports.includes("short")
        ? "The detector's alarm looks like a shorted cable to this input, so it may be reported as a fault instead of an alarm, and a real short looks like an alarm."
        : "The panel reports the detector's alarm as something else, so whoever responds is told the wrong thing.",
    );
  if (activeWrong && lifeSafety && alarmAsFault) out[out.length - 1].why += ` On a life-safety loop a fire alarm reported as a wiring fault delays the response to a fire. ${LIFE_SAFETY_CAUTION}`;
  if (tamperNormal) push(out, target, "tamper-reads-normal", "error", readsText(tamperNormal), "Opening the detector's cover must be reported; here it reads as normal, so the detector can be interfered with unseen.");
  if (tamperWrong)
    push(out, target, "tamper-misread",
      "warning",
      readsNotText(tamperWrong, "open"),
      "Opening the detector's cover is reported as an alarm rather than a tamper: with the system unset it may go unreported, and the panel can't tell interference from an intruder.",
    );

  // Faults.
  const shortDefeat = (["short-panel", "short-detector"] as const).filter((f) => analysis.faults[f] === "defeat");
  if (shortDefeat.length) {
    const r = silencingShort(rows, shortDefeat);
    const why =
      scheme === "none"
        ? "With no end-of-line resistor the panel can't tell a shorted pair from closed contacts: shorting the cable silences every detector on it without a report."
        : placement === "at-panel"
          ? "The resistor sits at the input terminals, so the panel sees it whatever happens on the cable: a short anywhere along the cable reads normal and the detectors are silenced without a trace. Fit the resistor at the detector, or as a loop-back resistor."
          : "A short reads as normal, so shorting the cable silences the detectors on this loop without any report.";
    push(out, target, "short-reads-normal", "error", () => `Defeat: ${reads(r)}`, why);
  }
  const shortMistaken = (["short-panel", "short-detector"] as const).filter((f) => analysis.faults[f] === "mistaken");
  if (shortMistaken.length && !shortDefeat.length) {
    const r = worstOf(rows, shortMistaken[0], (x) => !isOnly(x, ["short", "trouble"]));
    push(out, target, "short-misread",
      "warning",
      () => `${reads(r)}, not short`,
      "A shorted cable is reported as something other than a short, so the panel can't tell a damaged or tampered cable from a detector's own report.",
    );
  }
  if (analysis.faults.cut === "defeat") {
    const r = worstOf(rows, "cut", (x) => x.reports.includes("normal"));
    const why =
      placement === "at-panel"
        ? "The resistor is across the input terminals, so a cut cable leaves the panel reading the resistor alone: normal. The detectors are cut off without a report. Fit the resistor at the detector."
        : allNO && scheme === "none"
          ? "With no resistor a normally open loop at rest is already an open circuit; cutting it changes nothing the panel can see."
          : "A cut cable reads as normal, so the detectors are cut off without any report.";
    push(out, target, "cut-reads-normal", "error", () => `Defeat: ${reads(r)}`, why);
  } else if (analysis.faults.cut === "mistaken") {
    const r = worstOf(rows, "cut", (x) => !isOnly(x, ["open", "trouble"]));
    push(out, target, "cut-misread",
      "warning",
      () => `${reads(r)}, not open`,
      "A cut that reads as an alarm is not a tamper: with the system unset it may go unreported, and the panel can't tell a cut cable from an intruder.",
    );
  }

  // Readings that straddle a band edge.
  // One pass: readings that straddle an edge, and the thinnest margin among right ones.
  let nUncertain = 0;
  let firstUncertain: Reading | null = null;
  let thin: Reading | null = null;
  for (let i = 0; i < rows.length; i++) {
    const r = rows[i];
    if (r.uncertain) {
      nUncertain++;
      firstUncertain ??= r;
    } else if (r.marginOhms < 0.05 * Math.max(r.nominalOhms ?? 0, 1) && (masks[i] & ~acceptableFor(r.expected)) === 0 && (!thin || r.marginOhms < thin.marginOhms)) thin = r;
  }
  const uncertain = { length: nUncertain, 0: firstUncertain! };
  if (uncertain.length)
    push(out, target, "reading-uncertain",
      "warning",
      () => `${plural(uncertain.length, "reading")} ${pluralWord(uncertain.length, "straddles", "straddle")} a band edge, e.g. ${reads(uncertain[0])}`,
      "Across the parts' tolerance and the cable's temperature range the panel could report either side of the edge; such a loop gives intermittent reports.",
    );
  if (thin)
    push(out, target, "margin-thin", "note", thinText(thin), "A small margin leaves little room for a contact that ages, a joint that corrodes or a hotter cable run.");

  // States the panel can't tell apart, grouped by the kinds of situation involved (an alarm and a cut, …).
  if (ctx.groups.pairs.length) {
    const groups = indistinguishableGroups(ctx.groups);
    push(out, target, "readings-indistinguishable",
      "note",
      apartText(rows, groups),
      "These situations give the same report, so the panel — and whoever answers it — can't know which one happened.",
    );
  }

  // Resistors.
  for (const u of mismatched) {
    const sev: Severity = restWrong ? "error" : "warning";
    push(out, target, "resistor-value-mismatch",
      sev,
      () => `The ${ROLE_WORDS[u.role]} is ${formatOhms(u.ohms)}; the input type expects ${formatOhms(u.expectedOhms!)}. At rest the panel reads ${formatOhmsRange(rest.minOhms, rest.maxOhms)} (${reportsWords(rest.reports)})`,
      restWrong
        ? "The input judges the loop against the value it expects; with another value the loop doesn't read normal at rest."
        : "The loop still reads normal at rest, but with less margin than the input type allows for; fit the value the input expects.",
    );
  }
  for (const u of analysis.resistors) {
    if (u.preferred.series === null) {
      const nearest = u.preferred.nearest.slice();
      push(out, target, "resistor-not-preferred",
        "note",
        () => {
          const e12 = nearestPreferred(u.ohms, "E12").map(formatOhms).join(" or ");
          const e24 = nearest.map(formatOhms).join(" or ");
          const stock = combineFromStock(u.ohms, { series: "E12", tolerancePct: 1 }).best;
          return `The ${ROLE_WORDS[u.role]} ${formatOhms(u.ohms)} is not an E12 or E24 value; nearest E24: ${e24}, nearest E12: ${e12}${stock && stock.parts.length > 1 ? `; from E12 stock: ${stock.expression}` : ""}`;
        },
        "Installers carry E12 and E24 values; an odd value is hard to find on site and easy to replace with the wrong one.",
      );
    }
    if (u.bands.length === 0)
      push(out, target, "resistor-no-colour-code", "note", () => `The ${ROLE_WORDS[u.role]} ${formatOhms(u.ohms)} at ${tolerancePct} % has no IEC 60062 colour code`, "Without a colour code the part can only be checked with a meter before fitting.");
  }
  if (loop.tolerancePct > inputType.tolerancePct)
    push(out, target, "tolerance-wider",
      "warning",
      () => `Parts are ${tolerancePct} %; the input type is specified for ${typeTolerancePct} %`,
      "Wider-tolerance parts spread the readings toward the band edges.",
    );

  // Cable.
  const cable = analysis.conductorOhms!;
  if (cable.maxOhms > inputType.maxLoopOhms)
    push(out, target, "loop-ohms-over-limit",
      "error",
      () => `The loop's conductors measure up to ${formatOhms(cable.maxOhms)} at ${tempMaxC} °C; the input accepts at most ${formatOhms(maxLoopOhms)} (longest run ${Math.floor(byLoopOhmsM ?? 0)} m)`,
      "Beyond its loop-resistance limit the input can't measure the resistors reliably, whatever the bands say; use a heavier gauge or a shorter run.",
    );
  if (maxCableM !== null && maxCableM < lengthM)
    push(out, target, "cable-over-limit",
      "error",
      () => `Readings leave their bands beyond ${Math.floor(maxCableM)} m; this run is already ${lengthM} m`,
      "The cable's own resistance has moved a reading into the wrong band; use a heavier gauge or a shorter run.",
    );
  else if (maxCableM !== null && maxCableM < lengthM * 1.25 && !restWrong)
    push(out, target, "cable-near-limit",
      "warning",
      () => `Readings leave their bands beyond ${Math.floor(maxCableM)} m; this run is ${lengthM} m`,
      "There is little room left before the cable's resistance moves a reading into the wrong band.",
    );

  if (placement === "loop-back" && scheme === "none")
    push(out, target, "loop-back-without-resistor", "note", () => "A loop-back is wired but the scheme has no resistor to loop back", "The extra conductors add resistance and supervise nothing without an end-of-line resistor.");

  // Shared inputs.
  if (scheme === "shared" && analysis.decode) {
    const names = loop.detectors.map((d) => d.label);
    const ambiguous = analysis.decode.filter((d) => !d.unique);
    if (ambiguous.length)
      push(out, target, "shared-decode-ambiguous",
        "error",
        () => `The four states of this shared input don't decode uniquely: ${ambiguous.map((d) => `${describeDecode(d.states, names)} reads ${formatOhmsRange(d.minOhms, d.maxOhms)}`).join("; ")}`,
        "A shared input tells its two detectors apart only by the reading; when two states can give the same report, the panel can't say which detector is active.",
      );
    for (const [r, other] of sharedMisreads(rows, masks))
      push(out, target, "shared-state-misread",
        "error",
        () => `${describeDecode(r.states, names)} reads as ${describeDecode(other.states, names)}: ${reads(r)}`,
        `The panel decodes a shared input by which band the reading falls in; this combination lands in the band of another, so the panel reports ${describeDecode(other.states, names)} when ${describeDecode(r.states, names)}.`,
      );
    const lost = sharedLosses(ctx, names);
    analysis.sharedLost = lost;
    push(out, target, "shared-supervision-lost", "warning", () => `Sharing one input between ${names.join(" and ")} loses supervision compared with one detector per input`, lost.join(" "));
  }

  // Life safety.
  if (lifeSafety) {
    const ls = loop.detectors.filter((d) => d.lifeSafety).map((d) => d.label).join(", ");
    if (scheme === "shared")
      push(out, target, "life-safety-shared", "error", () => `Life-safety device on a shared input: ${ls}`, `Smoke, heat and other life-safety devices must never share an input: a fault on the other detector, or on the shared cable, can silence them. ${LIFE_SAFETY_CAUTION}`);
    if (!inputType.lifeSafety)
      push(out, target, "life-safety-input-type", "error", () => `Life-safety device on ${typeName}, an input type not meant for life-safety devices: ${ls}`, `This input type is not meant to carry fire or other life-safety devices. ${LIFE_SAFETY_CAUTION}`);
    const unsupervised = (["short-panel", "short-detector", "cut"] as const).filter((f) => analysis.faults[f] !== "detected");
    if (unsupervised.length)
      push(out, target, "life-safety-unsupervised",
        "error",
        () => `Life-safety loop without full supervision: ${unsupervised.map((f) => FAULT_SHORT_WORDS[f]).join(", ")} not reported as ${unsupervised.length > 1 ? "themselves" : "itself"}`,
        `A life-safety loop must report every short and cut as a fault, so a damaged cable is found before it is needed. ${LIFE_SAFETY_CAUTION}`,
      );
  }
  return out;
}

const FAULT_SHORT_WORDS = { "short-panel": "a short at the panel end", "short-detector": "a short at the detector end", cut: "a cut conductor" } as const;

function describeDecode(states: readonly string[], names: readonly string[]): string {
  // a shared input has two detectors: written out without intermediate arrays (this runs for every shared loop)
  const a0 = states[0] === "active";
  const a1 = states[1] === "active";
  const t0 = states[0] === "tamper";
  const t1 = states[1] === "tamper";
  const act = a0 && a1 ? "both active" : a0 ? `${names[0]} active` : a1 ? `${names[1]} active` : t0 || t1 ? "" : "both at rest";
  const tam = t0 && t1 ? `${names[0]} and ${names[1]} tamper open` : t0 ? `${names[0]} tamper open` : t1 ? `${names[1]} tamper open` : "";
  return act && tam ? `${act}, ${tam}` : act || tam;
}

/** Shared input, no fault: every state combination whose reading can land in the band of another combination. */
function sharedMisreads(rows: readonly Reading[], masks: readonly number[]): Array<[Reading, Reading]> {
  const out: Array<[Reading, Reading]> = [];
  for (let i = 0; i < rows.length; i += 4) {
    const r = rows[i];
    for (let j = 0; j < rows.length; j += 4) {
      const o = rows[j];
      if (j === i || o.expected === r.expected || !(masks[i] & REPORT_BIT[o.expected])) continue;
      if (out.some(([a, b]) => a === r && b.expected === o.expected)) continue;
      out.push([r, o]);
    }
  }
  return out;
}

const normal = (x: Reading) => x.reports.includes("normal");
const alarm = (x: Reading) => x.expected === "short" && x.states.includes("active") && normal(x);

/** The short to quote in a defeat: one at the detector end while a detector is in alarm silences that alarm. */
function silencingShort(rows: readonly Reading[], defeats: readonly Reading["fault"][]): Reading {
  const order: Reading["fault"][] = defeats.includes("short-detector") ? ["short-detector", ...defeats.filter((f) => f !== "short-detector")] : [...defeats];
  for (const f of order) {
    const hit = rows.find((x) => x.fault === f && alarm(x));
    if (hit) return hit;
  }
  return worstOf(rows, order[0], normal);
}

const SITUATION_ORDER = ["all at rest", "an alarm", "a tamper", "a short at the detector end", "a short at the panel end", "a cut conductor"];
const GROUP_WORDS = SITUATION_ORDER.map((a, i) => SITUATION_ORDER.map((b, j) => (i === j ? `${a} and another ${a.replace(/^(a|an|all at) /, "")}` : `${a} and ${b}`)));

/**
 * Pairs grouped by the two kinds of situation they mix up, in a fixed order, each with a count and its first pair
 * (row indices). Taken at once: the counts are overwritten by the next analysis.
 */
function indistinguishableGroups(g: PairGroups): { words: string; count: number; i: number; j: number }[] {
  const n = SITUATION_ORDER.length;
  const out: { words: string; count: number; i: number; j: number }[] = [];
  for (let k = 0; k < n * n; k++) if (g.counts[k]) out.push({ words: GROUP_WORDS[(k / n) | 0][k % n], count: g.counts[k], i: g.firstI[k], j: g.firstJ[k] });
  return out;
}

/** What a shared input loses against one detector per input, from this loop's own readings. */
function sharedLosses(ctx: FindingsInput, names: readonly string[]): string[] {
  const { analysis, loop } = ctx;
  const out: string[] = [];
  const hasTamper = loop.detectors.some((d) => d.tamper);
  out.push(
    `A cut cable${hasTamper ? " or either detector's tamper" : ""} opens the whole input: the panel reports the input, not which detector, and neither ${names[0]} nor ${names[1]} can report an alarm until it is repaired.`,
  );
  const shorts = (["short-panel", "short-detector"] as const).map((f) => analysis.faults[f]);
  if (shorts.includes("defeat")) out.push("A short on the shared cable reads as normal: both detectors are silenced at once without a report.");
  else out.push("A short on the shared cable is reported, but it blinds both detectors at once until it is repaired.");
  const undetected = (["short-panel", "short-detector", "cut"] as const).filter((f) => analysis.faults[f] !== "detected");
  if (undetected.length) out.push(`Not reported as themselves on this input: ${undetected.map((f) => FAULT_SHORT_WORDS[f]).join(", ")}.`);
  const ambiguous = analysis.decode?.filter((d) => !d.unique) ?? [];
  if (ambiguous.length) out.push(`Under tolerance and cable resistance these states can't be told apart: ${ambiguous.map((d) => describeDecode(d.states, names)).join(", ")}.`);
  out.push("Smoke, heat and other life-safety devices must never share an input.");
  return out;
}
