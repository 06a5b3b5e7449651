/**
 * Schema (zod) of a POST /api/uncertainty body: Monte Carlo ranges of one analysis, or of every level of a
 * stored sweep. Kept apart from the job handler (lib/service/uncertainty.ts, server-only) so that the
 * OpenAPI document can be built from it anywhere.
 */
import { z } from "zod";
import { analysisRequestSchema } from "../engine/requestSchema";

export const uncertaintyJobSchema = z.union([
  z.object({ analysis: analysisRequestSchema }).strict(),
  z
    .object({
      profileId: z.string().regex(/^[A-Za-z0-9_-]{1,80}$/, "expected a stored profile sweep id"),
      samples: z.number().int("expected a whole number of samples").min(0).max(100_000),
      seed: z.number().int().min(0).max(0xffffffff).optional(),
      sensitivity: z.boolean().optional(),
    })
    .strict(),
]);

export type UncertaintyJobInput = z.infer<typeof uncertaintyJobSchema>;
