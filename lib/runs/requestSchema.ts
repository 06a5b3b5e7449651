/**
 * Schema (zod) of a run request, shared by the route and the page. The
 * condition reuses the analysis schema, so every condition field the engine
 * accepts is accepted here. Limits: 1–60 days; a trajectory CSV of at most
 * 1 MiB (and 10,000 rows, parseTrajectoryCsv.ts).
 */
import { z } from "zod";
import { conditionSchema, finiteIn, parseWith } from "../engine/requestSchema";
import type { RunRequest } from "./types";

export const RUN_LIMITS = {
  maxDays: 60,
  /** characters of an inline trajectory CSV */
  maxTrajectoryCsv: 1024 * 1024,
};

const id = z.string().regex(/^[A-Za-z0-9_-]{1,80}$/, "expected an id");

export const runStartSchema = z.discriminatedUnion("kind", [
  z.object({ kind: z.literal("periodic"), ozone: z.enum(["held", "solved"]).optional() }).strict(),
  z.object({ kind: z.literal("analysis"), analysisId: id }).strict(),
  z
    .object({
      kind: z.literal("amounts"),
      mixingRatios: z.record(z.string(), finiteIn(0, 1, "expected a mixing ratio between 0 and 1")),
      ozone: z.enum(["held", "solved"]).optional(),
    })
    .strict(),
]);

export const runRequestSchema = z
  .object({
    mechanismId: id,
    condition: conditionSchema,
    days: z
      .number()
      .int("expected a whole number of days")
      .min(1, "expected at least 1 day")
      .max(RUN_LIMITS.maxDays, `expected at most ${RUN_LIMITS.maxDays} days`),
    start: runStartSchema.optional(),
    trajectory: z
      .object({
        csv: z
          .string()
          .min(1, "expected the CSV text")
          .max(RUN_LIMITS.maxTrajectoryCsv, `expected at most ${RUN_LIMITS.maxTrajectoryCsv} characters`),
        name: z.string().max(120).optional(),
      })
      .strict()
      .optional(),
    title: z.string().max(200).optional(),
    options: z
      .object({
        fminRelative: finiteIn(0, 0.5, "expected a fraction between 0 and 0.5", { min: true, max: true }).optional(),
        oxDefinition: z.enum(["standard", "extended"]).optional(),
        sunFollowsDate: z.boolean().optional(),
      })
      .strict()
      .optional(),
  })
  .strict();

/** Parses a run request or throws an InputError naming the first bad field. */
export function parseRunRequest(body: unknown): RunRequest {
  return parseWith(runRequestSchema, body) as RunRequest;
}
