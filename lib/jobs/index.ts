export { EMBEDDED_DEFAULTS, EmbeddedJobBackend, type EmbeddedOptions } from "./embeddedBackend";
export type * from "./types";
export { isFinal } from "./types";
