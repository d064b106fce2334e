export * from "./geometry";
export * from "./scale";
export * from "./polyline";
export * from "./snap";
export * from "./run-length";
export * from "./orthogonal";
