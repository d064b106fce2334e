"use client";
// The loop bench: wire a loop virtually, set each detector's state, inject a fault, and see what the input
// reads and the panel reports. The engine is pure, so it runs here on every change.
import type { InputType } from "@/lib/catalog/schema";
import { BenchResults } from "./bench-results";
import { ConductorFaultControls } from "./conductor-fault-controls";
import { FaultFinderPanel } from "./fault-finder-panel";
import { CableControls, ResistorControls } from "./resistor-cable-controls";
import { useBench } from "./use-bench";
import { DetectorFaultControls, InputWiringControls } from "./wiring-controls";

export function LoopBench({ inputTypes }: { inputTypes: InputType[] }) {
  const bench = useBench(inputTypes);
  return (
    <div className="grid grid-cols-[minmax(0,1fr)] gap-6 lg:grid-cols-[22rem_minmax(0,1fr)]" data-testid="loop-bench">
      {/* controls */}
      <div className="grid min-w-0 grid-cols-[minmax(0,1fr)] content-start gap-4">
        <InputWiringControls bench={bench} inputTypes={inputTypes} />
        <DetectorFaultControls bench={bench} />
        <ConductorFaultControls bench={bench} />
        <ResistorControls bench={bench} />
        <CableControls bench={bench} />
        <FaultFinderPanel loop={bench.loop} inputType={bench.inputType} />
      </div>
      {/* results */}
      <BenchResults bench={bench} />
    </div>
  );
}
