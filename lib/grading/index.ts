// Public surface of the grading engine. Pure: no database, clock, randomness or I/O.
export { grade, ENGINE_VERSION } from "./engine";
export { templates, findTemplate } from "./templates";
export { canonicalJson, resultDigest } from "./canonical";
export * from "./schema";
