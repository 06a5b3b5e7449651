/**
 * Schemas (zod) of a sweep request and a comparison request, shared by the
 * routes and the pages. The per-level condition reuses the analysis schema.
 */
import { z } from "zod";
import { conditionSchema, finiteIn, parseWith } from "../engine/requestSchema";
import { InputError } from "../errors";
import type { ComparisonRequest, SweepRequest } from "./types";

const id = z.string().regex(/^[A-Za-z0-9_-]{1,80}$/, "expected an id");

/** Largest CSV profile accepted inline, characters. */
export const MAX_PROFILE_CSV = 512 * 1024;

export const profileSpecSchema = z.discriminatedUnion("kind", [
  z.object({ kind: z.literal("standard") }).strict(),
  z.object({ kind: z.literal("demo"), id }).strict(),
  z
    .object({
      kind: z.literal("csv"),
      csv: z
        .string()
        .min(1, "expected the CSV text")
        .max(MAX_PROFILE_CSV, `expected at most ${MAX_PROFILE_CSV} characters`),
      name: z.string().max(120).optional(),
    })
    .strict(),
]);

export const sweepRequestSchema = z
  .object({
    mechanismId: id,
    profile: profileSpecSchema,
    grid: z
      .object({
        from_km: finiteIn(0, 86, "expected an altitude between 0 and 86 km").optional(),
        to_km: finiteIn(0, 86, "expected an altitude between 0 and 86 km").optional(),
        step_km: finiteIn(0.05, 86, "expected a step between 0.05 and 86 km").optional(),
      })
      .strict()
      .optional(),
    condition: conditionSchema.omit({ altitude_km: true, T_K: true, p_hPa: true }).optional(),
    options: z
      .object({
        fminRelative: finiteIn(0, 0.5, "expected a fraction between 0 and 0.5", { min: true, max: true }).optional(),
        oxDefinition: z.enum(["standard", "extended"]).optional(),
        parallel: z.enum(["auto", "parallel", "sequential"]).optional(),
        maxColumnPasses: z.number().int().min(1).max(10).optional(),
        columnTolerance: finiteIn(0, 1, "expected a fraction between 0 and 1", { min: true, max: true }).optional(),
      })
      .strict()
      .optional(),
  })
  .strict();

export const storedSideSchema = z.object({ sweepId: id }).strict();

export const comparisonRequestSchema = z
  .object({
    a: z.record(z.string(), z.unknown()),
    b: z.record(z.string(), z.unknown()),
    labels: z
      .object({ a: z.string().max(60).optional(), b: z.string().max(60).optional() })
      .strict()
      .optional(),
    topCycles: z.number().int().min(1).max(50).optional(),
  })
  .strict();

export function parseSweepRequest(body: unknown): SweepRequest {
  return parseWith(sweepRequestSchema, body) as SweepRequest;
}

/** Each side is either { sweepId } or a whole sweep request; errors name the side, e.g. b.profile.csv. */
export function parseComparisonRequest(body: unknown): ComparisonRequest {
  const top = parseWith(comparisonRequestSchema, body);
  const sideOf = (key: "a" | "b") => {
    const v = top[key];
    try {
      return "sweepId" in v ? parseWith(storedSideSchema, v) : parseSweepRequest(v);
    } catch (e) {
      if (e instanceof InputError) {
        const path = e.path && e.path !== "(body)" ? `${key}.${e.path}` : key;
        throw new InputError(path, e.message.slice((e.path ?? "").length + 2), e.code);
      }
      throw e;
    }
  };
  return { ...top, a: sideOf("a"), b: sideOf("b") } as ComparisonRequest;
}
