import { loopJsonReviver } from "@/lib/loop/loop-json";

/** An answer of a loop route with its open readings ("Infinity" on the wire) back as Infinity. */
export function reviveLoopJson<T>(value: unknown): T {
  return (value === undefined ? value : JSON.parse(JSON.stringify(value), loopJsonReviver)) as T;
}
