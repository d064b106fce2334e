import loadHighs, { type Highs } from "highs";

// HiGHS compiled to WebAssembly: loaded once per thread (the worker's, or a test's), about a hundred milliseconds.
let loading: Promise<Highs> | null = null;

export function highsSolver(): Promise<Highs> {
  return (loading ??= loadHighs());
}
