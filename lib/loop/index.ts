// Public API of the loop supervision engine.
export type * from "./types";

export { analyzeLoop } from "./analyze-loop";
export { loopSpecKey, LoopAnalysisMemo } from "./loop-key";
export { readingAt, enumerateStates, FAULTS, type ReadingParams } from "./loop-model";
export { reportOf, reportsOf } from "./loop-bands";
export { loopProblems, loopShapeProblems, inputTypeProblems, fittedValues, type LoopProblem } from "./loop-problems";
export { rowsMatchingReading } from "./meter-reading";
export { LIFE_SAFETY_CAUTION } from "./loop-findings";
export { statesLabel, rowLabel, REPORT_WORDS, FAULT_WORDS } from "./row-labels";
export { loopJsonReplacer, loopJsonReviver } from "./loop-json";
export { carriesTamperPair, CORE_COLOURS, CABLE_CORES_WORDS, coresOf, conductorFaultLabel, cutsSupply, conductorFaultReading, enumerateConductorFaults, positionWords } from "./conductors";
export { classAProblems } from "./class-a";

export {
  COPPER_RESISTIVITY_20C,
  COPPER_ALPHA_20C,
  awgDiameterMm,
  awgAreaMm2,
  gaugeAreaMm2,
  copperTempFactor,
  conductorOhmsPerM,
  conductorOhmsPer1000Ft,
  conductorOhms,
  cableOhms,
  maxRunForOhms,
} from "./cable";

export {
  E12_MANTISSAS,
  E24_MANTISSAS,
  seriesValues,
  isPreferred,
  preferredSeriesOf,
  nearestPreferred,
  closestPreferred,
  type ESeriesName,
} from "@/lib/resistors/e-series";
export { colourBands, bandsToOhms } from "@/lib/resistors/colour-code";
export { combineFromStock, type StockCombination, type StockOptions, type StockSolution, type CombinationTopology } from "@/lib/resistors/stock-combination";
export { series, parallel, series2, parallel2 } from "@/lib/resistors/network";
export { formatOhms, formatOhmsRange } from "@/lib/resistors/format-ohms";

export {
  analyzeRequestSchema,
  loopSpecSchema,
  loopDetectorSchema,
  cableSpecSchema,
  placementSchema,
  cableCoresSchema,
  coreColourSchema,
  conductorFaultSchema,
  conductorFaultsSchema,
  pathwaySchema,
  findingTargetSchema,
  inputTypeRefSchema,
  type AnalyzeRequest,
} from "./loop-schema";
export { cableGaugeSchema } from "./cable-gauge";
export { analyzeRequest, analyzeRequestAsync, type AnalyzeRequestResult, type RequestIssue, type InputTypeLookup } from "./analyze-request";
export { buildLoopNetlist, ohmsFromResult, SPICE_OPEN_OHMS, type SpiceCase } from "./spice-netlist";
