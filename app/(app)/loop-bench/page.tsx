import type { Metadata } from "next";
import { pageActor } from "@/lib/server/session";
import { loopInputTypesFor } from "@/lib/server/loop-analysis";
import { PageHeader } from "@/components/ui/page-header";
import { Refusal } from "@/components/ui/refusal";
import { LoopBench } from "@/components/loop-bench/loop-bench";

export const metadata: Metadata = { title: "Loop bench" };

export default async function LoopBenchPage() {
  const { actor, allowed, reason } = await pageActor("loop:analyze", "/loop-bench");
  if (!allowed) return <Refusal reason={reason} />;
  const inputTypes = await loopInputTypesFor(actor.organisationId);
  return (
    <>
      <PageHeader
        title="Loop bench"
        subtitle="Wire a loop virtually, set each detector's state, inject a fault, and see what the input reads and the panel reports. Everything updates as you change it."
      />
      {inputTypes.length ? <LoopBench inputTypes={inputTypes} /> : <p className="text-sm text-slate-600">Your organisation&apos;s catalog has no input types.</p>}
    </>
  );
}
