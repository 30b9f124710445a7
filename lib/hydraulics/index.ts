/** Hydraulic computations for GCL permeation tests (pure; SI inside). */
export { evaluateRun } from "./evaluate-run";
export { validateRunInput } from "./validate-run-input";
export * from "./types";
export * from "./units";
export * from "./water";
export * from "./geometry";
export * from "./burettes";
export * from "./falling-head";
export * from "./intervals";
export * from "./trend";
export * from "./termination";
export * from "./pore-volumes";
export * from "./uncertainty";
export * from "./conformance";
export * from "./projection";
