/** Seeded pseudo-random numbers shared by the assessments (variants) and the Monte Carlo (samples). */
export { mulberry32 } from "./mulberry32";
export { fmix32, variantSeed } from "./variantSeed";
