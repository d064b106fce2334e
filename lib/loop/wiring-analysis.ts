// The conductor-level and Class A parts of a loop analysis, attached when the loop asks for them.
import type { InputType } from "@/lib/catalog/schema";
import type { FindingTarget } from "@/lib/findings";
import { analyzeClassA, classAProblems } from "./class-a";
import { analyzeConductors, conductorFindings, conductorProblems, type ConductorProblem } from "./conductors";
import type { LoopModel } from "./loop-model";
import type { LoopAnalysis, LoopSpec } from "./types";
import { reportsWords } from "./row-labels";

export function wiringProblems(loop: LoopSpec, out: ConductorProblem[] = []): ConductorProblem[] {
  conductorProblems(loop, out);
  if (loop.pathway === "class-a") out.push(...classAProblems(loop));
  return out;
}

export function attachWiring(analysis: LoopAnalysis, loop: LoopSpec, inputType: InputType, m: LoopModel, target: FindingTarget): void {
  if (loop.conductorFaults !== undefined) {
    analysis.conductors = analyzeConductors(loop, inputType, m);
    analysis.findings.push(...conductorFindings(analysis.conductors, loop.detectors.some((d) => d.lifeSafety) || inputType.lifeSafety, target));
  }
  if (loop.pathway === "class-a") {
    analysis.classA = analyzeClassA(loop, inputType, m);
    if (!analysis.classA.everyDeviceReported) {
      const missed = analysis.classA.opens.find((o) => !o.openReported || o.devices.some((d) => !d.reported))!;
      const dev = missed.openReported ? missed.devices.find((d) => !d.reported) : undefined;
      analysis.findings.push({
        code: "class-a-device-lost",
        severity: "error",
        message: dev ? `After ${missed.label}, ${loop.detectors[dev.detector].label} active reads ${reportsWords(dev.reading.reports)} from either end, not active` : `${missed.rest.label} reads ${reportsWords(missed.rest.reports)}, not as an open or trouble`,
        why: "A Class A loop must keep reporting every device after a single open, fed from both ends; this one loses a device, so it is not Class A.",
        target,
      });
    }
  }
}
